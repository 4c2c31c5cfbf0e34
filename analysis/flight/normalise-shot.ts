import type { ShotField, ShotValues } from '@/analysis/fields';
import type { Conditions } from './conditions';
import { FLIGHT_FIELDS, flightFieldValue } from './fill-flight-fields';
import { launchFromShot } from './launch-from-shot';
import { simulateFlight, type FlightOptions } from './simulate-flight';

/** A shot carried over to other conditions. */
export interface NormalisedShot {
  values: ShotValues;
  /** Fields the shot lacked, filled from the model in the `to` conditions. */
  derived: ShotField[];
  /** Measured fields adjusted to the `to` conditions. */
  normalised: ShotField[];
}

/** Fields adjusted by adding the model's change rather than scaling by its ratio. */
const ADDITIVE: ReadonlySet<ShotField> = new Set<ShotField>(['offline', 'descentAngle']);

/**
 * Carry a shot's measured flight over from the conditions it was hit in (`from`, e.g. an
 * indoor bay) to other conditions (`to`, e.g. the player's course). Approach: the model flies
 * the shot's launch in both conditions, and each measured value is corrected by the model's
 * change, so the measurement's own error is kept and only the effect of the air is applied:
 * - carry, apexHeight and flightTime are scaled by the ratio model(to) / model(from);
 * - offline and descentAngle are shifted by the difference model(to) − model(from) (a ratio is
 *   unstable near zero offline and has no meaning for an angle);
 * - total follows: the measured carry's new value plus the measured roll (total − carry) shifted
 *   by the model's change of roll (the ground firmness of `from` and `to` counts here); a total
 *   measured without carry is shifted by the model's change of total.
 * Flight fields the shot lacks are filled from the model in `to` (offline only when the
 * launch direction and spin axis are known) and listed as derived. Returns the input
 * unchanged when the launch inputs are missing. O(two trajectories).
 * @throws RangeError when a launch or air value is out of range
 * @example normaliseShot({ ballSpeed: 74.65, launchAngle: 10.9, spinRate: 2686, carry: 235 }, {}, { altitudeM: 1600 })
 *   // => { values: { …, carry: ≈ 246 }, normalised: ['carry'], derived: ['apexHeight', 'descentAngle', 'flightTime'] }
 */
export function normaliseShot(
  values: ShotValues,
  from: Conditions,
  to: Conditions,
  options?: FlightOptions,
): NormalisedShot {
  const shot = launchFromShot(values);
  if (!shot) return { values, derived: [], normalised: [] };
  const before = simulateFlight(shot.launch, from, options);
  const after = simulateFlight(shot.launch, to, options);
  const result: ShotValues = { ...values };
  const derived: ShotField[] = [];
  const normalised: ShotField[] = [];
  for (const field of FLIGHT_FIELDS) {
    const measured = values[field];
    if (field === 'total' && measured !== undefined) continue; // after the loop, once carry is known
    const modelFrom = flightFieldValue(before, field);
    const modelTo = flightFieldValue(after, field);
    if (measured === undefined) {
      if (field === 'offline' && !shot.sideKnown) continue;
      result[field] = field === 'total' && values.carry !== undefined ? result.carry! + after.rollM : modelTo;
      derived.push(field);
    } else if (ADDITIVE.has(field)) {
      result[field] = measured + (modelTo - modelFrom);
      normalised.push(field);
    } else if (modelFrom > 0) {
      result[field] = measured * (modelTo / modelFrom);
      normalised.push(field);
    }
  }
  if (values.total !== undefined) {
    result.total =
      values.carry !== undefined
        ? result.carry! + (values.total - values.carry) + (after.rollM - before.rollM)
        : values.total + (after.totalM - before.totalM);
    if (result.total !== values.total) normalised.push('total');
  }
  return { values: result, derived, normalised };
}
