import type { Shot, ShotField } from '@/analysis/fields';
import type { FieldMargins, HeadToHead } from '@/analysis/head-to-head';
import type { OnTargetOdds } from '@/analysis/odds';
import type { UnitSystem } from '@/analysis/units';
import type { LadderRung } from '@/analysis/ladder';
import type { Oval } from '@/analysis/ovals';
import type { FieldSummary } from '@/analysis/statistics';
import type { StrayDecision, StrayKind, StrayValueFormatter } from '@/analysis/strays';

/** A group of shots: one club and one build. */
export interface GroupRef {
  club: string;
  build: string | null;
}

/** Options of `analyseSession`. */
export interface SessionOptions {
  /** Oval level, default 0.95. */
  level?: number;
  /** Count strays in the statistics (default false: strays are left out). */
  includeStrays?: boolean;
  /** The fitter's keep/drop per row; overrides the stray rules. */
  decisions?: Record<number, StrayDecision>;
  /** Two groups for a head-to-head (A, B). */
  compare?: [GroupRef, GroupRef];
  /** Loft per group, keyed `${club}|${build ?? ''}`, for the ladder's loft steps. */
  loftByGroup?: Record<string, number>;
  /** Writes distances and speeds in stray reasons (default: canonical, "148 m", "58.1 m/s"). */
  formatValue?: StrayValueFormatter;
  /**
   * The same shots as measured, when `shots` were carried over to other conditions: strays are
   * decided on these, so normalising moves numbers, never the set of strays. Same rows, clubs
   * and builds, in the same order.
   */
  measured?: readonly Shot[];
  /** Per club, the build the ladder uses; clubs not listed pool all their builds. */
  chosenBuild?: Record<string, string | null>;
  /** The player's bag clubs, for the ladder's neighbours (default: clubs a set holds side by side). */
  bagClubs?: readonly string[];
  /** The shop's margins per field (canonical units); fields not given keep the defaults. */
  margins?: Partial<FieldMargins>;
  /** Units of the words (the head-to-head's summary); default imperial. */
  units?: UnitSystem;
  /**
   * On-target odds: fairway width and green radius (default 30 yd and 12 yd), and the green's
   * carry per club (default: the median carry of the club's kept shots, all builds together, so
   * builds are judged at the same target).
   */
  odds?: { fairwayWidthM?: number; greenRadiusM?: number; targetCarryM?: Record<string, number> };
}

/** One stray as the session reports it: the row, its kind and the reason in plain words. */
export interface SessionStray {
  row: number;
  /** misread, mishit, review; null for a shot the fitter dropped that no rule flagged. */
  kind: StrayKind | null;
  reason: string;
  /** Whether the shot counts in the figures (the fitter's decision, else the rules' default). */
  inFigures: boolean;
}

/** The oval fields of the session shape. */
export type SessionOval = Oval;

/** One group's analysis. JSON-able; canonical units. */
export interface GroupAnalysis {
  club: string;
  build: string | null;
  /** Shots in the group. */
  n: number;
  /** Shots used in the statistics. */
  kept: number;
  fields: Partial<Record<ShotField, FieldSummary>>;
  /** From the smashFactor field where a shot has it, else ballSpeed / clubSpeed. */
  smashFactor: FieldSummary | null;
  oval: SessionOval | null;
  predictionOval: SessionOval | null;
  strays: SessionStray[];
  /** The chances of the next shot: a fairway and a green (predictive distribution). */
  odds: OnTargetOdds;
}

/** The whole session's analysis. JSON-able; canonical units. */
export interface SessionAnalysis {
  groups: GroupAnalysis[];
  headToHead?: HeadToHead;
  ladder: LadderRung[];
}
