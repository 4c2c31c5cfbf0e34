/**
 * Units of measure: the units a bay file may use, their exact factors to the canonical unit of
 * each dimension, and conversion to and from the canonical units of analysis/fields.ts.
 *
 * Factors are exact where NIST defines them (NIST Special Publication 811, 2008 edition,
 * Appendix B.8): yard = 0.9144 m, foot = 0.3048 m, mile per hour = 0.44704 m/s,
 * kilometre per hour = 1/3.6 m/s, revolution per minute = π/30 rad/s.
 * https://www.nist.gov/pml/special-publication-811
 */
import { FIELD_UNITS, type CanonicalUnit, type ShotField } from '@/analysis/fields';

/** The physical dimension of a unit; each has one canonical unit. */
export type Dimension = 'speed' | 'length' | 'angle' | 'spin' | 'time' | 'ratio';

/** Canonical unit of each dimension (the units of analysis/fields.ts). */
export const CANONICAL_UNIT: Readonly<Record<Dimension, CanonicalUnit>> = {
  speed: 'm/s',
  length: 'm',
  angle: 'deg',
  spin: 'rpm',
  time: 's',
  ratio: 'ratio',
};

/** A known unit: its name as Ovalyard writes it, its dimension and its factor to canonical. */
export interface UnitInfo {
  /** Our name for the unit, e.g. 'yd', 'mph', 'km/h'. */
  unit: string;
  dimension: Dimension;
  /** canonical value = value × factor (every unit here is linear, no offset). */
  factor: number;
  /** Ways files write it (lower case), our name included. */
  aliases: readonly string[];
  label: string;
}

/** Exact factors (NIST SP 811 Appendix B.8; radian factors from the definition of π). */
export const YARD_M = 0.9144;
export const FOOT_M = 0.3048;
export const INCH_M = 0.0254;
export const MPH_MPS = 0.44704;
export const KMH_MPS = 1 / 3.6;
export const RPM_RAD_PER_S = Math.PI / 30;
/** Degrees in one radian (180/π, from the definition of the radian). */
export const DEG_PER_RAD = 180 / Math.PI;

/** Every unit Ovalyard reads, grouped by dimension. */
export const UNITS: readonly UnitInfo[] = [
  { unit: 'm/s', dimension: 'speed', factor: 1, label: 'm/s',
    aliases: ['m/s', 'mps', 'm/sec', 'm s-1', 'ms-1', 'meters per second', 'metres per second', 'meter/second', 'metre/second'] },
  { unit: 'km/h', dimension: 'speed', factor: KMH_MPS, label: 'km/h',
    aliases: ['km/h', 'kph', 'kmh', 'km/hr', 'kmph', 'km h-1', 'kilometers per hour', 'kilometres per hour'] },
  { unit: 'mph', dimension: 'speed', factor: MPH_MPS, label: 'mph',
    aliases: ['mph', 'mi/h', 'mi/hr', 'miles per hour', 'mile per hour'] },
  { unit: 'ft/s', dimension: 'speed', factor: FOOT_M, label: 'ft/s',
    aliases: ['ft/s', 'fps', 'ft/sec', 'feet per second'] },
  { unit: 'm', dimension: 'length', factor: 1, label: 'm',
    aliases: ['m', 'meter', 'meters', 'metre', 'metres', 'mtr', 'mtrs'] },
  { unit: 'yd', dimension: 'length', factor: YARD_M, label: 'yd',
    aliases: ['yd', 'yds', 'yard', 'yards', 'yrd', 'yrds'] },
  { unit: 'ft', dimension: 'length', factor: FOOT_M, label: 'ft',
    aliases: ['ft', 'feet', 'foot', "'"] },
  { unit: 'deg', dimension: 'angle', factor: 1, label: '°',
    aliases: ['deg', 'degs', 'degree', 'degrees', '°', 'º', '˚'] },
  { unit: 'rad', dimension: 'angle', factor: DEG_PER_RAD, label: 'rad',
    aliases: ['rad', 'radian', 'radians'] },
  { unit: 'rpm', dimension: 'spin', factor: 1, label: 'rpm',
    aliases: ['rpm', 'r/min', 'rev/min', 'revs/min', 'revolutions per minute'] },
  { unit: 'rps', dimension: 'spin', factor: 60, label: 'rev/s',
    aliases: ['rps', 'r/s', 'rev/s', 'revolutions per second'] },
  { unit: 'rad/s', dimension: 'spin', factor: 1 / RPM_RAD_PER_S, label: 'rad/s',
    aliases: ['rad/s', 'rad/sec'] },
  { unit: 's', dimension: 'time', factor: 1, label: 's',
    aliases: ['s', 'sec', 'secs', 'second', 'seconds'] },
  { unit: 'ms', dimension: 'time', factor: 0.001, label: 'ms',
    aliases: ['ms', 'msec', 'millisecond', 'milliseconds'] },
  { unit: 'ratio', dimension: 'ratio', factor: 1, label: '',
    aliases: ['ratio', 'x', '×', 'factor'] },
];

