/**
 * What carrying the figures over to the player's course changed, for the words right under
 * the button: per group of a club, the mean carry measured and at the course. Pure.
 */
import type { GroupAnalysis } from '@/analysis/session';

export type CourseChange = { club: string; build: string | null; measuredCarryM: number; courseCarryM: number; changeM: number };

/**
 * The carry change of each group of `club` present in both answers (same groups, same kept
 * shots: strays never change with the course). O(groups).
 * @example courseChanges(measured.groups, course.groups, '7I')[0].changeM // => 7.4
 */
export function courseChanges(measured: readonly GroupAnalysis[], course: readonly GroupAnalysis[], club: string): CourseChange[] {
  const out: CourseChange[] = [];
  for (const g of course) {
    if (g.club !== club) continue;
    const m = measured.find((x) => x.club === g.club && x.build === g.build);
    const before = m?.fields.carry?.mean;
    const after = g.fields.carry?.mean;
    if (before === undefined || after === undefined) continue;
    out.push({ club: g.club, build: g.build, measuredCarryM: before, courseCarryM: after, changeM: after - before });
  }
  return out;
}
