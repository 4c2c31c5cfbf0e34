import fs from 'node:fs';
import path from 'node:path';
import type { Sequelize } from 'sequelize';
import { Build, Fitting, FittingCourseStep, Player, Shop, User } from '../models';
import { createImportPool } from '../services/import-pool';
import { commitBayFile } from '../services/bay-files';
import { hashPassword } from '../services/passwords';
import { seedDemoBags, type DemoBag, type DemoChoice } from './demo-bags';

interface Scenario {
  password: string;
  shop: { name: string };
  owner: { name: string; email: string };
  fitters: { name: string; email: string }[];
  players: (Omit<Player['_creationAttributes'], 'shopId' | 'userId'> & { key: string; account: boolean })[];
  fittings: {
    player: string;
    fitter: string;
    daysAgo: number;
    venue: 'indoor' | 'outdoor';
    temperatureC: number;
    altitudeM: number;
    humidityPct: number;
    ball: string;
    notes: string;
    remote: boolean;
    /** A demo bay file in fixtures/demo/, imported by the fitter. */
    bayFile?: string;
    /** Specs of the builds its file names ('' for shots with no build name). */
    builds?: { club: string; label: string; spec: Partial<Build['_creationAttributes']> }[];
    /** Builds chosen, confirmed into the bag, and the spec sheet sent. */
    choose?: DemoChoice;
  }[];
  /** The players' bags. */
  bags?: DemoBag[];
}

export const DEMO_DIR = path.resolve(__dirname, '../../fixtures/demo');

export function readScenario(): Scenario {
  return JSON.parse(fs.readFileSync(path.join(DEMO_DIR, 'scenario.json'), 'utf8')) as Scenario;
}

export type DemoHook = (ctx: { sequelize: Sequelize; fittings: Map<string, Fitting>; scenario: Scenario }) => Promise<void>;

/**
 * Loads the invented demo scenario — only into an empty database (no users at all), never over
 * real data. Returns false when it did nothing.
 */
export async function seedDemo(sequelize: Sequelize, now: Date, after?: DemoHook): Promise<boolean> {
  if ((await User.count()) > 0) return false;
  const scenario = readScenario();
  const passwordHash = await hashPassword(scenario.password);
  const fittings = new Map<string, Fitting>();
  const playersByKey = new Map<string, Player>();
  await sequelize.transaction(async (transaction) => {
    const shop = await Shop.create({ name: scenario.shop.name }, { transaction });
    const staff = new Map<string, User>();
    const owner = await User.create({ shopId: shop.id, role: 'owner', passwordHash, ...scenario.owner }, { transaction });
    staff.set(owner.email, owner);
    for (const f of scenario.fitters) {
      staff.set(f.email, await User.create({ shopId: shop.id, role: 'fitter', passwordHash, ...f }, { transaction }));
    }
    const players = new Map<string, Player>();
    for (const { key, account, ...p } of scenario.players) {
      let userId: string | null = null;
      if (account && p.email) {
        const user = await User.create({ shopId: shop.id, role: 'player', passwordHash, name: p.name, email: p.email }, { transaction });
        userId = user.id;
      }
      players.set(key, await Player.create({ ...p, shopId: shop.id, userId }, { transaction }));
      playersByKey.set(key, players.get(key)!);
    }
    for (const [i, f] of scenario.fittings.entries()) {
      const date = new Date(now.getTime() - f.daysAgo * 86_400_000).toISOString().slice(0, 10);
      const fitting = await Fitting.create(
        {
          shopId: shop.id,
          playerId: players.get(f.player)!.id,
          fitterId: staff.get(f.fitter)!.id,
          date,
          venue: f.venue,
          temperatureC: f.temperatureC,
          altitudeM: f.altitudeM,
          humidityPct: f.humidityPct,
          ball: f.ball,
          notes: f.notes,
          remote: f.remote,
          courseStep: 'in-progress',
        },
        { transaction },
      );
      // Every step up to "in progress" dated as it would have happened: a remote fitting was
      // requested three days before and its intake came in two days before; a bay fitting starts on the day.
      const day = new Date(`${date}T09:00:00Z`).getTime();
      const steps = f.remote
        ? ([['requested', 3], ['intake-done', 2], ['in-progress', 0]] as const)
        : ([['in-progress', 0]] as const);
      for (const [step, daysBefore] of steps) {
        await FittingCourseStep.create({ fittingId: fitting.id, shopId: shop.id, step, direction: 'forward', reason: null, at: new Date(day - daysBefore * 86_400_000), byUserId: staff.get(f.fitter)!.id }, { transaction });
      }
      fittings.set(String(i), fitting);
    }
  });
  // The demo sessions go in through the real import path, as a fitter would upload them.
  const pool = createImportPool(1);
  try {
    for (const [i, f] of scenario.fittings.entries()) {
      if (!f.bayFile) continue;
      const fitting = fittings.get(String(i))!;
      const fitter = await User.findOne({ where: { email: f.fitter } });
      const actor = { id: fitter!.id, role: fitter!.role, shopId: fitter!.shopId, playerId: null, units: fitter!.units };
      const file = { name: f.bayFile, buffer: fs.readFileSync(path.join(DEMO_DIR, f.bayFile)) };
      await commitBayFile(sequelize, pool, actor, fitting.id, file, { builds: { mode: 'column' } }, { maxRows: 200_000 });
      for (const b of f.builds ?? []) await Build.update(b.spec, { where: { fittingId: fitting.id, club: b.club, label: b.label } });
    }
  } finally {
    await pool.close();
  }
  const choices = [];
  for (const [i, f] of scenario.fittings.entries()) {
    if (f.choose) choices.push({ fitting: fittings.get(String(i))!, fitter: (await User.findOne({ where: { email: f.fitter } }))!, choose: f.choose });
  }
  await seedDemoBags(sequelize, now, scenario.bags ?? [], playersByKey, choices);
  if (after) await after({ sequelize, fittings, scenario });
  return true;
}

/** How to sign in to the demo, for the start log and the sign-in screen. */
export function demoSignInHint(): string {
  const s = readScenario();
  const player = s.players.find((p) => p.account);
  return [
    `Demo sign-in (password "${s.password}" for all):`,
    `  owner   ${s.owner.email}`,
    `  fitter  ${s.fitters[0].email}`,
    player?.email ? `  player  ${player.email}` : '',
  ]
    .filter(Boolean)
    .join('\n');
}
