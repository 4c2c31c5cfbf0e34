import { formatAmount, overallVerdict, summariseHeadToHead } from '@/analysis/head-to-head';
import type { FieldComparison, HeadToHead, Overall, SpreadComparison, Verdict } from '@/analysis/head-to-head';
import { SPREAD_METHOD } from '@/analysis/head-to-head';

// Unit factors: NIST Special Publication 811 (2008), Appendix B.8 (exact): 1 yd = 0.9144 m,
// 1 ft = 0.3048 m, 1 mi/h = 0.44704 m/s, 1 km/h = 1/3.6 m/s.
const YD = 0.9144;
const FT = 0.3048;
const MPH = 0.44704;
const KMH = 1 / 3.6;

/** A mean comparison as compareBuilds gives it; only diff, p, verdict and shotsNeeded are read. */
function mean(diff: number, verdict: Verdict, p = 0.001, shotsNeeded: number | null = verdict === 'unclear' ? 10 : null): FieldComparison {
  return { meanA: 0, meanB: 0, diff, ci95: [diff - 1, diff + 1], t: 0, df: 10, p, margin: 1, verdict, shotsNeeded };
}

function spread(diff: number, verdict: Verdict, sdA: number, sdB: number, p = 0.001, shotsNeeded: number | null = verdict === 'unclear' ? 10 : null): SpreadComparison {
  return {
    sdA, sdB, ratio: sdA / sdB, p, verdict, method: SPREAD_METHOD, w: 0, df1: 1, df2: 18,
    deviationA: 0, deviationB: 0, diff, ci95: [diff - 1, diff + 1], margin: 1, shotsNeeded,
  };
}

function parts(fields: HeadToHead['fields'], spreads: HeadToHead['spread']['fields'] = {}) {
  return {
    a: { club: 'DR', build: 'Birch' },
    b: { club: 'DR', build: 'Ash' },
    fields,
    spread: { method: SPREAD_METHOD, fields: spreads },
  } as const;
}

describe('formatAmount', () => {
  // NIST SP 811 factors above; decimals: tenths for yd, m, mph, km/h, degrees and seconds,
  // whole rpm and feet, thousandths for smash factor (our display rule).
  it('formatAmount writes a carry in yards or metres to a tenth', () => {
    expect(formatAmount('carry', 6 * YD, 'imperial')).toBe('6.0 yd');
    expect(formatAmount('carry', -5.4864, 'metric')).toBe('5.5 m');
  });
  it('formatAmount writes a speed in mph or km/h to a tenth', () => {
    expect(formatAmount('ballSpeed', 1.5 * MPH, 'imperial')).toBe('1.5 mph');
    expect(formatAmount('ballSpeed', 10 * KMH, 'metric')).toBe('10.0 km/h');
  });
  it('formatAmount writes spin in whole rpm and apex height in whole feet', () => {
    expect(formatAmount('spinRate', 250.4, 'imperial')).toBe('250 rpm');
    expect(formatAmount('apexHeight', 3 * FT, 'imperial')).toBe('3 ft');
    expect(formatAmount('apexHeight', 3 * FT, 'metric')).toBe('0.9 m');
  });
  it('formatAmount writes angles with a degree sign and smash factor bare to a thousandth', () => {
    expect(formatAmount('launchAngle', -1.24, 'imperial')).toBe('1.2°');
    expect(formatAmount('smashFactor', -0.02, 'metric')).toBe('0.020');
    expect(formatAmount('flightTime', 0.25, 'metric')).toBe('0.3 s');
  });
});

