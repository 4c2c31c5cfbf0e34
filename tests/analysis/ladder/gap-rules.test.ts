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

// Gaps are given in yards (the rule's own unit) and converted with 1 yd = 0.9144 m exactly (NIST
// SP 811, 2008, Appendix B); the yardages of the rule are common practice, no source.
const YD = 0.9144;

describe('classifyCarryGap', () => {
  it('classifyCarryGap between irons within 7–20 yd gives no flag', () => {
    expect(classifyCarryGap(12 * YD, 'iron', 'iron')).toBeNull();
    expect(classifyCarryGap(8 * YD, 'iron', 'iron')).toBeNull();
    expect(classifyCarryGap(19 * YD, 'iron', 'iron')).toBeNull();
  });
  it('classifyCarryGap between irons under 7 yd gives tight', () => {
    expect(classifyCarryGap(5 * YD, 'iron', 'iron')).toBe('tight');
  });
  it('classifyCarryGap between irons over 20 yd gives wide', () => {
    expect(classifyCarryGap(21 * YD, 'iron', 'iron')).toBe('wide');
  });
  it('classifyCarryGap at the 7 yd and 20 yd boundaries gives no flag; just past them flags', () => {
    expect(classifyCarryGap(7 * YD, 'iron', 'iron')).toBeNull();
    expect(classifyCarryGap(7 * YD - 0.001, 'iron', 'iron')).toBe('tight');
    expect(classifyCarryGap(20 * YD, 'iron', 'iron')).toBeNull();
    expect(classifyCarryGap(20 * YD + 0.001, 'iron', 'iron')).toBe('wide');
  });
  it('classifyCarryGap from a wood allows up to 25 yd', () => {
    expect(classifyCarryGap(23 * YD, 'wood', 'hybrid')).toBeNull();
    expect(classifyCarryGap(26 * YD, 'driver', 'wood')).toBe('wide');
  });
  it('classifyCarryGap with a long club on either side allows exactly 25 yd and flags just past it', () => {
    expect(classifyCarryGap(25 * YD, 'driver', 'wood')).toBeNull();
    expect(classifyCarryGap(25 * YD + 0.001, 'driver', 'wood')).toBe('wide');
    expect(classifyCarryGap(22 * YD, 'iron', 'hybrid')).toBeNull();
    expect(classifyCarryGap(22 * YD, 'hybrid', 'iron')).toBeNull();
    expect(classifyCarryGap(22 * YD, 'iron', null)).toBe('wide');
    expect(classifyCarryGap(22 * YD, null, 'iron')).toBe('wide');
  });
  it('classifyCarryGap with the shorter club carrying as far or farther gives reversed', () => {
    expect(classifyCarryGap(-2 * YD, 'iron', 'iron')).toBe('reversed');
    expect(classifyCarryGap(0, 'iron', 'iron')).toBe('reversed');
    expect(classifyCarryGap(0.001, 'iron', 'iron')).toBe('tight');
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
  it('classifyLoftStep at 4° and 6° gives no flag; just outside flags', () => {
    expect(classifyLoftStep(4, 'wedge', 'wedge')).toBeNull();
    expect(classifyLoftStep(6, 'wedge', 'wedge')).toBeNull();
    expect(classifyLoftStep(3.9, 'wedge', 'wedge')).toBe('tight');
    expect(classifyLoftStep(6.1, 'wedge', 'wedge')).toBe('wide');
    expect(classifyLoftStep(8, 'wedge', 'iron')).toBeNull();
  });
  it('classifyLoftStep outside the wedges gives no flag', () => {
    expect(classifyLoftStep(8, 'iron', 'iron')).toBeNull();
  });
});
