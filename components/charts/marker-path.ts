import type { MarkerShape } from './chart-types';

const SHAPES: readonly MarkerShape[] = ['circle', 'square', 'diamond', 'triangle'];

/** The marker shape of the build at `index` in a chart's build order (cycles after four). */
export function markerShape(index: number): MarkerShape {
  return SHAPES[((index % SHAPES.length) + SHAPES.length) % SHAPES.length];
}

const f = (n: number) => Math.round(n * 100) / 100;

/**
 * An SVG path for a marker centred on (cx, cy) with about the visual size of a circle of
 * radius r (square and diamond of equal area to the circle, triangle a little larger). Closed. O(1).
 * @example markerPath('square', 10, 10, 4) // => 'M6.46,6.46H13.54V13.54H6.46Z'
 */
export function markerPath(shape: MarkerShape, cx: number, cy: number, r: number): string {
  switch (shape) {
    case 'circle':
      return `M${f(cx - r)},${f(cy)}A${f(r)},${f(r)} 0 1,0 ${f(cx + r)},${f(cy)}A${f(r)},${f(r)} 0 1,0 ${f(cx - r)},${f(cy)}Z`;
    case 'square': {
      const h = (r * Math.sqrt(Math.PI)) / 2;
      return `M${f(cx - h)},${f(cy - h)}H${f(cx + h)}V${f(cy + h)}H${f(cx - h)}Z`;
    }
    case 'diamond': {
      const h = r * Math.sqrt(Math.PI / 2);
      return `M${f(cx)},${f(cy - h)}L${f(cx + h)},${f(cy)}L${f(cx)},${f(cy + h)}L${f(cx - h)},${f(cy)}Z`;
    }
    case 'triangle': {
      const h = r * 1.35;
      return `M${f(cx)},${f(cy - h)}L${f(cx + h * 0.866)},${f(cy + h * 0.5)}L${f(cx - h * 0.866)},${f(cy + h * 0.5)}Z`;
    }
  }
}
