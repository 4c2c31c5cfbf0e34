/*
 * Wind that grows with height: the logarithmic wind profile of the neutral surface layer,
 *   u(z) = u(zr) · ln(z / z0) / ln(zr / z0)   for z > z0, and 0 at or below z0,
 * with z0 the roughness length of the ground and zr the height the wind speed was measured at.
 * Sources: the log law u = (u_star / κ)·ln(z/z0) (e.g. Stull, "An Introduction to Boundary Layer
 * Meteorology", 1988, §9.7); roughness lengths by the Davenport–Wieringa classification as
 * tabulated in US EPA "Meteorological Monitoring Guidance for Regulatory Modeling
 * Applications" (EPA-454/R-99-005, 2000), Table 6-10: "open flat terrain; grass, few isolated
 * obstacles" z0 = 0.03 m — the default here, for mown course grass. Surface wind is measured
 * (and forecast) at 10 m above the ground (WMO Guide to Meteorological Instruments and Methods
 * of Observation, WMO-No. 8, Part I, Chapter 5), the default reference height. The profile
 * ignores the zero-plane displacement (nil over short grass) and atmospheric stability (neutral).
 */

/** Roughness length of open flat terrain with grass (m): Davenport–Wieringa class 3. */
export const GRASS_ROUGHNESS_M = 0.03;

/** Standard height of surface wind measurement (m), WMO-No. 8. */
export const WIND_REFERENCE_HEIGHT_M = 10;

/**
 * The share of the reference wind speed blowing at a height: ln(z/z0) / ln(zr/z0), 0 at or below
 * the roughness length. O(1).
 * @throws RangeError when z0 is not positive or the reference height is not above z0
 * @example windProfileFactor(2) // => 0.72295 (2 m, z0 0.03 m, reference 10 m)
 */
export function windProfileFactor(heightM: number, roughnessM: number = GRASS_ROUGHNESS_M, referenceHeightM: number = WIND_REFERENCE_HEIGHT_M): number {
  if (!(roughnessM > 0) || !Number.isFinite(roughnessM)) throw new RangeError(`roughness length ${roughnessM} m is not positive`);
  if (!(referenceHeightM > roughnessM) || !Number.isFinite(referenceHeightM)) {
    throw new RangeError(`wind reference height ${referenceHeightM} m is not above the roughness length`);
  }
  return heightM > roughnessM ? Math.log(heightM / roughnessM) / Math.log(referenceHeightM / roughnessM) : 0;
}
