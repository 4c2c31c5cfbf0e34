/**
 * The flight model's edges: sideways motion against a closed form, the ranges each published
 * formula is stated for, and bad input refused with its value named.
 */
import {
  BALL_AREA_M2,
  BALL_MASS_KG,
  ballForces,
  GRASS_ROUGHNESS_M,
  integrateTrajectory,
  launchVectors,
  modernBallDragCoefficient,
  modernBallLiftCoefficient,
  resolveAir,
  WIND_REFERENCE_HEIGHT_M,
  type CoefficientModel,
  isaPressurePa,
  moistAirDensityKgM3,
  reynoldsNumber,
  saturationVapourPressurePa,
  spinDecayTimeConstantS,
  STANDARD_GRAVITY_MPS2,
  sutherlandViscosityPaS,
  windProfileFactor,
  type ForceModel,
} from '@/analysis/flight';

const G = STANDARD_GRAVITY_MPS2;

describe('integrateTrajectory sideways', () => {
  // Linear drag −k·v on every axis: the sideways motion is uncoupled, z(t) = (v0z/k)(1 − e^(−kt)) and
  // vz(t) = v0z·e^(−kt) (closed form of dv/dt = −k·v).
  const k = 0.08;
  const linearDrag: ForceModel = {
    derivative(_h, vx, vy, vz, _spin, out) {
      out[0] = -k * vx;
      out[1] = -G - k * vy;
      out[2] = -k * vz;
      out[3] = 0;
    },
  };

  it('lands as far sideways, and as fast sideways, as the closed form of linear drag says', () => {
    const r = integrateTrajectory(linearDrag, { vxMps: 55, vyMps: 14, vzMps: 6 });
    const T = r.flightTimeS;
    expect(r.zM).toBeCloseTo((6 / k) * (1 - Math.exp(-k * T)), 4);
    expect(r.landingVzMps).toBeCloseTo(6 * Math.exp(-k * T), 4);
  });

  it('a constant sideways push lands ½·a·T² off line with a·T sideways speed (uniform acceleration)', () => {
    const push: ForceModel = {
      derivative(_h, _vx, _vy, _vz, _spin, out) {
        out[0] = 0;
        out[1] = -G;
        out[2] = 1.5;
        out[3] = 0;
      },
    };
    const r = integrateTrajectory(push, { vxMps: 40, vyMps: 20, vzMps: 0 });
    const T = (2 * 20) / G;
    expect(r.flightTimeS).toBeCloseTo(T, 9);
    expect(r.zM).toBeCloseTo(0.5 * 1.5 * T * T, 9);
    expect(r.landingVzMps).toBeCloseTo(1.5 * T, 9);
  });

  it('a time limit that is not positive is refused with its value', () => {
    const still: ForceModel = { derivative: (_h, _vx, _vy, _vz, _s, out) => out.fill(0) };
    expect(() => integrateTrajectory(still, { vxMps: 1, vyMps: 1, vzMps: 0 }, { maxTimeS: 0 })).toThrow('time limit 0 s is not positive');
    expect(() => integrateTrajectory(still, { vxMps: 1, vyMps: 1, vzMps: 0 }, { stepS: -1 })).toThrow('step -1 s is not positive');
  });
});

