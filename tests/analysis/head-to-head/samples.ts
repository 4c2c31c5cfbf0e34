/** n values with exactly the given mean and sample sd (evenly spaced, then rescaled). */
export function withMoments(n: number, mean: number, sd: number): number[] {
  const offsets = Array.from({ length: n }, (_, i) => i - (n - 1) / 2);
  const spread = Math.sqrt(offsets.reduce((s, o) => s + o * o, 0) / (n - 1));
  return offsets.map((o) => mean + (o * sd) / spread);
}
