/**
 * `npm run analyse`: the command-line contract other tools rely on (exit codes, JSON shape).
 * Runs the script as a child process over the invented fixtures; checks its statistics against
 * simple-statistics (an independent npm reference) on the same imported values.
 */
import { execFileSync, spawnSync } from 'node:child_process';
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { mean, median, sampleStandardDeviation } from 'simple-statistics';
import { importBayFile } from '@/analysis/import';

const ROOT = path.resolve(__dirname, '../..');
const FIXTURE = path.join(ROOT, 'fixtures/bay-files/tab-units-row.tsv');

function run(args: string[]) {
  return spawnSync(process.execPath, ['--import', 'tsx', 'scripts/analyse.ts', ...args], { cwd: ROOT, encoding: 'utf8' });
}

jest.setTimeout(60_000);

describe('npm run analyse', () => {
  it('analyse --json prints one document in canonical units whose summaries match simple-statistics', () => {
    const r = run([FIXTURE, '--json', '--all']);
    expect(r.status).toBe(0);
    const out = JSON.parse(r.stdout);
    expect(Object.keys(out)).toEqual(expect.arrayContaining(['rows', 'imported', 'rejected', 'groups', 'ladder']));
    const shots = importBayFile(fs.readFileSync(FIXTURE, 'utf8')).shots;
    for (const g of out.groups) {
      const carry = shots.filter((s) => s.club === g.club && s.build === g.build).map((s) => s.values.carry!);
      expect(g.n).toBe(carry.length);
      expect(g.fields.carry.mean).toBeCloseTo(mean(carry), 9);
      expect(g.fields.carry.median).toBeCloseTo(median(carry), 9);
      if (carry.length > 1) expect(g.fields.carry.sd).toBeCloseTo(sampleStandardDeviation(carry), 9);
      expect(g.oval === null || (g.oval.angleDeg > -90 && g.oval.angleDeg <= 90)).toBe(true);
    }
  });

  it('analyse --compare gives a head-to-head whose diff is meanA − meanB', () => {
    const r = run([FIXTURE, '--json', '--compare', 'Driver:Head A 9.5', 'DR:Head B 10.5']);
    expect(r.status).toBe(0);
    const h = JSON.parse(r.stdout).headToHead;
    expect(h.a).toEqual({ club: 'DR', build: 'Head A 9.5' });
    expect(h.b).toEqual({ club: 'DR', build: 'Head B 10.5' });
    expect(h.fields.carry.diff).toBeCloseTo(h.fields.carry.meanA - h.fields.carry.meanB, 12);
  });

  // The contract: per field verdict and margin (canonical units) beside ci95, by one rule —
  // equivalent inside ±margin (Schuirmann 1987), else clear when the interval excludes 0, else
  // unclear; spread fields { sdA, sdB, ratio, p, verdict, method } with the Brown–Forsythe p; a
  // summary; per group odds { fairway: { widthM, p }, green: { radiusM, carryM, p } }.
  it('analyse --compare --json gives verdicts, margins, spread, summary and odds as documented', () => {
    const session = path.join(ROOT, 'fixtures/demo/nell-driver-and-7-iron.csv');
    const r = run([session, '--json', '--compare', '7I:Steel 105 S', '7I:Graphite 75 R']);
    expect(r.status).toBe(0);
    const out = JSON.parse(r.stdout);
    const h = out.headToHead;
    expect(h.fields.carry.margin).toBeCloseTo(3 * 0.9144, 12); // 3 yd (NIST SP 811: 1 yd = 0.9144 m)
    for (const c of Object.values(h.fields) as { ci95: [number, number]; margin: number; verdict: string }[]) {
      const inside = c.ci95[0] > -c.margin && c.ci95[1] < c.margin;
      const clear = c.ci95[0] > 0 || c.ci95[1] < 0;
      expect(c.verdict).toBe(inside ? 'equivalent' : clear ? 'clear' : 'unclear');
    }
    for (const field of ['offline', 'carry']) {
      const s = h.spread.fields[field];
      expect(Object.keys(s)).toEqual(expect.arrayContaining(['sdA', 'sdB', 'ratio', 'p', 'verdict', 'method']));
      expect(s.ratio).toBeCloseTo(s.sdA / s.sdB, 12);
      expect(s.method).toMatch(/Brown–Forsythe/);
      expect(['equivalent', 'clear', 'unclear']).toContain(s.verdict);
    }
    expect(h.summary).toMatch(/^Steel 105 S .*\. Overall: /);
    for (const g of out.groups) {
      expect(g.odds.fairway.widthM).toBeCloseTo(30 * 0.9144, 12);
      expect(g.odds.fairway.p).toBeGreaterThanOrEqual(0);
      expect(g.odds.fairway.p).toBeLessThanOrEqual(1);
      expect(g.odds.green).toEqual({ radiusM: expect.closeTo(12 * 0.9144, 12), carryM: expect.any(Number), p: expect.any(Number) });
    }
  });

  it('analyse --level 0.68 scales the oval by the χ² quantile ratio', () => {
    // χ²₂ quantiles in closed form −2·ln(1 − p) (Abramowitz & Stegun, Handbook of Mathematical Functions, 1964, §26.4: for ν = 2, Q(χ²) = e^(−χ²/2)): 0.68 → 2.278868566, 0.95 → 5.991464547.
    const session = path.join(ROOT, 'fixtures/demo/nell-driver-and-7-iron.csv');
    const ovalOf = (args: string[]) => JSON.parse(run([session, '--json', '--all', ...args]).stdout).groups.find((g: { oval: unknown }) => g.oval).oval;
    const a = ovalOf([]);
    const b = ovalOf(['--level', '0.68']);
    expect(b.level).toBe(0.68);
    expect(b.semiMajor / a.semiMajor).toBeCloseTo(Math.sqrt(2.278868566 / 5.991464547), 9);
  });

  it('analyse without --json prints a readable table', () => {
    const r = run([FIXTURE]);
    expect(r.status).toBe(0);
    expect(r.stdout).toMatch(/club\s+build\s+n\s+kept/);
    expect(r.stdout).toMatch(/Ladder/);
  });

  it('analyse with a column of unknown unit and no recipe exits 2 naming the column', () => {
    const dir = fs.mkdtempSync(path.join(os.tmpdir(), 'ovy-cli-'));
    const file = path.join(dir, 'odd.csv');
    fs.writeFileSync(file, 'Club,Ball Speed (mph),Carry (furlongs)\n7 Iron,110,0.75\n7 Iron,112,0.76\n7 Iron,111,0.74\n');
    const r = run([file, '--json']);
    expect(r.status).toBe(2);
    expect(r.stderr).toMatch(/Carry \(furlongs\)/);
    expect(r.stdout).toBe('');
    // A recipe settles it.
    const recipe = path.join(dir, 'recipe.json');
    fs.writeFileSync(recipe, JSON.stringify({ columns: { 'Carry (furlongs)': { field: 'ignore' } } }));
    expect(run([file, '--json', '--recipe', recipe]).status).toBe(0);
    fs.rmSync(dir, { recursive: true, force: true });
  });

  it.each([[['--level', '2', FIXTURE]], [['--compare', 'DR:Head A 9.5']], [[]], [['--nope', FIXTURE]], [[FIXTURE, '--compare', 'DR:x', 'DR:y']]])(
    'analyse with bad arguments %j exits 2 with a message',
    (args) => {
      const r = run(args);
      expect(r.status).toBe(2);
      expect(r.stderr).toMatch(/analyse:/);
    },
  );

  it('analyse of a missing file exits 1', () => {
    expect(run(['/nonexistent/file.csv']).status).toBe(1);
  });

  it('npm run -s analyse is wired to the script', () => {
    const out = execFileSync('npm', ['run', '-s', 'analyse', '--', FIXTURE, '--json'], { cwd: ROOT, encoding: 'utf8' });
    expect(JSON.parse(out).imported).toBeGreaterThan(0);
  });
});
