/**
 * findStrays at the edges of its rules, worked by hand. Three-shot groups are scored against the
 * whole group (no shot is left out below four), so a shot's modified z is Iglewicz & Hoaglin's
 * M = 0.6745·(x − median)/MAD over the three values ("How to Detect and Handle Outliers", ASQC
 * 1993; NIST/SEMATECH e-Handbook §1.3.5.17); with values a, m, x (a and x either side of m) the
 * median is m and the MAD the smaller of |a − m| and |x − m|. Each boundary value below was found
 * as the double for which that formula gives the limit exactly, and the test says so first.
 * The limits themselves — a mishit beyond 3.5 on one field, or beyond 2.8 on two; carry a
 * quarter short — are our rules (Iglewicz & Hoaglin's 3.5; the rest common practice, no source):
 * "beyond" means strictly more.
 */
import { smashFactorLimit } from '@/analysis/physics';
import { findStrays, groundDistanceLimit, type StrayShot } from '@/analysis/strays';

const M = (x: number, median: number, mad: number) => (0.6745 * (x - median)) / mad;
/** The next double up (`up`) or down from a positive x. */
function nextDouble(x: number, up: boolean): number {
  const b = new Float64Array([x]);
  const i = new BigInt64Array(b.buffer);
  i[0] += up ? 1n : -1n;
  return b[0];
}
const below = (x: number) => nextDouble(x, false);
const above = (x: number) => nextDouble(x, true);
const verdicts = (strays: StrayShot[]) => strays.map((s) => [s.row, s.kind, s.flags.map((f) => f.rule)]);

describe('findStrays: one field beyond 3.5', () => {
  it('a ball speed at M = −3.5 exactly is kept; the next value down is a mishit', () => {
    // Ball speeds 64, 62, x m/s: median 62, MAD 2 (above the floor of 1% of 62).
    const at = 51.62194217939214;
    expect(M(at, 62, 2)).toBe(-3.5);
    expect(findStrays({ rows: [1, 2, 3], ballSpeedMps: [64, 62, at] })).toEqual([]);
    expect(verdicts(findStrays({ rows: [1, 2, 3], ballSpeedMps: [64, 62, below(at)] }))).toEqual([[3, 'mishit', ['ballSpeed']]]);
  });

  it('a carry at M = −3.5 exactly is kept when nothing else was measured; the next value down is a mishit', () => {
    // Carries 144, 140, x m: median 140, MAD 4 (above the floor max(1.5 m, 1.5% of 140)); x is
    // 15% short, not the quarter that is a mishit by share.
    const at = 119.24388435878429;
    expect(M(at, 140, 4)).toBe(-3.5);
    expect(findStrays({ rows: [1, 2, 3], carryM: [144, 140, at] })).toEqual([]);
    expect(verdicts(findStrays({ rows: [1, 2, 3], carryM: [144, 140, below(at)] }))).toEqual([[3, 'mishit', ['carry']]]);
  });

  it('a carry well beyond 3.5 but less than a quarter short is the flight, not the strike, when the strike was measured normal', () => {
    const carry = [144, 140, 115];
    expect(M(115, 140, 4)).toBeLessThan(-3.5);
    expect(findStrays({ rows: [1, 2, 3], carryM: carry, ballSpeedMps: [62, 62.4, 62.2] })).toEqual([]);
    expect(verdicts(findStrays({ rows: [1, 2, 3], carryM: carry }))).toEqual([[3, 'mishit', ['carry']]]);
  });
});

