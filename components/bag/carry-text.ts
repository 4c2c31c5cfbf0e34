import { distanceText } from '@/analysis/bag';
import type { UnitSystem } from '@/analysis/units';
import type { BagCarry } from '@/server/schemas';
import { formatDate } from '../format';

/** A bag club's carry with where it comes from: "183 yd, hit on 29 Nov 2026", "150 yd, estimate", "none yet". */
export function carryText(carry: BagCarry | null, units: UnitSystem): string {
  if (!carry) return 'none yet';
  const d = distanceText(carry.carryM, units);
  if (carry.source === 'hit') return `${d}, hit${carry.fittingDate ? ` on ${formatDate(carry.fittingDate)}` : ''}`;
  if (carry.source === 'entered') return `${d}, entered`;
  return `${d}, estimate${carry.loftFrom === 'typical' ? ' (typical loft)' : ''}`;
}
