// Jest for mutation testing (npm run mutate): the analysis project of jest.config.js as one flat
// config (Stryker's Jest runner swaps in its own test environment, which needs a flat config).
// Tests: the mirror of the mutated folder or file under tests/analysis (tests/analysis/strays
// for analysis/strays, tests/analysis/units.test.ts and units-*.test.ts for analysis/units.ts), plus the families
// that read it directly (units.ts: the import tests). A folder's own tests must catch its
// mistakes; running all 700 analysis tests for every module-level mutant would take hours on two
// cores. MUTATE_TESTS (comma-separated paths under tests/analysis) overrides the choice.
// tests/scripts run child processes, which a mutant never reaches.
const path = require('node:path');
const { projects } = require('../../jest.config.js');

const { displayName: _name, testMatch: _match, ...analysis } = projects.find((p) => p.displayName === 'analysis');

const EXTRA_TESTS = { 'analysis/units.ts': ['import'] };

function testsFor(target) {
  if (process.env.MUTATE_TESTS) return process.env.MUTATE_TESTS.split(',').map((t) => t.trim()).filter(Boolean);
  if (!target || target === 'analysis') return ['.'];
  const mirror = target.replace(/^analysis\/?/, '').replace(/\.ts$/, '');
  return [mirror.endsWith('/') ? mirror.slice(0, -1) : mirror, ...(EXTRA_TESTS[target] ?? [])];
}

const target = (process.env.MUTATE_TARGET ?? 'analysis').replace(/\/+$/, '');
const testMatch = testsFor(target).flatMap((t) =>
  t === '.'
    ? ['<rootDir>/tests/analysis/**/*.test.ts']
    : [`<rootDir>/tests/analysis/${t}.test.ts`, `<rootDir>/tests/analysis/${t}-*.test.ts`, `<rootDir>/tests/analysis/${t}/**/*.test.ts`],
);

module.exports = {
  ...analysis,
  rootDir: path.resolve(__dirname, '../..'),
  testMatch,
};
