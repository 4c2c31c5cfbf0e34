import { integrateTrajectory, STANDARD_GRAVITY_MPS2, type ForceModel } from '@/analysis/flight';

const G = STANDARD_GRAVITY_MPS2;
const DEG = Math.PI / 180;

function start(speedMps: number, angleDeg: number) {
  return { vxMps: speedMps * Math.cos(angleDeg * DEG), vyMps: speedMps * Math.sin(angleDeg * DEG), vzMps: 0 };
}

/** Gravity only. */
const vacuum: ForceModel = {
  derivative(_h, _vx, _vy, _vz, _spin, out) {
    out[0] = 0;
    out[1] = -G;
    out[2] = 0;
    out[3] = 0;
  },
};

/**
 * Drag and lift proportional to speed (MacDonald & Hanzely, "The physics of the drive in golf",
 * Am. J. Phys. 59:213, 1991, after Erlichson 1983): dv/dt = −g·ŷ − k·v + κ·(ŷ-rotated v).
 */
function linearForces(k: number, kappa: number): ForceModel {
  return {
    derivative(_h, vx, vy, vz, _spin, out) {
      out[0] = -k * vx - kappa * vy;
      out[1] = -G - k * vy + kappa * vx;
      out[2] = -k * vz;
      out[3] = 0;
    },
  };
}

/** The linear model with a spin that decays as dω/dt = −ω/τ (closed form ω0·e^{−t/τ}). */
function linearForcesWithSpin(k: number, kappa: number, tauS: number): ForceModel {
  const linear = linearForces(k, kappa);
  return {
    derivative(h, vx, vy, vz, spin, out) {
      linear.derivative(h, vx, vy, vz, spin, out);
      out[3] = -spin / tauS;
    },
  };
}

/**
 * MacDonald & Hanzely (1991) closed form, in complex numbers: velocity w(t) = w∞ + (w0 − w∞)·e^{λt},
 * position z(t) = w∞·t + (w0 − w∞)·(e^{λt} − 1)/λ, λ = −k + iκ, w∞ = i·g/λ (g acting along −y).
 * The landing time is the root of Im z(t) = 0 after the apex, found here by bisection.
 */
function linearClosedForm(k: number, kappa: number, speedMps: number, angleDeg: number) {
  type C = [number, number];
  const mul = (a: C, b: C): C => [a[0] * b[0] - a[1] * b[1], a[0] * b[1] + a[1] * b[0]];
  const div = (a: C, b: C): C => {
    const d = b[0] * b[0] + b[1] * b[1];
    return [(a[0] * b[0] + a[1] * b[1]) / d, (a[1] * b[0] - a[0] * b[1]) / d];
  };
  const lambda: C = [-k, kappa];
  const wInf = div([0, G], lambda);
  const w0: C = [speedMps * Math.cos(angleDeg * DEG), speedMps * Math.sin(angleDeg * DEG)];
  const d0: C = [w0[0] - wInf[0], w0[1] - wInf[1]];
  const exp = (t: number): C => [Math.exp(-k * t) * Math.cos(kappa * t), Math.exp(-k * t) * Math.sin(kappa * t)];
  const velocity = (t: number): C => {
    const e = mul(d0, exp(t));
    return [wInf[0] + e[0], wInf[1] + e[1]];
  };
  const position = (t: number): C => {
    const e = exp(t);
    const p = div(mul(d0, [e[0] - 1, e[1]]), lambda);
    return [wInf[0] * t + p[0], wInf[1] * t + p[1]];
  };
  let lo = 1;
  let hi = 30;
  for (let i = 0; i < 200; i++) {
    const mid = (lo + hi) / 2;
    if (position(mid)[1] > 0) lo = mid;
    else hi = mid;
  }
  const t = (lo + hi) / 2;
  const [vx, vy] = velocity(t);
  return { flightTimeS: t, carryM: position(t)[0], vxMps: vx, vyMps: vy };
}

/** Quadratic drag with terminal speed vt: dv/dt = −g·ŷ − (g/vt²)·|v|·v. */
function quadraticDrag(terminalMps: number): ForceModel {
  const c = G / (terminalMps * terminalMps);
  return {
    derivative(_h, vx, vy, vz, _spin, out) {
      const speed = Math.sqrt(vx * vx + vy * vy + vz * vz);
      out[0] = -c * speed * vx;
      out[1] = -G - c * speed * vy;
      out[2] = -c * speed * vz;
      out[3] = 0;
    },
  };
}

