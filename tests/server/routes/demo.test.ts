import request from 'supertest';
import { User } from '@/server/models';
import { readScenario, seedDemo } from '@/server/seed/demo';
import { createTestContext, type TestContext } from '../../support/test-db';

let ctx: TestContext;
beforeAll(async () => {
  ctx = await createTestContext();
});
afterAll(async () => {
  await ctx.close();
});

// GET /api/demo is public and takes no input: there is no 400, 401/403 or another shop's record
// to ask for; the checks are what it says with and without the demo, and that it says nothing else.
describe('/api/demo', () => {
  it('GET /api/demo, a database without the demo, answers 200 { demo: false } to anyone', async () => {
    const res = await request(ctx.app).get('/api/demo');
    expect(res.status).toBe(200);
    expect(res.body).toEqual({ demo: false });
  });

  it('GET /api/demo, the demo loaded, answers { demo: true } and nothing else', async () => {
    expect(await seedDemo(ctx.sequelize, new Date('2026-12-01T10:00:00Z'))).toBe(true);
    const res = await request(ctx.app).get('/api/demo');
    expect(res.status).toBe(200);
    expect(res.body).toEqual({ demo: true });
    expect(res.headers['cache-control']).toBe('no-store');
  });

  it('GET /api/demo, the demo owner deactivated, answers { demo: false } (the demo sign-ins no longer all work)', async () => {
    await User.update({ active: false }, { where: { email: readScenario().owner.email } });
    expect((await request(ctx.app).get('/api/demo')).body).toEqual({ demo: false });
    await User.update({ active: true }, { where: { email: readScenario().owner.email } });
    expect((await request(ctx.app).get('/api/demo')).body).toEqual({ demo: true });
  });

  it('POST /api/demo is no route: 404', async () => {
    expect((await request(ctx.app).post('/api/demo').set('x-ovalyard-request', '1')).status).toBe(404);
  });
});

describe('the demo fittings on their course', () => {
  it('every step a demo fitting has reached carries a date, in order (no step shown done without one)', async () => {
    const { COURSE_STEPS } = await import('@/server/schemas');
    const { Fitting, FittingCourseStep } = await import('@/server/models');
    const fittings = await Fitting.findAll();
    expect(fittings.length).toBeGreaterThan(0);
    for (const f of fittings) {
      const entries = await FittingCourseStep.findAll({ where: { fittingId: f.id, direction: 'forward' }, order: [['id', 'ASC']] });
      const reached = COURSE_STEPS.slice(COURSE_STEPS.indexOf(f.remote ? 'requested' : 'in-progress'), COURSE_STEPS.indexOf(f.courseStep) + 1);
      expect(entries.map((e) => e.step)).toEqual(reached);
      for (let i = 1; i < entries.length; i++) expect(entries[i].at.getTime()).toBeGreaterThanOrEqual(entries[i - 1].at.getTime());
    }
  });
});
