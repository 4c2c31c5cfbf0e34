/**
 * The demo's bags (fixtures/demo/scenario.json, invented): each player's clubs with their
 * history dated back to when they went in, and a fitting whose chosen builds went into the bag
 * and whose spec sheet was sent (no e-mail leaves the seed).
 */
import type { Sequelize } from 'sequelize';
import { BagClub, BagClubHistory, Build, type Fitting, Player, User } from '../models';
import type { Actor } from '../services/actor';
import { stateOf } from '../services/bags';
import { confirmChosenBuilds, getChosenBuilds, setChosenBuilds } from '../services/chosen-builds';
import { sendSpecSheet } from '../services/spec-sheets';

export interface DemoBag {
  player: string;
  daysAgo: number;
  clubs: (Partial<BagClub['_creationAttributes']> & { club: string })[];
}

export interface DemoChoice {
  builds: { club: string; label: string }[];
  newStatus: 'on-order' | 'in-bag';
  sendSpecSheet: boolean;
}

const actorOf = (u: User): Actor => ({ id: u.id, role: u.role, shopId: u.shopId, playerId: null, units: u.units });

export async function seedDemoBags(
  sequelize: Sequelize,
  now: Date,
  bags: readonly DemoBag[],
  playersByKey: ReadonlyMap<string, Player>,
  choices: readonly { fitting: Fitting; fitter: User; choose: DemoChoice }[],
): Promise<void> {
  for (const bag of bags) {
    const player = playersByKey.get(bag.player)!;
    const at = new Date(now.getTime() - bag.daysAgo * 86_400_000);
    for (const spec of bag.clubs) {
      const row = await BagClub.create({ ...spec, shopId: player.shopId, playerId: player.id, status: spec.status ?? 'in-bag', inBagSince: at.toISOString().slice(0, 10), version: 1 });
      await BagClubHistory.create({ bagClubId: row.id, shopId: row.shopId, playerId: row.playerId, action: 'add', changedAt: at, changedBy: null, fittingId: null, snapshot: JSON.stringify(stateOf(row)) });
    }
  }
  for (const { fitting, fitter, choose } of choices) {
    const actor = actorOf(fitter);
    const builds = await Build.findAll({ where: { fittingId: fitting.id } });
    const ids = choose.builds.map((b) => builds.find((x) => x.club === b.club && x.label === b.label)!.id);
    await setChosenBuilds(actor, fitting.id, { builds: ids.map((buildId) => ({ buildId })), takeOut: [] });
    const view = await getChosenBuilds(actor, fitting.id);
    const versions: Record<string, number> = {};
    for (const c of view.proposal) if (c.kind !== 'add') versions[c.bagClubId] = c.version;
    await confirmChosenBuilds(actor, fitting.id, { versions, newStatus: choose.newStatus });
    if (choose.sendSpecSheet) await sendSpecSheet(sequelize, actor, fitting.id, { send: async () => {} }, 'http://127.0.0.1:8080');
  }
}