describe('integrateTrajectory', () => {
  // Vacuum closed form (range v²·sin2θ/g, apex (v·sinθ)²/2g, flight 2·v·sinθ/g; any mechanics
  // text, e.g. Halliday, Resnick & Walker, "Fundamentals of Physics", projectile motion),
  // computed with standard gravity g = 9.80665 m/s² (NIST SP 811, 2008, Appendix B).
  it('integrateTrajectory in a vacuum matches the closed-form range, apex and flight time', () => {
    const result = integrateTrajectory(vacuum, start(70, 10));
    expect(result.xM).toBeCloseTo(170.894, 3);
    expect(result.apexHeightM).toBeCloseTo(7.5333, 4);
    expect(result.flightTimeS).toBeCloseTo(2.479, 4);
    expect(result.zM).toBe(0);
    expect(result.landingVyMps).toBeCloseTo(-70 * Math.sin(10 * DEG), 9);
  });

  // MacDonald & Hanzely, "The physics of the drive in golf", Am. J. Phys. 59:213 (1991), after
  // Erlichson (1983): closed form w(t) = w∞ + (w0 − w∞)·e^{λt}, λ = −k + iκ, w∞ = i·g/λ, with
  // k = 0.267373 s⁻¹, κ = 0.194136 s⁻¹ (ρ 1.225, m 45.93 g, d 42.67 mm); values computed from
  // that closed form.
  it('integrateTrajectory with linear drag and lift at 70 m/s, 10° matches the closed form', () => {
    const result = integrateTrajectory(linearForces(0.267373, 0.194136), start(70, 10));
    expect(result.flightTimeS).toBeCloseTo(6.7913, 3);
    expect(result.xM).toBeCloseTo(206.099, 2);
    expect(result.apexHeightM).toBeCloseTo(25.9, 2);
    expect(result.apexTimeS).toBeCloseTo(3.443, 2);
  });
  it('integrateTrajectory with linear drag and lift at 60 m/s, 12° matches the closed form', () => {
    const result = integrateTrajectory(linearForces(0.267373, 0.194136), start(60, 12));
    expect(result.flightTimeS).toBeCloseTo(5.9272, 3);
    expect(result.xM).toBeCloseTo(166.927, 2);
    expect(result.apexHeightM).toBeCloseTo(20.829, 2);
  });
  it('integrateTrajectory with linear forces keeps its accuracy when the step is halved', () => {
    const result = integrateTrajectory(linearForces(0.267373, 0.194136), start(70, 10), { stepS: 0.1 });
    expect(result.xM).toBeCloseTo(206.099, 2);
    expect(result.flightTimeS).toBeCloseTo(6.7913, 3);
  });

  // Vertical motion with quadratic drag (closed forms in e.g. Taylor, "Classical Mechanics",
  // 2005, §2.4). Fall from rest: v(t) = vt·tanh(g·t/vt), so
  // the height fallen is (vt²/g)·ln cosh(g·t/vt). Rise from v0: v(t) = vt·tan(atan(v0/vt) − g·t/vt),
  // so the apex is reached at (vt/g)·atan(v0/vt) at height (vt²/2g)·ln(1 + v0²/vt²) (integrated
  // from the same equation of motion). The fall from that apex lasts (vt/g)·acosh(e^{g·h/vt²}).
  it('integrateTrajectory straight up with quadratic drag matches the tanh closed forms', () => {
    const vt = 32;
    const v0 = 40;
    const result = integrateTrajectory(quadraticDrag(vt), { vxMps: 0, vyMps: v0, vzMps: 0 }, { stepS: 0.05, samplePath: true });
    const tUp = (vt / G) * Math.atan(v0 / vt);
    const apex = ((vt * vt) / (2 * G)) * Math.log(1 + (v0 * v0) / (vt * vt));
    const tDown = (vt / G) * Math.acosh(Math.exp((G * apex) / (vt * vt)));
    expect(result.apexTimeS).toBeCloseTo(tUp, 5);
    expect(result.apexHeightM).toBeCloseTo(apex, 4);
    expect(result.flightTimeS).toBeCloseTo(tUp + tDown, 4);
    expect(-result.landingVyMps).toBeCloseTo(vt * Math.tanh((G * tDown) / vt), 4);
    expect(result.xM).toBe(0);
    const falling = result.path!.filter((p) => p.timeS > tUp + 0.5 && p.yM > 0);
    expect(falling.length).toBeGreaterThan(10);
    for (const p of falling) {
      const fallenM = ((vt * vt) / G) * Math.log(Math.cosh((G * (p.timeS - tUp)) / vt));
      expect(p.yM).toBeCloseTo(apex - fallenM, 4);
    }
  });

  // Landing values against the closed forms (the landing must be interpolated inside the step:
  // the values at the end of the step are up to one step late, e.g. 0.2 s × 9.8 m/s² ≈ 2 m/s in
  // vertical speed, which these checks would catch).
  it.each([
    [70, 10],
    [45, 25],
    [60, 33],
  ])('integrateTrajectory in a vacuum at %d m/s, %d° lands with the closed-form descent, speed and time', (speed, angle) => {
    const result = integrateTrajectory(vacuum, start(speed, angle));
    // Vacuum: the ball lands at the launch speed, at the launch angle, after 2·v·sinθ/g.
    expect(result.flightTimeS).toBeCloseTo((2 * speed * Math.sin(angle * DEG)) / G, 6);
    expect(Math.atan2(-result.landingVyMps, result.landingVxMps) / DEG).toBeCloseTo(angle, 4);
    expect(Math.hypot(result.landingVxMps, result.landingVyMps)).toBeCloseTo(speed, 4);
  });
  it.each([
    [70, 10],
    [60, 12],
    [50, 20],
  ])('integrateTrajectory with linear drag and lift at %d m/s, %d° lands with the closed-form velocity and spin', (speed, angle) => {
    const k = 0.267373;
    const kappa = 0.194136;
    const tauS = 20;
    const closed = linearClosedForm(k, kappa, speed, angle);
    const result = integrateTrajectory(linearForcesWithSpin(k, kappa, tauS), { ...start(speed, angle), spin: 300 });
    expect(result.flightTimeS).toBeCloseTo(closed.flightTimeS, 4);
    expect(result.xM).toBeCloseTo(closed.carryM, 2);
    const descentDeg = Math.atan2(-result.landingVyMps, result.landingVxMps) / DEG;
    expect(descentDeg).toBeCloseTo(Math.atan2(-closed.vyMps, closed.vxMps) / DEG, 3);
    expect(Math.hypot(result.landingVxMps, result.landingVyMps)).toBeCloseTo(Math.hypot(closed.vxMps, closed.vyMps), 3);
    expect(result.landingSpin).toBeCloseTo(300 * Math.exp(-closed.flightTimeS / tauS), 3);
  });
  it('integrateTrajectory passes the height to the forces at every stage (a force growing with height)', () => {
    // Vertical deceleration proportional to height, y'' = −g − c·y: a closed form exists for the
    // rise and fall, y(t) = (v0/ω)·sin ωt + (g/ω²)(cos ωt − 1), ω = √c; lands at the root after 0.
    const c = 0.5;
    const omega = Math.sqrt(c);
    const spring: ForceModel = {
      derivative(h, _vx, _vy, _vz, _spin, out) {
        out[0] = 0;
        out[1] = -G - c * h;
        out[2] = 0;
        out[3] = 0;
      },
    };
    const v0 = 20;
    const y = (t: number) => (v0 / omega) * Math.sin(omega * t) + (G / (omega * omega)) * (Math.cos(omega * t) - 1);
    let lo = 0.5;
    let hi = 10;
    for (let i = 0; i < 200; i++) {
      const mid = (lo + hi) / 2;
      if (y(mid) > 0) lo = mid;
      else hi = mid;
    }
    const result = integrateTrajectory(spring, { vxMps: 0, vyMps: v0, vzMps: 0 }, { stepS: 0.05 });
    expect(result.flightTimeS).toBeCloseTo((lo + hi) / 2, 5);
  });

  it('integrateTrajectory with samplePath off returns no path', () => {
    expect(integrateTrajectory(vacuum, start(50, 20)).path).toBeUndefined();
  });
  it('integrateTrajectory with a level or downward start lands at once', () => {
    const result = integrateTrajectory(vacuum, start(50, -3));
    expect(result.xM).toBe(0);
    expect(result.flightTimeS).toBe(0);
    for (const angle of [-3, 0]) {
      const still = integrateTrajectory(vacuum, start(50, angle), { samplePath: true });
      expect(still.path).toEqual([{ timeS: 0, xM: 0, yM: 0, zM: 0 }]);
      expect(still.apexHeightM).toBe(0);
      expect(still.landingVyMps).toBe(start(50, angle).vyMps);
    }
  });
  it('integrateTrajectory with a step that is not positive throws', () => {
    expect(() => integrateTrajectory(vacuum, start(50, 20), { stepS: 0 })).toThrow(RangeError);
  });
  // y = 3t − 4t² (a constant 8 m/s² down, 3 m/s up) with a 0.375 s step: every number of RK4 is
  // a short binary fraction (h/6 = 1/16), so the apex falls exactly on the end of the first step
  // (0.5625 m at 0.375 s) and the landing exactly on the end of the second (0.75 s). Each must be
  // found once, at the step's end, and the landing must not repeat the point before it.
  const binary: ForceModel = {
    derivative(_h, _vx, _vy, _vz, _spin, out) {
      out[0] = 0;
      out[1] = -8;
      out[2] = 0;
      out[3] = 0;
    },
  };
  it('integrateTrajectory with the apex and the landing exactly on step ends finds each once', () => {
    const r = integrateTrajectory(binary, { vxMps: 2, vyMps: 3, vzMps: 0 }, { stepS: 0.375, samplePath: true });
    expect(r.apexHeightM).toBe(0.5625);
    expect(r.apexTimeS).toBe(0.375);
    expect(r.flightTimeS).toBe(0.75);
    expect(r.xM).toBe(1.5);
    expect(r.landingVyMps).toBe(-3);
    expect(r.path!.map((p) => p.timeS)).toEqual([0, 0.375, 0.75]);
  });
  it('integrateTrajectory still in the air when the time limit ends a step throws; one step more lands', () => {
    expect(() => integrateTrajectory(binary, { vxMps: 2, vyMps: 3, vzMps: 0 }, { stepS: 0.375, maxTimeS: 0.375 })).toThrow(/not landed after 0.375 s/);
    expect(integrateTrajectory(binary, { vxMps: 2, vyMps: 3, vzMps: 0 }, { stepS: 0.375, maxTimeS: 0.75 }).flightTimeS).toBe(0.75);
  });
  it('integrateTrajectory that never comes down throws', () => {
    const hover: ForceModel = { derivative: (_h, _a, _b, _c, _d, out) => out.fill(0) };
    expect(() => integrateTrajectory(hover, start(50, 20), { maxTimeS: 5 })).toThrow(/not landed/);
  });
});

