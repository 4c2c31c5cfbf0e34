// Mutation testing of analysis/ (npm run mutate; see scripts/mutate.ts). One target per run:
// MUTATE_TARGET names a folder or file of analysis/ (default: all of analysis/), and each
// target keeps its own incremental file and reports under reports/mutation/.
const target = (process.env.MUTATE_TARGET ?? 'analysis').replace(/\/+$/, '');
const slug = target.replace(/\.ts$/, '').replace(/[^A-Za-z0-9]+/g, '-');
const isFile = target.endsWith('.ts');

/** @type {import('@stryker-mutator/api/core').PartialStrykerOptions} */
export default {
  testRunner: 'jest',
  jest: { projectType: 'custom', configFile: 'scripts/mutate/jest-analysis.config.js', enableFindRelatedTests: true },
  checkers: ['typescript'],
  tsconfigFile: 'scripts/mutate/tsconfig.json',
  coverageAnalysis: 'perTest',
  mutate: isFile ? [target] : [`${target}/**/*.ts`, '!**/index.ts', '!**/*.d.ts'],
  // Two cores shared with other work: one test runner unless told otherwise (--concurrency).
  concurrency: Number(process.env.MUTATE_CONCURRENCY ?? 1),
  // Module-level mutants (tables, constants worked out at load) need every test of the target
  // run afresh for each one: hours on two cores. Left out (reported as Ignored) unless
  // MUTATE_STATIC=1 (`npm run mutate -- --static …`).
  ignoreStatic: process.env.MUTATE_STATIC !== '1',
  incremental: true,
  incrementalFile: `reports/mutation/${slug}.incremental.json`,
  reporters: ['progress', 'clear-text', 'html', 'json'],
  htmlReporter: { fileName: `reports/mutation/${slug}.html` },
  jsonReporter: { fileName: `reports/mutation/${slug}.json` },
  clearTextReporter: { allowColor: false, logTests: false, maxTestsToLog: 0 },
  tempDirName: '.stryker-tmp',
  ignorePatterns: ['dist', '.data*', '.scratch*', '.expo', 'coverage', 'web-build'],
  // A loaded shared machine: generous before a mutant counts as an endless loop. MUTATE_TIMEOUT_MS
  // shortens it (endless-loop mutants each wait it out), but only on a quiet machine with one run:
  // two runs at once with 3 s made half the flight core's mutants "time out" that finish in time
  // at 10 s, and a timeout counts as detected.
  timeoutMS: Number(process.env.MUTATE_TIMEOUT_MS ?? 10_000),
};
