/**
 * A JSON answer serialised once and kept as bytes, with its entity tag and its compressed forms
 * made on first demand (off the main thread, in zlib's thread pool). Used for answers that are
 * worth keeping between requests (server/services/analysis-cache.ts).
 */
import { createHash } from 'node:crypto';
import { promisify } from 'node:util';
import zlib from 'node:zlib';

export type BodyEncoding = 'br' | 'gzip';

const brotli = promisify(zlib.brotliCompress);
const gzip = promisify(zlib.gzip);

/** Compression settings for bodies made once and sent many times: stronger than per-request. */
const ENCODERS: Record<BodyEncoding, (body: Buffer) => Promise<Buffer>> = {
  br: (body) =>
    brotli(body, {
      params: {
        [zlib.constants.BROTLI_PARAM_QUALITY]: 5,
        [zlib.constants.BROTLI_PARAM_MODE]: zlib.constants.BROTLI_MODE_TEXT,
        [zlib.constants.BROTLI_PARAM_SIZE_HINT]: body.length,
      },
    }),
  gzip: (body) => gzip(body, { level: 6 }),
};

export interface PreparedJson {
  /** The UTF-8 JSON text. */
  readonly body: Buffer;
  /** Weak entity tag from the body's SHA-256: equal bodies, equal tags, in every process. */
  readonly etag: string;
  /** The body in an encoding, made once (concurrent callers share one compression). */
  encoded(encoding: BodyEncoding): Promise<Buffer>;
  /** Bytes held: the body and the encodings made so far. */
  bytes(): number;
}

/**
 * Serialises a value once. O(size): one JSON.stringify and one SHA-256 pass (about 2 ms for
 * 500 KB here); each encoding costs one compression when first asked for.
 * @example prepareJson({ ok: true }).etag // => 'W/"…"'
 */
export function prepareJson(value: unknown): PreparedJson {
  return prepareJsonBytes(Buffer.from(JSON.stringify(value), 'utf8'));
}

/** The same for JSON text that is already bytes. */
export function prepareJsonBytes(body: Buffer): PreparedJson {
  const etag = `W/"${createHash('sha256').update(body).digest('base64url').slice(0, 32)}"`;
  const made = new Map<BodyEncoding, Promise<Buffer>>();
  const sizes = new Map<BodyEncoding, number>();
  return {
    body,
    etag,
    encoded(encoding) {
      let pending = made.get(encoding);
      if (!pending) {
        pending = ENCODERS[encoding](body).then((bytes) => {
          sizes.set(encoding, bytes.length);
          return bytes;
        });
        // A failed compression is not kept: the next request tries again.
        pending.catch(() => made.delete(encoding));
        made.set(encoding, pending);
      }
      return pending;
    },
    bytes() {
      let total = body.length;
      for (const n of sizes.values()) total += n;
      return total;
    },
  };
}
