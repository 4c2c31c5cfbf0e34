import { DEFAULT_MARGINS, resolveMargins } from '@/analysis/head-to-head';

const YD = 0.9144; // NIST SP 811 (2008), Appendix B: 1 yd = 0.9144 m exactly

describe('resolveMargins', () => {
  it('resolveMargins takes a shop’s positive margin over the default', () => {
    expect(resolveMargins({ carry: 5 * YD }).carry).toBe(5 * YD);
    expect(resolveMargins({ carry: 5 * YD }).offline).toBe(DEFAULT_MARGINS.offline);
  });
  // Common practice, no source: carry differences under 3 yd do not matter to a fitter.
  it('resolveMargins with no overrides gives 3 yd for carry', () => {
    expect(resolveMargins(null).carry).toBeCloseTo(3 * YD, 12);
  });
  it('resolveMargins keeps the default for a margin of 0, below 0 or not finite', () => {
    expect(resolveMargins({ carry: 0 }).carry).toBe(DEFAULT_MARGINS.carry);
    expect(resolveMargins({ carry: -2 }).carry).toBe(DEFAULT_MARGINS.carry);
    expect(resolveMargins({ carry: Number.POSITIVE_INFINITY }).carry).toBe(DEFAULT_MARGINS.carry);
  });
});