const BY_ALIAS: ReadonlyMap<string, UnitInfo> = new Map(
  UNITS.flatMap((info) => info.aliases.map((alias) => [alias, info] as const)),
);

/** Dimension of each canonical field unit. */
const DIMENSION_OF_CANONICAL: Readonly<Record<CanonicalUnit, Dimension>> = {
  'm/s': 'speed',
  m: 'length',
  deg: 'angle',
  rpm: 'spin',
  s: 'time',
  ratio: 'ratio',
};

/** Thrown for a unit Ovalyard does not know, or one of the wrong dimension for a field. */
export class UnitError extends Error {
  readonly code: 'UNKNOWN_UNIT' | 'UNIT_MISMATCH';
  readonly unit: string;
  constructor(code: 'UNKNOWN_UNIT' | 'UNIT_MISMATCH', unit: string, message: string) {
    super(message);
    this.name = 'UnitError';
    this.code = code;
    this.unit = unit;
  }
}

/**
 * Look up a unit by any of its aliases (case-insensitive, surrounding spaces ignored). O(1).
 * @returns the unit, or null when it is not known
 * @example findUnit('Yds') // => { unit: 'yd', dimension: 'length', factor: 0.9144, … }
 */
export function findUnit(text: string): UnitInfo | null {
  const key = text.trim().toLowerCase().replace(/\s+/g, ' ');
  return BY_ALIAS.get(key) ?? BY_ALIAS.get(key.replace(/\.$/, '')) ?? null;
}

/**
 * The unit named by `text`. O(1).
 * @throws UnitError UNKNOWN_UNIT when the unit is not known
 * @example unitInfo('kph').unit // => 'km/h'
 */
export function unitInfo(text: string): UnitInfo {
  const info = findUnit(text);
  if (!info) throw new UnitError('UNKNOWN_UNIT', text, `Unknown unit "${text}"`);
  return info;
}

/** The dimension of a shot field (speed, length, angle, spin, time or ratio). */
export function fieldDimension(field: ShotField): Dimension {
  return DIMENSION_OF_CANONICAL[FIELD_UNITS[field]];
}

/**
 * The factor that takes a value in `unit` to the canonical unit of `field`. O(1).
 * @throws UnitError UNKNOWN_UNIT for an unknown unit, UNIT_MISMATCH when the unit's dimension
 *   is not the field's (e.g. 'mph' for carry)
 * @example unitFactor('yd', 'carry') // => 0.9144
 */
export function unitFactor(unit: string, field: ShotField): number {
  const info = unitInfo(unit);
  const dimension = fieldDimension(field);
  if (info.dimension !== dimension) {
    throw new UnitError(
      'UNIT_MISMATCH',
      unit,
      `Unit "${unit}" is a ${info.dimension} unit; ${field} needs a ${dimension} unit`,
    );
  }
  return info.factor;
}

/**
 * Convert a value from `unit` to the canonical unit of `field`. O(1).
 * @throws UnitError for an unknown unit or one of the wrong dimension
 * @example toCanonical(100, 'mph', 'ballSpeed') // => 44.704
 */
export function toCanonical(value: number, unit: string, field: ShotField): number {
  return value * unitFactor(unit, field);
}

/**
 * Convert a canonical value of `field` to `unit`, for display. O(1).
 * @throws UnitError for an unknown unit or one of the wrong dimension
 * @example fromCanonical(0.9144, 'yd', 'carry') // => 1
 */
export function fromCanonical(value: number, unit: string, field: ShotField): number {
  return value / unitFactor(unit, field);
}

/** The user's display preference: yards/mph/feet or metres/km/h. */
export type UnitSystem = 'imperial' | 'metric';

