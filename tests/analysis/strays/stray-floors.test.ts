import { madFloor, offlineMadFloor } from '@/analysis/strays';

// The floors are our choices (common practice, no source; see analysis/strays/stray-floors.ts):
// these tests hold them at their stated values and boundaries. 1 mph = 0.44704 m/s exactly
// (NIST SP 811, 2008, Appendix B).
describe('madFloor', () => {
  it('madFloor for ball speed is 1% of the median, at least 1 mph', () => {
    expect(madFloor('ballSpeed', 70)).toBeCloseTo(0.7, 12);
    expect(madFloor('ballSpeed', 30)).toBe(0.44704);
  });
  it('madFloor for launch angle is 1° whatever the median', () => {
    expect(madFloor('launchAngle', 40)).toBe(1);
  });
  it('madFloor scales with the size of the median and falls back to the absolute floor without one', () => {
    expect(madFloor('carry', -210)).toBeCloseTo(3.15, 12);
    expect(madFloor('carry', Number.NaN)).toBe(1.5);
  });
});

describe('offlineMadFloor', () => {
  it('offlineMadFloor is 1.5% of the median carry, at least 1 m, and 1 m without a carry', () => {
    expect(offlineMadFloor(210)).toBeCloseTo(3.15, 12);
    expect(offlineMadFloor(-210)).toBeCloseTo(3.15, 12);
    expect(offlineMadFloor(40)).toBe(1);
    expect(offlineMadFloor(Number.NaN)).toBe(1);
  });
});
