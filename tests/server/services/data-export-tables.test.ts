import { QueryTypes } from 'sequelize';
import { SHOP_TABLES } from '@/server/services/data-export';
import { createTestContext, type TestContext } from '../../support/test-db';

let ctx: TestContext;
beforeAll(async () => {
  ctx = await createTestContext();
});
afterAll(async () => {
  await ctx.close();
});

/** Tables that hold no shop data to hand over: bookkeeping, secrets and short-lived markers. */
const NOT_EXPORTED = ['schema_migrations', 'sessions', 'rate_limits', 'password_resets', 'email_verifications', 'fitting_message_reads'];

describe('shop export tables', () => {
  it('SHOP_TABLES, every table of the migrated database, lists each one that holds shop data (a new table must be exported or said not to be)', async () => {
    const rows = await ctx.sequelize.query<{ name: string }>('SELECT table_name AS name FROM information_schema.tables WHERE table_schema = DATABASE()', { type: QueryTypes.SELECT });
    const exported = new Set(SHOP_TABLES.map((t) => t.name));
    const missing = rows.map((r) => r.name).filter((name) => !exported.has(name) && !NOT_EXPORTED.includes(name));
    expect(missing.sort()).toEqual([]);
  });
});
