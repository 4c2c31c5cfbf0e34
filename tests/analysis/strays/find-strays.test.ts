import fc from 'fast-check';
import { describeStray, findStrays } from '@/analysis/strays';
import { groundDistanceLimit } from '@/analysis/strays';

// Invented group: a player's 7-iron with one thin strike in row 5.
const ROWS = [1, 2, 3, 4, 5, 6, 7, 8];
const CARRY = [148, 150, 147, 149, 112, 151, 148, 146];
const SMASH = [1.33, 1.34, 1.32, 1.33, 1.18, 1.34, 1.33, 1.32];
const OFFLINE = [-3, 2, 0, 1, -4, -1, 3, 0];

describe('findStrays', () => {
  it('findStrays with a thin strike flags it on carry and smash factor, with reasons', () => {
    const strays = findStrays({ rows: ROWS, carryM: CARRY, smashFactor: SMASH, offlineM: OFFLINE });
    expect(strays.map((s) => s.row)).toEqual([5]);
    const rules = strays[0].flags.map((f) => f.rule);
    expect(rules).toContain('carry');
    expect(rules).toContain('smashFactor');
    expect(describeStray(strays[0])).toMatch(/^carry 112 m is far short of this group's median 148 m \(modified z −\d+\.\d\)/);
  });

  it('findStrays with a shot far right flags it on the ground only', () => {
    const offline = [...OFFLINE];
    offline[2] = 40;
    const carry = [...CARRY];
    carry[4] = 148;
    const strays = findStrays({ rows: ROWS, carryM: carry, offlineM: offline });
    expect(strays).toHaveLength(1);
    expect(strays[0].row).toBe(3);
    expect(strays[0].flags.map((f) => f.rule)).toEqual(['ground']);
    expect(describeStray(strays[0])).toMatch(/^lands far from this group's pattern: 40 m right and 1 m short of its median centre/);
  });

  it('findStrays with two shots applies no rule', () => {
    expect(findStrays({ rows: [1, 2], carryM: [150, 60], smashFactor: [1.3, 1.0] })).toEqual([]);
  });

  it('findStrays with four shots applies the one-field rules but not the ground rule', () => {
    const strays = findStrays({ rows: [1, 2, 3, 4], carryM: [150, 151, 149, 150], offlineM: [0, 1, -1, 50] });
    expect(strays).toEqual([]);
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
    });
    const group = fc.array(shot, { minLength: 3, maxLength: 40 }).map((shots) => shots.map((s, i) => ({ ...s, row: i + 1 })));
    fc.assert(
      fc.property(group.chain((g) => fc.tuple(fc.constant(g), fc.shuffledSubarray(g, { minLength: g.length }))), ([a, b]) => {
        const run = (shots: typeof a) =>
          findStrays({ rows: shots.map((s) => s.row), carryM: shots.map((s) => s.carry), smashFactor: shots.map((s) => s.smash), offlineM: shots.map((s) => s.offline) }).map((s) => ({
            row: s.row,
            reason: describeStray(s),
          }));
        expect(run(b)).toEqual(run(a));
      }),
    );
  });
});

describe('groundDistanceLimit', () => {
  it('groundDistanceLimit for 10 shots is the 99.9% Hotelling prediction scale', () => {
    // Computed from the closed form F(2, m; q) = (m/2)·((1 − q)^(−2/m) − 1) (CHECKS.md) with m = 8:
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
