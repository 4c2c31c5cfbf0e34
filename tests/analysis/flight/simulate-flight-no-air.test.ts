import { BALL_RADIUS_M, SPIN_DECAY_COEFFICIENT, STANDARD_GRAVITY_MPS2, simulateFlight } from '@/analysis/flight';
import { noAir, projectileRangeM } from '@/tests/support/no-air';

const G = STANDARD_GRAVITY_MPS2;
const DEG = Math.PI / 180;

describe('simulateFlight without drag or lift (closed forms)', () => {
  // The textbook projectile (Halliday, Resnick & Walker, "Fundamentals of Physics", 10th ed., 2014,
  // §4-6): range v²·sin 2θ/g, apex (v·sin θ)²/2g, flight time 2v·sin θ/g, landing at the launch
  // angle and speed. Its path length is L = (v²/g)·[sin θ + cos²θ·ln((1 + sin θ)/cos θ)] (the arc
  // length of the parabola). Spin decays as dω/dt = −(c/R)·v·ω (Smits & Smith 1994, as quoted by
  // A. M. Nathan, 2008), so after the flight ω = ω₀·exp(−c·L/R), whatever the speed along the way.
  it('simulateFlight without air lands where the projectile does, with the spin decayed over its path length', () => {
    const v = 40;
    const th = 30 * DEG;
    const f = simulateFlight({ ballSpeedMps: v, launchAngleDeg: 30, spinRateRpm: 3000 }, {}, { model: noAir });
    expect(f.carryM).toBeCloseTo(projectileRangeM(v, 30), 8);
    expect(f.offlineM).toBeCloseTo(0, 10);
    expect(f.apexHeightM).toBeCloseTo((v * Math.sin(th)) ** 2 / (2 * G), 8);
    expect(f.flightTimeS).toBeCloseTo((2 * v * Math.sin(th)) / G, 9);
    expect(f.descentAngleDeg).toBeCloseTo(30, 8);
    expect(f.landingSpeedMps).toBeCloseTo(v, 8);
    const pathM = ((v * v) / G) * (Math.sin(th) + Math.cos(th) ** 2 * Math.log((1 + Math.sin(th)) / Math.cos(th)));
    expect(f.landingSpinRpm / (3000 * Math.exp((-SPIN_DECAY_COEFFICIENT * pathM) / BALL_RADIUS_M)) - 1).toBeCloseTo(0, 7);
    expect(f.totalM).toBeCloseTo(f.carryM + f.rollM, 10);
  });

  // Only the spin about the horizontal axis across the ball's heading acts on the ground (the
  // model's stated assumption, simulate-flight.ts): with the axis tilted 60°, that is cos 60° = ½ of
  // it, so the run equals that of a ball with half the spin and an upright axis. Without lift the
  // flight does not depend on the spin, and the spin decays in proportion.
  it('simulateFlight without air runs a ball with its axis tilted 60° as one with half the spin', () => {
    const launch = { ballSpeedMps: 40, launchAngleDeg: 30 };
    const tilted = simulateFlight({ ...launch, spinRateRpm: 6000, spinAxisDeg: 60 }, {}, { model: noAir });
    const upright = simulateFlight({ ...launch, spinRateRpm: 3000 }, {}, { model: noAir });
    expect(tilted.rollM).toBeCloseTo(upright.rollM, 9);
    expect(tilted.rollM).not.toBeCloseTo(simulateFlight({ ...launch, spinRateRpm: 6000 }, {}, { model: noAir }).rollM, 2);
  });

  it('simulateFlight of a ball launched level or downward has no flight and no run', () => {
    for (const launchAngleDeg of [0, -4]) {
      const f = simulateFlight({ ballSpeedMps: 30, launchAngleDeg, spinRateRpm: 3000 });
      expect([f.carryM, f.flightTimeS, f.rollM, f.totalM]).toEqual([0, 0, 0, 0]);
    }
  });

  it('simulateFlight without air of a ball hit straight up comes down where it started, with a finite run', () => {
    const f = simulateFlight({ ballSpeedMps: 20, launchAngleDeg: 90, spinRateRpm: 3000 }, {}, { model: noAir });
    expect(Math.abs(f.carryM)).toBeLessThan(1e-9);
    expect(f.flightTimeS).toBeCloseTo(40 / G, 9);
    expect(Number.isFinite(f.rollM)).toBe(true);
  });
});

// Still air is the same in every direction: a straight shot started φ to the right is the same
// shot turned by φ about the vertical, so it carries carry₀·cos φ along the target line and
// carry₀·sin φ to the right of it, and its run along the line is run₀·cos φ.
describe('simulateFlight in still air turned about the vertical', () => {
  it.each([7, -20, 45])('simulateFlight started %d° off line is the straight shot turned by that angle', (phi) => {
    const shot = { ballSpeedMps: 60, launchAngleDeg: 14, spinRateRpm: 4500 };
    const straight = simulateFlight(shot);
    const turned = simulateFlight({ ...shot, launchDirectionDeg: phi });
    expect(turned.carryM).toBeCloseTo(straight.carryM * Math.cos(phi * DEG), 8);
    expect(turned.offlineM).toBeCloseTo(straight.carryM * Math.sin(phi * DEG), 8);
    expect(turned.rollM).toBeCloseTo(straight.rollM * Math.cos(phi * DEG), 8);
    expect(turned.landingSpinRpm).toBeCloseTo(straight.landingSpinRpm, 7);
  });
});
