/**
 * The impact bound at import: a row whose smash factor (read or derived) is more than the
 * impact allows for its club is a misread, not a shot, and is rejected with its reason.
 */
import { clubInfo } from '@/analysis/clubs';
import { smashFactorLimit } from '@/analysis/physics';

/**
 * Why a row's smash factor is a misread for its club, or null when it is not (or the club has
 * no bound: putters). O(1).
 * @example impactMisreadReason('DR', 1.62) // => 'smash factor 1.62 is more than the impact of a driver allows (at most 1.54 with 3% for measurement error): a misread, not a shot'
 */
export function impactMisreadReason(club: string, smashFactor: number): string | null {
  if (!Number.isFinite(smashFactor)) return null;
  const bound = smashFactorLimit(club);
  if (!bound || !(smashFactor > bound.limit)) return null;
  const name = clubInfo(club)?.label.toLowerCase() ?? 'this club';
  const article = /^[aeiou8]/.test(name) ? 'an' : 'a';
  const what = clubInfo(club) ? `${article} ${name}` : name;
  return `smash factor ${smashFactor.toFixed(2)} is more than the impact of ${what} allows (at most ${bound.limit.toFixed(2)} with 3% for measurement error): a misread, not a shot`;
}
