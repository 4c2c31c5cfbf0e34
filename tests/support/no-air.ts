import { STANDARD_GRAVITY_MPS2, type CoefficientModel } from '@/analysis/flight';

/**
 * A ball without drag or lift. The real flight code then flies the textbook projectile
 * (Halliday, Resnick & Walker, "Fundamentals of Physics", 10th ed., 2014, §4-6), whose carry,
 * apex, flight time and landing have closed forms.
 */
export const noAir: CoefficientModel = { name: 'no-air', source: 'gravity only', dragCoefficient: () => 0, liftCoefficient: () => 0 };

/** The projectile's range over level ground (m): v²·sin 2θ / g. */
export function projectileRangeM(speedMps: number, angleDeg: number): number {
  return (speedMps * speedMps * Math.sin((2 * angleDeg * Math.PI) / 180)) / STANDARD_GRAVITY_MPS2;
}
