import fc from 'fast-check';
import { describeStray, findStrays, groundDistanceLimit, madFloor, MODIFIED_Z_LIMIT } from '@/analysis/strays';

const YD = 0.9144; // NIST SP 811 (2008), Appendix B: 1 yd = 0.9144 m exactly

// Invented group: a player's 7-iron with one thin strike in row 5.
const ROWS = [1, 2, 3, 4, 5, 6, 7, 8];
const CARRY = [148, 150, 147, 149, 112, 151, 148, 146];
const SMASH = [1.33, 1.34, 1.32, 1.33, 1.18, 1.34, 1.33, 1.32];
const OFFLINE = [-3, 2, 0, 1, -4, -1, 3, 0];

describe('findStrays: the cases seen on real-looking sessions', () => {
  // Seen: a 10-shot hybrid group whose smash factors cluster (six read 1.37 from speeds rounded
  // to 0.1 mph, four 1.38–1.40) had a MAD of about 0.0015, and its best-struck shots were dropped
  // as "far above this group's median".
  it('findStrays on a hybrid group with clustered smash factors flags none of the well-struck shots', () => {
    const smash = [1.3702, 1.3688, 1.3715, 1.3695, 1.3721, 1.3684, 1.38, 1.39, 1.4, 1.385];
    const carry = [188, 192, 185, 190, 187, 193, 191, 189, 194, 186].map((x) => x * YD);
    const offline = [3, -5, 8, 0, -2, 6, -7, 4, 1, -3].map((x) => x * YD);
    expect(findStrays({ rows: smash.map((_, i) => i + 1), club: '4H', smashFactor: smash, carryM: carry, offlineM: offline })).toEqual([]);
  });

  // Seen: a 232-yd drive was dropped for a smash factor of 1.45 against a median of 1.47.
  it('findStrays on a drive 0.02 below a clustered median smash factor keeps it', () => {
    const smash = [1.4701, 1.4695, 1.4712, 1.4689, 1.4706, 1.4698, 1.471, 1.4693, 1.45, 1.4704, 1.4721, 1.4685];
    const carry = [238, 235, 241, 236, 233, 239, 240, 237, 232, 236, 238, 242].map((x) => x * YD);
    const offline = [5, -8, 12, 3, -4, 9, -11, 6, 2, -6, 0, 7].map((x) => x * YD);
    expect(findStrays({ rows: smash.map((_, i) => i + 1), club: 'DR', smashFactor: smash, carryM: carry, offlineM: offline })).toEqual([]);
  });
});

