/**
 * Physical limits of a shot's values, in canonical units. A value outside them is not a golf
 * shot (or is in the wrong unit) and rejects its row. One table, two checkers: a zod schema built
 * once (`shotValuesSchema`, for callers that validate whole objects) and a compiled check for the
 * import's hot path (`checkLimit`); a test holds them to the same verdicts.
 *
 * Named in the product's import issue: ball speed ≤ 110 m/s, club speed ≤ ~70 m/s, smash factor
 * ≤ ~1.60, spin ≤ 15,000 rpm, launch angle −20..70°, carry ≥ 0. The other bounds are loose
 * outer limits (common practice, no source): they catch wrong units and broken rows, not mishits.
 */
import { z } from 'zod';
import { FIELD_LABELS, FIELD_UNITS, SHOT_FIELDS, type CanonicalUnit, type ShotField, type ShotValues } from '@/analysis/fields';

export interface Limit {
  min: number;
  max: number;
}

export const SHOT_LIMITS: Readonly<Record<ShotField, Limit>> = {
  clubSpeed: { min: 0, max: 70 },
  ballSpeed: { min: 0, max: 110 },
  smashFactor: { min: 0, max: 1.6 },
  launchAngle: { min: -20, max: 70 },
  launchDirection: { min: -90, max: 90 },
  spinRate: { min: 0, max: 15000 },
  backSpin: { min: -15000, max: 15000 },
  sideSpin: { min: -15000, max: 15000 },
  spinAxis: { min: -90, max: 90 },
  attackAngle: { min: -30, max: 30 },
  clubPath: { min: -45, max: 45 },
  faceAngle: { min: -45, max: 45 },
  faceToPath: { min: -60, max: 60 },
  dynamicLoft: { min: -20, max: 90 },
  spinLoft: { min: -30, max: 120 },
  carry: { min: 0, max: 450 },
  total: { min: 0, max: 500 },
  offline: { min: -250, max: 250 },
  apexHeight: { min: 0, max: 150 },
  descentAngle: { min: 0, max: 90 },
  flightTime: { min: 0, max: 20 },
};

/** Trade words for each field, for messages ("ball speed"). */
export const FIELD_WORDS: Readonly<Record<ShotField, string>> = Object.fromEntries(
  SHOT_FIELDS.map((f) => [f, FIELD_LABELS[f].toLowerCase()]),
) as Record<ShotField, string>;

/** A column target in words: "ball speed", "the club", "the build". */
export function targetWords(target: ShotField | 'club' | 'build' | 'ignore'): string {
  if (target === 'club') return 'the club';
  if (target === 'build') return 'the build';
  if (target === 'ignore') return 'nothing Ovalyard keeps';
  return FIELD_WORDS[target];
}

const UNIT_SUFFIX: Readonly<Record<CanonicalUnit, string>> = {
  'm/s': ' m/s',
  m: ' m',
  deg: '°',
  rpm: ' rpm',
  s: ' s',
  ratio: '',
};

/** Zod schema of canonical shot values within their limits (every field optional). Built once. */
export const shotValuesSchema = z
  .object(
    Object.fromEntries(
      SHOT_FIELDS.map((f) => [f, z.number().min(SHOT_LIMITS[f].min).max(SHOT_LIMITS[f].max).optional()]),
    ) as Record<ShotField, z.ZodOptional<z.ZodNumber>>,
  )
  .strict();

function format(value: number): string {
  return Number.isInteger(value) ? String(value) : value.toFixed(Math.abs(value) < 10 ? 2 : 1);
}

/**
 * Check one canonical value against its field's limits. O(1).
 * @returns null when within the limits, else the reason in plain words
 * @example checkLimit('ballSpeed', 112) // => 'ball speed 112 m/s is above the limit of 110 m/s'
 */
export function checkLimit(field: ShotField, value: number): string | null {
  const { min, max } = SHOT_LIMITS[field];
  if (value >= min && value <= max) return null;
  const unit = UNIT_SUFFIX[FIELD_UNITS[field]];
  if (value !== value) return `${FIELD_WORDS[field]} is not a number`;
  return value < min
    ? `${FIELD_WORDS[field]} ${format(value)}${unit} is below the limit of ${min}${unit}`
    : `${FIELD_WORDS[field]} ${format(value)}${unit} is above the limit of ${max}${unit}`;
}

/**
 * Check every value of a shot against the limits (the compiled twin of shotValuesSchema). O(fields).
 * @returns the first field out of its limits with the reason, or null
 */
export function checkShotValues(values: ShotValues): { field: ShotField; reason: string } | null {
  for (const field of SHOT_FIELDS) {
    const v = values[field];
    if (v === undefined) continue;
    const reason = checkLimit(field, v);
    if (reason) return { field, reason };
  }
  return null;
}
