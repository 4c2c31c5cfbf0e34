import { SHOT_FIELDS, type ShotField } from '@/analysis/fields';
import { FOOT_M as FT, MPH_MPS as MPH, YARD_M as YD } from '@/analysis/units';

/** The smallest difference a fitter cares about, per field, in canonical units. */
export type FieldMargins = Readonly<Record<ShotField, number>>;

/**
 * Default margins, canonical units. Common practice, no source: carry, total and offline 3 yd,
 * ball and club speed 1 mph, launch angle 0.5°, spin (rate, back, side) 150 rpm, smash factor
 * 0.01. Our choices for the rest, at about a monitor's useful resolution of each: launch
 * direction, club path, face angle, face to path, attack angle, dynamic loft and spin loft 0.5°;
 * spin axis 1°; apex height 3 ft; descent angle 1°; flight time 0.1 s. A shop's owner may
 * change every one (server: shop margins).
 */
export const DEFAULT_MARGINS: FieldMargins = {
  clubSpeed: 1 * MPH,
  ballSpeed: 1 * MPH,
  smashFactor: 0.01,
  launchAngle: 0.5,
  launchDirection: 0.5,
  spinRate: 150,
  backSpin: 150,
  sideSpin: 150,
  spinAxis: 1,
  attackAngle: 0.5,
  clubPath: 0.5,
  faceAngle: 0.5,
  faceToPath: 0.5,
  dynamicLoft: 0.5,
  spinLoft: 0.5,
  carry: 3 * YD,
  total: 3 * YD,
  offline: 3 * YD,
  apexHeight: 3 * FT,
  descentAngle: 1,
  flightTime: 0.1,
};

/**
 * The defaults with a shop's own margins on top; a missing, non-finite or non-positive value
 * keeps the default. O(fields).
 * @example resolveMargins({ carry: 4.572 }).carry // => 4.572 (5 yd)
 */
export function resolveMargins(overrides: Partial<Record<ShotField, number>> | null | undefined): FieldMargins {
  const out = { ...DEFAULT_MARGINS } as Record<ShotField, number>;
  if (!overrides) return out;
  for (const field of SHOT_FIELDS) {
    const v = overrides[field];
    if (typeof v === 'number' && Number.isFinite(v) && v > 0) out[field] = v;
  }
  return out;
}
