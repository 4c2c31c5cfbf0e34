/** Grid and label steps the charts use, in display units: 10 first, then coarser. */
export const GRID_STEPS = [10, 20, 50, 100, 200, 500, 1000] as const;

/**
 * The finest step of `steps` whose lines lie at least `minPx` apart at `pxPerUnit`. O(steps).
 * Returns the coarsest step when none is wide enough.
 * @example stepForSpacing(2, 18) // => 10 (20 px apart)
 */
export function stepForSpacing(pxPerUnit: number, minPx: number, steps: readonly number[] = GRID_STEPS): number {
  for (const step of steps) if (step * pxPerUnit >= minPx) return step;
  return steps[steps.length - 1];
}

/**
 * The multiples of `step` in [lo, hi] (ends included within a 1e-9 relative slack). O(count).
 * @throws RangeError when step is not positive or the range is not finite
 * @example ticksEvery(143, 171, 10) // => [150, 160, 170]
 */
export function ticksEvery(lo: number, hi: number, step: number): number[] {
  if (!(step > 0) || !Number.isFinite(lo) || !Number.isFinite(hi)) throw new RangeError('ticksEvery needs a finite range and a positive step');
  const slack = 1e-9 * Math.max(1, Math.abs(lo), Math.abs(hi));
  const first = Math.ceil((lo - slack) / step);
  const last = Math.floor((hi + slack) / step);
  const out: number[] = [];
  for (let i = first; i <= last; i++) out.push(i * step === 0 ? 0 : i * step);
  return out;
}

/** Whether `value` is a multiple of `step` (for choosing which grid lines carry labels). */
export function isMultipleOf(value: number, step: number): boolean {
  const r = Math.abs(value / step - Math.round(value / step));
  return r < 1e-9;
}
