import { LYU_DRAG_BRANCH_SWITCH_RE, lyuCoefficients, lyuDragCoefficient, lyuLiftCoefficient } from '@/analysis/flight';

// Lyu, Kensrud, Smith & Tosaya, "Aerodynamics of Golf Balls in Still Air", Proceedings 2(6):238
// (2018), fits averaged over 13 balls (secondary: read through quotations of the paper). Values are the fits' exact arithmetic.
describe('lyuLiftCoefficient', () => {
  it.each([
    [0.1, 0.1665],
    [0.2, 0.268],
    [0.3, 0.3045],
  ])('lyuLiftCoefficient at S = %d gives the fit value %d', (spinRatio, lift) => {
    expect(lyuLiftCoefficient(spinRatio)).toBeCloseTo(lift, 12);
  });
  it('lyuLiftCoefficient with no spin gives no lift', () => {
    expect(lyuLiftCoefficient(0)).toBe(0);
  });
  it('lyuLiftCoefficient past the fit peak holds the peak value', () => {
    const peak = lyuLiftCoefficient(1.99 / 6.5);
    expect(lyuLiftCoefficient(0.5)).toBe(peak);
    expect(lyuLiftCoefficient(0.3)).toBeLessThan(peak);
  });
});

describe('lyuDragCoefficient', () => {
  it.each([
    [1.0e5, 0.211],
    [1.5e5, 0.17975],
    [2.0e5, 0.244],
  ])('lyuDragCoefficient at Re = %d gives the high-branch value %d', (reynolds, drag) => {
    expect(lyuDragCoefficient(reynolds)).toBeCloseTo(drag, 12);
  });
  it('lyuDragCoefficient below the branch switch uses the low branch', () => {
    const re = 6e4;
    expect(lyuDragCoefficient(re)).toBeCloseTo(1.29e-10 * re * re - 2.59e-5 * re + 1.5, 12);
  });
  it('lyuDragCoefficient is continuous where the branches join, inside their overlap', () => {
    expect(LYU_DRAG_BRANCH_SWITCH_RE).toBeGreaterThan(7.5e4);
    expect(LYU_DRAG_BRANCH_SWITCH_RE).toBeLessThan(1e5);
    expect(lyuDragCoefficient(LYU_DRAG_BRANCH_SWITCH_RE - 1e-6)).toBeCloseTo(lyuDragCoefficient(LYU_DRAG_BRANCH_SWITCH_RE + 1e-6), 9);
  });
  it('lyuDragCoefficient outside 5e4…2e5 holds the end values', () => {
    expect(lyuDragCoefficient(3e5)).toBe(lyuDragCoefficient(2e5));
    expect(lyuDragCoefficient(1e4)).toBe(lyuDragCoefficient(5e4));
  });
  it('lyuCoefficients drag ignores spin ratio', () => {
    expect(lyuCoefficients.dragCoefficient(0.3, 1.5e5)).toBe(lyuCoefficients.dragCoefficient(0, 1.5e5));
  });
  it('lyuLiftCoefficient takes a spin ratio below zero as no lift', () => {
    expect(lyuLiftCoefficient(-0.1)).toBe(0);
  });
});
