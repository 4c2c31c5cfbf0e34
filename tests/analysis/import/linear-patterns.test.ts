/**
 * Every regular expression that runs on file content must cost time linear in the cell (issue:
 * "a 64 KB file freezes every shop"). The patterns are read from the import sources themselves
 * with the TypeScript parser, so a pattern added later is checked too. Each runs over adversarial
 * cells of 64 KiB (long runs of what its quantifiers overlap on, ending in a character that makes
 * the match fail), and its time is compared with a plain linear pass over the same cell (splitting
 * it into characters): linear work costs a few such passes, quadratic backtracking thousands.
 * The bound is a ratio of times on one machine, not a wall-clock figure.
 */
import fs from 'node:fs';
import path from 'node:path';
import ts from 'typescript';
import { importBayFile } from '@/analysis/import';
import { isSummaryRow, isUnitsRow, unitCellText } from '@/analysis/import/row-kinds';
import { compileNumberReader, detectNumberFormat, looksNumeric, newCellState } from '@/analysis/import/number-format';
import { detectSideNotation, sideMark } from '@/analysis/import/side-notation';
import { parseHeader } from '@/analysis/import/header-match';
import { parseClubName } from '@/analysis/import/club-name';
import { findUnit } from '@/analysis/units';

const ROOT = path.resolve(__dirname, '../../..');
const SOURCES = [
  ...fs.readdirSync(path.join(ROOT, 'analysis/import')).filter((f) => f.endsWith('.ts')).map((f) => `analysis/import/${f}`),
  'analysis/units.ts',
  'analysis/clubs.ts',
];

/** Every regular-expression literal in a source file, as a RegExp without g/y (so test() starts at 0). */
function patternsOf(file: string): { where: string; re: RegExp }[] {
  const text = fs.readFileSync(path.join(ROOT, file), 'utf8');
  const source = ts.createSourceFile(file, text, ts.ScriptTarget.Latest, true);
  const found: { where: string; re: RegExp }[] = [];
  const visit = (node: ts.Node) => {
    if (node.kind === ts.SyntaxKind.RegularExpressionLiteral) {
      const literal = node.getText(source);
      const slash = literal.lastIndexOf('/');
      const flags = literal.slice(slash + 1).replace(/[gy]/g, '');
      const line = source.getLineAndCharacterOfPosition(node.getStart(source)).line + 1;
      found.push({ where: `${file}:${line} ${literal.slice(0, 60)}`, re: new RegExp(literal.slice(1, slash), flags) });
    }
    ts.forEachChild(node, visit);
  };
  visit(source);
  return found;
}

const PATTERNS = SOURCES.flatMap(patternsOf);

/** Adversarial cells of about n characters: runs that overlapping quantifiers split many ways. */
const PUMPS: { name: string; make: (n: number) => string }[] = [
  { name: 'spaces then !', make: (n) => `${' '.repeat(n)}!` },
  { name: '1, spaces, 1x', make: (n) => `1${' '.repeat(n)}1x` },
  { name: 'digits then !', make: (n) => `${'1'.repeat(n)}!` },
  { name: 'digits and commas then !', make: (n) => `${'1,'.repeat(n / 2)}!` },
  { name: 'digits and points then !', make: (n) => `${'1.'.repeat(n / 2)}!` },
  { name: 'points then x', make: (n) => `${'.'.repeat(n)}x` },
  { name: 'letters then !', make: (n) => `${'a'.repeat(n)}!` },
  { name: 'l and spaces then !', make: (n) => `${'l '.repeat(n / 2)}!` },
  { name: 'r + then !', make: (n) => `${'r+'.repeat(n / 2)}!` },
  { name: 'digit and space then x!', make: (n) => `${'1 '.repeat(n / 2)}x!` },
  { name: 'tabs then !', make: (n) => `${'\t'.repeat(n)}!` },
  { name: 'minus signs then !', make: (n) => `${'-'.repeat(n)}!` },
  { name: 'word and space then 1!', make: (n) => `${'deg '.repeat(n / 4)}1!` },
  { name: 'brackets open then !', make: (n) => `${'(a'.repeat(n / 2)}!` },
  { name: '7 spaces wood', make: (n) => `7${' '.repeat(n)}woo` },
  { name: 'no. then !', make: (n) => `${'no.'.repeat(n / 3)}!` },
  { name: 'l, spaces, line break', make: (n) => `l${' '.repeat(n)}\n` },
  { name: 'bracket, spaces then !', make: (n) => `(${' '.repeat(n)}!` },
  { name: 'plus, spaces then !', make: (n) => `+${' '.repeat(n)}!` },
];

