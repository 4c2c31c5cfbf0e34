import { classifyCarryGap, classifyLoftStep, GAP_RULES, WEDGE_LOFT_STEP } from '@/analysis/ladder';

describe('GAP_RULES', () => {
  // Yards to metres by 1 yd = 0.9144 m exactly (NIST SP 811, 2008, Appendix B); the yardages are
  // common practice, no source.
  it('GAP_RULES in metres are 7, 10, 15, 20 and 25 yards', () => {
    expect(GAP_RULES.tightBelowM).toBeCloseTo(6.4008, 12);
    expect(GAP_RULES.targetMinM).toBeCloseTo(9.144, 12);
    expect(GAP_RULES.targetMaxM).toBeCloseTo(13.716, 12);
    expect(GAP_RULES.wideAboveM).toBeCloseTo(18.288, 12);
    expect(GAP_RULES.woodWideAboveM).toBeCloseTo(22.86, 12);
  });
});

describe('classifyCarryGap', () => {
  it('classifyCarryGap between irons within 7–20 yd gives no flag', () => {
    expect(classifyCarryGap(11, 'iron', 'iron')).toBeNull();
  });
  it('classifyCarryGap between irons under 7 yd gives tight', () => {
    expect(classifyCarryGap(5, 'iron', 'iron')).toBe('tight');
  });
  it('classifyCarryGap between irons over 20 yd gives wide', () => {
    expect(classifyCarryGap(19, 'iron', 'iron')).toBe('wide');
  });
  it('classifyCarryGap from a wood allows up to 25 yd', () => {
    expect(classifyCarryGap(21, 'wood', 'hybrid')).toBeNull();
    expect(classifyCarryGap(24, 'driver', 'wood')).toBe('wide');
  });
  it('classifyCarryGap with the shorter club carrying farther gives reversed', () => {
    expect(classifyCarryGap(-2, 'iron', 'iron')).toBe('reversed');
  });
});

describe('classifyLoftStep', () => {
  // Common practice, no source: wedge lofts in 4–6° steps.
  it('classifyLoftStep between wedges follows the 4–6° rule', () => {
    expect(WEDGE_LOFT_STEP).toEqual({ minDeg: 4, maxDeg: 6 });
    expect(classifyLoftStep(5, 'wedge', 'wedge')).toBeNull();
    expect(classifyLoftStep(3, 'wedge', 'wedge')).toBe('tight');
    expect(classifyLoftStep(8, 'wedge', 'wedge')).toBe('wide');
  });
  it('classifyLoftStep outside the wedges gives no flag', () => {
    expect(classifyLoftStep(8, 'iron', 'iron')).toBeNull();
  });
});
