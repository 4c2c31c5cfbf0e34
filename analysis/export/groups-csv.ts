import { clubInfo } from '@/analysis/clubs';
import { SHOT_FIELDS } from '@/analysis/fields';
import type { GroupAnalysis } from '@/analysis/session';
import type { UnitSystem } from '@/analysis/units';
import { csvLine } from './csv-cell';
import { exportValue, fieldColumnTitle } from './shots-csv';

/**
 * The group summaries as CSV in the user's units: per group (club, build) the shots and kept
 * shots, mean and sd of every field any group has, the oval's semi-axes and angle, and the
 * on-target odds. Every cell through csvCell (OWASP). CRLF line ends. O(groups × fields).
 * @example groupsCsv(analysis.groups, 'metric').split('\r\n')[0] // => 'Club,Build,Shots,Kept,…'
 */
export function groupsCsv(groups: readonly GroupAnalysis[], units: UnitSystem): string {
  const present = SHOT_FIELDS.filter((f) => f !== 'smashFactor' && groups.some((g) => g.fields[f] !== undefined));
  const head = ['Club', 'Build', 'Shots', 'Kept'];
  for (const f of present) head.push(`${fieldColumnTitle(f, units)} mean`, `${fieldColumnTitle(f, units)} sd`);
  head.push('Smash factor mean', 'Smash factor sd', `Oval semi-major (${units === 'imperial' ? 'yd' : 'm'})`, `Oval semi-minor (${units === 'imperial' ? 'yd' : 'm'})`, 'Oval angle (°)', 'Fairway odds', 'Green odds');
  const lines = [csvLine(head)];
  for (const g of groups) {
    const cells: (string | number | null)[] = [clubInfo(g.club)?.label ?? g.club, g.build ?? '', g.n, g.kept];
    for (const f of present) cells.push(exportValue(f, g.fields[f]?.mean, units), exportValue(f, g.fields[f]?.sd ?? undefined, units));
    cells.push(
      exportValue('smashFactor', g.smashFactor?.mean, units),
      exportValue('smashFactor', g.smashFactor?.sd ?? undefined, units),
      exportValue('carry', g.oval?.semiMajor, units),
      exportValue('carry', g.oval?.semiMinor, units),
      g.oval ? Number(g.oval.angleDeg.toFixed(1)) : null,
      g.odds.fairway.p === null ? null : Number(g.odds.fairway.p.toFixed(3)),
      g.odds.green.p === null ? null : Number(g.odds.green.p.toFixed(3)),
    );
    lines.push(csvLine(cells));
  }
  return `${lines.join('\r\n')}\r\n`;
}
