/**
 * Builds the web app (expo export) when its sources changed since the last build; the hash of
 * the sources is kept in dist/.source-hash.
 */
import { createHash } from 'node:crypto';
import { spawnSync } from 'node:child_process';
import fs from 'node:fs';
import path from 'node:path';
import zlib from 'node:zlib';

const ROOT = path.resolve(__dirname, '../..');
const SOURCES = ['index.ts', 'package.json', 'app', 'components', 'analysis', 'server/schemas', 'assets', 'app.json', 'metro.config.js', 'package-lock.json', 'tsconfig.json'];

function walk(p: string, out: string[]): void {
  if (!fs.existsSync(p)) return;
  const stat = fs.statSync(p);
  if (stat.isDirectory()) {
    for (const entry of fs.readdirSync(p).sort()) walk(path.join(p, entry), out);
  } else {
    out.push(p);
  }
}

export function webSourceHash(root = ROOT): string {
  const files: string[] = [];
  for (const s of SOURCES) walk(path.join(root, s), files);
  const hash = createHash('sha256');
  for (const f of files) {
    hash.update(path.relative(root, f));
    hash.update(fs.readFileSync(f));
  }
  return hash.digest('hex');
}

/**
 * Writes a brotli (strongest setting) and a gzip copy beside each hashed script and style of the
 * build (dist/_expo/static), served by server/middleware/precompressed-static.ts. About 10 s.
 */
export function precompressBuild(dist: string): void {
  const files: string[] = [];
  walk(path.join(dist, '_expo/static'), files);
  for (const file of files) {
    if (!/\.(js|css)$/.test(file)) continue;
    const body = fs.readFileSync(file);
    const br = zlib.brotliCompressSync(body, {
      params: { [zlib.constants.BROTLI_PARAM_QUALITY]: 11, [zlib.constants.BROTLI_PARAM_MODE]: zlib.constants.BROTLI_MODE_TEXT, [zlib.constants.BROTLI_PARAM_SIZE_HINT]: body.length },
    });
    fs.writeFileSync(`${file}.br`, br);
    fs.writeFileSync(`${file}.gz`, zlib.gzipSync(body, { level: 9 }));
  }
}

/** Runs `expo export --platform web` when needed; returns whether it built. quiet: Expo's own output is left out. */
export function buildWebIfChanged(log: (line: string) => void = console.log, root = ROOT, force = false, quiet = false): boolean {
  const dist = path.join(root, 'dist');
  const stampFile = path.join(dist, '.source-hash');
  const hash = webSourceHash(root);
  if (!force && fs.existsSync(stampFile) && fs.readFileSync(stampFile, 'utf8') === hash && fs.existsSync(path.join(dist, 'index.html'))) {
    return false;
  }
  log('Building the web app (expo export --platform web)…');
  const started = Date.now();
  const r = spawnSync('npx', ['expo', 'export', '--platform', 'web', '--output-dir', 'dist'], {
    cwd: root,
    // quiet: only errors show (the bench's --json output stays JSON)
    stdio: ['ignore', quiet ? 'ignore' : 'inherit', 'inherit'],
    env: { ...process.env, EXPO_OFFLINE: '1', EXPO_NO_TELEMETRY: '1', CI: '1' },
  });
  if (r.status !== 0) throw new Error('The web build failed (see the output above).');
  precompressBuild(dist);
  fs.writeFileSync(stampFile, hash);
  log(`Web app built in ${((Date.now() - started) / 1000).toFixed(0)} s.`);
  return true;
}
