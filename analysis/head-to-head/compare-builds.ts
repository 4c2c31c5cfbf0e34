import { SHOT_FIELDS } from '@/analysis/fields';
import type { ShotField } from '@/analysis/fields';
import { meanVariance, sampleCovariance2, varianceRatioTest, welchTTest } from '@/analysis/statistics';
import type { SampleMoments } from '@/analysis/statistics';
import { moreShotsNeeded } from './shots-needed';

/** The kept shots of one build as aligned columns (index i is one shot; NaN = missing). */
export interface BuildSample {
  club: string;
  build: string | null;
  columns: Partial<Record<ShotField, ArrayLike<number>>>;
}

/** Difference of means A − B for one field, Welch. JSON-able. */
export interface FieldComparison {
  meanA: number;
  meanB: number;
  diff: number;
  ci95: [number, number];
  t: number;
  df: number;
  p: number;
}

/** Spread of one field in A against B: variance-ratio F test. */
export interface SpreadComparison {
  sdA: number;
  sdB: number;
  /** sA²/sB² */
  f: number;
  df1: number;
  df2: number;
  /** Two-sided p value. */
  p: number;
}

export const SPREAD_METHOD = 'variance-ratio F test, two-sided';

/** Two builds side by side. JSON-able. */
export interface HeadToHead {
  a: { club: string; build: string | null };
  b: { club: string; build: string | null };
  fields: Partial<Record<ShotField, FieldComparison>>;
  spread: { method: typeof SPREAD_METHOD; fields: Partial<Record<ShotField, SpreadComparison>> };
  /** Oval area of A over B (the same at every level); null without two ovals of some size. */
  ovalAreaRatio: number | null;
  /**
   * Per field with p ≥ 0.05: about how many more shots per build would settle the difference at
   * power 0.8 and α 0.05 (normal approximation, pooled variance); null when already clear (p < 0.05)
   * or when the means are equal.
   */
  shotsNeeded: Partial<Record<ShotField, number | null>>;
}

function finiteValues(values: ArrayLike<number>): Float64Array {
  const out = new Float64Array(values.length);
  let n = 0;
  for (let i = 0; i < values.length; i++) if (Number.isFinite(values[i])) out[n++] = values[i];
  return out.subarray(0, n);
}

function moments(values: ArrayLike<number>): SampleMoments | null {
  const finite = finiteValues(values);
  if (finite.length < 2) return null;
  const mv = meanVariance(finite);
  return { n: mv.n, mean: mv.mean, sd: Math.sqrt(mv.variance) };
}

/** sqrt(det) of the (offline, carry) covariance: the oval's area over π·k². */
function ovalAreaFactor(sample: BuildSample): number | null {
  const x = sample.columns.offline;
  const y = sample.columns.carry;
  if (!x || !y) return null;
  const length = Math.min(x.length, y.length);
  const px = new Float64Array(length);
  const py = new Float64Array(length);
  let n = 0;
  for (let i = 0; i < length; i++) {
    if (Number.isFinite(x[i]) && Number.isFinite(y[i])) {
      px[n] = x[i];
      py[n] = y[i];
      n++;
    }
  }
  if (n < 3) return null;
  const c = sampleCovariance2(px, py, n);
  return Math.sqrt(Math.max(0, c.xx * c.yy - c.xy * c.xy));
}

/**
 * Head-to-head of two builds: for each field both have (at least 2 values each, some spread),
 * both means, A − B with its 95% confidence interval, Welch's t, df and p; the spread of each
 * field by the variance-ratio F test; the ratio of oval areas A/B; and for differences not yet
 * clear (p ≥ 0.05) about how many more shots per build would settle them. O(n) over both.
 * https://www.itl.nist.gov/div898/handbook/eda/section3/eda353.htm
 * @example compareBuilds(sampleA, sampleB).fields.carry // => { meanA, meanB, diff, ci95, t, df, p }
 */
export function compareBuilds(a: BuildSample, b: BuildSample): HeadToHead {
  const fields: HeadToHead['fields'] = {};
  const spread: HeadToHead['spread']['fields'] = {};
  const shotsNeeded: HeadToHead['shotsNeeded'] = {};
  for (const field of SHOT_FIELDS) {
    const ca = a.columns[field];
    const cb = b.columns[field];
    if (!ca || !cb) continue;
    const ma = moments(ca);
    const mb = moments(cb);
    if (!ma || !mb || !(ma.sd > 0 || mb.sd > 0)) continue;
    const welch = welchTTest(ma, mb, 0.95);
    fields[field] = { meanA: ma.mean, meanB: mb.mean, diff: welch.diff, ci95: welch.ci, t: welch.t, df: welch.df, p: welch.p };
    if (mb.sd > 0) {
      const test = varianceRatioTest(ma, mb);
      spread[field] = { sdA: ma.sd, sdB: mb.sd, f: test.f, df1: test.df1, df2: test.df2, p: test.p };
    }
    shotsNeeded[field] =
      welch.p < 0.05 ? null : moreShotsNeeded({ nA: ma.n, nB: mb.n, sdA: ma.sd, sdB: mb.sd, diff: welch.diff });
  }
  const areaA = ovalAreaFactor(a);
  const areaB = ovalAreaFactor(b);
  return {
    a: { club: a.club, build: a.build },
    b: { club: b.club, build: b.build },
    fields,
    spread: { method: SPREAD_METHOD, fields: spread },
    ovalAreaRatio: areaA !== null && areaB !== null && areaB > 0 ? areaA / areaB : null,
    shotsNeeded,
  };
}
