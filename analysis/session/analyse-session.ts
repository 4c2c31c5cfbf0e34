import { compareClubs } from '@/analysis/clubs';
import type { Shot, ShotField } from '@/analysis/fields';
import { compareBuilds } from '@/analysis/head-to-head';
import type { BuildSample } from '@/analysis/head-to-head';
import { buildLadder } from '@/analysis/ladder';
import { DEFAULT_FAIRWAY_WIDTH_M, DEFAULT_GREEN_RADIUS_M, onTargetOdds } from '@/analysis/odds';
import { medianInPlace } from '@/analysis/statistics';
import type { LadderGroup } from '@/analysis/ladder';
import { analyseGroup, groupStrays } from './analyse-group';
import type { AnalysedGroup } from './analyse-group';
import type { GroupRef, SessionAnalysis, SessionOptions } from './session-types';
import { shotColumns } from './shot-columns';
import type { ShotColumns } from './shot-columns';

function keptValues(column: Float64Array, kept: Uint8Array): Float64Array {
  const out = new Float64Array(column.length);
  let m = 0;
  for (let j = 0; j < column.length; j++) if (kept[j] === 1) out[m++] = column[j];
  return out.subarray(0, m);
}

function buildSample(group: AnalysedGroup): BuildSample {
  const columns: Partial<Record<ShotField, Float64Array>> = {};
  for (const [field, column] of Object.entries(group.columns.fields) as [ShotField, Float64Array][]) {
    columns[field] = keptValues(column, group.kept);
  }
  columns.smashFactor = keptValues(group.columns.smashFactor, group.kept);
  return { club: group.columns.club, build: group.columns.build, columns };
}

/**
 * Each group's on-target odds from its kept shots, at one green carry per club (the median of
 * the club's kept carries, all builds together, unless given), so builds meet the same target.
 */
function addOdds(groups: AnalysedGroup[], odds: NonNullable<SessionOptions['odds']>): void {
  const byClub = new Map<string, AnalysedGroup[]>();
  for (const g of groups) {
    const list = byClub.get(g.columns.club);
    if (list) list.push(g);
    else byClub.set(g.columns.club, [g]);
  }
  const fairwayWidthM = odds.fairwayWidthM ?? DEFAULT_FAIRWAY_WIDTH_M;
  const greenRadiusM = odds.greenRadiusM ?? DEFAULT_GREEN_RADIUS_M;
  for (const [club, list] of byClub) {
    let targetCarryM: number | null = odds.targetCarryM?.[club] ?? null;
    if (targetCarryM === null) {
      const carries = list.flatMap((g) => (g.columns.fields.carry ? Array.from(keptValues(g.columns.fields.carry, g.kept)).filter(Number.isFinite) : []));
      targetCarryM = carries.length ? medianInPlace(Float64Array.from(carries)) : null;
    }
    for (const g of list) {
      const offline = g.columns.fields.offline;
      const carry = g.columns.fields.carry;
      const none = new Float64Array(0);
      g.analysis.odds = onTargetOdds(offline ? keptValues(offline, g.kept) : none, carry ? keptValues(carry, g.kept) : none, { fairwayWidthM, greenRadiusM, targetCarryM });
    }
  }
}

/** Same groups, rows and order: the measured twin of carried-over shots. */
function sameLayout(a: readonly ShotColumns[], b: readonly ShotColumns[]): boolean {
  if (a.length !== b.length) return false;
  for (let g = 0; g < a.length; g++) {
    if (a[g].club !== b[g].club || a[g].build !== b[g].build || a[g].rows.length !== b[g].rows.length) return false;
    for (let j = 0; j < a[g].rows.length; j++) if (a[g].rows[j] !== b[g].rows[j]) return false;
  }
  return true;
}

function findGroup(groups: AnalysedGroup[], ref: GroupRef): AnalysedGroup {
  const found = groups.find((g) => g.columns.club === ref.club && g.columns.build === ref.build);
  if (!found) throw new RangeError(`analyseSession: no shots for ${ref.club} with build ${ref.build ?? '(none)'}`);
  return found;
}

/**
 * The whole session's analysis: per group (club × build, in bag order then build label)
 * summaries of every field present, smash factor, the descriptive and prediction ovals, and
 * strays with their reasons; optionally a head-to-head of two groups; and the ladder.
 * Strays are left out of the statistics unless includeStrays; the fitter's decisions (by row)
 * override. All values in canonical units; the result is JSON-able. O(n · fields) expected.
 * @throws RangeError when a compared group has no shots, or level is not in (0, 1)
 * @example analyseSession(shots, { compare: [{ club: '7I', build: 'A' }, { club: '7I', build: 'B' }] }).headToHead?.fields.carry?.p
 */
export function analyseSession(shots: readonly Shot[], options: SessionOptions = {}): SessionAnalysis {
  const level = options.level ?? 0.95;
  if (!(level > 0 && level < 1)) throw new RangeError('analyseSession: level must lie in (0, 1)');
  const settings = { level, includeStrays: options.includeStrays ?? false, decisions: options.decisions ?? {}, formatValue: options.formatValue };
  const columns = shotColumns(shots);
  const measured = options.measured ? shotColumns(options.measured) : null;
  if (measured && !sameLayout(columns, measured)) throw new RangeError('analyseSession: the measured shots are not the same shots');
  let largest = 0;
  for (const c of columns) largest = Math.max(largest, c.rows.length);
  const scratch = new Float64Array(2 * largest);
  const analysed = columns.map((c, g) => analyseGroup(c, settings, scratch, measured ? groupStrays(measured[g]) : undefined));
  analysed.sort(
    (a, b) => compareClubs(a.columns.club, b.columns.club) || (a.columns.build ?? '').localeCompare(b.columns.build ?? ''),
  );

  addOdds(analysed, options.odds ?? {});

  const ladderGroups: LadderGroup[] = [];
  for (const g of analysed) {
    const carry = g.columns.fields.carry;
    if (carry) ladderGroups.push({ club: g.columns.club, build: g.columns.build, carryM: keptValues(carry, g.kept) });
  }
  const result: SessionAnalysis = {
    groups: analysed.map((g) => g.analysis),
    ladder: buildLadder(ladderGroups, { chosenBuild: options.chosenBuild, loftByGroup: options.loftByGroup, neighbours: options.bagClubs }),
  };
  if (options.compare) {
    const [a, b] = options.compare;
    result.headToHead = compareBuilds(buildSample(findGroup(analysed, a)), buildSample(findGroup(analysed, b)), { margins: options.margins, units: options.units });
  }
  return result;
}
