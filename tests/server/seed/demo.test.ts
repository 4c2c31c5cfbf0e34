import { QueryTypes } from 'sequelize';
import { Op } from 'sequelize';
import { BagClub, Build, Player, SpecSheetRecord, User } from '@/server/models';
import { seedDemo } from '@/server/seed/demo';
import { createTestDatabase } from '../../support/test-db';

let db: Awaited<ReturnType<typeof createTestDatabase>>;
beforeAll(async () => {
  db = await createTestDatabase();
});
afterAll(async () => {
  await db.drop();
});

describe('seedDemo', () => {
  it('seedDemo on an empty database loads the scenario and imports its bay files; a second run does nothing', async () => {
    expect(await seedDemo(db.sequelize, new Date('2026-12-01T12:00:00Z'))).toBe(true);
    expect(await User.count()).toBe(4); // owner, two fitters, one player with a sign-in
    const [shots] = await db.sequelize.query<{ n: number }>('SELECT COUNT(*) AS n FROM shots', { type: QueryTypes.SELECT });
    expect(Number(shots.n)).toBe(140);
    // The remote fitting's file has no carry: the ball-flight model filled it, marked as derived.
    const [filled] = await db.sequelize.query<{ n: number }>("SELECT COUNT(*) AS n FROM shots WHERE club = '4H' AND carry IS NOT NULL AND derived_mask > 0", { type: QueryTypes.SELECT });
    expect(Number(filled.n)).toBe(8);
    // Demo build specs reach their build records (4 of Nell's builds, 8 of Amos's wedges and irons).
    expect(await Build.count({ where: { loftDeg: { [Op.ne]: null } } })).toBe(12);
    // Bags: Nell 12 clubs (her old driver and 7 iron out, the two chosen builds on order), Amos 15, Bea 11.
    const active = async (name: string) => {
      const player = (await Player.findOne({ where: { name } }))!;
      return BagClub.findAll({ where: { playerId: player.id, status: { [Op.ne]: 'out' } } });
    };
    expect((await active('Amos Keverne')).length).toBe(15);
    expect((await active('Bea Solloway')).length).toBe(11);
    const nell = await active('Nell Tarrant');
    expect(nell.length).toBe(12);
    expect(nell.filter((c) => c.status === 'on-order').map((c) => c.club).sort()).toEqual(['7I', 'DR']);
    expect(await SpecSheetRecord.count({ where: { state: 'sent' } })).toBe(1);
    expect(await seedDemo(db.sequelize, new Date())).toBe(false);
    expect(await User.count()).toBe(4); // owner, two fitters, one player with a sign-in
  });
});
