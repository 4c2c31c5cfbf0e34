import {
  BALL_AREA_M2,
  BALL_MASS_KG,
  ballForces,
  defaultCoefficients,
  launchVectors,
  resolveAir,
  STANDARD_GRAVITY_MPS2,
  type CoefficientModel,
} from '@/analysis/flight';

const constant = (drag: number, lift: number): CoefficientModel => ({
  name: 'constant',
  source: 'test',
  dragCoefficient: () => drag,
  liftCoefficient: () => lift,
});

describe('ballForces', () => {
  const air = resolveAir();
  const k = (air.densityKgM3 * BALL_AREA_M2) / (2 * BALL_MASS_KG);
  it('ballForces at level flight with back spin gives ½ρAv²/m drag back and lift up', () => {
    const out = new Float64Array(4);
    ballForces(air, constant(0.25, 0.2), { x: 0, y: 0, z: 1 }).derivative(20, 50, 0, 0, 300, out);
    expect(out[0]).toBeCloseTo(-k * 0.25 * 2500, 10);
    expect(out[1]).toBeCloseTo(-STANDARD_GRAVITY_MPS2 + k * 0.2 * 2500, 10);
    expect(out[2]).toBeCloseTo(0, 12);
  });
  it('ballForces with zero spin gives no lift, only drag against the motion', () => {
    const out = new Float64Array(4);
    const { vxMps, vyMps, vzMps, spinAxis } = launchVectors({ ballSpeedMps: 60, launchAngleDeg: 14, launchDirectionDeg: 4, spinRateRpm: 0, spinAxisDeg: 10 });
    ballForces(air, defaultCoefficients, spinAxis).derivative(20, vxMps, vyMps, vzMps, 0, out);
    const drag = -out[0] / vxMps;
    expect(drag).toBeGreaterThan(0);
    expect(-(out[1] + STANDARD_GRAVITY_MPS2) / vyMps).toBeCloseTo(drag, 12);
    expect(-out[2] / vzMps).toBeCloseTo(drag, 12);
  });
  it('ballForces with the axis tilted right pushes the ball right', () => {
    const out = new Float64Array(4);
    const { vxMps, vyMps, vzMps, spinAxis } = launchVectors({ ballSpeedMps: 60, launchAngleDeg: 12, spinRateRpm: 3000, spinAxisDeg: 15 });
    ballForces(air, defaultCoefficients, spinAxis).derivative(20, vxMps, vyMps, vzMps, 314, out);
    expect(out[2]).toBeGreaterThan(0);
  });
  it('ballForces in a headwind drags harder than in still air', () => {
    const still = new Float64Array(4);
    const head = new Float64Array(4);
    ballForces(air, defaultCoefficients, { x: 0, y: 0, z: 1 }).derivative(20, 50, 5, 0, 300, still);
    ballForces(resolveAir({ wind: { speedMps: 5, fromDeg: 0 } }), defaultCoefficients, { x: 0, y: 0, z: 1 }).derivative(20, 50, 5, 0, 300, head);
    expect(head[0]).toBeLessThan(still[0]);
  });
});
