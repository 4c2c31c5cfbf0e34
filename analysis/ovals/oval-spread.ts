import type { Oval } from './oval';

/** Half-widths of the box around an oval, across and along the target line. */
export interface OvalSpread {
  level: number;
  /** The oval reaches ±offlineHalfWidthM left–right of its centre. */
  offlineHalfWidthM: number;
  /** The oval reaches ±carryHalfWidthM short–long of its centre. */
  carryHalfWidthM: number;
}

/**
 * The carry and offline spread of an oval: half-widths of the smallest box, aligned with the
 * target line, that holds the oval (a² sin²θ + b² cos²θ across, a² cos²θ + b² sin²θ along).
 * Since the box holds the oval, at least `level` of shots lie within both. O(1).
 * https://en.wikipedia.org/wiki/Ellipse#Ellipse_as_an_affine_image_of_the_unit_circle
 * @example ovalSpread({ level: 0.95, semiMajor: 8, semiMinor: 5, angleDeg: 90, … }) // => { offlineHalfWidthM: 8, carryHalfWidthM: 5, level: 0.95 }
 */
export function ovalSpread(oval: Oval): OvalSpread {
  const angle = (oval.angleDeg * Math.PI) / 180;
  const s = Math.sin(angle);
  const c = Math.cos(angle);
  const a2 = oval.semiMajor * oval.semiMajor;
  const b2 = oval.semiMinor * oval.semiMinor;
  return {
    level: oval.level,
    offlineHalfWidthM: Math.sqrt(a2 * s * s + b2 * c * c),
    carryHalfWidthM: Math.sqrt(a2 * c * c + b2 * s * s),
  };
}

/**
 * The spread in plain words, distances through the caller's unit formatter, e.g.
 * "95% of shots within ±11 m left–right and ±8 m in carry". O(1).
 * @example describeOvalSpread(spread, (m) => `${(m / 0.9144).toFixed(0)} yd`) // => "95% of shots within ±12 yd left–right and ±9 yd in carry"
 */
export function describeOvalSpread(spread: OvalSpread, formatDistance: (metres: number) => string): string {
  const percent = Number((spread.level * 100).toFixed(1));
  return `${percent}% of shots within ±${formatDistance(spread.offlineHalfWidthM)} left–right and ±${formatDistance(spread.carryHalfWidthM)} in carry`;
}
