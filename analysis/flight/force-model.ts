/**
 * The accelerations acting on a point mass, for the trajectory integrator. Forces may depend on
 * the height above the launch point (the wind grows with height), on the velocity and on one
 * extra scalar (the ball's spin), not on the position along the ground. Frame: x toward the
 * target, y up, z right (right-handed).
 */
export interface ForceModel {
  /**
   * Write the acceleration (m/s²) into out[0..2] (x, y, z) and the rate of change of the extra
   * scalar into out[3] (0 when there is none). Must not allocate: it runs four times per step.
   */
  derivative(heightM: number, vxMps: number, vyMps: number, vzMps: number, spin: number, out: Float64Array): void;
}
