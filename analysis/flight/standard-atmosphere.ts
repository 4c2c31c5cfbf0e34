/**
 * ISO 2533:1975 / ICAO standard atmosphere, troposphere (geopotential altitude up to 11 000 m).
 * Sea level 288.15 K, 101 325 Pa; lapse rate 0.0065 K/m; specific gas constant of dry air
 * 287.05287 J/(kg·K); pressure exponent g0/(R·L) = 5.255880.
 */

import { STANDARD_GRAVITY_MPS2 } from './constants';

export const ISA_SEA_LEVEL_TEMPERATURE_K = 288.15;
export const ISA_SEA_LEVEL_PRESSURE_PA = 101325;
export const ISA_LAPSE_RATE_K_PER_M = 0.0065;
export const ISA_GAS_CONSTANT_J_PER_KG_K = 287.05287;
const PRESSURE_EXPONENT = STANDARD_GRAVITY_MPS2 / (ISA_GAS_CONSTANT_J_PER_KG_K * ISA_LAPSE_RATE_K_PER_M);
const TROPOPAUSE_M = 11000;
const LOWEST_M = -5000;

function checkAltitude(altitudeM: number): void {
  if (!Number.isFinite(altitudeM) || altitudeM < LOWEST_M || altitudeM > TROPOPAUSE_M) {
    throw new RangeError(`altitude ${altitudeM} m is outside the troposphere model (${LOWEST_M}–${TROPOPAUSE_M} m)`);
  }
}

/**
 * Standard-atmosphere temperature (K) at a geopotential altitude. O(1).
 * https://en.wikipedia.org/wiki/International_Standard_Atmosphere
 * @throws RangeError when the altitude is outside −5000…11 000 m
 * @example isaTemperatureK(1000) // => 281.65
 */
export function isaTemperatureK(altitudeM: number): number {
  checkAltitude(altitudeM);
  return ISA_SEA_LEVEL_TEMPERATURE_K - ISA_LAPSE_RATE_K_PER_M * altitudeM;
}

/**
 * Standard-atmosphere pressure (Pa) at a geopotential altitude. O(1).
 * https://en.wikipedia.org/wiki/Barometric_formula
 * @throws RangeError when the altitude is outside −5000…11 000 m
 * @example isaPressurePa(1000) // => 89874.6
 */
export function isaPressurePa(altitudeM: number): number {
  const temperatureK = isaTemperatureK(altitudeM);
  return ISA_SEA_LEVEL_PRESSURE_PA * Math.pow(temperatureK / ISA_SEA_LEVEL_TEMPERATURE_K, PRESSURE_EXPONENT);
}

/**
 * Standard-atmosphere (dry) air density (kg/m³) at a geopotential altitude: p / (R·T). O(1).
 * @throws RangeError when the altitude is outside −5000…11 000 m
 * @example isaDensityKgM3(0) // => 1.225
 */
export function isaDensityKgM3(altitudeM: number): number {
  return isaPressurePa(altitudeM) / (ISA_GAS_CONSTANT_J_PER_KG_K * isaTemperatureK(altitudeM));
}
