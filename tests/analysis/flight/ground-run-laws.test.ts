import { BALL_RADIUS_M, GROUND_FIRMNESS_PARAMETERS, STANDARD_GRAVITY_MPS2, groundRun, rollDistanceM, turfBounce, type GroundLanding } from '@/analysis/flight';

const R = BALL_RADIUS_M;
const DEG = Math.PI / 180;
const MU = 0.43; // Penner (2002), from memory, as the code says
/** Penner's (2002) normal coefficient of restitution on turf, written out here (from memory). */
const penner = (vn: number) => (Math.abs(vn) > 20 ? 0.12 : 0.51 - 0.0375 * Math.abs(vn) + 0.000903 * vn * vn);
/** Penner's (2002) crater tilt, 15.4°·(v/18.6)·(θ/44.4), tilted up toward the ball, in radians. */
function tilt(l: GroundLanding, scale: number): number {
  const angleDeg = Math.atan2(-l.verticalMps, Math.abs(l.horizontalMps)) / DEG;
  return scale * 15.4 * (Math.hypot(l.horizontalMps, l.verticalMps) / 18.6) * (angleDeg / 44.4) * DEG * Math.sign(l.horizontalMps);
}
/** Velocity along (t) and out of (n) a surface tilted by `a`: t = (cos a, sin a), n = (−sin a, cos a). */
const surface = (h: number, v: number, a: number) => ({ t: h * Math.cos(a) + v * Math.sin(a), n: -h * Math.sin(a) + v * Math.cos(a) });

// A rigid sphere (I = 2/5·m·r²) meeting a surface: both impulses act at the contact point, so the
// angular momentum about it, m·r·(vt − (2/5)·r·ω) with ω the back spin, is the same before and
// after; the normal speed comes back as −e·vn; friction either stops the contact point (the ball
// leaves rolling, vt + r·ω = 0) or slides throughout and takes μ(1 + e)·|vn| off vt (Cross, "Grip-
// slip behavior of a bouncing ball", Am. J. Phys. 70:1093, 2002; Penner 2002 for the tilted turf).
describe('turfBounce on a cratered surface', () => {
  const landings: GroundLanding[] = [];
  for (const horizontalMps of [25, 12, 4]) for (const verticalMps of [-20, -12, -6]) for (const backSpinRadS of [0, 300, 900, -100]) landings.push({ horizontalMps, verticalMps, backSpinRadS });

  it.each(['soft', 'normal', 'firm'] as const)('turfBounce on %s ground keeps the angular momentum about the contact point and gives e·vn back', (firmness) => {
    const ground = GROUND_FIRMNESS_PARAMETERS[firmness];
    let grips = 0;
    let slides = 0;
    for (const landing of landings) {
      const a = tilt(landing, ground.craterScale);
      const before = surface(landing.horizontalMps, landing.verticalMps, a);
      const out = turfBounce(landing, ground);
      const after = surface(out.horizontalMps, out.verticalMps, a);
      expect(after.n).toBeCloseTo(-ground.restitutionScale * penner(before.n) * before.n, 9);
      expect(after.t - 0.4 * R * out.backSpinRadS).toBeCloseTo(before.t - 0.4 * R * landing.backSpinRadS, 9);
      if (Math.abs(after.t + R * out.backSpinRadS) < 1e-9) grips += 1;
      else {
        const e = ground.restitutionScale * penner(before.n);
        expect(Math.abs(before.t - after.t)).toBeCloseTo(MU * (1 + e) * -before.n, 9);
        slides += 1;
      }
    }
    expect(grips).toBeGreaterThan(0);
    expect(slides).toBeGreaterThan(0);
  });

  // Mirror the world front to back: a ball landing while moving backwards with the opposite spin
  // bounces as the mirror image, its crater tilted up toward it from the other side.
  it('turfBounce of a ball landing backwards is the mirror image of the forward bounce', () => {
    for (const landing of landings) {
      const forward = turfBounce(landing, GROUND_FIRMNESS_PARAMETERS.normal);
      const back = turfBounce({ horizontalMps: -landing.horizontalMps, verticalMps: landing.verticalMps, backSpinRadS: -landing.backSpinRadS }, GROUND_FIRMNESS_PARAMETERS.normal);
      expect(back.horizontalMps).toBeCloseTo(-forward.horizontalMps, 10);
      expect(back.verticalMps).toBeCloseTo(forward.verticalMps, 10);
      expect(back.backSpinRadS).toBeCloseTo(-forward.backSpinRadS, 8);
    }
  });
});

