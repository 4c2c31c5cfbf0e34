import {
  BALL_AREA_M2,
  BALL_MASS_KG,
  ballForces,
  GRASS_ROUGHNESS_M,
  resolveAir,
  simulateFlight,
  WIND_REFERENCE_HEIGHT_M,
  windProfileFactor,
  type CoefficientModel,
} from '@/analysis/flight';

// The logarithmic wind profile of the neutral surface layer, u(z) = (u*/κ)·ln(z/z0) (Stull,
// "An Introduction to Boundary Layer Meteorology", 1988, §9.7), so u(z)/u(zr) = ln(z/z0)/ln(zr/z0).
// Roughness length of open flat terrain with grass z0 = 0.03 m (Davenport–Wieringa class; US EPA
// "Meteorological Monitoring Guidance for Regulatory Modeling Applications", EPA-454/R-99-005,
// 2000, Table 6-10); surface wind measured at 10 m (WMO-No. 8, Part I, Chapter 5).
describe('windProfileFactor', () => {
  it('windProfileFactor defaults to grass roughness 0.03 m and the 10 m measuring height', () => {
    expect(GRASS_ROUGHNESS_M).toBe(0.03);
    expect(WIND_REFERENCE_HEIGHT_M).toBe(10);
  });
  it.each([
    [10, 1],
    [2, Math.log(2 / 0.03) / Math.log(10 / 0.03)],
    [30, Math.log(30 / 0.03) / Math.log(10 / 0.03)],
    [0.5, Math.log(0.5 / 0.03) / Math.log(10 / 0.03)],
  ])('windProfileFactor at %d m gives the log-law ratio %d', (heightM, factor) => {
    expect(windProfileFactor(heightM)).toBeCloseTo(factor, 12);
  });
  it('windProfileFactor at 2 m over grass gives 0.72295 of the 10 m wind', () => {
    expect(windProfileFactor(2)).toBeCloseTo(0.72295, 5); // ln(66.667)/ln(333.33), computed
  });
  it('windProfileFactor at or below the roughness length gives no wind', () => {
    expect(windProfileFactor(0.03)).toBe(0);
    expect(windProfileFactor(0)).toBe(0);
    expect(windProfileFactor(-1)).toBe(0);
  });
  it('windProfileFactor with a rougher ground and a 2 m reference follows the same law', () => {
    expect(windProfileFactor(20, 0.1, 2)).toBeCloseTo(Math.log(200) / Math.log(20), 12);
  });
  it('windProfileFactor with a roughness that is not positive or a reference below it throws', () => {
    expect(() => windProfileFactor(5, 0)).toThrow(RangeError);
    expect(() => windProfileFactor(5, 0.03, 0.01)).toThrow(RangeError);
  });
});

describe('ballForces with a wind profile', () => {
  const constant: CoefficientModel = { name: 'constant', source: 'test', dragCoefficient: () => 0.25, liftCoefficient: () => 0 };
  const air = resolveAir({ wind: { speedMps: 10, fromDeg: 0 } }); // 10 m/s headwind at 10 m
  const k = (air.densityKgM3 * BALL_AREA_M2) / (2 * BALL_MASS_KG);
  it.each([2, 10, 25])('ballForces at %d m drags against the log-profile wind at that height', (heightM) => {
    const out = new Float64Array(4);
    ballForces(air, constant, { x: 0, y: 0, z: 1 }).derivative(heightM, 40, 0, 0, 0, out);
    const relative = 40 + 10 * (Math.log(heightM / 0.03) / Math.log(10 / 0.03));
    expect(out[0]).toBeCloseTo(-k * 0.25 * relative * relative, 9);
  });
  it('ballForces on the ground (below the roughness length) feels no wind', () => {
    const out = new Float64Array(4);
    ballForces(air, constant, { x: 0, y: 0, z: 1 }).derivative(0, 40, 0, 0, 0, out);
    expect(out[0]).toBeCloseTo(-k * 0.25 * 40 * 40, 9);
  });
  it('simulateFlight in a crosswind drifts farther when the same speed is measured lower down', () => {
    // The same 8 m/s measured at 2 m instead of 10 m means more wind at every height: more drift.
    const launch = { ballSpeedMps: 70, launchAngleDeg: 10, spinRateRpm: 2600 };
    const at10 = simulateFlight(launch, { wind: { speedMps: 8, fromDeg: 90 } }).offlineM;
    const at2 = simulateFlight(launch, { wind: { speedMps: 8, fromDeg: 90, referenceHeightM: 2 } }).offlineM;
    expect(at10).toBeLessThan(0);
    expect(at2).toBeLessThan(at10);
  });
});
