/** An elliptical distribution on the ground and a circle to land in. */
export interface DiscInput {
  /** Centre of the distribution (offline, carry), m. */
  centre: readonly [number, number];
  /** Its scale matrix [[xx, xy], [xy, yy]] (the covariance for a normal), m². */
  scale: { xx: number; yy: number; xy: number };
  /** Degrees of freedom of a bivariate Student t; Infinity for the normal. */
  dof: number;
  /** Centre of the circle (offline, carry), m. */
  disc: readonly [number, number];
  radiusM: number;
}

/** Nodes of the angular rule: a fixed, bounded cost per call. */
export const DISC_NODES = 512;

/**
 * The chance that a bivariate normal or Student t lands inside a circle. In polar coordinates
 * around the distribution's centre the radial part has a closed form: along the direction v,
 * with k = vᵀS⁻¹v, ∫ f·r dr from r₁ to r₂ = [H(k r₂²) − H(k r₁²)] / (2π √det S · k), where
 * H(s) = 1 − (1 + s/ν)^(−ν/2) for a t with ν degrees of freedom (1 − e^(−s/2) for the normal),
 * and r₁, r₂ are where the ray meets the circle. What is left is one integral over the angle:
 * the trapezoid rule on the whole turn when the centre is inside the circle (a smooth periodic
 * integrand), else the midpoint rule over the angles that meet the circle after the
 * substitution φ = φ₀ + α·sin t, which removes the square-root ends. At the centre of an
 * isotropic normal this is Rayleigh's 1 − exp(−R²/(2σ²)). O(DISC_NODES).
 * @throws RangeError when the scale is not positive definite, the radius not positive, or dof ≤ 0
 * @example discProbability({ centre: [0, 0], scale: { xx: 1, yy: 1, xy: 0 }, dof: Infinity, disc: [0, 0], radiusM: 1 }) // => 0.393469
 */
export function discProbability(input: DiscInput): number {
  const { xx, yy, xy } = input.scale;
  const det = xx * yy - xy * xy;
  if (!(xx > 0) || !(yy > 0) || !(det > 0) || !Number.isFinite(det)) throw new RangeError('discProbability: the scale must be positive definite');
  if (!(input.radiusM > 0) || !Number.isFinite(input.radiusM)) throw new RangeError('discProbability: the radius must be positive');
  if (!(input.dof > 0)) throw new RangeError('discProbability: degrees of freedom must be positive');
  const nu = input.dof;
  const H = Number.isFinite(nu) ? (s: number) => -Math.expm1((-nu / 2) * Math.log1p(s / nu)) : (s: number) => -Math.expm1(-s / 2);
  // inverse of the scale: k(φ) = vᵀ S⁻¹ v
  const ixx = yy / det;
  const iyy = xx / det;
  const ixy = -xy / det;
  const norm = 1 / (2 * Math.PI * Math.sqrt(det));
  const dx = input.disc[0] - input.centre[0];
  const dy = input.disc[1] - input.centre[1];
  const R = input.radiusM;
  const c0 = dx * dx + dy * dy - R * R;
  const at = (phi: number): number => {
    const c = Math.cos(phi);
    const s = Math.sin(phi);
    const b = c * dx + s * dy;
    const disc = b * b - c0;
    if (disc <= 0) return 0;
    const root = Math.sqrt(disc);
    const r2 = b + root;
    const r1 = Math.max(0, b - root);
    if (r2 <= 0) return 0;
    const k = c * c * ixx + 2 * c * s * ixy + s * s * iyy;
    return (H(k * r2 * r2) - H(k * r1 * r1)) / k;
  };
  let sum = 0;
  if (c0 <= 0) {
    const h = (2 * Math.PI) / DISC_NODES;
    for (let i = 0; i < DISC_NODES; i++) sum += at(i * h);
    return Math.min(1, Math.max(0, norm * sum * h));
  }
  const phi0 = Math.atan2(dy, dx);
  const alpha = Math.asin(Math.min(1, R / Math.sqrt(dx * dx + dy * dy)));
  const h = Math.PI / DISC_NODES;
  for (let i = 0; i < DISC_NODES; i++) {
    const t = -Math.PI / 2 + (i + 0.5) * h;
    sum += at(phi0 + alpha * Math.sin(t)) * alpha * Math.cos(t);
  }
  return Math.min(1, Math.max(0, norm * sum * h));
}
