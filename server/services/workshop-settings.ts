/** The shop's workshop settings: wedge-wear counts and the static-fit table (defaults until an owner saves). */
import { DEFAULT_WEDGE_WEAR_LIMITS, type WedgeWearLimits } from '../../analysis/bag';
import { defaultStaticFitTable, type StaticFitRow } from '../../analysis/workshop';
import { WorkshopSettingsRecord } from '../models';
import type { WorkshopSettings, WorkshopSettingsBody } from '../schemas';
import { type Actor, requireOwner, requireStaff } from './actor';

/** What the bag and the player's page use: the shop's counts and table, or the defaults. */
export async function shopWorkshopRules(shopId: string): Promise<{ wear: WedgeWearLimits; table: StaticFitRow[] }> {
  const row = await WorkshopSettingsRecord.findByPk(shopId);
  if (!row) return { wear: DEFAULT_WEDGE_WEAR_LIMITS, table: defaultStaticFitTable() };
  return { wear: { rounds: row.wedgeWearRounds, practiceSessions: row.wedgeWearPracticeSessions }, table: JSON.parse(row.staticFitTable) as StaticFitRow[] };
}

export async function getWorkshopSettings(actor: Actor): Promise<WorkshopSettings> {
  requireStaff(actor);
  const row = await WorkshopSettingsRecord.findByPk(actor.shopId);
  const rules = await shopWorkshopRules(actor.shopId);
  return {
    wedgeWearRounds: rules.wear.rounds,
    wedgeWearPracticeSessions: rules.wear.practiceSessions,
    staticFitTable: rules.table,
    isDefault: row === null,
    updatedAt: row ? row.updatedAt.toISOString() : null,
  };
}

export async function updateWorkshopSettings(actor: Actor, body: WorkshopSettingsBody & { staticFitTable: StaticFitRow[] }): Promise<WorkshopSettings> {
  requireOwner(actor);
  await WorkshopSettingsRecord.upsert({
    shopId: actor.shopId,
    wedgeWearRounds: body.wedgeWearRounds,
    wedgeWearPracticeSessions: body.wedgeWearPracticeSessions,
    staticFitTable: JSON.stringify(body.staticFitTable),
    updatedBy: actor.id,
  });
  return getWorkshopSettings(actor);
}
