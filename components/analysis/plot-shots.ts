/**
 * The analysis answer's compact plot columns as shot objects for the charts and the stray list.
 */
import type { StrayKind } from '@/analysis/strays';
import type { FittingAnalysis } from '@/server/schemas';

/** One shot as the decision views use it (canonical units). */
export type AnalysisShot = {
  id: number;
  /** Row in its bay file. */
  row: number;
  club: string;
  build: string | null;
  carry: number | null;
  offline: number | null;
  ballSpeed: number | null;
  launchAngle: number | null;
  spinRate: number | null;
  decision: 'keep' | 'drop' | null;
  strayKind: StrayKind | null;
  /** Flagged by the stray rules (any kind). */
  stray: boolean;
};

/**
 * Shots from the plot columns, club and build taken from each shot's group. O(n).
 * @example analysisShots(data).filter((s) => s.club === '7I')
 */
export function analysisShots(data: Pick<FittingAnalysis, 'analysis' | 'plot'>): AnalysisShot[] {
  const { plot, analysis } = data;
  const out: AnalysisShot[] = new Array(plot.id.length);
  for (let i = 0; i < plot.id.length; i++) {
    const g = analysis.groups[plot.group[i]];
    out[i] = {
      id: plot.id[i],
      row: plot.row[i],
      club: g?.club ?? '',
      build: g?.build ?? null,
      carry: plot.carry[i],
      offline: plot.offline[i],
      ballSpeed: plot.ballSpeed[i],
      launchAngle: plot.launchAngle[i],
      spinRate: plot.spinRate[i],
      decision: plot.decision[i],
      strayKind: plot.stray[i],
      stray: plot.stray[i] !== null,
    };
  }
  return out;
}
