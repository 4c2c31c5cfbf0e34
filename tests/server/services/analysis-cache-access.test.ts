import { buildFitting, buildPlayer, buildShopWorld, buildUser } from '@/fixtures/builders';
import { visibleFittingRevision } from '@/server/services/analysis-cache';
import { loadActor } from '@/server/services/auth';
import { findVisibleFitting } from '@/server/services/fittings';
import { startSession } from '@/server/services/sessions';
import { createTestContext, type TestContext } from '../../support/test-db';

let ctx: TestContext;
beforeAll(async () => {
  ctx = await createTestContext();
});
afterAll(async () => {
  await ctx.close();
});

const outcome = (p: Promise<unknown>) => p.then(() => 'seen', (err: { status?: number }) => `error ${err.status}`);

describe('visibleFittingRevision', () => {
  it('visibleFittingRevision for every role and fitting agrees with findVisibleFitting', async () => {
    const a = await buildShopWorld();
    const b = await buildShopWorld();
    // A player of shop A with a sign-in but no fitting, and a fitting of another player of A.
    const lonelyUser = await buildUser(a.shop, 'player');
    await buildPlayer(a.shop, { userId: lonelyUser.id });
    const othersFitting = await buildFitting(a.shop, a.otherPlayer, a.fitter);
    const users = [a.owner, a.fitter, a.playerUser, lonelyUser, b.owner, b.fitter, b.playerUser];
    const fittings = [a.fitting, othersFitting, b.fitting, b.otherFitting];
    let seen = 0;
    for (const user of users) {
      const actor = (await loadActor(user.id, user.tokenVersion, (await startSession(user.id, 60_000)).id))!;
      for (const fitting of fittings) {
        const expected = await outcome(findVisibleFitting(actor, fitting.id));
        expect(`${user.role} ${fitting.id}: ${await outcome(visibleFittingRevision(actor, fitting.id))}`).toBe(`${user.role} ${fitting.id}: ${expected}`);
        if (expected === 'seen') seen++;
      }
    }
    // owner and fitter of each shop see its two fittings; A's player sees theirs; B's player theirs
    expect(seen).toBe(2 * 2 + 2 * 2 + 1 + 1);
  });

  it('visibleFittingRevision of an unknown fitting answers 404', async () => {
    const a = await buildShopWorld();
    const actor = (await loadActor(a.owner.id, a.owner.tokenVersion, (await startSession(a.owner.id, 60_000)).id))!;
    await expect(visibleFittingRevision(actor, '00000000-0000-4000-8000-000000000000')).rejects.toMatchObject({ status: 404 });
  });
});
