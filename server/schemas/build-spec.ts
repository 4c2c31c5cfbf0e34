import { z } from 'zod';

/**
 * The spec fields of a build, shared by a fitting's builds and a player's bag clubs. Physical
 * ranges (a value outside is refused, naming the field): loft 0–70°, lie 40–80°, length
 * 28–50 in, no negative mass. Hosel changes are the numbers the fitter reads off the head
 * maker's own chart for the setting — Ovalyard ships no such table.
 */
const text = (max: number) => z.string().trim().max(max, `Keep it to ${max} characters.`).nullish();
const range = (label: string, min: number, max: number, unit: string) =>
  z
    .number({ message: `${label} must be a number.` })
    .min(min, `${label} must lie between ${min}${unit} and ${max}${unit}.`)
    .max(max, `${label} must lie between ${min}${unit} and ${max}${unit}.`)
    .nullish();
const mass = (label: string, max: number) =>
  z.number({ message: `${label} must be a number.` }).min(0, `${label} cannot be negative.`).max(max, `${label} must be at most ${max} g.`).nullish();

export const SPEC_RANGES = {
  loftDeg: [0, 70],
  lieDeg: [40, 80],
  lengthIn: [28, 50],
} as const;

export const buildSpecFields = {
  head: text(120),
  loftDeg: range('Loft', SPEC_RANGES.loftDeg[0], SPEC_RANGES.loftDeg[1], '°'),
  hoselSetting: text(60),
  /** Loft change of the hosel setting (deg, + adds loft), as the fitter enters it. */
  hoselLoftChangeDeg: range('Hosel loft change', -10, 10, '°'),
  /** Lie change of the hosel setting (deg, + more upright). */
  hoselLieChangeDeg: range('Hosel lie change', -10, 10, '°'),
  /** Face-angle change of the hosel setting (deg, + more open). */
  hoselFaceChangeDeg: range('Hosel face change', -10, 10, '°'),
  lieDeg: range('Lie', SPEC_RANGES.lieDeg[0], SPEC_RANGES.lieDeg[1], '°'),
  lengthIn: range('Length', SPEC_RANGES.lengthIn[0], SPEC_RANGES.lengthIn[1], ' in'),
  shaft: text(120),
  shaftWeightG: mass('Shaft weight', 200),
  shaftFlex: text(20),
  torqueDeg: range('Torque', 0, 10, '°'),
  grip: text(120),
  gripSize: text(40),
  swingWeight: text(10),
  totalWeightG: mass('Total weight', 800),
  /** Balance point from the grip end (in), for the swing weight on the 14-inch scale. */
  balancePointIn: range('Balance point', 14, 50, ' in'),
  addedMassG: mass('Added mass', 60),
  addedMassWhere: text(60),
  notes: z.string().trim().max(2000, 'Keep the notes to 2,000 characters.').nullish(),
};

export const buildSpecSchema = z.object(buildSpecFields);
export type BuildSpecBody = z.output<typeof buildSpecSchema>;

/** The keys of a build spec, in workshop order. */
export const BUILD_SPEC_KEYS = Object.keys(buildSpecFields) as (keyof typeof buildSpecFields)[];

/** A spec as the API answers it: every key, null where unset. */
export type BuildSpecValues = { [K in keyof BuildSpecBody]-?: Exclude<BuildSpecBody[K], undefined> };
