import fc from 'fast-check';
import { mean, quantile, sampleStandardDeviation } from 'simple-statistics';
import type { Shot, ShotValues } from '@/analysis/fields';
import { analyseSession } from '@/analysis/session';

// Invented session: one player, two 7-iron builds, a driver, a pitching wedge; row 5 a thin strike.
function shot(row: number, club: string, build: string | null, values: ShotValues): Shot {
  return { row, club, build, values, derived: [] };
}

const SEVEN_A: [number, number, number, number][] = [
  // carry, offline, ballSpeed, clubSpeed
  [148, -3, 53.0, 40.0],
  [150, 2, 53.4, 40.1],
  [147, 0, 52.8, 39.8],
  [149, 1, 53.1, 40.0],
  [112, -4, 45.0, 39.9],
  [151, -1, 53.6, 40.2],
  [148, 3, 53.0, 39.9],
  [146, 0, 52.6, 39.7],
];

function session(): Shot[] {
  const shots: Shot[] = [];
  SEVEN_A.forEach(([carry, offline, ballSpeed, clubSpeed], i) =>
    shots.push(shot(i + 1, '7I', 'A', { carry, offline, ballSpeed, clubSpeed, spinRate: 6500 + 40 * i })),
  );
  [152, 155, 151, 154, 153, 150].forEach((carry, i) =>
    shots.push(shot(20 + i, '7I', 'B', { carry, offline: [4, -2, 1, 6, -3, 0][i], ballSpeed: 54 + i / 10, clubSpeed: 40, smashFactor: 1.36 })),
  );
  shots.push(shot(40, 'DR', null, { carry: 228, offline: 8 }));
  shots.push(shot(41, 'DR', null, { carry: 232, offline: -5 }));
  shots.push(shot(50, 'PW', 'X', { carry: 118 }));
  return shots;
}

