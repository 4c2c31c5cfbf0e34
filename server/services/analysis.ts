/**
 * A fitting's analysis on the server: its stored shots through the same analysis/ code the
 * command line and the app use. Shots are numbered by their database id here (a fitting may
 * hold several bay files whose row numbers overlap), so strays and decisions name shot ids.
 * The answer holds the figures and, for the plots, compact per-shot columns; the full shots
 * come from the shot table's own paged endpoint (services/shots.ts).
 */
import { Op, type Sequelize } from 'sequelize';
import type { Shot } from '../../analysis/fields';
import { normaliseShot, type Conditions } from '../../analysis/flight';
import { analyseSession, type GroupRef, type SessionAnalysis } from '../../analysis/session';
import { strayFormatterFor, type StrayKind } from '../../analysis/strays';
import { HttpError } from '../errors';
import { BagClub, Build } from '../models';
import type { FittingAnalysis, PlotColumns } from '../schemas';
import type { Actor } from './actor';
import { airOf } from './bay-files';
import { findVisibleFitting } from './fittings';
import { shopDecisionSettings } from './shop-margins';
import { loadFittingShots, type StoredShot } from './shot-store';

export interface AnalysisQuery {
  level: number;
  includeStrays: boolean;
  compare?: [GroupRef, GroupRef];
  /** Units of the words (stray reasons, the head-to-head's summary): the user's preference. */
  units?: 'imperial' | 'metric';
  /** Carry the shots over to these conditions (the player's course: air and ground) with the ball-flight model. */
  to?: Conditions;
  /** On-target odds asked for on the page (default: the shop's, then the defaults). */
  fairwayWidthM?: number;
  greenRadiusM?: number;
  target?: { club: string; carryM: number };
}

/** The fitting's shots as the analysis numbers them (row = shot id). */
export function sessionShots(stored: readonly StoredShot[]): Shot[] {
  return stored.map((s) => ({ row: s.id, club: s.club, build: s.build, values: s.values, derived: s.derived }));
}

function plotColumns(stored: readonly StoredShot[], analysis: SessionAnalysis): PlotColumns {
  const groupIndex = new Map(analysis.groups.map((g, i) => [`${g.club}|${g.build ?? ''}`, i]));
  const strayKind = new Map<number, StrayKind>();
  for (const g of analysis.groups) for (const s of g.strays) if (s.kind) strayKind.set(s.row, s.kind);
  const n = stored.length;
  const plot: PlotColumns = {
    id: new Array(n),
    row: new Array(n),
    group: new Array(n),
    carry: new Array(n),
    offline: new Array(n),
    ballSpeed: new Array(n),
    launchAngle: new Array(n),
    spinRate: new Array(n),
    decision: new Array(n),
    stray: new Array(n),
  };
  stored.forEach((s, i) => {
    plot.id[i] = s.id;
    plot.row[i] = s.row;
    plot.group[i] = groupIndex.get(`${s.club}|${s.build ?? ''}`) ?? -1;
    plot.carry[i] = s.values.carry ?? null;
    plot.offline[i] = s.values.offline ?? null;
    plot.ballSpeed[i] = s.values.ballSpeed ?? null;
    plot.launchAngle[i] = s.values.launchAngle ?? null;
    plot.spinRate[i] = s.values.spinRate ?? null;
    plot.decision[i] = s.decision;
    plot.stray[i] = strayKind.get(s.id) ?? null;
  });
  return plot;
}

export async function analyseFitting(sequelize: Sequelize, actor: Actor, fittingId: string, query: AnalysisQuery): Promise<FittingAnalysis> {
  const fitting = await findVisibleFitting(actor, fittingId);
  const measuredAir = airOf(fitting);
  const stored = await loadFittingShots(sequelize, fittingId);
  // Strays are decided on the measured shots; carrying over to the course moves numbers only.
  const measured = query.to ? sessionShots(stored) : undefined;
  if (query.to) {
    for (const s of stored) {
      const n = normaliseShot(s.values, measuredAir, query.to);
      s.values = n.values;
      s.derived = [...new Set([...s.derived, ...n.derived])];
    }
  }
  const [builds, settings, bagClubs] = await Promise.all([
    Build.findAll({ where: { fittingId }, attributes: ['club', 'label', 'loftDeg'] }),
    shopDecisionSettings(fitting.shopId),
    // The ladder's neighbours: the player's bag once they have one (clubs not taken out).
    BagClub.findAll({ where: { playerId: fitting.playerId, status: { [Op.ne]: 'out' } }, attributes: ['club'] }),
  ]);
  const loftByGroup: Record<string, number> = {};
  for (const b of builds) if (b.loftDeg != null) loftByGroup[`${b.club}|${b.label}`] = b.loftDeg;
  const decisions: Record<number, 'keep' | 'drop'> = {};
  for (const s of stored) if (s.decision) decisions[s.id] = s.decision;
  let analysis: SessionAnalysis;
  try {
    analysis = analyseSession(sessionShots(stored), {
      level: query.level,
      includeStrays: query.includeStrays,
      decisions,
      compare: query.compare,
      loftByGroup,
      formatValue: strayFormatterFor(query.units ?? 'imperial'),
      measured,
      bagClubs: bagClubs.length > 0 ? [...new Set(bagClubs.map((c) => c.club))] : undefined,
      margins: settings.margins,
      units: query.units,
      odds: {
        fairwayWidthM: query.fairwayWidthM ?? settings.fairwayWidthM,
        greenRadiusM: query.greenRadiusM ?? settings.greenRadiusM,
        targetCarryM: query.target ? { [query.target.club]: query.target.carryM } : undefined,
      },
    });
  } catch (err) {
    if (err instanceof RangeError) throw new HttpError(400, 'BAD_ANALYSIS_REQUEST', err.message.replace(/^analyseSession: /, ''));
    throw err;
  }
  return { analysis, air: { measured: measuredAir, normalisedTo: query.to ?? null }, plot: plotColumns(stored, analysis) };
}