const LONG = 65536; // 64 KiB, the hostile cell of the issue
/** A plain linear pass over a cell: the unit of cost. */
const reference = (cell: string) => cell.split('').length;
// Linear work measured so far: under 30 passes. Quadratic backtracking at 64 KiB: tens of thousands.
const MAX_GROWTH = 200;

/** Seconds per call: the least over three rounds of enough calls to fill a millisecond. */
function secondsPerCall(f: () => unknown): number {
  let best = Infinity;
  for (let round = 0; round < 3; round++) {
    let calls = 0;
    const start = process.hrtime.bigint();
    let elapsed = 0;
    do {
      f();
      calls++;
      elapsed = Number(process.hrtime.bigint() - start) / 1e9;
    } while (elapsed < 1e-3);
    best = Math.min(best, elapsed / calls);
  }
  return best;
}

const cells = new Map<(n: number) => string, { cell: string; referenceSeconds: number }>();

/** Time of f on a long adversarial cell, in plain linear passes over the same cell (measured once per cell). */
function growth(f: (cell: string) => unknown, make: (n: number) => string): number {
  let known = cells.get(make);
  if (!known) {
    const cell = make(LONG);
    known = { cell, referenceSeconds: secondsPerCall(() => reference(cell)) };
    cells.set(make, known);
  }
  const { cell, referenceSeconds } = known;
  return secondsPerCall(() => f(cell)) / referenceSeconds;
}

describe('import patterns on adversarial cells', () => {
  it('the import sources hold the patterns this test checks', () => {
    expect(PATTERNS.length).toBeGreaterThan(20);
  });

  it.each(PATTERNS.map((p) => [p.where, p.re] as const))('pattern %s costs a few linear passes on every adversarial cell', (_where, re) => {
    const slow = PUMPS.map((p) => ({ pump: p.name, growth: growth((cell) => re.test(cell), p.make) })).filter((g) => g.growth > MAX_GROWTH);
    expect(slow).toEqual([]);
  });

  const READERS: [string, (cell: string) => unknown][] = [
    ['looksNumeric', looksNumeric],
    ['the number reader (point)', (c) => compileNumberReader('.', ',')(c, newCellState())],
    ['the number reader (comma)', (c) => compileNumberReader(',', '.')(c, newCellState())],
    ['sideMark', sideMark],
    ['detectSideNotation', (c) => detectSideNotation([c])],
    ['detectNumberFormat', (c) => detectNumberFormat([c], ',')],
    ['parseHeader', parseHeader],
    ['parseClubName', parseClubName],
    ['isSummaryRow', (c) => isSummaryRow([c])],
    ['isUnitsRow', (c) => isUnitsRow([c])],
    ['unitCellText', unitCellText],
    ['findUnit', findUnit],
  ];

  it.each(READERS)('%s costs a few linear passes on every adversarial cell', (_name, read) => {
    const slow = PUMPS.map((p) => ({ pump: p.name, growth: growth(read, p.make) })).filter((g) => g.growth > MAX_GROWTH);
    expect(slow).toEqual([]);
  });
});

describe('importBayFile of the 64 KB hostile file', () => {
  // The reproduction of the issue: a side cell of 64,000 spaces and "!". Compared with a plain
  // file of the same size and shape (a long but ordinary text cell), it may cost a few times more,
  // never the hundreds of times that backtracking costs.
  const hostile = `Club,Carry (yds),Side (yds)\n7 Iron,150,${' '.repeat(64_000)}!\n7 Iron,151,2 L\n`;
  const plain = `Club,Carry (yds),Side (yds)\n7 Iron,150,3 R\n${'7 Iron,151,2 L\n'.repeat(4_270)}`;

  it('imports the hostile file and rejects its row with the reason', () => {
    const r = importBayFile(hostile);
    expect(r.shots).toHaveLength(1);
    expect(r.rejected).toHaveLength(1);
    expect(r.rejected[0]).toMatchObject({ row: 1, column: 'Side (yds)' });
  });

  it('the hostile file costs at most 20 times a plain file of the same size', () => {
    expect(Math.abs(hostile.length - plain.length)).toBeLessThan(2_000);
    const tPlain = secondsPerCall(() => importBayFile(plain));
    const tHostile = secondsPerCall(() => importBayFile(hostile));
    expect(tHostile / tPlain).toBeLessThan(20);
  });
});
