/**
 * A shot on the dispersion plot (metres, offline + right of the target line) with both ground
 * coordinates present and the id as text (SVG keys and selection).
 */
export type PlotShot = {
  id: string;
  bayFileId?: string;
  /** Row in its bay file. */
  row: number;
  club: string;
  build: string | null;
  decision: 'keep' | 'drop' | null;
  /** Flagged by the stray rules. */
  stray: boolean;
  carry: number;
  offline: number;
};

/** One shot on the launch-vs-spin plane. */
export type LaunchPoint = { id?: string; launchAngleDeg: number; spinRateRpm: number };

/** The plotting area inside a chart, in px from the chart's top-left corner. */
export type PlotBox = { left: number; top: number; right: number; bottom: number };

/** A grid line and its label (null when this line carries no label). */
export type GridLine = { value: number; px: number; label: string | null };

/** Marker shapes, one per build in order, so builds differ by more than colour. */
export type MarkerShape = 'circle' | 'square' | 'diamond' | 'triangle';