/**
 * The display unit of every shot field for a unit system. O(fields).
 * Imperial: speeds mph, carry/total/offline yd, apex ft. Metric: speeds km/h, distances m.
 * Angles deg, spin rpm, time s and smash factor are the same in both.
 * @example displayUnits('imperial').apexHeight // => 'ft'
 */
export function displayUnits(system: UnitSystem): Record<ShotField, string> {
  const speed = system === 'imperial' ? 'mph' : 'km/h';
  const distance = system === 'imperial' ? 'yd' : 'm';
  const height = system === 'imperial' ? 'ft' : 'm';
  const out = {} as Record<ShotField, string>;
  for (const field of Object.keys(FIELD_UNITS) as ShotField[]) {
    const dimension = fieldDimension(field);
    out[field] =
      dimension === 'speed' ? speed
      : dimension === 'length' ? (field === 'apexHeight' ? height : distance)
      : CANONICAL_UNIT[dimension];
  }
  return out;
}

/** Whether a unit belongs to the imperial (yd, ft, mph, ft/s) or metric (m, m/s, km/h) system. */
export function unitSystemOf(unit: string): UnitSystem | null {
  const info = findUnit(unit);
  if (!info) return null;
  if (info.unit === 'yd' || info.unit === 'ft' || info.unit === 'mph' || info.unit === 'ft/s') return 'imperial';
  if (info.unit === 'm' || info.unit === 'm/s' || info.unit === 'km/h') return 'metric';
  return null;
}

/** A length or height as a person reads it (a player's height, a club's length). */
export type LengthUnit = 'in' | 'cm';
/** An altitude as a person reads it. */
export type AltitudeUnit = 'ft' | 'm';
/** A temperature as a person reads it (°F or °C). */
export type TemperatureUnit = 'f' | 'c';

/** Centimetres per inch (exact: 1 in = 0.0254 m). */
export const CM_PER_IN = INCH_M * 100;

/**
 * Centimetres in a length unit. O(1).
 * @example cmTo(254, 'in') // => 100
 */
export function cmTo(cm: number, unit: LengthUnit): number {
  return unit === 'cm' ? cm : cm / CM_PER_IN;
}

/** A length in a unit, in centimetres. O(1). @example toCm(100, 'in') // => 254 */
export function toCm(value: number, unit: LengthUnit): number {
  return unit === 'cm' ? value : value * CM_PER_IN;
}

/** Inches in a length unit (club lengths are kept in inches). O(1). @example inchesTo(45, 'cm') // => 114.3 */
export function inchesTo(inches: number, unit: LengthUnit): number {
  return unit === 'in' ? inches : inches * CM_PER_IN;
}

/** A length in a unit, in inches. O(1). @example toInches(114.3, 'cm') // => 45 */
export function toInches(value: number, unit: LengthUnit): number {
  return unit === 'in' ? value : value / CM_PER_IN;
}

/** Metres in an altitude unit (exact: 1 ft = 0.3048 m). O(1). @example metresTo(304.8, 'ft') // => 1000 */
export function metresTo(metres: number, unit: AltitudeUnit): number {
  return unit === 'm' ? metres : metres / FOOT_M;
}

/** An altitude in a unit, in metres. O(1). @example toMetres(1000, 'ft') // => 304.8 */
export function toMetres(value: number, unit: AltitudeUnit): number {
  return unit === 'm' ? value : value * FOOT_M;
}

/** Degrees Celsius in a temperature unit: °F = °C·9/5 + 32. O(1). @example celsiusTo(100, 'f') // => 212 */
export function celsiusTo(celsius: number, unit: TemperatureUnit): number {
  return unit === 'c' ? celsius : (celsius * 9) / 5 + 32;
}

/** A temperature in a unit, in degrees Celsius: °C = (°F − 32)·5/9. O(1). @example toCelsius(212, 'f') // => 100 */
export function toCelsius(value: number, unit: TemperatureUnit): number {
  return unit === 'c' ? value : ((value - 32) * 5) / 9;
}

/** The symbol shown beside a value. */
export const UNIT_SYMBOL: Readonly<Record<LengthUnit | AltitudeUnit | TemperatureUnit, string>> = { in: 'in', cm: 'cm', ft: 'ft', m: 'm', f: '°F', c: '°C' };
