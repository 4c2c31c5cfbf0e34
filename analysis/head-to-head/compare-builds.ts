import { SHOT_FIELDS } from '@/analysis/fields';
import type { ShotField } from '@/analysis/fields';
import { meanVariance, sampleCovariance2, spreadDifference, welchTTest } from '@/analysis/statistics';
import type { SampleMoments } from '@/analysis/statistics';
import type { UnitSystem } from '@/analysis/units';
import { resolveMargins, type FieldMargins } from './margins';
import { shotsToSettle } from './shots-needed';
import { overallVerdict, summariseHeadToHead, type Overall } from './summarise';
import { verdictOf, type Verdict } from './verdict';

/** The kept shots of one build as aligned columns (index i is one shot; NaN = missing). */
export interface BuildSample {
  club: string;
  build: string | null;
  columns: Partial<Record<ShotField, ArrayLike<number>>>;
}

/** Difference of means A − B for one field (Welch), with its verdict. JSON-able; canonical units. */
export interface FieldComparison {
  meanA: number;
  meanB: number;
  diff: number;
  ci95: [number, number];
  t: number;
  df: number;
  p: number;
  /** The smallest difference that matters for this field (the shop's, else the default). */
  margin: number;
  verdict: Verdict;
  /** For an unclear verdict: about how many more shots per build would settle it; else null. */
  shotsNeeded: number | null;
}

export const SPREAD_METHOD = 'Brown–Forsythe (Levene on deviations from the median)';

/**
 * Spread of one field in A against B: sds, their ratio, and the Brown–Forsythe test, whose two
 * means (mean absolute deviation from each build's median) are compared with an interval and
 * the field's margin, so spread gets a verdict by the same rule as the means. JSON-able.
 */
export interface SpreadComparison {
  sdA: number;
  sdB: number;
  /** sdA / sdB. */
  ratio: number;
  /** Brown–Forsythe p. */
  p: number;
  verdict: Verdict;
  method: typeof SPREAD_METHOD;
  w: number;
  df1: number;
  df2: number;
  /** Mean absolute deviation from the median, A and B. */
  deviationA: number;
  deviationB: number;
  /** deviationA − deviationB and its 95% interval (pooled t; excludes 0 exactly when p < 0.05). */
  diff: number;
  ci95: [number, number];
  margin: number;
  shotsNeeded: number | null;
}

/** Two builds side by side. JSON-able; canonical units, words in `units`. */
export interface HeadToHead {
  a: { club: string; build: string | null };
  b: { club: string; build: string | null };
  fields: Partial<Record<ShotField, FieldComparison>>;
  spread: { method: typeof SPREAD_METHOD; fields: Partial<Record<ShotField, SpreadComparison>> };
  /** Oval area of A over B (the same at every level); null without two ovals of some size. */
  ovalAreaRatio: number | null;
  /** Which build is better on the fields that decide (see overallVerdict). */
  overall: Overall;
  /** One sentence in the user's units, e.g. "Birch carries 6 yd farther (clear); …". */
  summary: string;
}

function finiteValues(values: ArrayLike<number>): Float64Array {
  const out = new Float64Array(values.length);
  let n = 0;
  for (let i = 0; i < values.length; i++) if (Number.isFinite(values[i])) out[n++] = values[i];
  return out.subarray(0, n);
}

function moments(values: Float64Array): SampleMoments | null {
  if (values.length < 2) return null;
  const mv = meanVariance(values);
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

function compareSpread(a: Float64Array, b: Float64Array, margin: number, ma: SampleMoments, mb: SampleMoments): SpreadComparison | null {
  if (a.length < 3 || b.length < 3 || !(mb.sd > 0)) return null;
  let s;
  try {
    s = spreadDifference(a, b, 0.95);
  } catch (err) {
    if (err instanceof RangeError) return null; // no spread at all in the deviations
    throw err;
  }
  const verdict = verdictOf(s.ci, margin);
  return {
    sdA: ma.sd,
    sdB: mb.sd,
    ratio: ma.sd / mb.sd,
    p: s.p,
    verdict,
    method: SPREAD_METHOD,
    w: s.w,
    df1: s.df1,
    df2: s.df2,
    deviationA: s.meanAbsoluteDeviations[0],
    deviationB: s.meanAbsoluteDeviations[1],
    diff: s.diff,
    ci95: s.ci,
    margin,
    shotsNeeded: verdict === 'unclear' ? shotsToSettle({ nA: s.nA, nB: s.nB, sdA: s.pooledSd, sdB: s.pooledSd, diff: s.diff, margin }) : null,
  };
}

/**
 * Head-to-head of two builds: for each field both have (at least 2 values each, some spread),
 * both means, A − B with its 95% confidence interval (Welch), and the verdict against the
 * field's margin (equivalent / clear / unclear, with the shots that would settle it); the
 * spread of each field by the Brown–Forsythe test with the sd ratio and a verdict by the same
 * rule; the ratio of oval areas A/B; the overall verdict and a one-sentence summary in `units`.
 * O(n) over both.
 * https://www.itl.nist.gov/div898/handbook/eda/section3/eda353.htm
 * @example compareBuilds(sampleA, sampleB).fields.carry // => { meanA, meanB, diff, ci95, t, df, p, margin, verdict, shotsNeeded }
 */
export function compareBuilds(a: BuildSample, b: BuildSample, options: { margins?: Partial<FieldMargins>; units?: UnitSystem } = {}): HeadToHead {
  const margins = resolveMargins(options.margins);
  const fields: HeadToHead['fields'] = {};
  const spread: HeadToHead['spread']['fields'] = {};
  for (const field of SHOT_FIELDS) {
    const ca = a.columns[field];
    const cb = b.columns[field];
    if (!ca || !cb) continue;
    const va = finiteValues(ca);
    const vb = finiteValues(cb);
    const ma = moments(va);
    const mb = moments(vb);
    if (!ma || !mb || !(ma.sd > 0 || mb.sd > 0)) continue;
    const welch = welchTTest(ma, mb, 0.95);
    const margin = margins[field];
    const verdict = verdictOf(welch.ci, margin);
    fields[field] = {
      meanA: ma.mean,
      meanB: mb.mean,
      diff: welch.diff,
      ci95: welch.ci,
      t: welch.t,
      df: welch.df,
      p: welch.p,
      margin,
      verdict,
      shotsNeeded: verdict === 'unclear' ? shotsToSettle({ nA: ma.n, nB: mb.n, sdA: ma.sd, sdB: mb.sd, diff: welch.diff, margin }) : null,
    };
    const s = compareSpread(va, vb, margin, ma, mb);
    if (s) spread[field] = s;
  }
  const areaA = ovalAreaFactor(a);
  const areaB = ovalAreaFactor(b);
  const partial: Omit<HeadToHead, 'overall' | 'summary'> = {
    a: { club: a.club, build: a.build },
    b: { club: b.club, build: b.build },
    fields,
    spread: { method: SPREAD_METHOD, fields: spread },
    ovalAreaRatio: areaA !== null && areaB !== null && areaB > 0 ? areaA / areaB : null,
  };
  const overall = overallVerdict(partial);
  return { ...partial, overall, summary: summariseHeadToHead({ ...partial, overall }, options.units ?? 'imperial') };
}
