/**
 * Density of moist air by the CIPM-2007 equation: Picard, Davis, Gläser & Fujii, "Revised
 * formula for the density of moist air (CIPM-2007)", Metrologia 45:149–155 (2008).
 * ρ = p·Ma/(Z·R·T) · [1 − xv·(1 − Mv/Ma)], with the enhancement factor f, the saturation
 * vapour pressure psv and the compressibility factor Z of that paper. Its stated validity is
 * 600–1100 hPa and 15–27 °C; outside that range it is used as a smooth extrapolation (golf is
 * played from about 0 to 40 °C, where the error of the extrapolation is far below what matters
 * for a ball's flight).
 */

const R_J_PER_MOL_K = 8.314472;
const MOLAR_MASS_WATER_KG_PER_MOL = 18.01528e-3;
const A = 1.2378847e-5;
const B = -1.9121316e-2;
const C = 33.93711047;
const D = -6.3431645e3;
const ALPHA = 1.00062;
const BETA = 3.14e-8;
const GAMMA = 5.6e-7;
const A0 = 1.58123e-6;
const A1 = -2.9331e-8;
const A2 = 1.1043e-10;
const B0 = 5.707e-6;
const B1 = -2.051e-8;
const C0 = 1.9898e-4;
const C1 = -2.376e-6;
const D_Z = 1.83e-11;
const E_Z = -0.765e-8;

/** Default CO₂ mole fraction of CIPM-2007's reference air. */
export const DEFAULT_CO2_MOLE_FRACTION = 0.0004;

/**
 * Saturation vapour pressure of water over a plane surface (Pa), CIPM-2007 form. O(1).
 * https://doi.org/10.1088/0026-1394/45/2/004
 * @throws RangeError when the temperature is not a positive finite number of kelvins
 * @example saturationVapourPressurePa(293.15) // => 2339.16
 */
export function saturationVapourPressurePa(temperatureK: number): number {
  if (!(temperatureK > 0) || !Number.isFinite(temperatureK)) throw new RangeError(`temperature ${temperatureK} K is not valid`);
  const t = temperatureK;
  return Math.exp(A * t * t + B * t + C + D / t);
}

/**
 * Density of moist air (kg/m³) from temperature, pressure, relative humidity and CO₂ mole
 * fraction, by CIPM-2007. O(1).
 * https://doi.org/10.1088/0026-1394/45/2/004
 * @throws RangeError when a value is not finite, the pressure is not positive or the humidity
 *   is outside 0–100 %
 * @example moistAirDensityKgM3(293.15, 101325, 50) // => 1.19931
 */
export function moistAirDensityKgM3(
  temperatureK: number,
  pressurePa: number,
  humidityPct: number,
  co2MoleFraction: number = DEFAULT_CO2_MOLE_FRACTION,
): number {
  if (!(pressurePa > 0) || !Number.isFinite(pressurePa)) throw new RangeError(`pressure ${pressurePa} Pa is not valid`);
  if (!(humidityPct >= 0 && humidityPct <= 100)) throw new RangeError(`humidity ${humidityPct} % is outside 0–100 %`);
  if (!(co2MoleFraction >= 0 && co2MoleFraction < 0.01)) throw new RangeError(`CO2 mole fraction ${co2MoleFraction} is not valid`);
  const t = temperatureK - 273.15;
  const molarMassAir = (28.96546 + 12.011 * (co2MoleFraction - 0.0004)) * 1e-3;
  const enhancement = ALPHA + BETA * pressurePa + GAMMA * t * t;
  const xv = ((humidityPct / 100) * enhancement * saturationVapourPressurePa(temperatureK)) / pressurePa;
  const pOverT = pressurePa / temperatureK;
  const z =
    1 -
    pOverT * (A0 + A1 * t + A2 * t * t + (B0 + B1 * t) * xv + (C0 + C1 * t) * xv * xv) +
    pOverT * pOverT * (D_Z + E_Z * xv * xv);
  return ((pressurePa * molarMassAir) / (z * R_J_PER_MOL_K * temperatureK)) * (1 - xv * (1 - MOLAR_MASS_WATER_KG_PER_MOL / molarMassAir));
}
