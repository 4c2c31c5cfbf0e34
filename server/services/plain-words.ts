/**
 * The player's view of a fitting in plain words: each chosen build against the club's other
 * build (analysis/plain-words), its on-target odds and how its shots curve for the player's hand.
 */
import type { Sequelize } from 'sequelize';
import { clubInfo } from '../../analysis/clubs';
import { buildInPlainWords, curveWord, missWord, oddsInPlainWords } from '../../analysis/plain-words';
import { Build, ChosenBuild, Player } from '../models';
import type { PlainChoice, PlainWords } from '../schemas';
import type { Actor } from './actor';
import { analyseFitting } from './analysis';
import { findVisibleFitting } from './fittings';
import { decisionFigures, rivalOf } from './spec-sheet-figures';

/** GET /api/fittings/:id/plain-words */
export async function plainWords(sequelize: Sequelize, actor: Actor, fittingId: string): Promise<PlainWords> {
  const fitting = await findVisibleFitting(actor, fittingId);
  const [player, chosen, builds] = await Promise.all([
    Player.findByPk(fitting.playerId, { attributes: ['handedness'] }),
    ChosenBuild.findAll({ where: { fittingId } }),
    Build.findAll({ where: { fittingId } }),
  ]);
  const hand = player?.handedness ?? 'right';
  const buildById = new Map(builds.map((b) => [b.id, b]));
  const query = { units: actor.units, level: 0.95, includeStrays: false } as const;
  const { analysis } = await analyseFitting(sequelize, actor, fittingId, query);
  const choices: PlainChoice[] = [];
  for (const c of [...chosen].sort((a, b) => (clubInfo(a.club)?.order ?? 999) - (clubInfo(b.club)?.order ?? 999))) {
    const b = buildById.get(c.buildId);
    if (!b) continue;
    const ref = { club: b.club, build: b.label === '' ? null : b.label };
    const group = analysis.groups.find((g) => g.club === ref.club && (g.build ?? null) === ref.build);
    const rival = rivalOf(analysis, ref);
    const h = rival && group && group.kept >= 2 ? ((await analyseFitting(sequelize, actor, fittingId, { ...query, compare: [ref, rival] })).analysis.headToHead ?? null) : null;
    const words = buildInPlainWords(b.label, h, actor.units);
    const odds = decisionFigures(analysis, ref, h).onTargetOdds;
    const axis = group?.fields.spinAxis?.mean;
    const offline = group?.fields.offline?.mean;
    choices.push({
      club: b.club,
      clubLabel: clubInfo(b.club)?.label ?? b.club,
      buildLabel: b.label,
      ...words,
      odds: odds ? oddsInPlainWords(odds, actor.units) : null,
      curve: axis === undefined ? null : curveWord(axis, hand),
      miss: offline === undefined ? null : missWord(offline),
      shots: group?.kept ?? 0,
    });
  }
  return { handedness: hand, choices };
}
