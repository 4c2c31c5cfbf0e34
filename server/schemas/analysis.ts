import { z } from 'zod';
import type { Conditions } from '../../analysis/flight/conditions';
import { groundFirmnessSchema } from './fittings';
import type { SessionAnalysis } from '../../analysis/session/session-types';

/** One shot as the dispersion plot needs it (canonical units). */
export interface PlotShot {
  id: number;
  bayFileId: string;
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
  /** Flagged by the stray rules (strays and decisions name shot ids here). */
  stray: boolean;
}

/** GET /api/fittings/:id/analysis */
export interface FittingAnalysis {
  analysis: SessionAnalysis;
  /** The fitting's measured air and ground, and the conditions the figures were carried over to (if any). */
  air: { measured: Conditions; normalisedTo: Conditions | null };
  shots: PlotShot[];
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
  })
  .refine((q) => (q.a === undefined) === (q.b === undefined), { message: 'Give both builds to compare (a and b).', path: ['b'] });
