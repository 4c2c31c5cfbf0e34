/**
 * The head-to-head on invented, physically flown sessions (fixtures/sessions/): two groups of
 * the same player and build must read as no better build about as often as the tests' 5% level
 * promises (Welch's t per field; Holm's correction for the overall verdict, Holm 1979), and a
 * real difference of strike (smash factor 0.04 higher, about 6 mph of ball speed with a driver)
 * must be found in most 12-shot sessions.
 */
import { analyseSession } from '@/analysis/session';
import { CLUBS, generateGroup, PROFILES, type ClubPlan } from '@/fixtures/sessions/realistic-session';

jest.setTimeout(120_000);

function headToHead(planA: ClubPlan, planB: ClubPlan, seed: number) {
  const a = generateGroup({ profile: PROFILES[1], plan: planA, size: 12, injected: [], seed }).shots.map((s) => ({ ...s.shot, build: 'A' }));
  const b = generateGroup({ profile: PROFILES[1], plan: planB, size: 12, injected: [], seed: seed + 100_000 }).shots.map((s) => ({ ...s.shot, row: s.shot.row + 100, build: 'B' }));
  return analyseSession([...a, ...b], { compare: [{ club: planA.club, build: 'A' }, { club: planA.club, build: 'B' }] }).headToHead!;
}

const RUNS = 150;

describe('head-to-head on generated two-build sessions', () => {
  it.each([['driver', CLUBS[0]], ['7-iron', CLUBS[3]]] as const)('head-to-head of two identical %s builds names a better build in at most about 5%% of sessions', (_, plan) => {
    let named = 0;
    let carryClear = 0;
    for (let i = 0; i < RUNS; i++) {
      const h = headToHead(plan, plan, 7000 + i);
      if (h.overall.verdict === 'a' || h.overall.verdict === 'b' || h.overall.verdict === 'tradeOff') named++;
      if (h.fields.carry!.verdict === 'clear') carryClear++;
    }
    // 5% nominal; with 150 sessions the binomial sd is 1.8%: allow 5% + 2.5 sd.
    expect(named / RUNS).toBeLessThanOrEqual(0.095);
    expect(carryClear / RUNS).toBeLessThanOrEqual(0.095);
  });

  it('head-to-head of a driver build striking 0.04 better names it the better build in most sessions', () => {
    let found = 0;
    for (let i = 0; i < RUNS; i++) if (headToHead({ ...CLUBS[0], smash: CLUBS[0].smash + 0.04 }, CLUBS[0], 9000 + i).overall.verdict === 'a') found++;
    expect(found / RUNS).toBeGreaterThan(0.75);
  });
});