describe('ballForces and the wind', () => {
  const constant: CoefficientModel = { name: 'constant', source: 'test', dragCoefficient: () => 0.25, liftCoefficient: () => 0 };
  const axis = { x: 0, y: 0, z: 1 };

  it('a ball at rest in the air feels gravity alone (no air speed, no drag, no lift, no spin decay)', () => {
    const out = new Float64Array(4);
    ballForces(resolveAir(), constant, axis).derivative(5, 0, 0, 0, 300, out);
    expect([...out]).toEqual([0, -G, 0, 0]);
  });

  it('a wind straight from the right pushes the ball left with the log-profile share at its height (EPA-454/R-99-005, 2000)', () => {
    // Wind from the right (fromDeg 90) blows toward −z. At 20 m the wind is ln(20/z0)/ln(10/z0) of
    // the reference speed (logarithmic profile, z0 = 0.03 m, reference 10 m); the air moves past a
    // ball flying straight at 50 m/s with a sideways part +5·share, and drag acts against it.
    // (The air is given with the sideways part alone: cos 90° is 6·10⁻¹⁷ in floating point, not 0.)
    const air = { ...resolveAir(), windXMps: 0, windZMps: -5 };
    const share = Math.log(20 / GRASS_ROUGHNESS_M) / Math.log(WIND_REFERENCE_HEIGHT_M / GRASS_ROUGHNESS_M);
    const uz = 5 * share;
    const k = (air.densityKgM3 * BALL_AREA_M2) / (2 * BALL_MASS_KG);
    const out = new Float64Array(4);
    ballForces(air, constant, axis).derivative(20, 50, 0, 0, 0, out);
    expect(out[2]).toBeCloseTo(-k * 0.25 * Math.hypot(50, uz) * uz, 10);
    expect(out[0]).toBeCloseTo(-k * 0.25 * Math.hypot(50, uz) * 50, 10);
  });

  it('at or below the roughness length there is no wind: the ball feels still air', () => {
    const still = new Float64Array(4);
    const windy = new Float64Array(4);
    ballForces(resolveAir(), constant, axis).derivative(0.02, 50, -3, 1, 0, still);
    ballForces(resolveAir({ wind: { speedMps: 8, fromDeg: 30 } }), constant, axis).derivative(0.02, 50, -3, 1, 0, windy);
    expect([...windy]).toEqual([...still]);
  });
});

describe('the lift force is the cross product of the spin axis and the air speed', () => {
  // The Magnus force points along ω̂ × u (right-hand rule): perpendicular to the air speed and to the
  // spin axis. With no drag, what the ball feels beyond gravity is k·|u|·CL·(ω̂ × u), every
  // component of the cross product written out: (ωy·uz − ωz·uy, ωz·ux − ωx·uz, ωx·uy − ωy·ux).
  it('for an axis and a velocity with all three components', () => {
    const liftOnly: CoefficientModel = { name: 'lift only', source: 'test', dragCoefficient: () => 0, liftCoefficient: () => 0.2 };
    const air = resolveAir();
    const k = (air.densityKgM3 * BALL_AREA_M2) / (2 * BALL_MASS_KG);
    const axis = { x: 0.2, y: 0.3, z: Math.sqrt(1 - 0.04 - 0.09) };
    const [ux, uy, uz] = [50, 12, -7];
    const out = new Float64Array(4);
    ballForces(air, liftOnly, axis).derivative(1, ux, uy, uz, 0, out);
    const f = k * Math.hypot(ux, uy, uz) * 0.2;
    expect(out[0]).toBeCloseTo(f * (axis.y * uz - axis.z * uy), 10);
    expect(out[1] + G).toBeCloseTo(f * (axis.z * ux - axis.x * uz), 10);
    expect(out[2]).toBeCloseTo(f * (axis.x * uy - axis.y * ux), 10);
    expect(out[0] * ux + (out[1] + G) * uy + out[2] * uz).toBeCloseTo(0, 9);
  });
});

describe('the modern ball below zero spin', () => {
  // The model is stated for S ≥ 0 (a spin ratio cannot be negative in flight: spin only decays);
  // the functions take S < 0 as 0: drag at its no-spin value, no lift.
  it('drag at S < 0 is the no-spin drag, lift is 0', () => {
    expect(modernBallDragCoefficient(-0.1, 1.5e5)).toBe(0.2);
    expect(modernBallDragCoefficient(-0.1, 4e4)).toBe(0.5);
    expect(modernBallLiftCoefficient(-0.1)).toBe(0);
  });
});

