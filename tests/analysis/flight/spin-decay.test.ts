import { ballForces, BALL_RADIUS_M, defaultCoefficients, resolveAir, SPIN_DECAY_COEFFICIENT, spinDecayTimeConstantS } from '@/analysis/flight';

// Spin decay dω/dt = −2.0e-5·(v/R)·ω, R = 0.02134 m (Smits & Smith, quoted by A. M. Nathan,
// 2008): time constant 23.87 s at 100 mph (0.44704 m/s per mph, NIST SP 811).
describe('spin decay', () => {
  it('spinDecayTimeConstantS at 100 mph gives 23.87 s', () => {
    expect(spinDecayTimeConstantS(44.704, 0.02134)).toBeCloseTo(23.87, 2);
    expect(SPIN_DECAY_COEFFICIENT).toBe(2.0e-5);
  });
  it('ballForces spin rate changes at −ω/τ in still air', () => {
    const out = new Float64Array(4);
    const omega = 300;
    ballForces(resolveAir(), defaultCoefficients, { x: 0, y: 0, z: 1 }).derivative(20, 44.704, 0, 0, omega, out);
    expect(out[3]).toBeCloseTo(-omega / spinDecayTimeConstantS(44.704, BALL_RADIUS_M), 10);
  });
  it('spinDecayTimeConstantS at zero speed throws', () => {
    expect(() => spinDecayTimeConstantS(0)).toThrow(RangeError);
  });
});