describe('integrateTrajectory in a vacuum', () => {
  // Under gravity alone the path is a parabola: RK4 integrates a constant acceleration exactly and a
  // cubic Hermite segment reproduces a quadratic exactly, so the landing and the apex placed inside
  // their step must agree with the textbook closed forms to rounding: range v²·sin 2θ / g, flight
  // time 2·v·sin θ / g, apex height (v·sin θ)² / 2g at half the flight time, landing speed
  // −v·sin θ upward. A root finder that stops short, or interpolates with a wrong slope, is off by
  // more than 5·10⁻¹⁰.
  it.each([
    [70, 10, 0.2],
    [60, 45, 0.2],
    [40, 30, 0.13],
    [70, 10, 0.01],
    [75, 12, 0.2],
    [30, 60, 0.2],
  ])('%d m/s at %d° with a %d s step lands where the closed forms say, to 5e-10', (speed, deg, stepS) => {
    const th = deg * DEG;
    const vy = speed * Math.sin(th);
    const r = integrateTrajectory(vacuum, start(speed, deg), { stepS });
    const T = (2 * vy) / G;
    expect(Math.abs(r.xM - (speed * speed * Math.sin(2 * th)) / G)).toBeLessThan(5e-10);
    expect(Math.abs(r.flightTimeS - T)).toBeLessThan(5e-10);
    expect(Math.abs(r.apexHeightM - (vy * vy) / (2 * G))).toBeLessThan(5e-10);
    expect(Math.abs(r.apexTimeS - T / 2)).toBeLessThan(5e-10);
    expect(Math.abs(r.landingVyMps + vy)).toBeLessThan(5e-10);
  });
});
