/**
 * Where a bag club's carry comes from: the latest fitting where it was hit (its source build's
 * group, or the player's own club — shots with no build name — in a later fitting), else the
 * carry entered, else the flight model's estimate for its loft and the player's speed (worked out
 * from the hit club nearest in loft, else the club speed measured in the latest fitting).
 */
import { Op, type Sequelize } from 'sequelize';
import { clubInfo, compareClubs } from '../../analysis/clubs';
import { calibratedReference, clubSpeedFromBallSpeed, estimateCarry, typicalLengthIn, type SpeedReference } from '../../analysis/bag';
import type { GroupAnalysis } from '../../analysis/session';
import { Build, Fitting } from '../models';
import type { BagCarry, BagView } from '../schemas';
import type { Actor } from './actor';
import { analyseFitting } from './analysis';
import { countShotsByFitting } from './shot-store';

/** A bag club's state as the carry needs it. */
export interface CarryInput {
  id: string;
  club: string;
  loftDeg: number | null;
  lengthIn: number | null;
  carryEnteredM: number | null;
  sourceBuildId: string | null;
  sourceFittingId: string | null;
}

interface FittingFigures {
  fittingId: string;
  date: string;
  groups: GroupAnalysis[];
  /** Build specs of the fitting by `${club}|${label}`. */
  builds: Map<string, Build>;
}

/** How many of a player's latest fittings (with shots) are read for carries and speed. */
const LATEST_FITTINGS = 5;

const groupOf = (f: FittingFigures, club: string, label: string) => f.groups.find((g) => g.club === club && (g.build ?? '') === label);

async function figuresOf(sequelize: Sequelize, actor: Actor, fitting: Fitting): Promise<FittingFigures> {
  const { analysis } = await analyseFitting(sequelize, actor, fitting.id, { level: 0.95, includeStrays: false });
  const builds = await Build.findAll({ where: { fittingId: fitting.id } });
  return { fittingId: fitting.id, date: fitting.date, groups: analysis.groups, builds: new Map(builds.map((b) => [`${b.club}|${b.label}`, b])) };
}

function hitCarry(f: FittingFigures, club: string, label: string): BagCarry | null {
  const carry = groupOf(f, club, label)?.fields.carry;
  if (!carry) return null;
  return { carryM: carry.median, source: 'hit', fittingId: f.fittingId, fittingDate: f.date, n: carry.n, q1M: carry.q1, q3M: carry.q3 };
}

/** The player's club speed from the latest fitting that measured it (the longest club hit), else from ball speed. */
function speedReference(figures: readonly FittingFigures[]): BagView['speed'] {
  for (const fromBall of [false, true]) {
    for (const f of figures) {
      const groups = [...f.groups].sort((a, b) => compareClubs(a.club, b.club));
      for (const g of groups) {
        const build = f.builds.get(`${g.club}|${g.build ?? ''}`);
        const lengthIn = build?.lengthIn ?? typicalLengthIn(g.club);
        if (lengthIn === null) continue;
        let speed: number | null = null;
        if (!fromBall) speed = g.fields.clubSpeed?.median ?? null;
        else if (g.fields.ballSpeed) speed = clubSpeedFromBallSpeed(g.fields.ballSpeed.median, g.club, build?.loftDeg ?? null);
        if (speed !== null && speed > 0) return { clubSpeedMps: speed, lengthIn, club: g.club, fittingId: f.fittingId, fromBallSpeed: fromBall };
      }
    }
  }
  return null;
}

/**
 * Carries of the given bag clubs and the speed the estimates use. Reads the source fittings of
 * the clubs and the player's latest fittings with shots (analysis of each, once). O(fittings ×
 * shots) for the analyses.
 */
export async function bagCarries(sequelize: Sequelize, actor: Actor, playerId: string, clubs: readonly CarryInput[]): Promise<{ carries: Map<string, BagCarry | null>; speed: BagView['speed'] }> {
  const latest = await Fitting.findAll({ where: { playerId }, order: [['date', 'DESC'], ['createdAt', 'DESC']], limit: 20 });
  const counts = await countShotsByFitting(sequelize, latest.map((f) => f.id));
  const wanted = new Map<string, Fitting>();
  for (const f of latest) if ((counts.get(f.id) ?? 0) > 0 && wanted.size < LATEST_FITTINGS) wanted.set(f.id, f);
  const sourceIds = [...new Set(clubs.map((c) => c.sourceFittingId).filter((id): id is string => id !== null && !wanted.has(id)))];
  if (sourceIds.length) for (const f of await Fitting.findAll({ where: { id: { [Op.in]: sourceIds }, playerId } })) wanted.set(f.id, f);
  const figures: FittingFigures[] = [];
  for (const f of [...wanted.values()].sort((a, b) => (a.date < b.date ? 1 : a.date > b.date ? -1 : 0))) figures.push(await figuresOf(sequelize, actor, f));
  const sourceLabels = new Map<string, string>();
  const sourceBuildIds = clubs.map((c) => c.sourceBuildId).filter((id): id is string => id !== null);
  if (sourceBuildIds.length) for (const b of await Build.findAll({ where: { id: { [Op.in]: sourceBuildIds } }, attributes: ['id', 'label'] })) sourceLabels.set(b.id, b.label);

  const speed = speedReference(figures);
  const measured: SpeedReference | null = speed ? { clubSpeedMps: speed.clubSpeedMps, lengthIn: speed.lengthIn } : null;
  const carries = new Map<string, BagCarry | null>();
  const pending: CarryInput[] = [];
  for (const c of clubs) {
    let carry: BagCarry | null = null;
    // The latest fitting where the club was hit: its source build, or the player's own club (no build name).
    for (const f of figures) {
      const label = c.sourceFittingId === f.fittingId && c.sourceBuildId ? sourceLabels.get(c.sourceBuildId) : '';
      if (label === undefined) continue;
      carry = hitCarry(f, c.club, label);
      if (carry) break;
    }
    if (!carry && c.carryEnteredM !== null) carry = { carryM: c.carryEnteredM, source: 'entered' };
    carries.set(c.id, carry);
    if (!carry) pending.push(c);
  }
  // Estimates start from the hit club nearest in loft (its speed worked out so the model carries it
  // as far as it was hit), else from the club speed measured in the latest fitting.
  const hits = clubs.filter((c) => carries.get(c.id)?.source === 'hit');
  const references = new Map<string, SpeedReference | null>();
  const loftOf = (c: CarryInput) => c.loftDeg ?? clubInfo(c.club)?.typicalLoftDeg ?? 90;
  for (const c of pending) {
    const nearest = [...hits].sort((a, b) => Math.abs(loftOf(a) - loftOf(c)) - Math.abs(loftOf(b) - loftOf(c)))[0];
    let reference = measured;
    if (nearest) {
      if (!references.has(nearest.id)) references.set(nearest.id, calibratedReference({ club: nearest.club, loftDeg: nearest.loftDeg, lengthIn: nearest.lengthIn, carryM: carries.get(nearest.id)!.carryM }));
      reference = references.get(nearest.id) ?? measured;
    }
    const e = estimateCarry({ club: c.club, loftDeg: c.loftDeg, lengthIn: c.lengthIn }, reference);
    if (e) carries.set(c.id, { carryM: e.carryM, source: 'estimate', clubSpeedMps: e.clubSpeedMps, loftFrom: e.loftFrom, ...(nearest && references.get(nearest.id) ? { fromClub: nearest.club } : {}) });
  }
  return { carries, speed };
}
