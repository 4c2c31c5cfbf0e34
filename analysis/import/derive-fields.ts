/**
 * Fields computed from others when a file lacks them (the product page's "Canonical data"):
 * smashFactor = ballSpeed / clubSpeed; spinRate = hypot(backSpin, sideSpin);
 * spinAxis = atan2(sideSpin, backSpin) in degrees (+ tilts the ball right, as sideSpin + curves
 * it right); faceToPath = faceAngle − clubPath; spinLoft = dynamicLoft − attackAngle.
 */
import { SHOT_FIELDS, type ShotField, type ShotValues } from '@/analysis/fields';
import { DEG_PER_RAD } from '@/analysis/units';
import { newSlots, SLOT, slotsFromValues, valuesFromSlots } from './shot-slots';

const { ballSpeed, clubSpeed, smashFactor, backSpin, sideSpin, spinRate, spinAxis, faceAngle, clubPath, faceToPath, dynamicLoft, attackAngle, spinLoft } = SLOT;

/**
 * Fill in, in place, every derivable slot that is missing (NaN). A value read from the file is
 * never replaced. O(1).
 * @returns a bit mask of the slots filled (bit i = slot i); see derivedFields
 */
export function deriveSlotsInPlace(s: Float64Array): number {
  let mask = 0;
  if (s[smashFactor] !== s[smashFactor] && s[clubSpeed] > 0 && s[ballSpeed] === s[ballSpeed]) {
    s[smashFactor] = s[ballSpeed] / s[clubSpeed];
    mask |= 1 << smashFactor;
  }
  const back = s[backSpin];
  const side = s[sideSpin];
  if (back === back && side === side) {
    if (s[spinRate] !== s[spinRate]) {
      s[spinRate] = Math.hypot(back, side);
      mask |= 1 << spinRate;
    }
    if (s[spinAxis] !== s[spinAxis] && (back !== 0 || side !== 0)) {
      s[spinAxis] = Math.atan2(side, back) * DEG_PER_RAD;
      mask |= 1 << spinAxis;
    }
  }
  if (s[faceToPath] !== s[faceToPath] && s[faceAngle] === s[faceAngle] && s[clubPath] === s[clubPath]) {
    s[faceToPath] = s[faceAngle] - s[clubPath];
    mask |= 1 << faceToPath;
  }
  if (s[spinLoft] !== s[spinLoft] && s[dynamicLoft] === s[dynamicLoft] && s[attackAngle] === s[attackAngle]) {
    s[spinLoft] = s[dynamicLoft] - s[attackAngle];
    mask |= 1 << spinLoft;
  }
  return mask;
}

const DERIVED_BY_MASK = new Map<number, readonly ShotField[]>();

/**
 * The derived fields of a mask, in SHOT_FIELDS order. The array is frozen and shared by every
 * shot with the same mask (a file derives the same fields for nearly every row, and 100,000
 * shots then hold one array instead of 100,000). O(1) after the first call per mask.
 */
export function derivedFields(mask: number): ShotField[] {
  let fields = DERIVED_BY_MASK.get(mask);
  if (fields === undefined) {
    fields = Object.freeze(SHOT_FIELDS.filter((_, i) => (mask & (1 << i)) !== 0));
    DERIVED_BY_MASK.set(mask, fields);
  }
  return fields as ShotField[];
}

/**
 * The derivable fields a shot lacks, computed from the ones it has. Pure. O(1).
 * @example deriveFields({ backSpin: 3000, sideSpin: 3000 }).values.spinAxis // => 45
 */
export function deriveFields(values: ShotValues): { values: ShotValues; derived: ShotField[] } {
  const slots = slotsFromValues(values, newSlots());
  const mask = deriveSlotsInPlace(slots);
  return { values: valuesFromSlots(slots), derived: [...derivedFields(mask)] };
}