describe('the ranges the published formulas are stated for', () => {
  it('the troposphere of the standard atmosphere runs from −5,000 m to the tropopause at 11,000 m (ISO 2533:1975)', () => {
    // the tropopause of the standard atmosphere (ISO 2533:1975; ICAO Doc 7488): 22,632 Pa at 11,000 m (value from memory; the
    // closed form p0·(T11/T0)^(g0·M/(R·L)) with p0 = 101,325 Pa, T0 = 288.15 K, L = 0.0065 K/m gives it to the pascal)
    expect(isaPressurePa(11_000)).toBeCloseTo(22_632, -1);
    expect(Number.isFinite(isaPressurePa(-5_000))).toBe(true);
    expect(() => isaPressurePa(-5_001)).toThrow('altitude -5001 m is outside the troposphere model (-5000–11000 m)');
    expect(() => isaPressurePa(11_001)).toThrow(RangeError);
  });

  it('CIPM-2007 takes the CO2 mole fraction from 0 up to (not including) 0.01, and dry air\'s density follows its molar mass Ma = 28.96546 + 12.011·(xCO2 − 0.0004) g/mol', () => {
    // Picard, Davis, Gläser, Fujii, "Revised formula for the density of moist air (CIPM-2007)", Metrologia 45 (2008), eq. (A1.3):
    // for dry air xv = 0 and ρ = p·Ma/(Z·R·T), so the density ratio is the molar-mass ratio at the same T and p.
    const at = (xco2: number) => moistAirDensityKgM3(293.15, 101_325, 0, xco2);
    expect(at(0.0005) / at(0.0004)).toBeCloseTo((28.96546 + 12.011 * 0.0001) / 28.96546, 12);
    expect(at(0) / at(0.0004)).toBeCloseTo((28.96546 - 12.011 * 0.0004) / 28.96546, 12);
    expect(() => at(0.01)).toThrow('CO2 mole fraction 0.01 is not valid');
    expect(() => at(-0.0001)).toThrow(RangeError);
    expect(() => moistAirDensityKgM3(293.15, -1, 50)).toThrow('pressure -1 Pa is not valid');
    expect(() => moistAirDensityKgM3(293.15, 101_325, 101)).toThrow('humidity 101 % is outside 0–100 %');
    expect(() => moistAirDensityKgM3(293.15, 101_325, -1)).toThrow('humidity -1 % is outside 0–100 %');
  });

  it('the saturation vapour pressure needs a temperature above absolute zero', () => {
    expect(() => saturationVapourPressurePa(0)).toThrow('temperature 0 K is not valid');
    expect(() => saturationVapourPressurePa(Number.POSITIVE_INFINITY)).toThrow(RangeError);
    expect(() => saturationVapourPressurePa(Number.NaN)).toThrow(RangeError);
  });

  it('the wind profile needs a reference height above the roughness length, equal is refused', () => {
    expect(() => windProfileFactor(5, 0.03, 0.03)).toThrow('wind reference height 0.03 m is not above the roughness length');
    expect(() => windProfileFactor(5, -1)).toThrow('roughness length -1 m is not positive');
  });

  it('viscosity, Reynolds number and spin decay name the value they refuse', () => {
    expect(() => sutherlandViscosityPaS(-3)).toThrow(/-3 K/);
    expect(() => reynoldsNumber(1.2, 50, 0)).toThrow('viscosity 0 Pa·s is not positive');
    expect(() => spinDecayTimeConstantS(-2)).toThrow('speed -2 m/s is not positive');
  });
});

describe('air and launch values at the ends of their ranges', () => {
  // The air model takes −50 … 60 °C (our stated range, beyond any playable day), ends included.
  it('a temperature of −50 °C and of 60 °C is taken; just outside is refused with its value and the range', () => {
    expect(resolveAir({ temperatureC: -50 }).temperatureK).toBeCloseTo(223.15, 10);
    expect(resolveAir({ temperatureC: 60 }).temperatureK).toBeCloseTo(333.15, 10);
    expect(() => resolveAir({ temperatureC: -50.5 })).toThrow('temperature -50.5 °C is outside -50…60 °C');
    expect(() => resolveAir({ temperatureC: 60.5 })).toThrow('temperature 60.5 °C is outside -50…60 °C');
    expect(() => resolveAir({ wind: { speedMps: -1, fromDeg: 0 } })).toThrow('wind -1 m/s from 0° is not valid');
  });

  it('a ball at rest is a launch (speed 0 gives no velocity); a negative speed or spin, or a missing value, is refused by name', () => {
    const still = launchVectors({ ballSpeedMps: 0, launchAngleDeg: 12, spinRateRpm: 0 });
    expect([still.vxMps, still.vyMps, still.vzMps]).toEqual([0, 0, 0]);
    expect(() => launchVectors({ ballSpeedMps: -1, launchAngleDeg: 12, spinRateRpm: 0 })).toThrow('ball speed -1 m/s is negative');
    expect(() => launchVectors({ ballSpeedMps: 60, launchAngleDeg: 12, spinRateRpm: -5 })).toThrow('spin rate -5 rpm is negative');
    expect(() => launchVectors({ ballSpeedMps: 60, launchAngleDeg: Number.NaN, spinRateRpm: 0 })).toThrow('launch angle NaN is not a finite number');
  });
});
