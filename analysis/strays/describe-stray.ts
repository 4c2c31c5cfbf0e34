import { fromCanonical, type UnitSystem } from '@/analysis/units';
import type { StrayFlag, StrayKind, StrayShot } from './find-strays';

/** The fields a stray's reason writes with a unit the user chooses. */
export type StrayUnitField = 'carry' | 'offline' | 'ballSpeed';

/** Writes a canonical value (m, m/s) with its unit, in the user's units ("148 m", "131 mph"). */
export type StrayValueFormatter = (value: number, field: StrayUnitField) => string;

/** Canonical units: whole metres ("148 m") and m/s to 0.1 ("58.1 m/s"); the default. */
export const formatCanonical: StrayValueFormatter = (value, field) =>
  field === 'ballSpeed' ? `${value.toFixed(1)} m/s` : `${Math.round(value)} m`;

/**
 * Values in a user's units: whole yards or metres, mph or km/h to 0.1. O(1).
 * @example strayFormatterFor('imperial')(9.144, 'carry') // => '10 yd'
 */
export function strayFormatterFor(units: UnitSystem): StrayValueFormatter {
  return (value, field) => {
    if (field === 'ballSpeed') {
      return units === 'imperial' ? `${fromCanonical(value, 'mph', 'ballSpeed').toFixed(1)} mph` : `${fromCanonical(value, 'km/h', 'ballSpeed').toFixed(1)} km/h`;
    }
    return units === 'imperial' ? `${fromCanonical(value, 'yd', field).toFixed(0)} yd` : `${value.toFixed(0)} m`;
  };
}

function signed(x: number, digits: number): string {
  const text = Math.abs(x).toFixed(digits);
  if (Number(text) === 0) return text;
  return x < 0 ? `−${text}` : `+${text}`;
}

/** The word a stray's kind starts its reason with. */
export const STRAY_KIND_WORDS: Readonly<Record<StrayKind, string>> = {
  misread: 'Misread',
  mishit: 'Mishit',
  review: 'For review',
};

/**
 * One flag in plain words, e.g. "carry 112 m, far short of this group's 148 m (modified z −5.2)"
 * or "a directional miss 24 m right of this group's pattern: the player's dispersion". Values go
 * through `format` (the user's units). O(1).
 * @example describeStrayFlag({ rule: 'smashFactor', kind: 'mishit', value: 1.21, median: 1.45, modifiedZ: -6, madUsed: 0.02, floored: false }) // => "smash factor 1.21, far below this group's 1.45 (modified z −6.0)"
 */
export function describeStrayFlag(flag: StrayFlag, format: StrayValueFormatter = formatCanonical): string {
  switch (flag.rule) {
    case 'misread':
      return `smash factor ${flag.value.toFixed(2)} is more than the impact of this club allows (at most ${flag.limit.toFixed(2)}, measurement error allowed)`;
    case 'smashFactor':
      return `smash factor ${flag.value.toFixed(2)}, far below this group's ${flag.median.toFixed(2)} (modified z ${signed(flag.modifiedZ, 1)})`;
    case 'ballSpeed':
      return `ball speed ${format(flag.value, 'ballSpeed')}, far below this group's ${format(flag.median, 'ballSpeed')} (modified z ${signed(flag.modifiedZ, 1)})`;
    case 'carry':
      return `carry ${format(flag.value, 'carry')}, far short of this group's ${format(flag.median, 'carry')} (modified z ${signed(flag.modifiedZ, 1)})`;
    case 'launchAngle': {
      const how = flag.value < flag.median ? 'far below' : 'far above';
      return `launch ${flag.value.toFixed(1)}°, ${how} this group's ${flag.median.toFixed(1)}° (modified z ${signed(flag.modifiedZ, 1)})`;
    }
    case 'ground': {
      const limit = `robust distance ${flag.distance.toFixed(1)}, limit ${flag.limit.toFixed(1)}`;
      if (flag.direction === 'short') {
        return `lands ${format(Math.abs(flag.carryFromCenterM), 'carry')} short of this group's pattern (${limit})`;
      }
      const across = format(Math.abs(flag.offlineFromCenterM), 'offline');
      return `a directional miss ${across} ${flag.direction} of this group's pattern: the player's dispersion (${limit})`;
    }
  }
}

/**
 * All of a stray's flags in plain words after the word of its kind: "Mishit: smash factor 1.21,
 * far below …; carry …". A shot only for review says that it stays in the figures. O(flags).
 * @example describeStray({ row: 5, index: 4, kind: 'mishit', flags: [carryFlag] }) // => "Mishit: carry 112 m, far short of this group's 148 m (modified z −24.3)"
 */
export function describeStray(stray: StrayShot, format: StrayValueFormatter = formatCanonical): string {
  const text = stray.flags.map((flag) => describeStrayFlag(flag, format)).join('; ');
  const tail = stray.kind === 'review' ? '; kept in the figures unless you drop it' : '';
  return `${STRAY_KIND_WORDS[stray.kind]}: ${text}${tail}`;
}
