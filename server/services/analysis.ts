/**
 * A fitting's analysis on the server: its stored shots through the same analysis/ code the
 * command line and the app use. Shots are numbered by their database id here (a fitting may
 * hold several bay files whose row numbers overlap), so strays and decisions name shot ids.
 */
import type { Sequelize } from 'sequelize';
import type { Shot } from '../../analysis/fields';
import { normaliseShot, type AirConditions } from '../../analysis/flight';
import { fromCanonical } from '../../analysis/units';
import { analyseSession, type GroupRef, type SessionAnalysis } from '../../analysis/session';
import type { StrayValueFormatter } from '../../analysis/strays';
import { HttpError } from '../errors';
import { Build } from '../models';
import type { FittingAnalysis } from '../schemas';
import type { Actor } from './actor';
import { airOf } from './bay-files';
import { findVisibleFitting } from './fittings';
import { loadFittingShots } from './shot-store';

export interface AnalysisQuery {
  level: number;
  includeStrays: boolean;
  compare?: [GroupRef, GroupRef];
  /** Units of the distances written in stray reasons (the user's preference). */
  units?: 'imperial' | 'metric';
  /** Carry the shots over to these conditions (the player's course) with the ball-flight model. */
  to?: AirConditions;
}

/** Stray reasons in the user's units: whole yards or metres, mph or km/h to 0.1. */
export function strayFormatter(units: 'imperial' | 'metric'): StrayValueFormatter {
  return (value, field) => {
    if (field === 'ballSpeed') return units === 'imperial' ? `${fromCanonical(value, 'mph', 'ballSpeed').toFixed(1)} mph` : `${fromCanonical(value, 'km/h', 'ballSpeed').toFixed(1)} km/h`;
    return units === 'imperial' ? `${fromCanonical(value, 'yd', 'carry').toFixed(0)} yd` : `${value.toFixed(0)} m`;
  };
}

export async function analyseFitting(sequelize: Sequelize, actor: Actor, fittingId: string, query: AnalysisQuery): Promise<FittingAnalysis> {
  const fitting = await findVisibleFitting(actor, fittingId);
  const measuredAir = airOf(fitting);
  const stored = await loadFittingShots(sequelize, fittingId);
  // Strays are decided on the measured shots; carrying over to the course moves numbers only.
  const measured: Shot[] | undefined = query.to ? stored.map((s) => ({ row: s.id, club: s.club, build: s.build, values: s.values, derived: s.derived })) : undefined;
  if (query.to) {
    for (const s of stored) {
      const n = normaliseShot(s.values, measuredAir, query.to);
      s.values = n.values;
      s.derived = [...new Set([...s.derived, ...n.derived])];
    }
  }
  const builds = await Build.findAll({ where: { fittingId }, attributes: ['club', 'label', 'loftDeg'] });
  const loftByGroup: Record<string, number> = {};
  for (const b of builds) if (b.loftDeg != null) loftByGroup[`${b.club}|${b.label}`] = b.loftDeg;
  const decisions: Record<number, 'keep' | 'drop'> = {};
  const shots: Shot[] = stored.map((s) => {
    if (s.decision) decisions[s.id] = s.decision;
    return { row: s.id, club: s.club, build: s.build, values: s.values, derived: s.derived };
  });
  let analysis: SessionAnalysis;
  try {
    analysis = analyseSession(shots, { level: query.level, includeStrays: query.includeStrays, decisions, compare: query.compare, loftByGroup, formatValue: strayFormatter(query.units ?? 'imperial'), measured });
  } catch (err) {
    if (err instanceof RangeError) throw new HttpError(400, 'BAD_ANALYSIS_REQUEST', err.message.replace(/^analyseSession: /, ''));
    throw err;
  }
  const strayIds = new Set(analysis.groups.flatMap((g) => g.strays.map((s) => s.row)));
  return {
    analysis,
    air: { measured: measuredAir, normalisedTo: query.to ?? null },
    shots: stored.map((s) => ({
      id: s.id,
      bayFileId: s.bayFileId,
      row: s.row,
      club: s.club,
      build: s.build,
      carry: s.values.carry ?? null,
      offline: s.values.offline ?? null,
      ballSpeed: s.values.ballSpeed ?? null,
      launchAngle: s.values.launchAngle ?? null,
      spinRate: s.values.spinRate ?? null,
      decision: s.decision,
      stray: strayIds.has(s.id),
    })),
  };
}
