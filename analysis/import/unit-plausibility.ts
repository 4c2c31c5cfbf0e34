/**
 * Warnings for columns whose values do not fit their stated unit: speeds that look like km/h
 * labelled mph, a carry in yards among metric columns, a smash factor that only makes sense
 * with another speed unit. Warnings only: the fitter decides in the mapping step.
 *
 * The typical ranges below are deliberately wide (common practice, no source; they bracket the
 * product's own examples of a 7 iron at ~50 m/s and ~150 m, a driver at ~70 m/s and ~230 m).
 * A warning is raised only when the stated unit puts the column's median outside its range
 * and another unit of the same dimension puts it inside.
 */
import type { ShotField } from '@/analysis/fields';
import { UNITS, unitSystemOf, type UnitInfo } from '@/analysis/units';
import { FIELD_WORDS, type Limit } from './shot-limits';

export interface ImportWarning {
  code: string;
  message: string;
  column?: string;
}

/** One mapped numeric column of the sample, its values in canonical units (undefined: missing). */
export interface SampleColumn {
  header: string;
  field: ShotField;
  unit: UnitInfo;
  values: readonly (number | undefined)[];
}

const TYPICAL_MEDIAN: Partial<Record<ShotField, Limit>> = {
  ballSpeed: { min: 15, max: 85 },
  clubSpeed: { min: 10, max: 60 },
  carry: { min: 5, max: 320 },
  total: { min: 5, max: 360 },
  apexHeight: { min: 1, max: 60 },
  flightTime: { min: 0.5, max: 12 },
};
const SMASH = { min: 1.0, max: 1.6 };
const SMASH_FIT = { min: 1.05, max: 1.56 };
/** carry (m) / ball speed (m/s): 150/50 = 3.0 for a 7 iron, 230/70 = 3.3 for a driver. */
const CARRY_PER_SPEED = { min: 1.4, max: 4.5 };
const CARRY_PER_SPEED_FIT = { min: 1.8, max: 4.0 };

function median(values: number[]): number | null {
  if (values.length === 0) return null;
  const sorted = [...values].sort((a, b) => a - b);
  const mid = sorted.length >> 1;
  return sorted.length % 2 ? sorted[mid] : (sorted[mid - 1] + sorted[mid]) / 2;
}

function inside(value: number, range: Limit): boolean {
  return value >= range.min && value <= range.max;
}

function alternatives(unit: UnitInfo): UnitInfo[] {
  return UNITS.filter((u) => u.dimension === unit.dimension && u.unit !== unit.unit && u.unit !== 'rad' && u.unit !== 'ms');
}

function present(values: readonly (number | undefined)[]): number[] {
  return values.filter((v): v is number => v !== undefined);
}

function ratioMedian(a: SampleColumn, b: SampleColumn, scaleA = 1, scaleB = 1): number | null {
  const ratios: number[] = [];
  for (let i = 0; i < a.values.length; i++) {
    const x = a.values[i];
    const y = b.values[i];
    if (x !== undefined && y !== undefined && y > 0) ratios.push((x * scaleA) / (y * scaleB));
  }
  return median(ratios);
}

function label(u: UnitInfo): string {
  return u.unit;
}

/**
 * Unit warnings for the mapped numeric columns of a sample. O(rows × columns + rows·log rows).
 * Codes: UNIT_SUSPECT (values fit another unit better), UNIT_MIXED (imperial and metric mixed).
 */
export function unitWarnings(columns: readonly SampleColumn[]): ImportWarning[] {
  const warnings: ImportWarning[] = [];
  const warned = new Set<string>();
  const warn = (column: SampleColumn, message: string) => {
    if (warned.has(column.header)) return;
    warned.add(column.header);
    warnings.push({ code: 'UNIT_SUSPECT', column: column.header, message });
  };

  for (const column of columns) {
    const typical = TYPICAL_MEDIAN[column.field];
    const m = median(present(column.values));
    if (!typical || m === null || inside(m, typical)) continue;
    const stated = m / column.unit.factor;
    const fit = alternatives(column.unit).find((u) => inside(stated * u.factor, typical));
    if (fit) {
      warn(column, `${column.header}: a median of ${stated.toFixed(1)} ${label(column.unit)} is unusual for ${FIELD_WORDS[column.field]}; the values look like ${label(fit)}.`);
    }
  }

  const ball = columns.find((c) => c.field === 'ballSpeed');
  const club = columns.find((c) => c.field === 'clubSpeed');
  if (ball && club) {
    const smash = ratioMedian(ball, club);
    if (smash !== null && !inside(smash, SMASH)) {
      for (const [column, other, isBall] of [[ball, club, true], [club, ball, false]] as const) {
        const fit = alternatives(column.unit).find((u) => {
          const scale = u.factor / column.unit.factor;
          const s = isBall ? ratioMedian(column, other, scale) : ratioMedian(other, column, 1, scale);
          return s !== null && inside(s, SMASH_FIT);
        });
        if (fit) {
          warn(column, `${column.header}: ball speed / club speed is ${smash.toFixed(2)} with ${label(ball.unit)} and ${label(club.unit)}; with ${column.header} in ${label(fit)} it would be a usual smash factor.`);
        }
      }
    }
  }

  const carry = columns.find((c) => c.field === 'carry');
  if (ball && carry) {
    const ratio = ratioMedian(carry, ball);
    if (ratio !== null && !inside(ratio, CARRY_PER_SPEED)) {
      for (const [column, isCarry] of [[carry, true], [ball, false]] as const) {
        const fit = alternatives(column.unit).find((u) => {
          const scale = u.factor / column.unit.factor;
          const r = isCarry ? ratioMedian(carry, ball, scale) : ratioMedian(carry, ball, 1, scale);
          return r !== null && inside(r, CARRY_PER_SPEED_FIT);
        });
        if (fit) {
          warn(column, `${column.header}: carry and ball speed do not fit together as stated; with ${column.header} in ${label(fit)} they would.`);
        }
      }
    }
  }

  const systems = columns
    .filter((c) => c.unit.dimension === 'speed' || c.unit.dimension === 'length')
    .map((c) => ({ column: c, system: unitSystemOf(c.unit.unit) }))
    .filter((s) => s.system !== null);
  const imperial = systems.filter((s) => s.system === 'imperial');
  const metric = systems.filter((s) => s.system === 'metric');
  if (imperial.length > 0 && metric.length > 0) {
    const odd = imperial.length < metric.length ? imperial : metric.length < imperial.length ? metric : [];
    const others = odd === imperial ? 'metric' : 'imperial';
    for (const { column } of odd) {
      warnings.push({
        code: 'UNIT_MIXED',
        column: column.header,
        message: `${column.header} is in ${label(column.unit)} while the file's other speeds and distances are ${others}; check the unit.`,
      });
    }
    if (odd.length === 0) {
      warnings.push({ code: 'UNIT_MIXED', message: 'The file mixes imperial and metric units for speeds and distances; check each unit.' });
    }
  }
  return warnings;
}