describe('findStrays: two fields beyond 2.8', () => {
  // Launches 8, 12, x°: median 12, MAD 4. Carries 152, 150, 140 m: median 150, MAD 2 under the
  // floor 2.25 m (1.5% of 150), M = 0.6745·(−10)/2.25 = −2.998: a supporting sign, not a mishit alone.
  it('a launch at M = 2.8 exactly with a carry at −3.0 is kept; the next launch up makes two signs, a mishit', () => {
    const at = 28.604892512972572;
    expect(M(at, 12, 4)).toBe(2.8);
    expect(M(140, 150, 2.25)).toBeCloseTo(-2.998, 3);
    expect(findStrays({ rows: [1, 2, 3], launchAngleDeg: [8, 12, at], carryM: [152, 150, 140] })).toEqual([]);
    expect(verdicts(findStrays({ rows: [1, 2, 3], launchAngleDeg: [8, 12, above(at)], carryM: [152, 150, 140] }))).toEqual([
      [3, 'mishit', ['launchAngle', 'carry']],
    ]);
  });

  it('a ball speed at M = −2.8 exactly with a launch at 3.0 is kept; the next speed down is a mishit on both', () => {
    // Ball speeds 57.5, 55, x m/s: median 55, MAD 2.5. Launches 8, 12, 29.79°: M = 3.0.
    const at = 44.62194217939214;
    const launch = 12 + (3 * 4) / 0.6745;
    expect(M(at, 55, 2.5)).toBe(-2.8);
    expect(findStrays({ rows: [1, 2, 3], ballSpeedMps: [57.5, 55, at], launchAngleDeg: [8, 12, launch] })).toEqual([]);
    expect(verdicts(findStrays({ rows: [1, 2, 3], ballSpeedMps: [57.5, 55, below(at)], launchAngleDeg: [8, 12, launch] }))).toEqual([
      [3, 'mishit', ['ballSpeed', 'launchAngle']],
    ]);
  });

  it('a carry at M = −2.8 exactly with a launch at 3.0 is kept; the next carry down is a mishit on both', () => {
    // Carries 125, 120, x m: median 120, MAD 5.
    const at = 99.24388435878429;
    const launch = 12 + (3 * 4) / 0.6745;
    expect(M(at, 120, 5)).toBe(-2.8);
    expect(findStrays({ rows: [1, 2, 3], carryM: [125, 120, at], launchAngleDeg: [8, 12, launch] })).toEqual([]);
    expect(verdicts(findStrays({ rows: [1, 2, 3], carryM: [125, 120, below(at)], launchAngleDeg: [8, 12, launch] }))).toEqual([
      [3, 'mishit', ['launchAngle', 'carry']],
    ]);
  });

  it('a launch mishit lists a carry sign only beyond 2.8: at −2.8 exactly the carry is not named', () => {
    const at = 99.24388435878429;
    const skied = [8, 12, 40]; // M = 0.6745·28/4 = 4.72
    expect(verdicts(findStrays({ rows: [1, 2, 3], carryM: [125, 120, at], launchAngleDeg: skied }))).toEqual([[3, 'mishit', ['launchAngle']]]);
    expect(verdicts(findStrays({ rows: [1, 2, 3], carryM: [125, 120, below(at)], launchAngleDeg: skied }))).toEqual([
      [3, 'mishit', ['launchAngle', 'carry']],
    ]);
  });
});

describe('findStrays: a quarter short', () => {
  it('a carry exactly a quarter short of the median (141 of 188 m) is kept; 140 m is a mishit', () => {
    // The strike was measured normal, so carry speaks only by share: 0.75 × 188 = 141.
    const ball = [62, 62.4, 62.2];
    expect(findStrays({ rows: [1, 2, 3], carryM: [188, 190, 141], ballSpeedMps: ball })).toEqual([]);
    expect(verdicts(findStrays({ rows: [1, 2, 3], carryM: [188, 190, 140], ballSpeedMps: ball }))).toEqual([[3, 'mishit', ['carry']]]);
  });
});

