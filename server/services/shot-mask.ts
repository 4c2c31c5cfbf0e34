/** The derived fields of a shot as a bit mask in SHOT_FIELDS order (stored as shots.derived_mask). */
import { SHOT_FIELDS, type ShotField } from '../../analysis/fields';

const FIELD_BIT = new Map<ShotField, number>(SHOT_FIELDS.map((f, i) => [f, 1 << i]));

/** O(derived fields). */
export function derivedMask(derived: readonly ShotField[]): number {
  let mask = 0;
  for (const f of derived) mask |= FIELD_BIT.get(f) ?? 0;
  return mask;
}
