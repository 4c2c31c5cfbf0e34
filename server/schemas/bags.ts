import { z } from 'zod';
import { clubInfo } from '../../analysis/clubs';
import type { BagCheck } from '../../analysis/conformance';
import type { BagLadderRung, CarrySource } from '../../analysis/ladder';
import type { BagChange, WedgeWearReminder } from '../../analysis/bag';
import type { StaticFitStart } from '../../analysis/workshop';
import { buildSpecFields, type BuildSpecValues } from './build-spec';

export const bagStatusSchema = z.enum(['in-bag', 'on-order', 'out']);
export type BagStatus = z.infer<typeof bagStatusSchema>;

const clubCode = z
  .string()
  .trim()
  .max(40)
  .refine((c) => clubInfo(c) !== null, { message: 'Choose a club from the list.' });
const count = (label: string) => z.number().int(`${label} is a whole number.`).min(0, `${label} cannot be negative.`).max(10_000, `${label} must be at most 10,000.`);

const bagClubFields = {
  ...buildSpecFields,
  club: clubCode,
  status: bagStatusSchema,
  /** A carry the fitter or player entered (m); used when the club was not hit in a fitting. */
  carryEnteredM: z.number().min(1, 'Carry must be at least 1 m.').max(400, 'Carry must be at most 400 m.').nullish(),
  /** The date the club went in the bag. */
  inBagSince: z.iso.date({ message: 'Enter a date as YYYY-MM-DD.' }).nullish(),
  roundsSince: count('Rounds'),
  practiceSessionsSince: count('Practice sessions'),
};

/** POST /api/players/:id/bag/clubs */
export const bagClubBodySchema = z.object({
  ...bagClubFields,
  status: bagStatusSchema.default('in-bag'),
  roundsSince: bagClubFields.roundsSince.default(0),
  practiceSessionsSince: bagClubFields.practiceSessionsSince.default(0),
});
export type BagClubBody = z.input<typeof bagClubBodySchema>;

/** PATCH /api/bag-clubs/:id — only the keys sent change; `version` is the one the editor read. */
export const bagClubUpdateSchema = z.object(bagClubFields).partial().extend({ version: z.number().int().min(1) });
export type BagClubUpdate = z.input<typeof bagClubUpdateSchema>;

/** PATCH /api/bag-clubs/:id/wear — a wedge's use since it went in, by the player or a fitter. */
export const bagClubWearSchema = z.object({
  roundsSince: count('Rounds').optional(),
  practiceSessionsSince: count('Practice sessions').optional(),
  version: z.number().int().min(1),
});

/** GET /api/players/:id/bag?on=YYYY-MM-DD */
export const bagQuerySchema = z.object({ on: z.iso.date({ message: 'Enter a date as YYYY-MM-DD.' }).optional() });

/** Where a bag club's carry comes from, with its figures. */
export interface BagCarry {
  carryM: number;
  source: CarrySource;
  /** Hit: the fitting, its date and the middle half of the carries. */
  fittingId?: string;
  fittingDate?: string;
  n?: number;
  q1M?: number;
  q3M?: number;
  /** Estimate: the club speed assumed (m/s) and whether the loft was the club's own or typical. */
  clubSpeedMps?: number;
  loftFrom?: 'club' | 'typical';
  /** Estimate: the hit club whose carry set the player's speed, if any. */
  fromClub?: string;
}

/** One club of a player's bag. */
export type BagClub = BuildSpecValues & {
  id: string;
  playerId: string;
  club: string;
  status: BagStatus;
  carryEnteredM: number | null;
  inBagSince: string | null;
  roundsSince: number;
  practiceSessionsSince: number;
  /** The fitting build it came from, if any. */
  sourceBuildId: string | null;
  sourceFittingId: string | null;
  version: number;
  /** The carry shown (hit, entered or estimated); null when none can be given. */
  carry: BagCarry | null;
  wear: WedgeWearReminder | null;
  updatedAt: string;
};

/** GET /api/players/:id/bag */
export interface BagView {
  playerId: string;
  playerName: string;
  /** The date asked for (the bag as recorded at its end), or null for today's bag. */
  on: string | null;
  clubs: BagClub[];
  ladder: BagLadderRung[];
  checks: BagCheck[];
  /** The player's club speed the estimates use, and where it was measured. */
  speed: { clubSpeedMps: number; lengthIn: number; club: string; fittingId: string; fromBallSpeed: boolean } | null;
  /** A static-fit starting point from the player's height and wrist-to-floor and the shop's table. */
  staticFit: StaticFitStart | null;
  wedgeWearLimits: { rounds: number; practiceSessions: number };
}

/** One recorded change of a bag club. */
export interface BagHistoryItem {
  id: number;
  bagClubId: string;
  action: 'add' | 'update' | 'replace' | 'out' | 'wear';
  changedAt: string;
  changedBy: string | null;
  changedByName: string | null;
  fittingId: string | null;
  /** The club after the change. */
  snapshot: Omit<BagClub, 'carry' | 'wear' | 'updatedAt'>;
}

// ---- from a fitting to the bag -------------------------------------------------------------

/** PUT /api/fittings/:id/chosen-builds */
export const chosenBuildsBodySchema = z.object({
  builds: z
    .array(
      z.object({
        buildId: z.uuid({ message: 'Choose a build of this fitting.' }),
        /** The bag club it replaces; null to add it; left out to let Ovalyard match one. */
        replacesBagClubId: z.uuid().nullish(),
      }),
    )
    .max(40),
  takeOut: z.array(z.uuid()).max(40).default([]),
});
export type ChosenBuildsBody = z.input<typeof chosenBuildsBodySchema>;

/** POST /api/fittings/:id/chosen-builds/confirm */
export const confirmChosenBuildsSchema = z.object({
  /** Per bag club the proposal changes, the version the fitter saw. */
  versions: z.record(z.uuid(), z.number().int().min(1)),
  /** How the new clubs go in. */
  newStatus: bagStatusSchema.exclude(['out']).default('on-order'),
});
export type ConfirmChosenBuildsBody = z.input<typeof confirmChosenBuildsSchema>;

export interface ChosenBuild {
  buildId: string;
  club: string;
  label: string;
  replacesBagClubId: string | null;
}

/** GET /api/fittings/:id/chosen-builds */
export interface ChosenBuildsView {
  fittingId: string;
  playerId: string;
  builds: ChosenBuild[];
  takeOut: string[];
  /** The bag changes the choice makes (empty once confirmed). */
  proposal: BagChange[];
  /** When the fitter confirmed the changes, or null. */
  confirmedAt: string | null;
  /** The proposal could not be made (e.g. a club it names went out since): the reason. */
  problem: string | null;
}
