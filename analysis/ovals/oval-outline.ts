import type { Oval } from './oval';

/** A point on the ground, metres. */
export interface GroundPoint {
  offline: number;
  carry: number;
}

/**
 * Points on the outline of an oval, evenly spaced in the ellipse's parameter, starting at the
 * far end of the long axis and going round once (the first point is not repeated at the end).
 * For plotting. O(segments).
 * https://en.wikipedia.org/wiki/Ellipse#Parametric_representation
 * @throws RangeError when segments < 3
 * @example ovalOutline(oval, 4) // => 4 points: the two ends of each axis
 */
export function ovalOutline(oval: Oval, segments = 64): GroundPoint[] {
  if (!(segments >= 3) || !Number.isInteger(segments)) throw new RangeError('ovalOutline needs at least 3 whole segments');
  const angle = (oval.angleDeg * Math.PI) / 180;
  // Unit vectors of the long and short axes in (offline, carry).
  const ux = Math.sin(angle);
  const uy = Math.cos(angle);
  const vx = Math.cos(angle);
  const vy = -Math.sin(angle);
  const points: GroundPoint[] = new Array(segments);
  for (let i = 0; i < segments; i++) {
    const t = (2 * Math.PI * i) / segments;
    const a = oval.semiMajor * Math.cos(t);
    const b = oval.semiMinor * Math.sin(t);
    points[i] = { offline: oval.centerOffline + a * ux + b * vx, carry: oval.centerCarry + a * uy + b * vy };
  }
  return points;
}
