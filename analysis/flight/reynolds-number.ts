import { BALL_DIAMETER_M } from './constants';

/**
 * Reynolds number Re = ρ·v·d/μ of a ball in air. O(1).
 * https://en.wikipedia.org/wiki/Reynolds_number
 * @throws RangeError when the viscosity is not positive
 * @example reynoldsNumber(1.225, 55.2, 1.78938e-5) // => 161 248 (ball diameter 42.67 mm)
 */
export function reynoldsNumber(densityKgM3: number, speedMps: number, viscosityPaS: number, diameterM: number = BALL_DIAMETER_M): number {
  if (!(viscosityPaS > 0)) throw new RangeError(`viscosity ${viscosityPaS} Pa·s is not positive`);
  return (densityKgM3 * Math.abs(speedMps) * diameterM) / viscosityPaS;
}

/**
 * Reynolds number per unit speed, ρ·d/μ (s/m): the one place the model's Reynolds number comes
 * from (ball-forces.ts multiplies it by the air-relative speed). O(1).
 * @throws RangeError when the viscosity is not positive
 * @example reynoldsPerSpeed(1.225, 1.78938e-5) * 55.2 // => 161 248
 */
export function reynoldsPerSpeed(densityKgM3: number, viscosityPaS: number, diameterM: number = BALL_DIAMETER_M): number {
  return reynoldsNumber(densityKgM3, 1, viscosityPaS, diameterM);
}