describe('overallVerdict', () => {
  it('overallVerdict with B clearly longer names B the better build', () => {
    const o = overallVerdict(parts({ carry: mean(-8 * YD, 'clear') }));
    expect(o).toEqual({ verdict: 'b', betterA: [], betterB: ['carry'], text: 'Overall: Ash is the better build: longer.' });
  });

  it('overallVerdict reads a smaller spread as better: A tighter favours A, B tighter favours B', () => {
    expect(overallVerdict(parts({}, { offline: spread(-2, 'clear', 3, 6) })).text).toBe('Overall: Birch is the better build: tighter left to right.');
    expect(overallVerdict(parts({}, { carry: spread(2, 'clear', 6, 3) })).text).toBe('Overall: Ash is the better build: tighter in carry.');
  });

  it('overallVerdict lists two fields with "and" and three with a comma first', () => {
    expect(overallVerdict(parts({ carry: mean(5, 'clear'), ballSpeed: mean(1, 'clear') })).text).toBe('Overall: Birch is the better build: longer and more ball speed.');
    expect(overallVerdict(parts({ carry: mean(5, 'clear'), total: mean(6, 'clear'), ballSpeed: mean(1, 'clear') })).text).toBe(
      'Overall: Birch is the better build: longer, longer in total and more ball speed.',
    );
  });

  // Holm, "A simple sequentially rejective multiple test procedure", Scand. J. Statist. 6 (1979):
  // with m hypotheses ordered by p, reject the (k+1)-th (k = 0…) while p ≤ α/(m − k).
  it('overallVerdict keeps a clear field whose p equals Holm’s limit α/m exactly', () => {
    const o = overallVerdict(parts({ carry: mean(5, 'clear', 0.05 / 2), ballSpeed: mean(0.1, 'unclear', 0.6) }));
    expect(o.verdict).toBe('a');
    expect(o.betterA).toEqual(['carry']);
  });
  it('overallVerdict by Holm’s steps: p 0.001 and 0.04 of two fields both hold (0.001 ≤ 0.05/2, 0.04 ≤ 0.05/1)', () => {
    const o = overallVerdict(parts({ carry: mean(5, 'clear', 0.04), ballSpeed: mean(1, 'clear', 0.001) }));
    expect(o.betterA).toEqual(['carry', 'ballSpeed']);
  });
  it('overallVerdict by Holm’s steps: p 0.001, 0.04, 0.5 of three fields keeps only the first (0.04 > 0.05/2), said as "perhaps"', () => {
    const o = overallVerdict(parts({ carry: mean(5, 'clear', 0.001), total: mean(6, 'unclear', 0.5), ballSpeed: mean(1, 'clear', 0.04) }));
    expect(o.betterA).toEqual(['carry']);
    expect(o.text).toBe('Overall: Birch is the better build: longer (perhaps also more ball speed).');
    const b = overallVerdict(parts({ carry: mean(-5, 'clear', 0.001), total: mean(-6, 'unclear', 0.5), ballSpeed: mean(-1, 'clear', 0.04) }));
    expect(b.text).toBe('Overall: Ash is the better build: longer (perhaps also more ball speed).');
  });

  it('overallVerdict with each build better somewhere says trade-off', () => {
    const o = overallVerdict(parts({ carry: mean(5, 'clear') }, { offline: spread(2, 'clear', 6, 3) }));
    expect(o.text).toBe('Overall: a trade-off: Birch is longer; Ash is tighter left to right.');
  });

  it('overallVerdict with clear fields that Holm sets aside names the side each leans to and how many things were weighed', () => {
    const o = overallVerdict(parts({ carry: mean(-5, 'clear', 0.03), total: mean(1, 'unclear', 0.4), ballSpeed: mean(0.2, 'unclear', 0.5) }));
    expect(o.verdict).toBe('unclear');
    expect(o.text).toBe('Overall: not yet clear: Ash looks longer, but with three things weighed that could still be chance; a few more shots per build will tell.');
  });

  it('overallVerdict with every deciding field equivalent says no difference that matters', () => {
    const o = overallVerdict(parts({ carry: mean(0.1, 'equivalent', 0.8), ballSpeed: mean(0.1, 'equivalent', 0.7) }));
    expect(o).toEqual({ verdict: 'equivalent', betterA: [], betterB: [], text: 'Overall: no difference that matters between Birch and Ash.' });
  });
  it('overallVerdict with one deciding field equivalent and one unclear is not yet clear, with the larger count of shots', () => {
    const o = overallVerdict(parts({ carry: mean(0.1, 'equivalent', 0.8), total: mean(2, 'unclear', 0.3, 12), ballSpeed: mean(0.5, 'unclear', 0.2, 40) }));
    expect(o.verdict).toBe('unclear');
    expect(o.text).toBe('Overall: not yet clear: about 40 more shots per build would settle it.');
  });
  it('overallVerdict says "about 100" at 100 shots and "more than 100" above', () => {
    expect(overallVerdict(parts({ carry: mean(2, 'unclear', 0.3, 100) })).text).toBe('Overall: not yet clear: about 100 more shots per build would settle it.');
    expect(overallVerdict(parts({ carry: mean(2, 'unclear', 0.3, 101) })).text).toBe('Overall: not yet clear: more than 100 more shots per build would settle it.');
  });
  it('overallVerdict with no deciding field compared is not yet clear, without a count', () => {
    expect(overallVerdict(parts({ launchAngle: mean(1, 'clear') }))).toEqual({ verdict: 'unclear', betterA: [], betterB: [], text: 'Overall: not yet clear.' });
  });
});

