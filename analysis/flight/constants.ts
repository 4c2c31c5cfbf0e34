import { RPM_RAD_PER_S } from '@/analysis/units';

/**
 * Physical constants of the ball-flight model.
 * Ball limits: R&A / USGA Rules of Equipment (ball mass at most 45.93 g, diameter at least
 * 42.67 mm); the model uses the limit ball. Standard gravity: NIST SP 811 (2008), Appendix B.
 */

/** Ball mass (kg), the Rules of Equipment maximum. */
export const BALL_MASS_KG = 0.04593;

/** Ball diameter (m), the Rules of Equipment minimum. */
export const BALL_DIAMETER_M = 0.04267;

/** Ball radius (m). */
export const BALL_RADIUS_M = BALL_DIAMETER_M / 2;

/** Ball frontal area (m²). */
export const BALL_AREA_M2 = (Math.PI * BALL_DIAMETER_M * BALL_DIAMETER_M) / 4;

/** Standard gravity (m/s²), NIST SP 811 (2008). */
export const STANDARD_GRAVITY_MPS2 = 9.80665;

/** Radians per second in one revolution per minute (NIST SP 811: rpm = π/30 rad/s). */
export const RAD_PER_S_PER_RPM = RPM_RAD_PER_S;

/** Degrees to radians. */
export const RAD_PER_DEG = Math.PI / 180;
