import type { StrayFlag, StrayShot } from './find-strays';

/** Formats a distance given in metres, unit included (the caller picks yards or metres). */
export type DistanceFormatter = (metres: number) => string;

/** Whole metres, e.g. "148 m": the default when no formatter is passed. */
export const formatMetres: DistanceFormatter = (metres) => `${Math.round(metres)} m`;

function signed(x: number, digits: number): string {
  const text = Math.abs(x).toFixed(digits);
  if (Number(text) === 0) return text;
  return x < 0 ? `−${text}` : `+${text}`;
}

/**
 * One flag in plain words, e.g. "carry 112 m is far short of this group's median 148 m
 * (modified z −5.2)". Distances go through formatDistance. O(1).
 * @example describeStrayFlag({ rule: 'smashFactor', value: 1.21, median: 1.45, modifiedZ: -6 }) // => "smash factor 1.21 is far below this group's median 1.45 (modified z −6.0)"
 */
export function describeStrayFlag(flag: StrayFlag, formatDistance: DistanceFormatter = formatMetres): string {
  if (flag.rule !== 'ground') {
    const z = signed(flag.modifiedZ, 1);
    if (flag.rule === 'carry') {
      const side = flag.value < flag.median ? 'far short of' : 'far beyond';
      return `carry ${formatDistance(flag.value)} is ${side} this group's median ${formatDistance(flag.median)} (modified z ${z})`;
    }
    const side = flag.value < flag.median ? 'far below' : 'far above';
    return `smash factor ${flag.value.toFixed(2)} is ${side} this group's median ${flag.median.toFixed(2)} (modified z ${z})`;
  }
  const parts: string[] = [];
  const across = flag.offlineFromCenterM;
  const along = flag.carryFromCenterM;
  if (Math.abs(across) >= 0.5) parts.push(`${formatDistance(Math.abs(across))} ${across > 0 ? 'right' : 'left'}`);
  if (Math.abs(along) >= 0.5) parts.push(`${formatDistance(Math.abs(along))} ${along > 0 ? 'long' : 'short'}`);
  const where = parts.length > 0 ? `${parts.join(' and ')} of its median centre` : 'at its median centre';
  return `lands far from this group's pattern: ${where} (robust distance ${flag.distance.toFixed(1)}, limit ${flag.limit.toFixed(1)})`;
}

/**
 * All of a stray's flags in plain words, joined by "; ". O(flags).
 * @example describeStray({ row: 5, flags: [carryFlag, groundFlag] }) // => "carry 112 m is far short …; lands far from …"
 */
export function describeStray(stray: StrayShot, formatDistance: DistanceFormatter = formatMetres): string {
  return stray.flags.map((flag) => describeStrayFlag(flag, formatDistance)).join('; ');
}
