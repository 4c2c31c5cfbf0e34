import { buildChangeEffect, parseSwingWeight, swingWeightLabel, swingWeightPoints } from '@/analysis/workshop';
import { specNumber } from './build-summary';

/** The saved values a change is measured from, and the values as typed (null when blank). */
export type EffectInput = {
  saved: { addedMassG: number | null; lengthIn: number | null; swingWeight: string | null };
  typed: { addedMassG: number | null; addedMassWhere: string | null; lengthIn: number | null; totalWeightG: number | null; balancePointIn: number | null };
};

const signed = (n: number, digits = 1) => {
  const r = Math.round(n * 10 ** digits) / 10 ** digits;
  return r > 0 ? `+${specNumber(r)}` : r < 0 ? `−${specNumber(-r)}` : '0';
};
const points = (p: number) => `about ${signed(p)} swing-weight point${Math.abs(Math.round(p * 10) / 10) === 1 ? '' : 's'}`;

/**
 * What a change to a build does, in plain lines, by the workshop rules of thumb (common
 * practice: 2 g at the head per swing-weight point, 3 points and 1° of lie per ½ in of
 * length) and the 14-inch swing-weight scale for a total weight and balance point. O(1).
 * @example workshopEffectLines({ saved: { addedMassG: null, lengthIn: 45.75, swingWeight: 'D2' }, typed: { addedMassG: 4, addedMassWhere: 'heel', lengthIn: 45.75, … } })[0] // => '+4 g at the heel: about +2 swing-weight points'
 */
export function workshopEffectLines({ saved, typed }: EffectInput): string[] {
  const lines: string[] = [];
  const massChange = (typed.addedMassG ?? 0) - (saved.addedMassG ?? 0);
  const lengthChange = typed.lengthIn !== null && saved.lengthIn !== null ? typed.lengthIn - saved.lengthIn : null;
  const effect = buildChangeEffect({ addedMassG: massChange, lengthChangeIn: lengthChange });
  if (effect.massPoints !== null) {
    const where = typed.addedMassWhere?.trim();
    lines.push(`${signed(massChange)} g${where ? ` at the ${where}` : ''}: ${points(effect.massPoints)}`);
  }
  if (effect.lengthPoints !== null && lengthChange !== null && effect.lieDeg !== null) {
    const lie = `${specNumber(Math.abs(Math.round(effect.lieDeg * 10) / 10))}° ${effect.lieDeg > 0 ? 'more upright' : 'flatter'}`;
    lines.push(`${signed(lengthChange, 3)} in of length: ${points(effect.lengthPoints)}; about ${lie} keeps the sole level`);
  }
  const before = parseSwingWeight(saved.swingWeight);
  if (before !== null && effect.totalPoints !== null) {
    const after = swingWeightLabel(before + effect.totalPoints);
    if (after) lines.push(`Swing weight ${saved.swingWeight?.trim().toUpperCase()} → about ${after}`);
  }
  if (typed.totalWeightG !== null && typed.balancePointIn !== null && typed.totalWeightG > 0) {
    const label = swingWeightLabel(swingWeightPoints(typed.totalWeightG, typed.balancePointIn));
    if (label) lines.push(`${specNumber(typed.totalWeightG)} g balancing ${specNumber(typed.balancePointIn)} in from the grip end: ${label} on the 14-inch scale`);
  }
  return lines;
}
