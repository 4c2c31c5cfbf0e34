import { integrateTrajectory, STANDARD_GRAVITY_MPS2, type ForceModel } from '@/analysis/flight';

const G = STANDARD_GRAVITY_MPS2;
const DEG = Math.PI / 180;

function start(speedMps: number, angleDeg: number) {
  return { vxMps: speedMps * Math.cos(angleDeg * DEG), vyMps: speedMps * Math.sin(angleDeg * DEG), vzMps: 0 };
}

/** Gravity only. */
const vacuum: ForceModel = {
  derivative(_vx, _vy, _vz, _spin, out) {
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
    derivative(vx, vy, vz, _spin, out) {
      out[0] = -k * vx - kappa * vy;
      out[1] = -G - k * vy + kappa * vx;
      out[2] = -k * vz;
      out[3] = 0;
    },
  };
}

/** Quadratic drag with terminal speed vt: dv/dt = −g·ŷ − (g/vt²)·|v|·v. */
function quadraticDrag(terminalMps: number): ForceModel {
  const c = G / (terminalMps * terminalMps);
  return {
    derivative(vx, vy, vz, _spin, out) {
      const speed = Math.sqrt(vx * vx + vy * vy + vz * vz);
      out[0] = -c * speed * vx;
      out[1] = -G - c * speed * vy;
      out[2] = -c * speed * vz;
      out[3] = 0;
    },
  };
}

describe('integrateTrajectory', () => {
  // CHECKS.md, "Ball flight": vacuum closed form (range v²·sin2θ/g, apex (v·sinθ)²/2g,
  // flight 2·v·sinθ/g), computed with g = 9.80665 (NIST SP 811).
  it('integrateTrajectory in a vacuum matches the closed-form range, apex and flight time', () => {
    const result = integrateTrajectory(vacuum, start(70, 10));
    expect(result.xM).toBeCloseTo(170.894, 3);
    expect(result.apexHeightM).toBeCloseTo(7.5333, 4);
    expect(result.flightTimeS).toBeCloseTo(2.479, 4);
    expect(result.zM).toBe(0);
    expect(result.landingVyMps).toBeCloseTo(-70 * Math.sin(10 * DEG), 9);
  });

  // MacDonald & Hanzely (Am. J. Phys. 59:213, 1991), closed form w(t) = w∞ + (w0 − w∞)·e^{λt},
  // λ = −k + iκ, w∞ = i·g/λ, with k = 0.267373 s⁻¹, κ = 0.194136 s⁻¹ (values in CHECKS.md,
  // computed from the closed form).
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

  // Vertical motion with quadratic drag. Fall from rest: v(t) = vt·tanh(g·t/vt) (CHECKS.md), so
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

  it('integrateTrajectory with samplePath off returns no path', () => {
    expect(integrateTrajectory(vacuum, start(50, 20)).path).toBeUndefined();
  });
  it('integrateTrajectory with a level or downward start lands at once', () => {
    const result = integrateTrajectory(vacuum, start(50, -3));
    expect(result.xM).toBe(0);
    expect(result.flightTimeS).toBe(0);
  });
  it('integrateTrajectory with a step that is not positive throws', () => {
    expect(() => integrateTrajectory(vacuum, start(50, 20), { stepS: 0 })).toThrow(RangeError);
  });
  it('integrateTrajectory that never comes down throws', () => {
    const hover: ForceModel = { derivative: (_a, _b, _c, _d, out) => out.fill(0) };
    expect(() => integrateTrajectory(hover, start(50, 20), { maxTimeS: 5 })).toThrow(/not landed/);
  });
});