// A ball coming straight down has no forward side: the crater is level, so without spin it
// bounces straight up, with back spin it kicks back and with top spin forward (Cross 2002).
describe('turfBounce of a ball coming straight down', () => {
  it('turfBounce of a vertical landing bounces straight up without spin, back with back spin, forward with top spin', () => {
    const normal = GROUND_FIRMNESS_PARAMETERS.normal;
    const still = turfBounce({ horizontalMps: 0, verticalMps: -12, backSpinRadS: 0 }, normal);
    expect(still.horizontalMps).toBe(0);
    expect(still.verticalMps).toBeCloseTo(12 * penner(12), 12);
    expect(turfBounce({ horizontalMps: 0, verticalMps: -12, backSpinRadS: 400 }, normal).horizontalMps).toBeLessThan(0);
    expect(turfBounce({ horizontalMps: 0, verticalMps: -12, backSpinRadS: -400 }, normal).horizontalMps).toBeGreaterThan(0);
  });
});

// Between bounces the ball hops without air: a projectile that covers 2·vx·vy/g and comes down
// with its vertical speed reversed (Halliday, Resnick & Walker, "Fundamentals of Physics", 10th ed.,
// 2014, §4-6); once a bounce leaves slower than 0.5 m/s upward (the model's stated switch), it
// rolls from (5·vx − 2·r·ω)/7, the rolling speed with the same angular momentum about the contact
// point (Cross 2002).
describe('groundRun as bounces and a roll', () => {
  it.each([
    ['firm', { horizontalMps: 18, verticalMps: -16, backSpinRadS: 150 }],
    ['normal', { horizontalMps: 24, verticalMps: -12, backSpinRadS: 250 }],
    ['soft', { horizontalMps: 9, verticalMps: -19, backSpinRadS: 700 }],
  ] as const)('groundRun on %s ground adds projectile hops and the rolling distance', (firmness, landing) => {
    const ground = GROUND_FIRMNESS_PARAMETERS[firmness];
    let state: GroundLanding = landing;
    let hops = 0;
    let bounces = 0;
    for (;;) {
      bounces += 1;
      const out = turfBounce(state, ground);
      if (out.verticalMps < 0.5) {
        state = out;
        break;
      }
      hops += (2 * out.horizontalMps * out.verticalMps) / STANDARD_GRAVITY_MPS2;
      state = { ...out, verticalMps: -out.verticalMps };
    }
    const rolling = (5 * state.horizontalMps - 2 * R * state.backSpinRadS) / 7;
    const run = groundRun(landing, firmness);
    expect(run.bounces).toBe(bounces);
    expect(run.bounceM).toBeCloseTo(hops, 9);
    expect(run.runM).toBeCloseTo(hops + Math.sign(rolling) * rollDistanceM(Math.abs(rolling), ground.rollingDecelerationMps2), 9);
    if (firmness !== 'soft') expect(bounces).toBeGreaterThan(1);
  });

  // The stated bound, O(bounces) ≤ 12: a ball skimming in at 21 m/s and 4° on soft ground is
  // thrown up by its crater again and again (13 bounces before it would roll), and the run stops
  // counting at twelve.
  it('groundRun stops at twelve bounces', () => {
    expect(groundRun({ horizontalMps: 21, verticalMps: -1.5, backSpinRadS: 0 }, 'soft').bounces).toBe(12);
  });
  it('groundRun names what it refuses', () => {
    expect(() => groundRun({ horizontalMps: 10, verticalMps: 0, backSpinRadS: 0 })).toThrow('vertical landing speed 0 m/s is not downward');
    expect(() => groundRun({ horizontalMps: 10, verticalMps: -3, backSpinRadS: Number.POSITIVE_INFINITY })).toThrow('landing values must be finite');
    expect(() => groundRun({ horizontalMps: 10, verticalMps: -3, backSpinRadS: 0 }, 'icy' as never)).toThrow('ground firmness "icy" is not soft, normal or firm');
  });
});