describe('analyseSession', () => {
  it('analyseSession sorts groups in bag order, then by build', () => {
    const groups = analyseSession(session()).groups;
    expect(groups.map((g) => [g.club, g.build])).toEqual([['DR', null], ['7I', 'A'], ['7I', 'B'], ['PW', 'X']]);
  });

  it('analyseSession by default flags the thin strike and leaves it out', () => {
    const a = analyseSession(session()).groups[1];
    expect(a.n).toBe(8);
    expect(a.kept).toBe(7);
    expect(a.strays.map((s) => s.row)).toEqual([5]);
    expect(a.strays[0].reason).toMatch(/^Mishit: .*carry 112 m, far short of this group's 148 m/);
    expect(a.fields.carry!.n).toBe(7);
    expect(a.fields.carry!.min).toBe(146);
  });

  // Reference library: simple-statistics' mean, sampleStandardDeviation and quantile (type 7).
  it('analyseSession field summaries agree with simple-statistics on the kept shots', () => {
    const carry = analyseSession(session()).groups[1].fields.carry!;
    const kept = SEVEN_A.map((s) => s[0]).filter((c) => c !== 112);
    expect(carry.mean).toBeCloseTo(mean(kept), 12);
    expect(carry.sd!).toBeCloseTo(sampleStandardDeviation(kept), 12);
    expect(carry.median).toBeCloseTo(quantile(kept, 0.5), 12);
    expect(carry.q1).toBeCloseTo(quantile(kept, 0.25), 12);
    expect(carry.q3).toBeCloseTo(quantile(kept, 0.75), 12);
  });

  it('analyseSession with includeStrays counts the stray but still lists it', () => {
    const a = analyseSession(session(), { includeStrays: true }).groups[1];
    expect(a.kept).toBe(8);
    expect(a.fields.carry!.min).toBe(112);
    expect(a.strays.map((s) => s.row)).toEqual([5]);
  });

  it('analyseSession with the fitter’s decisions keeps a stray and drops a good shot', () => {
    const a = analyseSession(session(), { decisions: { 5: 'keep', 2: 'drop' } }).groups[1];
    expect(a.kept).toBe(7);
    expect(a.fields.carry!.min).toBe(112);
    expect(a.fields.carry!.max).toBe(151);
    expect(a.strays).toEqual([
      { row: 2, kind: null, reason: 'Dropped by the fitter', inFigures: false },
      expect.objectContaining({ row: 5, reason: expect.stringMatching(/\(kept by the fitter\)$/) }),
    ]);
  });

  it('analyseSession derives smash factor from speeds, or takes the field when present', () => {
    const groups = analyseSession(session()).groups;
    const keptA = SEVEN_A.filter((s) => s[0] !== 112).map((s) => s[2] / s[3]);
    expect(groups[1].smashFactor!.mean).toBeCloseTo(mean(keptA), 12);
    expect(groups[1].fields.smashFactor).toBeUndefined();
    expect(groups[2].smashFactor!.mean).toBeCloseTo(1.36, 12);
    expect(groups[0].smashFactor).toBeNull();
  });

  it('analyseSession with fewer than 3 shots gives no oval, and one shot no sd', () => {
    const groups = analyseSession(session()).groups;
    expect(groups[0].oval).toBeNull();
    expect(groups[0].predictionOval).toBeNull();
    expect(groups[0].fields.carry!.sd).not.toBeNull();
    expect(groups[3].fields.carry!.sd).toBeNull();
    expect(groups[3].oval).toBeNull();
  });

  it('analyseSession gives a prediction oval wider than the descriptive one', () => {
    const a = analyseSession(session()).groups[1];
    expect(a.oval!.level).toBe(0.95);
    expect(a.predictionOval!.semiMajor).toBeGreaterThan(a.oval!.semiMajor);
    expect(a.predictionOval!.angleDeg).toBeCloseTo(a.oval!.angleDeg, 12);
  });

  it('analyseSession with a level of 0.68 gives smaller ovals', () => {
    const wide = analyseSession(session()).groups[1].oval!;
    const narrow = analyseSession(session(), { level: 0.68 }).groups[1].oval!;
    expect(narrow.level).toBe(0.68);
    // Semi-axes scale with sqrt of the χ²₂ quantile: sqrt(2.278868566 / 5.991464547) (Abramowitz & Stegun, 1964, §26.4: −2·ln(1 − p)
    // for ν = 2).
    expect(narrow.semiMajor / wide.semiMajor).toBeCloseTo(Math.sqrt(2.278868566 / 5.991464547), 8);
  });

  it('analyseSession with compare gives a head-to-head of the two builds', () => {
    const result = analyseSession(session(), { compare: [{ club: '7I', build: 'A' }, { club: '7I', build: 'B' }] });
    const h = result.headToHead!;
    expect(h.a).toEqual({ club: '7I', build: 'A' });
    expect(h.fields.carry!.diff).toBeLessThan(0);
    expect(h.fields.carry!.ci95[0]).toBeLessThan(h.fields.carry!.ci95[1]);
    // Smash factor = ball speed / club speed (the trade's definition, common practice, no source),
    // over build A's seven kept shots (row 5 is the thin strike); build B's are all 1.36.
    const keptA = SEVEN_A.filter((_, i) => i !== 4);
    const smashA = mean(keptA.map(([, , ball, club]) => ball / club));
    expect(h.fields.smashFactor!.meanA).toBeCloseTo(smashA, 12);
    expect(h.fields.smashFactor!.diff).toBeCloseTo(smashA - 1.36, 12);
    // Welch–Satterthwaite with B's variance 0 leaves A's n − 1 = 6 degrees of freedom (Welch,
    // Biometrika 34, 1947).
    expect(h.fields.smashFactor!.df).toBeCloseTo(6, 9);
    expect(h.ovalAreaRatio).toBeGreaterThan(0);
  });

  it('analyseSession with compare naming a missing group throws', () => {
    expect(() => analyseSession(session(), { compare: [{ club: '7I', build: 'A' }, { club: '7I', build: 'Z' }] })).toThrow(RangeError);
  });

  it('analyseSession without compare has no head-to-head', () => {
    expect(analyseSession(session())).not.toHaveProperty('headToHead');
  });

  it('analyseSession gives a ladder from the kept carries', () => {
    const ladder = analyseSession(session()).ladder;
    expect(ladder.map((r) => r.club)).toEqual(['DR', '7I', 'PW']);
    expect(ladder[1].n).toBe(13);
  });

  it('analyseSession with a level outside (0, 1) throws', () => {
    expect(() => analyseSession(session(), { level: 1 })).toThrow(RangeError);
  });

  it('analyseSession of no shots gives empty groups and ladder', () => {
    expect(analyseSession([])).toEqual({ groups: [], ladder: [] });
  });

  it('analyseSession result survives a JSON round trip unchanged', () => {
    const result = analyseSession(session(), { compare: [{ club: '7I', build: 'A' }, { club: '7I', build: 'B' }] });
    expect(JSON.parse(JSON.stringify(result))).toEqual(result);
  });

  it('analyseSession group shape has exactly the agreed keys', () => {
    const g = analyseSession(session()).groups[1];
    expect(Object.keys(g).sort()).toEqual(['build', 'club', 'fields', 'kept', 'n', 'odds', 'oval', 'predictionOval', 'smashFactor', 'strays'].sort());
    expect(Object.keys(g.fields.carry!).sort()).toEqual(['max', 'mean', 'median', 'min', 'n', 'q1', 'q3', 'sd'].sort());
    expect(Object.keys(g.oval!).sort()).toEqual(['angleDeg', 'area', 'centerCarry', 'centerOffline', 'level', 'semiMajor', 'semiMinor'].sort());
  });

  // Property: shuffling the shots changes nothing (strays included).
  it('analyseSession of shuffled shots gives the same analysis', () => {
    const shots = session();
    fc.assert(
      fc.property(fc.shuffledSubarray(shots, { minLength: shots.length }), (shuffled) => {
        const a = analyseSession(shots);
        const b = analyseSession(shuffled);
        expect(b.groups.map((g) => g.strays)).toEqual(a.groups.map((g) => g.strays));
        b.groups.forEach((g, i) => {
          expect(g.kept).toBe(a.groups[i].kept);
          expect(g.fields.carry!.mean).toBeCloseTo(a.groups[i].fields.carry!.mean, 9);
          if (g.oval) expect(g.oval.area).toBeCloseTo(a.groups[i].oval!.area, 9);
        });
      }),
      { numRuns: 50 },
    );
  });
});

describe('analyseSession odds', () => {
  // Fairway odds of a group: the Student t predictive of its kept offline (see tests/analysis/odds),
  // checked here against the closed form with jstat for the 7-iron A group.
  it('analyseSession gives each group fairway odds from its kept shots and a green at the club’s median carry', () => {
    const a = analyseSession(session()).groups;
    const seven = a.filter((g) => g.club === '7I');
    const greenCarry = seven[0].odds.green.carryM;
    expect(seven.every((g) => g.odds.green.carryM === greenCarry)).toBe(true);
    expect(seven[0].odds.fairway.widthM).toBeCloseTo(30 * 0.9144, 12);
    expect(seven[0].odds.green.radiusM).toBeCloseTo(12 * 0.9144, 12);
    const off = seven[0].fields.offline!;
    const { jStat } = jest.requireActual('jstat');
    const s = off.sd! * Math.sqrt(1 + 1 / off.n);
    const w = (30 * 0.9144) / 2;
    expect(seven[0].odds.fairway.p).toBeCloseTo(jStat.studentt.cdf((w - off.mean) / s, off.n - 1) - jStat.studentt.cdf((-w - off.mean) / s, off.n - 1), 10);
  });

  it('analyseSession with targets set uses them', () => {
    const g = analyseSession(session(), { odds: { fairwayWidthM: 20, greenRadiusM: 5, targetCarryM: { '7I': 140 } } }).groups[1];
    expect(g.odds.fairway.widthM).toBe(20);
    expect(g.odds.green).toMatchObject({ radiusM: 5, carryM: 140 });
  });
});
