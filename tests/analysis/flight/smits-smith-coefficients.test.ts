import { smitsSmithCoefficients, smitsSmithDragCoefficient, smitsSmithLiftCoefficient } from '@/analysis/flight';

// Smits & Smith, Science and Golf II (1994), as quoted by A. M. Nathan (2008) and others (memory/secondary):
// CD ≈ 0.24 + 0.18·S, CL ≈ 0.54·S^0.4. Values are the formulas' exact arithmetic.
describe('smitsSmithCoefficients', () => {
  it.each([
    [0.08, 0.2544, 0.54 * Math.pow(0.08, 0.4)],
    [0.1, 0.258, 0.54 * Math.pow(0.1, 0.4)],
    [0.2, 0.276, 0.54 * Math.pow(0.2, 0.4)],
  ])('smitsSmith coefficients at S = %d give CD %d and CL %d', (spinRatio, drag, lift) => {
    expect(smitsSmithDragCoefficient(spinRatio)).toBeCloseTo(drag, 12);
    expect(smitsSmithLiftCoefficient(spinRatio)).toBeCloseTo(lift, 12);
  });
  it('smitsSmithLiftCoefficient at S = 0.1 gives 0.21498', () => {
    expect(smitsSmithLiftCoefficient(0.1)).toBeCloseTo(0.21498, 5);
  });
  it('smitsSmith coefficients with no spin give CD 0.24 and no lift', () => {
    expect(smitsSmithCoefficients.dragCoefficient(0, 1.5e5)).toBe(0.24);
    expect(smitsSmithCoefficients.liftCoefficient(0, 1.5e5)).toBe(0);
  });
  // The fits are for S ≥ 0 (Smits & Smith 1994): a spin ratio below zero is taken as none.
  it('smitsSmith coefficients take a spin ratio below zero as no spin', () => {
    expect(smitsSmithDragCoefficient(-0.1)).toBe(0.24);
    expect(smitsSmithLiftCoefficient(-0.1)).toBe(0);
  });
});
