/**
 * The shop margins form: canonical margins as text in the user's units and back. A box left
 * empty, or at the default, keeps the default (nothing is stored for it). Pure.
 */
import { FIELD_LABELS, SHOT_FIELDS, type ShotField } from '@/analysis/fields';
import { displayUnits, fromCanonical, toCanonical, type UnitSystem } from '@/analysis/units';
import type { ShopMarginsBody, ShopMarginsView } from '@/server/schemas';
import { parseOptionalNumber } from '../forms';

export type MarginTexts = Record<ShotField | 'fairwayWidthM' | 'greenRadiusM', string>;

/** The fields in groups, as the form shows them. */
export const MARGIN_GROUPS: readonly { title: string; fields: readonly ShotField[] }[] = [
  { title: 'Distance', fields: ['carry', 'total', 'offline', 'apexHeight'] },
  { title: 'Speed', fields: ['clubSpeed', 'ballSpeed', 'smashFactor'] },
  { title: 'Launch and spin', fields: ['launchAngle', 'launchDirection', 'spinRate', 'backSpin', 'sideSpin', 'spinAxis', 'descentAngle', 'flightTime'] },
  { title: 'Delivery', fields: ['attackAngle', 'clubPath', 'faceAngle', 'faceToPath', 'dynamicLoft', 'spinLoft'] },
];

/** A canonical margin in the user's unit, as short text ("3", "0.5", "0.01"). */
export function marginText(field: ShotField, value: number, units: UnitSystem): string {
  const unit = displayUnits(units)[field];
  const shown = field === 'smashFactor' ? value : fromCanonical(value, unit, field);
  return String(Number(shown.toPrecision(6)));
}

/** A distance for the odds targets in the user's unit (yd or m). */
const distanceText = (m: number, units: UnitSystem) => marginText('carry', m, units);

/** The form's texts from what the shop uses. O(fields). */
export function marginTexts(view: ShopMarginsView, units: UnitSystem): MarginTexts {
  const out = {} as MarginTexts;
  for (const f of SHOT_FIELDS) out[f] = marginText(f, view.margins[f], units);
  out.fairwayWidthM = distanceText(view.fairwayWidthM, units);
  out.greenRadiusM = distanceText(view.greenRadiusM, units);
  return out;
}

const same = (a: number, b: number) => Math.abs(a - b) <= 1e-6 * Math.max(Math.abs(a), Math.abs(b));

/**
 * The body to save from the form's texts: only margins that differ from the defaults, in
 * canonical units; or the fields that are not numbers. O(fields).
 * @example marginBody({ ...texts, carry: '5' }, view, 'imperial').body?.margins.carry // => 4.572
 */
export function marginBody(texts: MarginTexts, view: ShopMarginsView, units: UnitSystem): { body: ShopMarginsBody | null; errors: Record<string, string> } {
  const errors: Record<string, string> = {};
  const margins: Partial<Record<ShotField, number>> = {};
  for (const f of SHOT_FIELDS) {
    const n = parseOptionalNumber(texts[f]);
    if (n === null) continue;
    if (!(n > 0)) {
      errors[f] = `Enter a number above 0 for ${FIELD_LABELS[f].toLowerCase()}, or leave it empty for the default.`;
      continue;
    }
    const canonical = f === 'smashFactor' ? n : toCanonical(n, displayUnits(units)[f], f);
    if (!same(canonical, view.defaults[f])) margins[f] = canonical;
  }
  const distance = (key: 'fairwayWidthM' | 'greenRadiusM', fallback: number): number | null => {
    const n = parseOptionalNumber(texts[key]);
    if (n === null) return null;
    if (!(n > 0)) {
      errors[key] = 'Enter a number above 0, or leave it empty for the default.';
      return null;
    }
    const m = toCanonical(n, displayUnits(units).carry, 'carry');
    return same(m, fallback) ? null : m;
  };
  const fairwayWidthM = distance('fairwayWidthM', view.defaultFairwayWidthM);
  const greenRadiusM = distance('greenRadiusM', view.defaultGreenRadiusM);
  if (Object.keys(errors).length) return { body: null, errors };
  return { body: { margins, fairwayWidthM, greenRadiusM }, errors };
}