describe('findStrays: misreads', () => {
  it('a smash factor at the impact bound exactly is a reading; the next value up is a misread', () => {
    const limit = smashFactorLimit('driver')!.limit;
    const smash = [1.46, 1.47, 1.45, limit, 1.46];
    expect(findStrays({ rows: [1, 2, 3, 4, 5], club: 'driver', smashFactor: smash })).toEqual([]);
    smash[3] = above(limit);
    expect(verdicts(findStrays({ rows: [1, 2, 3, 4, 5], club: 'driver', smashFactor: smash }))).toEqual([[4, 'misread', ['misread']]]);
  });

  it('a misread does not count as a measured strike: with two smash factors left, a short carry speaks alone', () => {
    // Smash factor read on three shots, one of them a misread: two readings are too few to judge
    // the strike (three are needed), so the carry rule applies as when nothing else was measured.
    // Carries: median 150, MAD 1 under the 2.25 m floor; 135 m gives M = 0.6745·(−15)/2.25 = −4.5.
    const carry = [150, 151, 149, 150, 135];
    const smash = [1.45, 1.44, 1.7, Number.NaN, Number.NaN];
    expect(verdicts(findStrays({ rows: [1, 2, 3, 4, 5], club: 'driver', carryM: carry, smashFactor: smash }))).toEqual([
      [3, 'misread', ['misread']],
      [5, 'mishit', ['carry']],
    ]);
  });

  it('the misreads’ smash factors stay out of the median a thin strike is compared with', () => {
    // Good strikes 1.45, 1.44, 1.46; two misreads 1.70 and 1.72; a thin strike 1.30 compared with
    // the three good ones: median 1.45 (with the misreads it would be 1.46).
    const smash = [1.45, 1.44, 1.46, 1.7, 1.72, 1.3];
    const strays = findStrays({ rows: [1, 2, 3, 4, 5, 6], club: 'driver', smashFactor: smash });
    const thin = strays.find((s) => s.row === 6)!;
    expect(thin.kind).toBe('mishit');
    expect(thin.flags[0]).toMatchObject({ rule: 'smashFactor', median: 1.45 });
  });
});

describe('findStrays: the group and its order', () => {
  it('a column of the wrong length is refused with a message that says what is wrong', () => {
    expect(() => findStrays({ rows: [1, 2, 3], carryM: [1, 2] })).toThrow('findStrays: every column needs one value per row');
  });

  it('shots with the same row number (from several bay files) come back in the order they were given', () => {
    const strays = findStrays({ rows: [7, 7, 7, 7, 7], carryM: [150, 151, 100, 149, 101] });
    expect(strays.map((s) => s.index)).toEqual([2, 4]);
  });

  it('the ground rule looks at five shots, not four', () => {
    const offline = [0, 1, -1, 0.5, 60];
    const carry = [150, 151, 149, 150, 150];
    expect(findStrays({ rows: [1, 2, 3, 4], carryM: carry.slice(0, 4), offlineM: [0, 1, -1, 60] })).toEqual([]);
    expect(verdicts(findStrays({ rows: [1, 2, 3, 4, 5], carryM: carry, offlineM: offline }))).toEqual([[5, 'review', ['ground']]]);
  });
});

describe('groundDistanceLimit for the smallest groups', () => {
  // Hotelling's prediction region: k² = 2(n−1)(n+1)/(n(n−2))·F(2, n−2; p), and the F quantile with
  // 2 numerator degrees of freedom has the closed form F(2, ν; p) = (ν/2)·((1 − p)^(−2/ν) − 1)
  // (from the F(2, ν) distribution function 1 − (1 + 2x/ν)^(−ν/2)).
  const f2 = (nu: number, p: number) => (nu / 2) * ((1 - p) ** (-2 / nu) - 1);
  it('three shots: sqrt(16/3 · F(2, 1; 0.999)) = sqrt(16/3 · 499,999.5) ≈ 1,633', () => {
    expect(groundDistanceLimit(3)).toBeCloseTo(Math.sqrt((16 / 3) * f2(1, 0.999)), 6);
    expect(groundDistanceLimit(3)).toBeCloseTo(1632.99, 1);
  });
  it('four shots: sqrt(30/8 · F(2, 2; 0.999)) = sqrt(3.75 · 999) ≈ 61.21', () => {
    expect(groundDistanceLimit(4)).toBeCloseTo(Math.sqrt(3.75 * f2(2, 0.999)), 6);
  });
});
