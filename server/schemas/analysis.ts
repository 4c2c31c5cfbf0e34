import { z } from 'zod';
import type { ShotField } from '../../analysis/fields';
import type { Conditions } from '../../analysis/flight/conditions';
import { groundFirmnessSchema } from './fittings';
import type { SessionAnalysis } from '../../analysis/session/session-types';
import type { StrayKind } from '../../analysis/strays/find-strays';

/**
 * The shots as the plots need them, as compact columns (index i is one shot, in file and row
 * order) rather than one object per shot: the full shots come from their own paged endpoint
 * (GET /api/fittings/:id/shots). Canonical units; null where a shot lacks the value.
 */
export interface PlotColumns {
  id: number[];
  /** Row in its bay file. */
  row: number[];
  /** Index of the shot's group in analysis.groups. */
  group: number[];
  carry: (number | null)[];
  offline: (number | null)[];
  ballSpeed: (number | null)[];
  launchAngle: (number | null)[];
  spinRate: (number | null)[];
  decision: ('keep' | 'drop' | null)[];
  /** The stray rules' kind for the shot, null when not flagged. */
  stray: (StrayKind | null)[];
}

/** GET /api/fittings/:id/analysis */
export interface FittingAnalysis {
  analysis: SessionAnalysis;
  /** The fitting's measured air and ground, and the conditions the figures were carried over to (if any). */
  air: { measured: Conditions; normalisedTo: Conditions | null };
  plot: PlotColumns;
}

/** "7I|Steel 105" → { club, build }; "7I|" or "7I" → build null. */
const groupRef = z
  .string()
  .max(130)
  .transform((s) => {
    const i = s.indexOf('|');
    const club = i === -1 ? s : s.slice(0, i);
    const build = i === -1 ? '' : s.slice(i + 1);
    return { club, build: build === '' ? null : build };
  });

export const analysisQuerySchema = z
  .object({
    level: z.coerce.number().gt(0).lt(1).default(0.95),
    all: z.enum(['0', '1', 'true', 'false']).default('0').transform((v) => v === '1' || v === 'true'),
    a: groupRef.optional(),
    b: groupRef.optional(),
    /** Course conditions to carry the figures over to (ball-flight model). */
    toTemperatureC: z.coerce.number().min(-20).max(50).optional(),
    toAltitudeM: z.coerce.number().min(-430).max(4500).optional(),
    toHumidityPct: z.coerce.number().min(0).max(100).optional(),
    toFirmness: groundFirmnessSchema.optional(),
    /** On-target odds: fairway width and green radius, m (default: the shop's). */
    fairwayWidthM: z.coerce.number().min(5).max(100).optional(),
    greenRadiusM: z.coerce.number().min(1).max(50).optional(),
    /** The green's carry for one club, m (default: the club's median carry). */
    targetClub: z.string().min(1).max(40).optional(),
    targetCarryM: z.coerce.number().min(1).max(450).optional(),
  })
  .refine((q) => (q.a === undefined) === (q.b === undefined), { message: 'Give both builds to compare (a and b).', path: ['b'] })
  .refine((q) => (q.targetClub === undefined) === (q.targetCarryM === undefined), { message: 'Give the club and its target carry together.', path: ['targetCarryM'] });

/** Sort keys of the shot table: a shot field, or the shot's place. */
export const SHOT_SORT_KEYS = ['row', 'club', 'build', 'stray', 'clubSpeed', 'ballSpeed', 'smashFactor', 'launchAngle', 'launchDirection', 'spinRate', 'backSpin', 'sideSpin', 'spinAxis', 'attackAngle', 'clubPath', 'faceAngle', 'faceToPath', 'dynamicLoft', 'spinLoft', 'carry', 'total', 'offline', 'apexHeight', 'descentAngle', 'flightTime'] as const;
export type ShotSortKey = (typeof SHOT_SORT_KEYS)[number];

/** GET /api/fittings/:id/shots: one page of the shot table. */
export const shotPageQuerySchema = z.object({
  offset: z.coerce.number().int().min(0).max(10_000_000).default(0),
  limit: z.coerce.number().int().min(1).max(500).default(100),
  sort: z.enum(SHOT_SORT_KEYS).default('row'),
  dir: z.enum(['asc', 'desc']).default('asc'),
  /** Only this club (canonical code). */
  club: z.string().min(1).max(40).optional(),
});
export type ShotPageQuery = z.infer<typeof shotPageQuerySchema>;

/** One shot of the shot table: every field it has, canonical units, with its stray and decision. */
export interface TableShot {
  id: number;
  bayFileId: string;
  /** Row in its bay file. */
  row: number;
  club: string;
  build: string | null;
  values: Partial<Record<ShotField, number>>;
  /** Fields computed rather than read (smash factor, spin axis… or filled by the flight model). */
  derived: ShotField[];
  decision: 'keep' | 'drop' | null;
  /** What the stray rules say (reason in the user's units), null when not flagged. */
  stray: { kind: StrayKind; reason: string } | null;
  /** Whether the shot counts in the figures (the fitter's decision, else the rules' default). */
  inFigures: boolean;
}

/** GET /api/fittings/:id/shots */
export interface ShotPage {
  /** Shots matching (all pages). */
  total: number;
  offset: number;
  limit: number;
  sort: ShotSortKey;
  dir: 'asc' | 'desc';
  /** The fields any shot of the fitting has, in canonical order (the table's columns). */
  fields: ShotField[];
  shots: TableShot[];
}
