import { impactLaunch, TYPICAL_HEADS } from '@/analysis/bag';
import { BALL_MASS_KG, BALL_RADIUS_M, RAD_PER_DEG, RAD_PER_S_PER_RPM } from '@/analysis/flight';

const level = (massKg: number, restitution: number) => ({ massKg, restitution, attackDeg: 0, deliveredLoftChangeDeg: 0 });

describe('impactLaunch', () => {
  it('impactLaunch of a square face without loft gives (1 + e)/(1 + m/M) of the club speed, no spin (Penner, Rep. Prog. Phys. 66, 2003)', () => {
    // m 45.93 g, M 200 g: e 0.83 → 1.48823, e 0.80 → 1.46383 (computed from the published formula)
    expect(impactLaunch(1, 0, level(0.2, 0.83)).ballSpeedMps).toBeCloseTo(1.48823, 5);
    expect(impactLaunch(40, 0, level(0.2, 0.8)).ballSpeedMps).toBeCloseTo(40 * 1.46383, 3);
    expect(impactLaunch(40, 0, level(0.2, 0.8))).toMatchObject({ launchAngleDeg: 0, spinRateRpm: 0 });
  });

  it.each([10.5, 24, 31, 56])('impactLaunch at %p° leaves the ball rolling on the recoiling face (contact speeds equal along the face)', (loft) => {
    const head = level(0.26, 0.78);
    const V = 38;
    const out = impactLaunch(V, loft, head);
    const theta = loft * RAD_PER_DEG;
    const deviation = (loft - out.launchAngleDeg) * RAD_PER_DEG;
    const vt = out.ballSpeedMps * Math.sin(deviation); // along the face
    const spinRadS = out.spinRateRpm * RAD_PER_S_PER_RPM;
    // rolling: ball's contact point moves with the face, whose tangential speed the impulse m·vt lowered by m·vt/M
    expect(vt + spinRadS * BALL_RADIUS_M).toBeCloseTo(V * Math.sin(theta) - (BALL_MASS_KG * vt) / head.massKg, 9);
    // a uniform ball: the spin is 5/2 of the tangential speed over the radius
    expect(spinRadS * BALL_RADIUS_M).toBeCloseTo(2.5 * vt, 9);
  });

  it('impactLaunch with an upward attack angle raises the launch by it at the same spin loft', () => {
    const flat = impactLaunch(45, 10.5, level(0.2, 0.83));
    const up = impactLaunch(45, 13.5, { massKg: 0.2, restitution: 0.83, attackDeg: 3, deliveredLoftChangeDeg: 0 });
    expect(up.launchAngleDeg - flat.launchAngleDeg).toBeCloseTo(3, 9);
    expect(up.spinRateRpm).toBeCloseTo(flat.spinRateRpm, 9);
  });

  it('impactLaunch with the typical deliveries keeps ball speed falling and spin rising with loft', () => {
    const driver = impactLaunch(45, 10.5, TYPICAL_HEADS.driver);
    const iron = impactLaunch(37, 31, TYPICAL_HEADS.iron);
    const wedge = impactLaunch(35, 56, TYPICAL_HEADS.wedge);
    expect(driver.ballSpeedMps).toBeGreaterThan(iron.ballSpeedMps);
    expect(iron.ballSpeedMps).toBeGreaterThan(wedge.ballSpeedMps);
    expect(driver.spinRateRpm).toBeLessThan(iron.spinRateRpm);
    expect(iron.spinRateRpm).toBeLessThan(wedge.spinRateRpm);
  });

  it('impactLaunch of a negative speed or a spin loft past 90° throws', () => {
    expect(() => impactLaunch(-1, 10, level(0.2, 0.83))).toThrow(RangeError);
    expect(() => impactLaunch(40, 95, level(0.2, 0.83))).toThrow(RangeError);
  });
});
