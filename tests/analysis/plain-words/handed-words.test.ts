import fc from 'fast-check';
import { compareBuilds, type BuildSample } from '@/analysis/head-to-head';
import { curveWord, faceWord, missWord, pathWord, type Hand } from '@/analysis/plain-words';

// The convention (common practice, no source): a right-hander's draw curves right to left, a
// left-hander's left to right; in-to-out and open turn with the hand; left and right do not.
describe('handed words', () => {
  it('curveWord, a ball curving left (axis −6°), is a right-hander’s draw and a left-hander’s fade', () => {
    expect(curveWord(-6, 'right')).toBe('draw');
    expect(curveWord(-6, 'left')).toBe('fade');
  });

  it('curveWord, a ball curving right (axis +6°), is a right-hander’s fade and a left-hander’s draw', () => {
    expect(curveWord(6, 'right')).toBe('fade');
    expect(curveWord(6, 'left')).toBe('draw');
  });

  it('curveWord, strong curves (±14°), are hooks and slices by the hand; within ±2° straight', () => {
    expect(curveWord(-14, 'right')).toBe('hook');
    expect(curveWord(14, 'right')).toBe('slice');
    expect(curveWord(14, 'left')).toBe('hook');
    expect(curveWord(-14, 'left')).toBe('slice');
    expect(curveWord(1.5, 'left')).toBe('straight');
  });

  it('pathWord and faceWord, a path and face pointing right, are in-to-out and open for a right-hander, out-to-in and closed for a left-hander', () => {
    expect(pathWord(3, 'right')).toBe('in-to-out');
    expect(pathWord(3, 'left')).toBe('out-to-in');
    expect(faceWord(2, 'right')).toBe('open');
    expect(faceWord(2, 'left')).toBe('closed');
    expect(pathWord(0.5, 'left')).toBe('square');
  });

  it('missWord, left and right, is the same for both hands (the target line does not turn)', () => {
    expect(missWord(7)).toBe('miss right');
    expect(missWord(-7)).toBe('miss left');
    expect(missWord(2)).toBe('on line');
  });
});

/** A right-hander's session as a left-hander would hit it: every left–right field changes sign. */
const LATERAL = ['offline', 'launchDirection', 'clubPath', 'faceAngle', 'spinAxis', 'sideSpin'] as const;
function mirrored(sample: BuildSample): BuildSample {
  const columns: BuildSample['columns'] = { ...sample.columns };
  for (const field of LATERAL) {
    const values = sample.columns[field];
    if (values) columns[field] = Array.from(values, (v) => -v);
  }
  return { ...sample, columns };
}

// Values to a tenth, as bay files give them.
const value = (min: number, max: number) => fc.integer({ min: min * 10, max: max * 10 }).map((x) => x / 10);
const shots = fc.array(fc.record({ carry: value(120, 180), offline: value(-30, 30), clubPath: value(-8, 8), faceAngle: value(-6, 6), spinAxis: value(-20, 20), ballSpeed: value(50, 60) }), { minLength: 4, maxLength: 14 });
const sampleOf = (build: string, rows: { carry: number; offline: number; clubPath: number; faceAngle: number; spinAxis: number; ballSpeed: number }[]): BuildSample => ({
  club: '7I',
  build,
  columns: {
    carry: rows.map((r) => r.carry),
    offline: rows.map((r) => r.offline),
    clubPath: rows.map((r) => r.clubPath),
    faceAngle: rows.map((r) => r.faceAngle),
    spinAxis: rows.map((r) => r.spinAxis),
    ballSpeed: rows.map((r) => r.ballSpeed),
  },
});
const mean = (xs: ArrayLike<number>) => Array.from(xs).reduce((s, x) => s + x, 0) / xs.length;
const other = (hand: Hand): Hand => (hand === 'right' ? 'left' : 'right');

describe('a mirrored session', () => {
  it('a right-hander’s session mirrored for a left-hander gives the same handed words, mirrored side words, the same numbers and verdicts', () => {
    fc.assert(
      fc.property(shots, shots, (rowsA, rowsB) => {
        const a = sampleOf('Birch', rowsA);
        const b = sampleOf('Alder', rowsB);
        const ma = mirrored(a);
        const mb = mirrored(b);
        for (const hand of ['right', 'left'] as const) {
          expect(curveWord(mean(ma.columns.spinAxis!), other(hand))).toBe(curveWord(mean(a.columns.spinAxis!), hand));
          expect(pathWord(mean(ma.columns.clubPath!), other(hand))).toBe(pathWord(mean(a.columns.clubPath!), hand));
          expect(faceWord(mean(ma.columns.faceAngle!), other(hand))).toBe(faceWord(mean(a.columns.faceAngle!), hand));
        }
        const side = missWord(mean(a.columns.offline!));
        const mirroredSide = missWord(mean(ma.columns.offline!));
        expect(mirroredSide).toBe(side === 'miss left' ? 'miss right' : side === 'miss right' ? 'miss left' : 'on line');

        const h = compareBuilds(a, b);
        const m = compareBuilds(ma, mb);
        expect(m.overall.verdict).toBe(h.overall.verdict);
        expect(m.fields.carry?.diff).toBe(h.fields.carry?.diff);
        for (const field of ['carry', 'offline', 'clubPath', 'faceAngle', 'spinAxis', 'ballSpeed'] as const) {
          expect(m.fields[field]?.verdict).toBe(h.fields[field]?.verdict);
          expect(m.spread.fields[field]?.verdict).toBe(h.spread.fields[field]?.verdict);
        }
        // a group without spread has no comparison on either side
        expect(m.fields.offline === undefined).toBe(h.fields.offline === undefined);
        if (h.fields.offline) expect(m.fields.offline!.diff).toBeCloseTo(-h.fields.offline.diff, 9);
        if (h.spread.fields.offline) expect(m.spread.fields.offline!.sdA).toBeCloseTo(h.spread.fields.offline.sdA, 9);
      }),
      { numRuns: 60, seed: 11 },
    );
  });
});
