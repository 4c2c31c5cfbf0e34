import { clubInfo, compareClubs } from '@/analysis/clubs';

/**
 * The largest step of typical loft between two clubs that can sit next to each other in a bag:
 * adjacent clubs of a set differ by about 3–5° (common practice, no source), so a bigger step
 * means a club between them was left out.
 */
export const NEIGHBOUR_LOFT_STEP_DEG = 6;

/**
 * Whether two clubs, `longer` before `shorter` in bag order, are neighbours, so that the carry
 * gap between them means something. With `bag` (the player's clubs, any order): neighbours
 * when no club of the bag lies strictly between them in bag order. Without: neighbours when no
 * club a set would normally hold was skipped — numbered irons and hybrids one apart, woods at
 * most two apart (a 3 and a 5 wood are common), and otherwise typical lofts at most
 * NEIGHBOUR_LOFT_STEP_DEG apart. O(bag).
 * @example areNeighbours('DR', '7I') // => false (the clubs between were not hit)
 * @example areNeighbours('7I', '8I') // => true
 * @example areNeighbours('5H', '7I', ['DR', '3W', '5H', '7I', '8I']) // => true (no 6-iron in the bag)
 */
export function areNeighbours(longer: string, shorter: string, bag?: readonly string[]): boolean {
  if (bag) {
    for (const club of bag) {
      if (club === longer || club === shorter) continue;
      if (compareClubs(longer, club) < 0 && compareClubs(club, shorter) < 0) return false;
    }
    return true;
  }
  const a = clubInfo(longer);
  const b = clubInfo(shorter);
  if (!a || !b) return false;
  const number = (code: string) => Number(code.replace(/\D/g, ''));
  if (a.kind === b.kind && (a.kind === 'iron' || a.kind === 'hybrid')) return number(shorter) - number(longer) === 1;
  if (a.kind === 'wood' && b.kind === 'wood') return number(shorter) - number(longer) <= 2;
  return Math.abs(b.typicalLoftDeg - a.typicalLoftDeg) <= NEIGHBOUR_LOFT_STEP_DEG;
}
