import { clubInfo } from '@/analysis/clubs';

/**
 * A typical length (in) of a club of this code, for estimates only. Common practice, no source,
 * approximate (never a maker's chart): driver 45.5; woods 43 for a 3 wood, ½ in shorter per
 * number; hybrids 40 for a 4 hybrid, ½ in per number; irons 37 for a 7 iron, ½ in per number;
 * pitching wedge 35.75, other wedges 35.5; putter 34. Null for an unknown code. O(1).
 * @example typicalLengthIn('7I') // => 37
 */
export function typicalLengthIn(code: string): number | null {
  const info = clubInfo(code);
  if (!info) return null;
  const n = Number(code.match(/^(\d)/)?.[1] ?? NaN);
  switch (info.kind) {
    case 'driver':
      return 45.5;
    case 'wood':
      return 43 - 0.5 * (n - 3);
    case 'hybrid':
      return 40 - 0.5 * (n - 4);
    case 'iron':
      return 37 - 0.5 * (n - 7);
    case 'wedge':
      return code === 'PW' ? 35.75 : 35.5;
    case 'putter':
      return 34;
  }
}
