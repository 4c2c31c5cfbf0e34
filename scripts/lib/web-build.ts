/**
 * Builds the web app (expo export) when its sources changed since the last build; the hash of
 * the sources is kept in dist/.source-hash.
 */
import { createHash } from 'node:crypto';
import { spawnSync } from 'node:child_process';
import fs from 'node:fs';
import path from 'node:path';

const ROOT = path.resolve(__dirname, '../..');
const SOURCES = ['index.ts', 'package.json', 'app', 'components', 'analysis', 'server/schemas', 'assets', 'app.json', 'package-lock.json', 'tsconfig.json'];

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

/** Runs `expo export --platform web` when needed; returns whether it built. */
export function buildWebIfChanged(log: (line: string) => void = console.log, root = ROOT, force = false): boolean {
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
    stdio: ['ignore', 'inherit', 'inherit'],
    env: { ...process.env, EXPO_OFFLINE: '1', EXPO_NO_TELEMETRY: '1', CI: '1' },
  });
  if (r.status !== 0) throw new Error('The web build failed (see the output above).');
  fs.writeFileSync(stampFile, hash);
  log(`Web app built in ${((Date.now() - started) / 1000).toFixed(0)} s.`);
  return true;
}
