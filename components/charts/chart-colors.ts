import { colors } from '@/components/theme';

/**
 * Chart colours. Builds take the colour-blind-safe qualitative palette of Okabe & Ito
 * ("Color Universal Design", 2008) in this order: blue, vermillion, bluish green (the first
 * three keep at least 3:1 contrast on the paper and surface colours, WCAG 2.1 SC 1.4.11), then
 * reddish purple, orange and sky blue. Marker shapes differ per build too, so a build is never
 * told by colour alone. Everything else comes from components/theme.ts.
 */
export const BUILD_COLORS = ['#0072B2', '#D55E00', '#009E73', '#CC79A7', '#E69F00', '#56B4E9'] as const;

/** The colour of the build at `index` in a chart's build order (cycles after six). */
export function buildColor(index: number): string {
  return BUILD_COLORS[((index % BUILD_COLORS.length) + BUILD_COLORS.length) % BUILD_COLORS.length];
}

export const chartColors = {
  background: colors.surface,
  grid: colors.border,
  axisText: colors.textMuted,
  text: colors.text,
  targetLine: colors.ink,
  caution: colors.caution,
  cautionSoft: colors.cautionSoft,
  /** A difference whose 95% interval excludes zero. */
  clear: colors.ink,
  /** A difference not yet clear (interval spans zero). */
  unclear: colors.textMuted,
  /** The launch window's fill and edge. */
  window: colors.success,
  windowSoft: colors.successSoft,
  best: colors.accent,
  points: colors.ink,
  selection: colors.ink,
} as const;

/** Opacity of a dropped shot's marker. */
export const DROPPED_OPACITY = 0.3;
/** Fill opacity of a descriptive oval. */
export const OVAL_FILL_OPACITY = 0.12;