describe('summariseHeadToHead', () => {
  const overall: Overall = { verdict: 'unclear', betterA: [], betterB: [], text: 'Overall: …' };

  it('summariseHeadToHead words a clear difference of each field it speaks of, up and down', () => {
    const up = parts({
      carry: mean(6 * YD, 'clear'),
      total: mean(7 * YD, 'clear'),
      ballSpeed: mean(1.5 * MPH, 'clear'),
      offline: mean(4 * YD, 'clear'),
      launchAngle: mean(1.2, 'clear'),
      spinRate: mean(250, 'clear'),
      smashFactor: mean(0.02, 'clear'),
      spinAxis: mean(2.5, 'clear'),
      clubSpeed: mean(2 * MPH, 'clear'),
    });
    expect(summariseHeadToHead({ ...up, overall }, 'imperial')).toBe(
      'Birch carries 6.0 yd farther (clear), goes 7.0 yd farther in total (clear), has 1.5 mph more ball speed (clear), finishes 4.0 yd further right (clear), ' +
        'launches 1.2° higher (clear), spins 250 rpm more (clear), has a smash factor 0.020 higher (clear), tilts its spin axis 2.5° further right (clear) ' +
        'and has 2.0 mph more club speed (clear). Overall: …',
    );
    const down = parts({
      carry: mean(-6 * YD, 'clear'),
      total: mean(-7 * YD, 'clear'),
      ballSpeed: mean(-1.5 * MPH, 'clear'),
      offline: mean(-4 * YD, 'clear'),
      launchAngle: mean(-1.2, 'clear'),
      spinRate: mean(-250, 'clear'),
      smashFactor: mean(-0.02, 'clear'),
      spinAxis: mean(-2.5, 'clear'),
      clubSpeed: mean(-2 * MPH, 'clear'),
    });
    expect(summariseHeadToHead({ ...down, overall }, 'imperial')).toBe(
      'Birch carries 6.0 yd shorter (clear), goes 7.0 yd shorter in total (clear), has 1.5 mph less ball speed (clear), finishes 4.0 yd further left (clear), ' +
        'launches 1.2° lower (clear), spins 250 rpm less (clear), has a smash factor 0.020 lower (clear), tilts its spin axis 2.5° further left (clear) ' +
        'and has 2.0 mph less club speed (clear). Overall: …',
    );
  });

  // 95% of a normal population lies within ±1.959964 sd (NIST/SEMATECH e-Handbook §1.3.6.7.1, normal table).
  it('summariseHeadToHead words a spread as ±1.96 sd of each build, wider or tighter, after the build’s name when alone', () => {
    const h = parts({}, { carry: spread(-1, 'clear', 5 * YD, 10 * YD) });
    expect(summariseHeadToHead({ ...h, overall }, 'imperial')).toBe('Birch: carry spread ±9.8 vs ±19.6 yd, tighter (clear). Overall: …');
    const both = parts({}, { offline: spread(1, 'clear', 10 * YD, 5 * YD), carry: spread(-1, 'clear', 5 * YD, 10 * YD) });
    expect(summariseHeadToHead({ ...both, overall }, 'imperial')).toBe(
      'Birch: left–right spread ±19.6 vs ±9.8 yd, wider (clear); carry spread ±9.8 vs ±19.6 yd, tighter (clear). Overall: …',
    );
    const wide = parts({ carry: mean(6 * YD, 'clear') }, { offline: spread(1, 'clear', 10, 5) });
    expect(summariseHeadToHead({ ...wide, overall }, 'metric')).toBe('Birch carries 5.5 m farther (clear); left–right spread ±19.6 vs ±9.8 m, wider (clear). Overall: …');
  });

  it('summariseHeadToHead says what is left only when something compared is not clear', () => {
    const h = parts({ carry: mean(6 * YD, 'clear'), launchAngle: mean(0.1, 'equivalent') });
    expect(summariseHeadToHead({ ...h, overall }, 'imperial')).toBe('Birch carries 6.0 yd farther (clear); the rest is equivalent or not yet clear. Overall: …');
  });

  it('summariseHeadToHead with nothing clear, or nothing compared, says so', () => {
    const h = parts({ carry: mean(0.1, 'equivalent') }, { offline: spread(0.5, 'unclear', 3, 3) });
    expect(summariseHeadToHead({ ...h, overall }, 'imperial')).toBe('No clear difference between Birch and Ash: everything compared is equivalent or not yet clear. Overall: …');
    expect(summariseHeadToHead({ ...parts({}), overall }, 'imperial')).toBe('Nothing to compare between Birch and Ash yet. Overall: …');
  });

  it('summariseHeadToHead leaves out a field it does not speak of (apex height)', () => {
    const h = parts({ carry: mean(6 * YD, 'clear') });
    expect(summariseHeadToHead({ ...h, fields: { ...h.fields, apexHeight: mean(3 * FT, 'clear') }, overall }, 'imperial')).toBe('Birch carries 6.0 yd farther (clear). Overall: …');
  });
});
