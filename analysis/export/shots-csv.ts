import { clubInfo } from '@/analysis/clubs';
import { FIELD_LABELS, SHOT_FIELDS, SIDE_FIELDS, type ShotField, type ShotValues } from '@/analysis/fields';
import { displayUnits, fromCanonical, type UnitSystem } from '@/analysis/units';
import { csvLine } from './csv-cell';

/** One shot as exported: every field it has, and what the rules and the fitter said. */
export interface ExportShot {
  fileName: string;
  row: number;
  club: string;
  build: string | null;
  values: ShotValues;
  derived: readonly ShotField[];
  /** The stray rules' kind and reason, or null. */
  stray: { kind: string; reason: string } | null;
  decision: 'keep' | 'drop' | null;
  inFigures: boolean;
}

const UNIT_HEADER: Record<string, string> = { deg: '°', ratio: '' };

/** A field's column title in a unit system: "Carry (yd)", "Offline (yd, + right)", "Smash factor". */
export function fieldColumnTitle(field: ShotField, units: UnitSystem): string {
  const unit = displayUnits(units)[field];
  const shown = UNIT_HEADER[unit] ?? unit;
  const side = SIDE_FIELDS.has(field) ? `${shown ? ', ' : ''}+ right` : '';
  return shown || side ? `${FIELD_LABELS[field]} (${shown}${side})` : FIELD_LABELS[field];
}

/** Decimals in the file per display unit (a monitor's resolution, common practice). */
function digits(field: ShotField, unit: string): number {
  if (field === 'smashFactor') return 3;
  if (unit === 'rpm') return 0;
  if (field === 'flightTime') return 2;
  return 1;
}

/** A canonical value in the user's unit, rounded, as a number cell. */
export function exportValue(field: ShotField, value: number | undefined, units: UnitSystem): number | null {
  if (value === undefined || !Number.isFinite(value)) return null;
  const unit = displayUnits(units)[field];
  const shown = field === 'smashFactor' ? value : fromCanonical(value, unit, field);
  return Number(shown.toFixed(digits(field, unit)));
}

/**
 * The shot table as CSV in the user's units: file, row, club (full name), build, every field
 * any shot has (signed: + is right for offline and other sided fields), which fields were
 * derived, the stray kind and reason, the fitter's decision and whether the shot is in the
 * figures. Every cell through csvCell (formula-looking text neutralised, OWASP). CRLF line ends
 * (RFC 4180). O(shots × fields).
 * @example shotsCsv(shots, 'imperial').split('\r\n')[0] // => 'File,Row,Club,Build,Club speed (mph),…'
 */
export function shotsCsv(shots: readonly ExportShot[], units: UnitSystem): string {
  const present = SHOT_FIELDS.filter((f) => shots.some((s) => s.values[f] !== undefined));
  const head = ['File', 'Row', 'Club', 'Build', ...present.map((f) => fieldColumnTitle(f, units)), 'Derived fields', 'Stray', 'Stray reason', 'Decision', 'In the figures'];
  const lines = [csvLine(head)];
  for (const s of shots) {
    lines.push(
      csvLine([
        s.fileName,
        s.row,
        clubInfo(s.club)?.label ?? s.club,
        s.build ?? '',
        ...present.map((f) => exportValue(f, s.values[f], units)),
        s.derived.map((f) => FIELD_LABELS[f]).join('; '),
        s.stray?.kind ?? '',
        s.stray?.reason ?? '',
        s.decision ?? '',
        s.inFigures ? 'yes' : 'no',
      ]),
    );
  }
  return `${lines.join('\r\n')}\r\n`;
}
