import {
  BALL_RADIUS_M,
  craterAngleDeg,
  GROUND_FIRMNESS_PARAMETERS,
  groundRun,
  rollDistanceM,
  simulateFlight,
  turfBounce,
  turfRestitution,
  type GroundParameters,
} from '@/analysis/flight';

const MPH = 0.44704; // NIST SP 811 (2008), Appendix B
const flat: GroundParameters = { craterScale: 0, restitutionScale: 1, rollingDecelerationMps2: 1 };

// A. R. Penner, "The run of a golf ball", Can. J. Phys. 80:931–940 (2002) — forms from memory, as
// the code says: e = 0.510 − 0.0375·vn + 0.000903·vn² (vn ≤ 20 m/s), 0.120 above; crater angle
// θc = 15.4°·(v/18.6 m/s)·(θ/44.4°).
describe('Penner’s turf laws', () => {
  it.each([
    [0, 0.51],
    [10, 0.2253],
    [25, 0.12],
  ])('turfRestitution at a normal speed of %d m/s gives %d', (speed, e) => {
    expect(turfRestitution(speed)).toBeCloseTo(e, 10);
  });
  it('turfRestitution is nearly continuous at 20 m/s where the fit hands over to 0.120', () => {
    expect(turfRestitution(20)).toBeCloseTo(0.1212, 10); // 0.510 − 0.75 + 0.3612
    expect(Math.abs(turfRestitution(20) - turfRestitution(20.001))).toBeLessThan(0.002);
  });
  it('craterAngleDeg at Penner’s reference impact (18.6 m/s, 44.4°) gives 15.4°, linear in both', () => {
    expect(craterAngleDeg(18.6, 44.4)).toBeCloseTo(15.4, 12);
    expect(craterAngleDeg(37.2, 22.2)).toBeCloseTo(15.4, 12);
  });
});

// Rigid sphere (I = 2/5·m·r²) bouncing on a flat surface with Coulomb friction: closed forms of
// classical impact mechanics (e.g. Cross, "Grip-slip behavior of a bouncing ball", Am. J. Phys.
// 70:1093, 2002): a ball that grips leaves with vx' = (5·vx − 2·r·ω)/7 and ω' rolling; a ball
// that slides throughout loses μ(1 + e)·|vy| of its tangential speed.
describe('turfBounce on flat ground', () => {
  it('turfBounce of a steep landing grips and leaves rolling at (5·vx − 2·r·ω)/7', () => {
    const vx = 3;
    const spin = 100; // back spin, rad/s
    const out = turfBounce({ horizontalMps: vx, verticalMps: -15, backSpinRadS: spin }, flat);
    expect(out.horizontalMps).toBeCloseTo((5 * vx - 2 * BALL_RADIUS_M * spin) / 7, 10);
    expect(out.horizontalMps + BALL_RADIUS_M * out.backSpinRadS).toBeCloseTo(0, 10); // rolling
    expect(out.verticalMps).toBeCloseTo(15 * turfRestitution(15), 10);
  });
  it('turfBounce of a shallow fast landing slides throughout and loses μ(1 + e)·|vy|', () => {
    const out = turfBounce({ horizontalMps: 30, verticalMps: -5, backSpinRadS: 0 }, flat);
    const e = turfRestitution(5);
    expect(out.horizontalMps).toBeCloseTo(30 - 0.43 * (1 + e) * 5, 10);
    expect(out.backSpinRadS).toBeCloseTo(-(2.5 * 0.43 * (1 + e) * 5) / BALL_RADIUS_M, 8);
  });
  it('turfBounce never adds energy', () => {
    for (const [vh, vv, w] of [[25, -20, 200], [10, -15, 800], [30, -8, -100], [5, -20, 900]]) {
      const out = turfBounce({ horizontalMps: vh, verticalMps: vv, backSpinRadS: w }, GROUND_FIRMNESS_PARAMETERS.normal);
      const energy = (a: number, b: number, s: number) => a * a + b * b + 0.4 * (BALL_RADIUS_M * s) ** 2;
      expect(energy(out.horizontalMps, out.verticalMps, out.backSpinRadS)).toBeLessThanOrEqual(energy(vh, vv, w));
    }
  });
});