describe('findStrays', () => {
  it('findStrays with a thin strike calls it a mishit on carry and smash factor, with reasons', () => {
    const strays = findStrays({ rows: ROWS, club: '7I', carryM: CARRY, smashFactor: SMASH, offlineM: OFFLINE });
    expect(strays.map((s) => s.row)).toEqual([5]);
    expect(strays[0].kind).toBe('mishit');
    const rules = strays[0].flags.map((f) => f.rule);
    expect(rules).toContain('carry');
    expect(rules).toContain('smashFactor');
    expect(describeStray(strays[0])).toMatch(/^Mishit: smash factor 1\.18, far below this group's 1\.33 \(modified z −\d+\.\d\)/);
  });

  it('findStrays with a shot far right calls it a directional miss for review only', () => {
    const offline = [...OFFLINE];
    offline[2] = 40;
    const carry = [...CARRY];
    carry[4] = 148;
    const smash = [...SMASH];
    smash[4] = 1.33;
    const strays = findStrays({ rows: ROWS, club: '7I', carryM: carry, smashFactor: smash, offlineM: offline });
    expect(strays).toHaveLength(1);
    expect(strays[0].row).toBe(3);
    expect(strays[0].kind).toBe('review');
    expect(strays[0].flags).toEqual([expect.objectContaining({ rule: 'ground', direction: 'right' })]);
    expect(describeStray(strays[0])).toMatch(/^For review: a directional miss 40 m right of this group's pattern: the player's dispersion/);
    expect(describeStray(strays[0])).toMatch(/kept in the figures unless you drop it$/);
  });

  it('findStrays with a shot far long and on line flags nothing: a shot is never a stray for being better', () => {
    const carry = [...CARRY];
    carry[4] = 190;
    const smash = [...SMASH];
    smash[4] = 1.45;
    expect(findStrays({ rows: ROWS, club: '7I', carryM: carry, smashFactor: smash, offlineM: OFFLINE, ballSpeedMps: smash.map((x) => 36 * x) })).toEqual([]);
  });

  // Penner (2003) impact model: a driver cannot give 1.62 (see analysis/physics).
  it('findStrays with a smash factor beyond the impact bound calls it a misread and leaves it out of the median', () => {
    const smash = [1.46, 1.47, 1.45, 1.62, 1.46, 1.44, 1.47];
    const strays = findStrays({ rows: smash.map((_, i) => i + 1), club: 'DR', smashFactor: smash });
    expect(strays).toHaveLength(1);
    expect(strays[0]).toMatchObject({ row: 4, kind: 'misread' });
    expect(describeStray(strays[0])).toMatch(/^Misread: smash factor 1\.62 is more than the impact of this club allows \(at most 1\.5\d/);
  });

  it('findStrays with a misread and a mishit in one shot calls it a misread', () => {
    const smash = [1.33, 1.34, 1.32, 1.65, 1.33, 1.34];
    const carry = [148, 150, 147, 100, 149, 151];
    const strays = findStrays({ rows: [1, 2, 3, 4, 5, 6], club: '7I', smashFactor: smash, carryM: carry });
    expect(strays[0].kind).toBe('misread');
  });

  // The floor under the smash-factor MAD is 0.01: a mishit must be at least 3.5/0.6745 × 0.01 ≈ 0.052 below.
  it('findStrays on identical smash factors but one 0.04 lower keeps it; 0.07 lower is a mishit', () => {
    const base = [1.45, 1.45, 1.45, 1.45, 1.45, 1.45, 1.45];
    const run = (low: number) => findStrays({ rows: [1, 2, 3, 4, 5, 6, 7, 8], club: 'DR', smashFactor: [...base, low] });
    expect(run(1.41)).toEqual([]);
    expect(run(1.38).map((s) => s.row)).toEqual([8]);
  });

  it('findStrays with a topped shot calls it a mishit on ball speed, launch and carry', () => {
    const ball = [60, 61, 59.5, 60.5, 31, 60.2, 59.8];
    const launch = [12, 12.5, 11.8, 12.2, 2.1, 12.4, 11.9];
    const carry = [210, 214, 207, 212, 40, 211, 209];
    const strays = findStrays({ rows: [1, 2, 3, 4, 5, 6, 7], club: 'DR', ballSpeedMps: ball, launchAngleDeg: launch, carryM: carry });
    expect(strays.map((s) => s.row)).toEqual([5]);
    expect(strays[0].flags.map((f) => f.rule).sort()).toEqual(['ballSpeed', 'carry', 'launchAngle']);
  });

  it('findStrays with a skied drive flags launch far above', () => {
    const launch = [12, 12.5, 11.8, 12.2, 24, 12.4, 11.9, 12.1];
    const strays = findStrays({ rows: [1, 2, 3, 4, 5, 6, 7, 8], club: 'DR', launchAngleDeg: launch });
    expect(strays.map((s) => s.row)).toEqual([5]);
    expect(describeStray(strays[0])).toMatch(/launch 24\.0°, far above this group's 12\.\d°/);
  });

  it('findStrays with two shots applies no rule', () => {
    expect(findStrays({ rows: [1, 2], carryM: [150, 60], smashFactor: [1.3, 1.0] })).toEqual([]);
  });

  it('findStrays with four shots applies the one-field rules but not the ground rule', () => {
    expect(findStrays({ rows: [1, 2, 3, 4], carryM: [150, 151, 149, 150], offlineM: [0, 1, -1, 50] })).toEqual([]);
    // The one-field rule fires at four shots: a carry a third short is a mishit; the shot 50 m
    // right is not looked at by the ground rule (it needs five).
    const strays = findStrays({ rows: [1, 2, 3, 4], carryM: [150, 151, 100, 150], offlineM: [0, 1, -1, 50] });
    expect(strays.map((s) => [s.row, s.kind, s.flags.map((f) => f.rule)])).toEqual([[3, 'mishit', ['carry']]]);
  });

  // MIN_SHOTS_FOR_SCORE at its boundary: three carries are enough for the one-field rule. Median
  // 150, MAD 1 under the carry floor max(1.5 m, 1.5% × 150) = 2.25 m, so by Iglewicz & Hoaglin's
  // M = 0.6745·(x − median)/MAD (How to Detect and Handle Outliers, 1993) the short shot scores
  // 0.6745 × (100 − 150)/2.25 = −14.99, far beyond 3.5.
  it('findStrays with three shots and a carry a third short calls it a mishit on carry', () => {
    const strays = findStrays({ rows: [1, 2, 3], carryM: [150, 151, 100] });
    expect(strays.map((s) => [s.row, s.kind])).toEqual([[3, 'mishit']]);
    const flag = strays[0].flags[0];
    expect(flag).toMatchObject({ rule: 'carry', kind: 'mishit', value: 100, median: 150, floored: true });
    expect(flag.kind === 'mishit' && flag.modifiedZ).toBeCloseTo((0.6745 * (100 - 150)) / 2.25, 9);
  });

  it('findStrays with two shots and a carry a third short applies no rule (below three values)', () => {
    expect(findStrays({ rows: [1, 2], carryM: [150, 100] })).toEqual([]);
    expect(findStrays({ rows: [1, 2, 3], carryM: [150, Number.NaN, 100] })).toEqual([]);
  });

  // Iglewicz & Hoaglin (How to Detect and Handle Outliers, 1993): a likely outlier has |M|
  // *greater than* 3.5. Three launches: median 12°, MAD 2° (above the 1° floor), so
  // M = 0.6745·(x − 12)/2; x = 22.378057820607857 gives M = 3.5 exactly in double precision, the
  // next double above gives 3.500000000000001.
  it('findStrays with a launch at modified z exactly 3.5 keeps it; just above is a mishit', () => {
    const atLimit = 22.378057820607857;
    expect((0.6745 * (atLimit - 12)) / 2).toBe(3.5);
    expect(findStrays({ rows: [1, 2, 3], launchAngleDeg: [10, 12, atLimit] })).toEqual([]);
    const above = 22.37805782060786;
    expect((0.6745 * (above - 12)) / 2).toBeGreaterThan(3.5);
    const strays = findStrays({ rows: [1, 2, 3], launchAngleDeg: [10, 12, above] });
    expect(strays.map((s) => [s.row, s.kind, s.flags.map((f) => f.rule)])).toEqual([[3, 'mishit', ['launchAngle']]]);
  });

  it('findStrays with a column of the wrong length throws', () => {
    expect(() => findStrays({ rows: [1, 2, 3], carryM: [1, 2] })).toThrow(RangeError);
  });

  // Property: strays never change with row order.
  it('findStrays of shuffled shots flags the same rows for the same reasons', () => {
    const shot = fc.record({
      carry: fc.integer({ min: 1000, max: 1600 }).map((i) => i / 10),
      smash: fc.integer({ min: 100, max: 150 }).map((i) => i / 100),
      offline: fc.integer({ min: -300, max: 300 }).map((i) => i / 10),
      launch: fc.integer({ min: 50, max: 250 }).map((i) => i / 10),
    });
    const group = fc.array(shot, { minLength: 3, maxLength: 40 }).map((shots) => shots.map((s, i) => ({ ...s, row: i + 1 })));
    fc.assert(
      fc.property(group.chain((g) => fc.tuple(fc.constant(g), fc.shuffledSubarray(g, { minLength: g.length }))), ([a, b]) => {
        const run = (shots: typeof a) =>
          findStrays({
            rows: shots.map((s) => s.row),
            club: '7I',
            carryM: shots.map((s) => s.carry),
            smashFactor: shots.map((s) => s.smash),
            offlineM: shots.map((s) => s.offline),
            launchAngleDeg: shots.map((s) => s.launch),
          }).map((s) => ({ row: s.row, reason: describeStray(s) }));
        expect(run(b)).toEqual(run(a));
      }),
    );
  });

  // Property: a one-sided flag is always on the worse side, and a shot made better (more smash,
  // ball speed and carry, on line) never gains a flag.
  it('findStrays never flags a shot for being better', () => {
    const shot = fc.record({
      carry: fc.integer({ min: 1200, max: 1600 }).map((i) => i / 10),
      smash: fc.integer({ min: 125, max: 145 }).map((i) => i / 100),
      offline: fc.integer({ min: -150, max: 150 }).map((i) => i / 10),
    });
    fc.assert(
      fc.property(fc.array(shot, { minLength: 6, maxLength: 25 }), fc.nat(), (shots, pick) => {
        const i = pick % shots.length;
        const input = (list: typeof shots) => ({
          rows: list.map((_, k) => k + 1),
          club: '7I',
          carryM: list.map((s) => s.carry),
          smashFactor: list.map((s) => s.smash),
          ballSpeedMps: list.map((s) => 36 * s.smash),
          offlineM: list.map((s) => s.offline),
        });
        for (const stray of findStrays(input(shots))) {
          for (const f of stray.flags) {
            if (f.rule === 'smashFactor' || f.rule === 'ballSpeed' || f.rule === 'carry') expect(f.value).toBeLessThan(f.median);
            if (f.rule === 'ground' && f.direction === 'short') expect(f.carryFromCenterM).toBeLessThan(0);
          }
        }
        const better = shots.map((s, k) => (k === i ? { carry: Math.max(...shots.map((x) => x.carry)) + 5, smash: 1.46, offline: 0 } : s));
        expect(findStrays(input(better)).some((s) => s.index === i)).toBe(false);
      }),
    );
  });
});

describe('madFloor', () => {
  it('madFloor for carry is 1.5% of the median, at least 1.5 m', () => {
    expect(madFloor('carry', 210)).toBeCloseTo(3.15, 12);
    expect(madFloor('carry', 60)).toBe(1.5);
  });
  it('madFloor for smash factor is 0.01 whatever the median', () => {
    expect(madFloor('smashFactor', 1.45)).toBe(0.01);
  });
  it('MODIFIED_Z_LIMIT is Iglewicz and Hoaglin’s 3.5', () => {
    expect(MODIFIED_Z_LIMIT).toBe(3.5);
  });
});

describe('groundDistanceLimit', () => {
  it('groundDistanceLimit for 10 shots is the 99.9% Hotelling prediction scale', () => {
    // From the closed form F(2, m; q) = (m/2)·((1 − q)^(−2/m) − 1) with m = 8:
    // F = 4·(0.001^(−1/4) − 1) = 18.4937; k² = 2·9·11/(10·8)·F = 45.772; k = 6.7655.
    expect(groundDistanceLimit(10)).toBeCloseTo(6.7655, 3);
  });
  it('groundDistanceLimit for a large group tends to sqrt(χ²₂(0.999))', () => {
    expect(groundDistanceLimit(100000)).toBeCloseTo(Math.sqrt(-2 * Math.log(0.001)), 2);
  });
  it('groundDistanceLimit below 3 shots flags nothing', () => {
    expect(groundDistanceLimit(2)).toBe(Infinity);
  });
});
