/**
 * Draws Ovalyard's mark (a tilted copper oval around a ball on green-slate, as in
 * components/ui/brand-mark.tsx) into assets/images/favicon.png and icon.png. No image
 * library: the shapes are sampled per pixel (4 × 4 supersampling) and written as a PNG.
 * Run: node --import tsx scripts/draw-icons.ts
 */
import fs from 'node:fs';
import path from 'node:path';
import zlib from 'node:zlib';
import { colors } from '../components/theme';

type Rgba = [number, number, number, number];

const hex = (h: string, a = 255): Rgba => [parseInt(h.slice(1, 3), 16), parseInt(h.slice(3, 5), 16), parseInt(h.slice(5, 7), 16), a];

const INK = hex(colors.ink);
const ACCENT = hex(colors.accent);
const PAPER = hex(colors.paper);
const CLEAR: Rgba = [0, 0, 0, 0];

/** The colour at (x, y) in the 64-unit design square. */
function sample(x: number, y: number): Rgba {
  // rounded square, corner radius 14
  const r = 14;
  const cx = Math.min(Math.max(x, r), 64 - r);
  const cy = Math.min(Math.max(y, r), 64 - r);
  if (Math.hypot(x - cx, y - cy) > r) return CLEAR;
  // ball
  if (Math.hypot(x - 32, y - 33) <= 6) return PAPER;
  // oval ring: ellipse rx 22, ry 12, rotated −24°, stroke 5 (approximate normal distance)
  const t = (-24 * Math.PI) / 180;
  const dx = x - 32;
  const dy = y - 33;
  const u = dx * Math.cos(t) + dy * Math.sin(t);
  const v = -dx * Math.sin(t) + dy * Math.cos(t);
  const k = Math.hypot(u / 22, v / 12);
  const grad = Math.hypot(u / (22 * 22), v / (12 * 12)) / Math.max(k, 1e-9);
  if (Math.abs(k - 1) / grad <= 2.5) return ACCENT;
  return INK;
}

function render(size: number): Buffer {
  const ss = 4;
  const rows: Buffer[] = [];
  for (let py = 0; py < size; py++) {
    const row = Buffer.alloc(1 + size * 4);
    for (let px = 0; px < size; px++) {
      let rr = 0, gg = 0, bb = 0, aa = 0;
      for (let sy = 0; sy < ss; sy++) {
        for (let sx = 0; sx < ss; sx++) {
          const c = sample(((px + (sx + 0.5) / ss) / size) * 64, ((py + (sy + 0.5) / ss) / size) * 64);
          rr += c[0] * c[3];
          gg += c[1] * c[3];
          bb += c[2] * c[3];
          aa += c[3];
        }
      }
      const o = 1 + px * 4;
      row[o] = aa ? Math.round(rr / aa) : 0;
      row[o + 1] = aa ? Math.round(gg / aa) : 0;
      row[o + 2] = aa ? Math.round(bb / aa) : 0;
      row[o + 3] = Math.round(aa / (ss * ss));
    }
    rows.push(row);
  }
  return png(size, size, Buffer.concat(rows));
}

const CRC_TABLE = Array.from({ length: 256 }, (_, n) => {
  let c = n;
  for (let k = 0; k < 8; k++) c = c & 1 ? 0xedb88320 ^ (c >>> 1) : c >>> 1;
  return c >>> 0;
});

function crc32(buf: Buffer): number {
  let c = 0xffffffff;
  for (const b of buf) c = CRC_TABLE[(c ^ b) & 0xff]! ^ (c >>> 8);
  return (c ^ 0xffffffff) >>> 0;
}

function chunk(type: string, data: Buffer): Buffer {
  const len = Buffer.alloc(4);
  len.writeUInt32BE(data.length);
  const body = Buffer.concat([Buffer.from(type, 'ascii'), data]);
  const crc = Buffer.alloc(4);
  crc.writeUInt32BE(crc32(body));
  return Buffer.concat([len, body, crc]);
}

/** PNG (RGBA, 8 bit) from filtered scanlines (filter byte 0 on each row). */
function png(width: number, height: number, scanlines: Buffer): Buffer {
  const ihdr = Buffer.alloc(13);
  ihdr.writeUInt32BE(width, 0);
  ihdr.writeUInt32BE(height, 4);
  ihdr[8] = 8; // bit depth
  ihdr[9] = 6; // RGBA
  return Buffer.concat([
    Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]),
    chunk('IHDR', ihdr),
    chunk('IDAT', zlib.deflateSync(scanlines, { level: 9 })),
    chunk('IEND', Buffer.alloc(0)),
  ]);
}

const out = path.resolve(__dirname, '../assets/images');
fs.mkdirSync(out, { recursive: true });
fs.writeFileSync(path.join(out, 'favicon.png'), render(48));
fs.writeFileSync(path.join(out, 'icon.png'), render(512));
console.log('wrote assets/images/favicon.png (48 px) and icon.png (512 px)');
