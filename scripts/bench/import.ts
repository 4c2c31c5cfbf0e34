/**
 * Benchmark of the bay-file import: parse + map + validate of a generated 100,000-row,
 * 20-column file against a bare papaparse parse of the same text. Best of a few runs.
 * Run alone: `node --import tsx scripts/bench/import.ts`; `npm run bench` calls benchImport().
 */
import Papa from 'papaparse';
import v8 from 'node:v8';
import vm from 'node:vm';
import { importBayFile, shotValuesSchema, checkShotValues } from '@/analysis/import';
import { seededRandom } from '@/fixtures/seeded-random';

const HEADERS = [
  'Shot', 'Club', 'Build', 'Ball Speed (mph)', 'Club Speed (mph)', 'Smash', 'Launch Angle (deg)',
  'Launch Direction (deg)', 'Back Spin (rpm)', 'Side Spin (rpm)', 'Attack Angle (deg)', 'Club Path (deg)',
  'Face Angle (deg)', 'Dynamic Loft (deg)', 'Carry (yds)', 'Total (yds)', 'Offline (yds)', 'Apex (ft)',
  'Descent Angle (deg)', 'Flight Time (s)',
];


/** An invented session: a 7 iron with two shafts and a driver with two heads, repeated. */
export function generateBayFile(rows: number, options: { delimiter?: ',' | ';'; decimal?: '.' | ',' } = {}): string {
  const delimiter = options.delimiter ?? ',';
  const decimal = options.decimal ?? '.';
  const rnd = seededRandom(20240501);
  const gauss = () => (rnd() + rnd() + rnd() + rnd() - 2) * 1.2;
  const num = (x: number, digits: number) => {
    const s = x.toFixed(digits);
    return decimal === ',' ? s.replace('.', ',') : s;
  };
  const lines = [HEADERS.join(delimiter)];
  for (let i = 0; i < rows; i++) {
    const driver = i % 2 === 1;
    const club = driver ? 'Driver' : '7 Iron';
    const build = driver ? (i % 4 === 1 ? 'Head A' : 'Head B') : (i % 4 === 0 ? 'Shaft A' : 'Shaft B');
    const clubMph = (driver ? 105 : 85) + 3 * gauss();
    const smash = (driver ? 1.46 : 1.33) + 0.02 * gauss();
    const ballMph = clubMph * smash;
    const carryYd = (driver ? 250 : 165) + 8 * gauss();
    const offlineYd = 6 * gauss();
    lines.push([
      String(i + 1), club, build, num(ballMph, 1), num(clubMph, 1), num(smash, 2),
      num((driver ? 12 : 17) + gauss(), 1), num(2 * gauss(), 1), num((driver ? 2600 : 6500) + 300 * gauss(), 0),
      num(400 * gauss(), 0), num((driver ? 2 : -4) + gauss(), 1), num(2 * gauss(), 1), num(2 * gauss(), 1),
      num((driver ? 14 : 22) + gauss(), 1), num(carryYd, 1), num(carryYd + (driver ? 20 : 8), 1),
      `${num(Math.abs(offlineYd), 1)} ${offlineYd < 0 ? 'L' : 'R'}`, num((driver ? 95 : 90) + 5 * gauss(), 0),
      num((driver ? 38 : 48) + gauss(), 1), num((driver ? 6.5 : 5.8) + 0.2 * gauss(), 2),
    ].join(delimiter));
  }
  return `${lines.join('\n')}\n`;
}

/**
 * A full collection before each timed run, so every run (baseline or import) starts from the
 * same clean heap instead of paying for the garbage of the run before it.
 */
v8.setFlagsFromString('--expose-gc');
const collect = vm.runInNewContext('gc') as () => void;

function time(f: () => void): number {
  collect();
  const t0 = performance.now();
  f();
  return performance.now() - t0;
}

/** Best of `runs` for two tasks, run alternately so both meet the same machine state. */
function bestOfPair(runs: number, a: () => void, b: () => void): [number, number] {
  let bestA = Infinity;
  let bestB = Infinity;
  for (let i = 0; i < runs; i++) {
    bestA = Math.min(bestA, time(a));
    bestB = Math.min(bestB, time(b));
  }
  return [bestA, bestB];
}

function bestOf(runs: number, f: () => void): number {
  let best = Infinity;
  for (let i = 0; i < runs; i++) best = Math.min(best, time(f));
  return best;
}

/**
 * Time parse + map + validate (importBayFile, which keeps every shot) against a bare papaparse
 * parse of the same 100,000-row text (delimiter given, rows kept, as a caller would use it).
 * Best of seven alternating runs after a warm-up. Target ratio ≤ 1.5.
 */
export function benchImport(): { mapMs: number; papaparseMs: number; ratio: number } {
  const text = generateBayFile(100_000);
  importBayFile(text);
  Papa.parse(text, { delimiter: ',' });
  const [papaparseMs, mapMs] = bestOfPair(
    7,
    () => Papa.parse(text, { delimiter: ',' }),
    () => importBayFile(text),
  );
  return { mapMs, papaparseMs, ratio: mapMs / papaparseMs };
}

/** More figures: the decimal-comma dialect, and checking limits with zod per row instead. */
export function benchImportDetail(): Record<string, number> {
  const comma = generateBayFile(100_000, { delimiter: ';', decimal: ',' });
  importBayFile(comma);
  const [papaComma, mapComma] = bestOfPair(
    5,
    () => Papa.parse(comma, { delimiter: ';' }),
    () => importBayFile(comma),
  );
  const text = generateBayFile(100_000);
  // papaparse in step mode, rows not kept: the parse importBayFile itself runs
  const stepMs = bestOf(5, () => Papa.parse<string[]>(text, { delimiter: ',', step: () => undefined }));
  const shots = importBayFile(text).shots;
  const [compiledMs, zodMs] = bestOfPair(
    5,
    () => {
      for (const s of shots) checkShotValues(s.values);
    },
    () => {
      for (const s of shots) shotValuesSchema.safeParse(s.values);
    },
  );
  return {
    semicolonDecimalCommaMapMs: mapComma,
    semicolonDecimalCommaPapaparseMs: papaComma,
    semicolonDecimalCommaRatio: mapComma / papaComma,
    papaparseStepModeMs: stepMs,
    limitsCompiledMsPer100k: compiledMs,
    limitsZodMsPer100k: zodMs,
  };
}

if (process.argv[1]?.replace(/\\/g, '/').endsWith('scripts/bench/import.ts')) {
  console.log(benchImport());
  console.log(benchImportDetail());
}
