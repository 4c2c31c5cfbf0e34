/**
 * A shot's values as a fixed row of 21 slots (one per canonical field, in SHOT_FIELDS order;
 * NaN = missing) while a row is being read, and the plain object they become. The object is
 * written field by field with named stores in one fixed order, which V8 turns into one compact
 * object shape; adding fields by computed key (`values[field] = x`) to `{}` measured two to
 * three times slower for 100,000 shots (see scripts/bench/import.ts).
 */
import { SHOT_FIELDS, type ShotField, type ShotValues } from '@/analysis/fields';

/** Slot index of each canonical field (its index in SHOT_FIELDS). */
export const SLOT: Readonly<Record<ShotField, number>> = {
  clubSpeed: 0,
  ballSpeed: 1,
  smashFactor: 2,
  launchAngle: 3,
  launchDirection: 4,
  spinRate: 5,
  backSpin: 6,
  sideSpin: 7,
  spinAxis: 8,
  attackAngle: 9,
  clubPath: 10,
  faceAngle: 11,
  faceToPath: 12,
  dynamicLoft: 13,
  spinLoft: 14,
  carry: 15,
  total: 16,
  offline: 17,
  apexHeight: 18,
  descentAngle: 19,
  flightTime: 20,
};

export const SLOT_COUNT = SHOT_FIELDS.length;

/** Fresh slots, all missing. */
export function newSlots(): Float64Array {
  return new Float64Array(SLOT_COUNT).fill(NaN);
}

/** Slots from a values object (fields it lacks are NaN). O(fields). */
export function slotsFromValues(values: ShotValues, slots: Float64Array = newSlots()): Float64Array {
  slots.fill(NaN);
  for (let i = 0; i < SLOT_COUNT; i++) {
    const v = values[SHOT_FIELDS[i]];
    if (v !== undefined) slots[i] = v;
  }
  return slots;
}

interface ValuesFromSlots {
  new (s: Float64Array): ShotValues;
}

/**
 * Constructor of a values object. A constructor (rather than `{}` and stores) lets V8 size
 * the object to hold every field inline; its prototype is Object.prototype, so what it builds
 * is a plain object in every respect (prototype, constructor, keys, JSON).
 */
const ValuesObject = function (this: Record<string, number>, s: Float64Array) {
  if (s[0] === s[0]) this.clubSpeed = s[0];
  if (s[1] === s[1]) this.ballSpeed = s[1];
  if (s[2] === s[2]) this.smashFactor = s[2];
  if (s[3] === s[3]) this.launchAngle = s[3];
  if (s[4] === s[4]) this.launchDirection = s[4];
  if (s[5] === s[5]) this.spinRate = s[5];
  if (s[6] === s[6]) this.backSpin = s[6];
  if (s[7] === s[7]) this.sideSpin = s[7];
  if (s[8] === s[8]) this.spinAxis = s[8];
  if (s[9] === s[9]) this.attackAngle = s[9];
  if (s[10] === s[10]) this.clubPath = s[10];
  if (s[11] === s[11]) this.faceAngle = s[11];
  if (s[12] === s[12]) this.faceToPath = s[12];
  if (s[13] === s[13]) this.dynamicLoft = s[13];
  if (s[14] === s[14]) this.spinLoft = s[14];
  if (s[15] === s[15]) this.carry = s[15];
  if (s[16] === s[16]) this.total = s[16];
  if (s[17] === s[17]) this.offline = s[17];
  if (s[18] === s[18]) this.apexHeight = s[18];
  if (s[19] === s[19]) this.descentAngle = s[19];
  if (s[20] === s[20]) this.flightTime = s[20];
} as unknown as ValuesFromSlots;
ValuesObject.prototype = Object.prototype;

/**
 * The plain values object of a row of slots: every slot that is not NaN, in SHOT_FIELDS order.
 * O(fields).
 */
export function valuesFromSlots(s: Float64Array): ShotValues {
  return new ValuesObject(s);
}
