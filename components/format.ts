import { celsiusTo, metresTo, UNIT_SYMBOL, type AltitudeUnit, type TemperatureUnit } from '@/analysis/units';
import type { Role } from '@/server/schemas';

/** An altitude (kept in m) or a temperature (kept in °C) in the user's unit, to a tenth: "5249.3 ft", "86 °F". */
export function formatAir(value: number, quantity: 'altitude' | 'temperature', me: { altitudeUnit: AltitudeUnit; temperatureUnit: TemperatureUnit }): string {
  const shown = quantity === 'altitude' ? metresTo(value, me.altitudeUnit) : celsiusTo(value, me.temperatureUnit);
  return `${Math.round(shown * 10) / 10} ${UNIT_SYMBOL[quantity === 'altitude' ? me.altitudeUnit : me.temperatureUnit]}`;
}

/**
 * A handicap index as golfers write it: a negative stored value is a "plus" handicap (+2.0).
 * Common practice, no source.
 */
export function formatHandicap(handicap: number | null): string {
  if (handicap === null) return 'No handicap';
  if (handicap < 0) return `+${Math.abs(handicap).toFixed(1)}`;
  return handicap.toFixed(1);
}

export const formatHandedness = (h: 'right' | 'left'): string => (h === 'right' ? 'Right-handed' : 'Left-handed');

export const formatVenue = (v: 'indoor' | 'outdoor'): string => (v === 'indoor' ? 'Indoor bay' : 'Outdoor range');

export const formatRole = (role: Role): string => ({ owner: 'Owner', fitter: 'Fitter', player: 'Player' })[role];

const MONTHS = ['Jan', 'Feb', 'Mar', 'Apr', 'May', 'Jun', 'Jul', 'Aug', 'Sep', 'Oct', 'Nov', 'Dec'];

/** "2025-04-03" → "3 Apr 2025" (the calendar date as stored; no time zone shift). */
export function formatDate(isoDate: string): string {
  const m = /^(\d{4})-(\d{2})-(\d{2})/.exec(isoDate);
  if (!m) return isoDate;
  const month = MONTHS[Number(m[2]) - 1];
  return month ? `${Number(m[3])} ${month} ${m[1]}` : isoDate;
}

/** Today's calendar date in the browser's time zone, as YYYY-MM-DD. */
export function todayIsoDate(now: Date = new Date()): string {
  const pad = (n: number) => String(n).padStart(2, '0');
  return `${now.getFullYear()}-${pad(now.getMonth() + 1)}-${pad(now.getDate())}`;
}

export const plural = (n: number, one: string, many = `${one}s`): string => `${n} ${n === 1 ? one : many}`;

/** An instant in the browser's time zone: "3 Dec 2026, 14:05". */
export function formatDateTime(iso: string): string {
  const d = new Date(iso);
  if (Number.isNaN(d.getTime())) return iso;
  const pad = (n: number) => String(n).padStart(2, '0');
  return `${d.getDate()} ${MONTHS[d.getMonth()]} ${d.getFullYear()}, ${pad(d.getHours())}:${pad(d.getMinutes())}`;
}
