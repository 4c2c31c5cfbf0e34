/**
 * The flight model's edges: sideways motion against a closed form, the ranges each published
 * formula is stated for, and bad input refused with its value named.
 */
import {
  integrateTrajectory,
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
