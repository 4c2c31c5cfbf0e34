/**
 * server/schemas is the contract the web app shares with the server: it may import only zod,
 * its own files and analysis/ (pure code), so the web bundle never pulls in Express or Sequelize.
 */
import fs from 'node:fs';
import path from 'node:path';

const DIR = path.resolve(__dirname, '../../server/schemas');
const IMPORT = /^\s*(?:import|export)\s[^'"]*?from\s+['"]([^'"]+)['"]/gm;

describe('server/schemas imports', () => {
  const files = fs.readdirSync(DIR).filter((f) => f.endsWith('.ts'));
  it.each(files)('%s imports only zod, its own folder and analysis/', (file) => {
    const text = fs.readFileSync(path.join(DIR, file), 'utf8');
    const sources = [...text.matchAll(IMPORT)].map((m) => m[1]);
    const bad = sources.filter((s) => !(s === 'zod' || /^\.\/[\w-]+$/.test(s) || /^(\.\.\/\.\.\/|@\/)analysis\//.test(s)));
    expect(bad).toEqual([]);
  });
  it('the check sees the imports (it is not vacuous)', () => {
    const all = files.flatMap((f) => [...fs.readFileSync(path.join(DIR, f), 'utf8').matchAll(IMPORT)]);
    expect(all.length).toBeGreaterThan(files.length);
  });
});
