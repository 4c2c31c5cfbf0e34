/**
 * `npm run mutate [-- TARGET ...] [-- --static] [-- --report]`: mutation testing of analysis/ with StrykerJS
 * (Jest runner, TypeScript checker; config in stryker.config.mjs). Each TARGET is a folder or
 * file of analysis/ (`analysis/strays`, `strays`, `analysis/units.ts`); with none, all of
 * analysis/. Targets run one after another; at the end the mutation score per folder is printed
 * from every JSON report under reports/mutation/. `--report` only prints the scores. `--static`
 * also mutates module-level code (tables, constants), which reruns every test of the target per
 * mutant (MUTATE_STATIC=1); without it those mutants are reported as Ignored.
 * MUTATE_TESTS=a,b (paths under tests/analysis) picks the tests instead of the target's mirror.
 * Not part of `npm test`: a folder takes minutes to an hour.
 * Exit status: 0 done, 1 a Stryker run failed, 2 bad arguments.
 */
import { spawnSync } from 'node:child_process';
import { existsSync, readdirSync, readFileSync } from 'node:fs';
import path from 'node:path';

const ROOT = path.resolve(__dirname, '..');
const REPORTS = path.join(ROOT, 'reports', 'mutation');

type Mutant = { status: string };
type Report = { files: Record<string, { mutants: Mutant[] }> };
type Tally = { killed: number; timeout: number; survived: number; noCoverage: number; errors: number };

function normaliseTarget(arg: string): string {
  const rel = arg.replace(/^\.\//, '').replace(/\/+$/, '');
  const withRoot = rel === 'analysis' || rel.startsWith('analysis/') ? rel : `analysis/${rel}`;
  if (!existsSync(path.join(ROOT, withRoot))) {
    console.error(`mutate: no such folder or file: ${withRoot}`);
    process.exit(2);
  }
  return withRoot;
}

/** The folder a mutated file counts under: analysis/<family>, or the file itself at the top. */
function folderOf(file: string): string {
  const rel = path.relative(ROOT, path.resolve(ROOT, file)).split(path.sep);
  return rel.length > 2 ? rel.slice(0, 2).join('/') : rel.join('/');
}

function tallyReports(): Map<string, Tally> {
  const byFolder = new Map<string, Tally>();
  if (!existsSync(REPORTS)) return byFolder;
  // Later reports of the same file win (a folder run after a single-file run, or the reverse).
  const seen = new Map<string, Mutant[]>();
  const reports = readdirSync(REPORTS)
    .filter((f) => f.endsWith('.json') && !f.endsWith('.incremental.json'))
    .map((f) => path.join(REPORTS, f))
    .sort((a, b) => readMtime(a) - readMtime(b));
  for (const file of reports) {
    const report = JSON.parse(readFileSync(file, 'utf8')) as Report;
    for (const [name, { mutants }] of Object.entries(report.files)) seen.set(name, mutants);
  }
  for (const [name, mutants] of seen) {
    const folder = folderOf(name);
    const t = byFolder.get(folder) ?? { killed: 0, timeout: 0, survived: 0, noCoverage: 0, errors: 0 };
    for (const m of mutants) {
      if (m.status === 'Killed') t.killed += 1;
      else if (m.status === 'Timeout') t.timeout += 1;
      else if (m.status === 'Survived') t.survived += 1;
      else if (m.status === 'NoCoverage') t.noCoverage += 1;
      else t.errors += 1; // CompileError, RuntimeError, Ignored: not counted in the score
    }
    byFolder.set(folder, t);
  }
  return byFolder;
}

function readMtime(file: string): number {
  return require('node:fs').statSync(file).mtimeMs as number;
}

function printScores() {
  const byFolder = tallyReports();
  if (byFolder.size === 0) {
    console.log('mutate: no reports under reports/mutation/ yet');
    return;
  }
  console.log('\nMutation score per folder (killed + timeout) / (killed + timeout + survived + no coverage)');
  console.log('folder                      score   killed timeout survived no-cov  invalid');
  for (const [folder, t] of [...byFolder].sort(([a], [b]) => a.localeCompare(b))) {
    const detected = t.killed + t.timeout;
    const valid = detected + t.survived + t.noCoverage;
    const score = valid === 0 ? 'n/a' : `${((100 * detected) / valid).toFixed(1)} %`;
    console.log(
      `${folder.padEnd(27)} ${score.padStart(7)} ${String(t.killed).padStart(8)} ${String(t.timeout).padStart(7)} ${String(t.survived).padStart(8)} ${String(t.noCoverage).padStart(6)} ${String(t.errors).padStart(8)}`,
    );
  }
}

function main() {
  const args = process.argv.slice(2);
  if (args.includes('--help')) {
    console.log('npm run mutate [-- analysis/FOLDER|analysis/FILE.ts ...] [-- --static] [-- --report]');
    return;
  }
  if (!args.includes('--report')) {
    const targets = args.filter((a) => !a.startsWith('--')).map(normaliseTarget);
    for (const target of targets.length ? targets : ['analysis']) {
      console.log(`mutate: ${target}`);
      const run = spawnSync(path.join(ROOT, 'node_modules', '.bin', 'stryker'), ['run', 'stryker.config.mjs'], {
        cwd: ROOT,
        stdio: 'inherit',
        env: { ...process.env, MUTATE_TARGET: target, ...(args.includes('--static') ? { MUTATE_STATIC: '1' } : {}) },
      });
      if (run.status !== 0) {
        console.error(`mutate: Stryker failed on ${target} (exit ${run.status ?? run.signal})`);
        printScores();
        process.exit(1);
      }
    }
  }
  printScores();
}

main();
