import { parseSwingWeight, swingWeightLabel, swingWeightPoints } from '@/analysis/workshop';

/** The spec of a build or bag club, as the bag, the spec sheet and its PDF print it. */
export interface PrintableSpec {
  head: string | null;
  loftDeg: number | null;
  hoselSetting: string | null;
  hoselLoftChangeDeg: number | null;
  hoselLieChangeDeg: number | null;
  hoselFaceChangeDeg: number | null;
  lieDeg: number | null;
  lengthIn: number | null;
  shaft: string | null;
  shaftWeightG: number | null;
  shaftFlex: string | null;
  torqueDeg: number | null;
  grip: string | null;
  gripSize: string | null;
  swingWeight: string | null;
  totalWeightG: number | null;
  balancePointIn: number | null;
  addedMassG: number | null;
  addedMassWhere: string | null;
  notes: string | null;
}

/** A spec number as written: at most three decimals (lengths come in eighths), no trailing zeros. */
export const specNumber = (n: number): string => String(Math.round(n * 1000) / 1000);
const signed = (n: number): string => (n > 0 ? `+${specNumber(n)}` : n < 0 ? `−${specNumber(-n)}` : '0');
const text = (s: string | null | undefined): string | null => (s && s.trim() ? s.trim() : null);
const join = (parts: (string | null)[], sep = ', '): string | null => {
  const kept = parts.filter((p): p is string => Boolean(p));
  return kept.length ? kept.join(sep) : null;
};

/**
 * The spec as labelled rows in workshop order, leaving out what is not set: head, loft, hosel
 * setting (with the loft, lie and face changes the fitter entered), lie, length, shaft, grip,
 * swing weight (and the one worked out from total weight and balance point on the 14-inch
 * scale, when both are given), total weight, added mass, notes. O(1).
 * @example specRows({ ...blank, hoselSetting: '+1', hoselLoftChangeDeg: 1 }) // => [{ label: 'Hosel setting', value: '+1 (loft +1°)' }]
 */
export function specRows(spec: PrintableSpec): { label: string; value: string }[] {
  const hoselChanges = join([
    spec.hoselLoftChangeDeg == null ? null : `loft ${signed(spec.hoselLoftChangeDeg)}°`,
    spec.hoselLieChangeDeg == null ? null : `lie ${signed(spec.hoselLieChangeDeg)}°`,
    spec.hoselFaceChangeDeg == null ? null : `face ${signed(spec.hoselFaceChangeDeg)}°`,
  ]);
  const hosel = text(spec.hoselSetting);
  let worked: string | null = null;
  if (spec.totalWeightG != null && spec.balancePointIn != null && spec.totalWeightG > 0) {
    const label = swingWeightLabel(swingWeightPoints(spec.totalWeightG, spec.balancePointIn));
    if (label) worked = `${label} from ${specNumber(spec.totalWeightG)} g balancing at ${specNumber(spec.balancePointIn)} in`;
  }
  const entered = text(spec.swingWeight);
  const rows: [string, string | null][] = [
    ['Head', text(spec.head)],
    ['Loft', spec.loftDeg == null ? null : `${specNumber(spec.loftDeg)}°`],
    ['Hosel setting', hosel ? (hoselChanges ? `${hosel} (${hoselChanges})` : hosel) : hoselChanges],
    ['Lie', spec.lieDeg == null ? null : `${specNumber(spec.lieDeg)}°`],
    ['Length', spec.lengthIn == null ? null : `${specNumber(spec.lengthIn)} in`],
    [
      'Shaft',
      join(
        [text(spec.shaft), spec.shaftWeightG == null ? null : `${specNumber(spec.shaftWeightG)} g`, text(spec.shaftFlex) && `flex ${text(spec.shaftFlex)}`, spec.torqueDeg == null ? null : `${specNumber(spec.torqueDeg)}° torque`],
        ' · ',
      ),
    ],
    ['Grip', join([text(spec.grip), text(spec.gripSize)], ' · ')],
    ['Swing weight', entered && worked && parseSwingWeight(entered) !== null ? `${entered} (${worked})` : (entered ?? worked)],
    ['Total weight', spec.totalWeightG == null ? null : `${specNumber(spec.totalWeightG)} g`],
    ['Added mass', spec.addedMassG == null ? (text(spec.addedMassWhere) ? `at ${text(spec.addedMassWhere)}` : null) : `${specNumber(spec.addedMassG)} g${text(spec.addedMassWhere) ? ` at ${text(spec.addedMassWhere)}` : ''}`],
    ['Notes', text(spec.notes)],
  ];
  return rows.filter((r): r is [string, string] => r[1] !== null).map(([label, value]) => ({ label, value }));
}
