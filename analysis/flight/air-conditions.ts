import { sutherlandViscosityPaS } from './air-viscosity';
import { RAD_PER_DEG } from './constants';
import { moistAirDensityKgM3 } from './moist-air-density';
import { isaPressurePa, isaTemperatureK } from './standard-atmosphere';
import { GRASS_ROUGHNESS_M, WIND_REFERENCE_HEIGHT_M, windProfileFactor } from './wind-profile';

/**
 * Wind, as measured at `referenceHeightM` above the ground (default 10 m, the standard height of
 * surface wind), growing with height by the logarithmic profile of wind-profile.ts over ground
 * of roughness length `roughnessM` (default 0.03 m, open grass).
 * `fromDeg` is where the wind comes from, seen from the player facing the target:
 * 0 = from the target toward the player (headwind), 90 = from the right, 180 = from behind
 * (tailwind), 270 = from the left.
 */
export interface Wind {
  speedMps: number;
  fromDeg: number;
  referenceHeightM?: number;
  roughnessM?: number;
}

/**
 * The air a ball flies through. Every field is optional:
 * - `altitudeM` defaults to 0 (sea level);
 * - `pressurePa` defaults to the ISO 2533 standard pressure at `altitudeM` (station pressure);
 * - `temperatureC` defaults to the ISO 2533 standard temperature at `altitudeM` (15 °C at sea level);
 * - `humidityPct` (relative humidity) defaults to 0 (dry, as the standard atmosphere);
 * - `wind` defaults to still air.
 */
export interface AirConditions {
  temperatureC?: number;
  altitudeM?: number;
  pressurePa?: number;
  humidityPct?: number;
  wind?: Wind;
}

/** Air conditions with every value resolved, and the derived density and viscosity. */
export interface ResolvedAir {
  temperatureK: number;
  pressurePa: number;
  humidityPct: number;
  densityKgM3: number;
  viscosityPaS: number;
  /** Air velocity at the reference height in the flight frame (x toward the target, z right), m/s. */
  windXMps: number;
  windZMps: number;
  /** Roughness length and reference height of the wind profile (m). */
  windRoughnessM: number;
  windReferenceHeightM: number;
}

const MIN_TEMPERATURE_C = -50;
const MAX_TEMPERATURE_C = 60;

/**
 * Resolve air conditions: fill defaults, then density by CIPM-2007 (moist air) and viscosity by
 * Sutherland's law. O(1).
 * @throws RangeError when a value is out of range (temperature −50…60 °C, humidity 0–100 %,
 *   altitude −5000…11 000 m, pressure > 0, wind speed ≥ 0, wind reference height above the
 *   roughness length > 0) or not finite
 * @example resolveAir({ temperatureC: 20, humidityPct: 50 }).densityKgM3 // => 1.19931
 */
export function resolveAir(air: AirConditions = {}): ResolvedAir {
  const altitudeM = air.altitudeM ?? 0;
  const temperatureK = air.temperatureC === undefined ? isaTemperatureK(altitudeM) : air.temperatureC + 273.15;
  if (air.temperatureC !== undefined && !(air.temperatureC >= MIN_TEMPERATURE_C && air.temperatureC <= MAX_TEMPERATURE_C)) {
    throw new RangeError(`temperature ${air.temperatureC} °C is outside ${MIN_TEMPERATURE_C}…${MAX_TEMPERATURE_C} °C`);
  }
  const pressurePa = air.pressurePa ?? isaPressurePa(altitudeM);
  const humidityPct = air.humidityPct ?? 0;
  const wind = air.wind ?? { speedMps: 0, fromDeg: 0 };
  if (!(wind.speedMps >= 0) || !Number.isFinite(wind.speedMps) || !Number.isFinite(wind.fromDeg)) {
    throw new RangeError(`wind ${wind.speedMps} m/s from ${wind.fromDeg}° is not valid`);
  }
  const windRoughnessM = wind.roughnessM ?? GRASS_ROUGHNESS_M;
  const windReferenceHeightM = wind.referenceHeightM ?? WIND_REFERENCE_HEIGHT_M;
  windProfileFactor(windReferenceHeightM, windRoughnessM, windReferenceHeightM); // checks both
  const fromRad = wind.fromDeg * RAD_PER_DEG;
  // Air moves away from where it comes from: from the target (0°) it blows toward the player (−x).
  return {
    temperatureK,
    pressurePa,
    humidityPct,
    densityKgM3: moistAirDensityKgM3(temperatureK, pressurePa, humidityPct),
    viscosityPaS: sutherlandViscosityPaS(temperatureK),
    windXMps: -wind.speedMps * Math.cos(fromRad) || 0, // `|| 0` turns −0 into 0
    windZMps: -wind.speedMps * Math.sin(fromRad) || 0,
    windRoughnessM,
    windReferenceHeightM,
  };
}