describe('groundRun', () => {
  it('rollDistanceM matches a fine numerical integration of dv/dt = −a0·(1 + v/vr)', () => {
    for (const [v0, a0] of [[2, 0.75], [8, 1.2], [20, 0.45]]) {
      let v = v0;
      let x = 0;
      const h = 1e-4;
      while (v > 0) {
        const a = a0 * (1 + v / 5);
        x += h * (v - (h / 2) * a); // exact for the step at constant a
        v -= h * a;
      }
      expect(rollDistanceM(v0, a0)).toBeCloseTo(x, 2);
    }
  });
  it('groundRun of a ball already rolling runs no farther than a constant slow-roll deceleration allows', () => {
    // Lands rolling with a small downward speed: the bounce grips, e·vy stays under 0.5 m/s.
    const run = groundRun({ horizontalMps: 4, verticalMps: -0.5, backSpinRadS: -4 / BALL_RADIUS_M }, 'normal');
    const v = 4; // already rolling: the bounce changes neither speed nor spin along the surface
    expect(run.bounces).toBe(1);
    expect(run.runM).toBeGreaterThan(0);
    expect(run.runM).toBeLessThanOrEqual((v * v) / (2 * GROUND_FIRMNESS_PARAMETERS.normal.rollingDecelerationMps2) + 1e-9);
  });
  it('groundRun runs farther on firmer ground', () => {
    const landing = { horizontalMps: 19, verticalMps: -17, backSpinRadS: 220 };
    const soft = groundRun(landing, 'soft').runM;
    const normal = groundRun(landing, 'normal').runM;
    const firm = groundRun(landing, 'firm').runM;
    expect(soft).toBeLessThan(normal);
    expect(normal).toBeLessThan(firm);
  });
  it('groundRun of a ball coming up or not finite throws', () => {
    expect(() => groundRun({ horizontalMps: 10, verticalMps: 1, backSpinRadS: 0 })).toThrow(RangeError);
    expect(() => groundRun({ horizontalMps: Number.NaN, verticalMps: -1, backSpinRadS: 0 })).toThrow(RangeError);
  });
  // Plausibility only (common practice, no source): a tour-average drive (167 mph, 10.9°,
  // 2686 rpm) runs about a tenth of its carry on normal ground, a 7 iron (120 mph, 16.3°,
  // 7097 rpm) stops within a few metres, a pitching wedge with much spin may spin back.
  it('simulateFlight roll is plausible for a drive, a 7 iron and a wedge on normal ground', () => {
    const drive = simulateFlight({ ballSpeedMps: 167 * MPH, launchAngleDeg: 10.9, spinRateRpm: 2686 });
    expect(drive.rollM / drive.carryM).toBeGreaterThan(0.05);
    expect(drive.rollM / drive.carryM).toBeLessThan(0.15);
    expect(drive.totalM).toBeCloseTo(drive.carryM + drive.rollM, 10);
    const iron = simulateFlight({ ballSpeedMps: 120 * MPH, launchAngleDeg: 16.3, spinRateRpm: 7097 });
    expect(Math.abs(iron.rollM)).toBeLessThan(5);
    const wedge = simulateFlight({ ballSpeedMps: 102 * MPH, launchAngleDeg: 24.2, spinRateRpm: 9304 });
    expect(wedge.rollM).toBeLessThan(2);
  });
  it('simulateFlight roll follows the firmness of the conditions', () => {
    const launch = { ballSpeedMps: 70, launchAngleDeg: 12, spinRateRpm: 2600 };
    expect(simulateFlight(launch, { firmness: 'firm' }).rollM).toBeGreaterThan(simulateFlight(launch, { firmness: 'soft' }).rollM + 10);
  });
});
