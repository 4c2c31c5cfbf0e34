/**
 * The shot table and the exports: every stored shot with every field, its stray (decided on
 * the measured shots by the same rules as the analysis) and the fitter's decision; paged and
 * sorted on the server so a phone never loads a whole session at once.
 */
import { QueryTypes, type Sequelize } from 'sequelize';
import { compareClubs } from '../../analysis/clubs';
import { SHOT_FIELDS, type ShotField } from '../../analysis/fields';
import { groupsCsv, shotsCsv, type ExportShot } from '../../analysis/export';
import { groupStrays, shotColumns } from '../../analysis/session';
import { describeStray, isShotKept, strayFormatterFor, type StrayKind } from '../../analysis/strays';
import { notFound } from '../errors';
import { BayFile } from '../models';
import type { ShotPage, ShotPageQuery, TableShot } from '../schemas';
import { type Actor, requireStaff } from './actor';
import { analyseFitting, sessionShots } from './analysis';
import { findVisibleFitting } from './fittings';
import { bumpFittingRevision } from './fitting-revision';
import { renameNotFound } from './not-found';
import { loadFittingShots, type StoredShot } from './shot-store';

const KIND_ORDER: Record<StrayKind, number> = { misread: 0, mishit: 1, review: 2 };

/** Every shot of a fitting as the table shows it, in file and row order. */
async function tableShots(sequelize: Sequelize, actor: Actor, fittingId: string): Promise<TableShot[]> {
  await findVisibleFitting(actor, fittingId);
  const stored = await loadFittingShots(sequelize, fittingId);
  const format = strayFormatterFor(actor.units);
  const strays = new Map<number, { kind: StrayKind; reason: string }>();
  for (const columns of shotColumns(sessionShots(stored))) {
    for (const s of groupStrays(columns)) strays.set(s.row, { kind: s.kind, reason: describeStray(s, format) });
  }
  return stored.map((s: StoredShot) => {
    const stray = strays.get(s.id) ?? null;
    return {
      id: s.id,
      bayFileId: s.bayFileId,
      row: s.row,
      club: s.club,
      build: s.build,
      values: s.values,
      derived: s.derived,
      decision: s.decision,
      stray,
      inFigures: isShotKept({ flagged: stray !== null, reviewOnly: stray?.kind === 'review', decision: s.decision ?? undefined }),
    };
  });
}

function comparator(sort: ShotPageQuery['sort']): (a: TableShot, b: TableShot) => number {
  if (sort === 'row') return () => 0; // file and row order as stored
  if (sort === 'club') return (a, b) => compareClubs(a.club, b.club);
  if (sort === 'build') return (a, b) => (a.build ?? '').localeCompare(b.build ?? '');
  if (sort === 'stray') return (a, b) => (a.stray ? KIND_ORDER[a.stray.kind] : 9) - (b.stray ? KIND_ORDER[b.stray.kind] : 9);
  return (a, b) => (a.values[sort] as number) - (b.values[sort] as number);
}

/**
 * One page of the shot table: shots of the fitting (or of one club), sorted by a field (shots
 * without it last whichever way) or by club, build, stray or file order, from offset. O(n log n).
 */
export async function listShotPage(sequelize: Sequelize, actor: Actor, fittingId: string, query: ShotPageQuery): Promise<ShotPage> {
  const all = await tableShots(sequelize, actor, fittingId);
  const fields = SHOT_FIELDS.filter((f) => all.some((s) => s.values[f] !== undefined));
  let shots = query.club ? all.filter((s) => s.club === query.club) : all;
  const sign = query.dir === 'desc' ? -1 : 1;
  const compare = comparator(query.sort);
  const isField = (SHOT_FIELDS as readonly string[]).includes(query.sort);
  const missing = (s: TableShot) => isField && s.values[query.sort as ShotField] === undefined;
  const order = shots.map((s, i) => ({ s, i }));
  order.sort((x, y) => {
    const mx = missing(x.s);
    const my = missing(y.s);
    if (mx !== my) return mx ? 1 : -1;
    return (mx ? 0 : sign * compare(x.s, y.s)) || (query.sort === 'row' ? sign * (x.i - y.i) : x.i - y.i);
  });
  shots = order.map((o) => o.s);
  return { total: shots.length, offset: query.offset, limit: query.limit, sort: query.sort, dir: query.dir, fields, shots: shots.slice(query.offset, query.offset + query.limit) };
}

/** The shots as CSV in the user's units (fitter and owner). */
export async function exportShotsCsv(sequelize: Sequelize, actor: Actor, fittingId: string): Promise<string> {
  requireStaff(actor);
  const shots = await tableShots(sequelize, actor, fittingId);
  const files = await BayFile.findAll({ where: { fittingId }, attributes: ['id', 'fileName'] });
  const names = new Map(files.map((f) => [f.id, f.fileName]));
  const rows: ExportShot[] = shots.map((s) => ({ ...s, fileName: names.get(s.bayFileId) ?? '' }));
  return shotsCsv(rows, actor.units);
}

/** The group summaries as CSV in the user's units (fitter and owner). */
export async function exportGroupsCsv(sequelize: Sequelize, actor: Actor, fittingId: string): Promise<string> {
  requireStaff(actor);
  const { analysis } = await analyseFitting(sequelize, actor, fittingId, { level: 0.95, includeStrays: false, units: actor.units });
  return groupsCsv(analysis.groups, actor.units);
}

/** A fitter keeps or drops a shot (null: back to the automatic stray rules). */
export async function setShotDecision(sequelize: Sequelize, actor: Actor, shotId: number, decision: 'keep' | 'drop' | null) {
  requireStaff(actor);
  const rows = await sequelize.query<{ fitting_id: string }>('SELECT fitting_id FROM shots WHERE id = ?', {
    replacements: [shotId],
    type: QueryTypes.SELECT,
  });
  if (!rows[0]) throw notFound('That shot');
  await renameNotFound(findVisibleFitting(actor, rows[0].fitting_id), 'That shot');
  await sequelize.transaction(async (transaction) => {
    await bumpFittingRevision(rows[0].fitting_id, transaction); // the fitting's row first (see commitBayFile)
    await sequelize.query('UPDATE shots SET decision = ? WHERE id = ?', { replacements: [decision, shotId], type: QueryTypes.UPDATE, transaction });
  });
  return { id: shotId, decision };
}
