import type { HeadToHead } from '@/analysis/head-to-head';
import { buildInPlainWords, theBuild } from '@/analysis/plain-words';

/** The parts of a head-to-head the words read, worked by hand (A = the chosen build). */
function h(carry: { diff: number; verdict: 'clear' | 'equivalent' | 'unclear' } | null, offline: { diff: number; verdict: 'clear' | 'equivalent' | 'unclear' } | null, overall: HeadToHead['overall']['verdict'] = 'a') {
  const comparison = (c: { diff: number; verdict: 'clear' | 'equivalent' | 'unclear' }) => ({ diff: c.diff, verdict: c.verdict }) as unknown as HeadToHead['fields']['carry'];
  return {
    b: { club: 'DR', build: '55 g shaft' },
    fields: carry ? { carry: comparison(carry) } : {},
    spread: { method: 'brown-forsythe', fields: offline ? { offline: comparison(offline) as unknown as HeadToHead['spread']['fields']['offline'] } : {} },
    overall: { verdict: overall, betterA: [], betterB: [], text: '' },
  } as unknown as HeadToHead;
}

// One yard is 0.9144 m exactly (International Yard and Pound Agreement, 1959): 6 yd = 5.4864 m.
const SIX_YARDS_M = 5.4864;

describe('buildInPlainWords', () => {
  it('buildInPlainWords, 6 yd clearly longer and an equivalent spread, says "6 yd longer and as straight"', () => {
    const words = buildInPlainWords('65 g shaft', h({ diff: SIX_YARDS_M, verdict: 'clear' }, { diff: 0.2, verdict: 'equivalent' }), 'imperial');
    expect(words.headline).toBe('The 65 g shaft: 6 yd longer and as straight');
    expect(words.against).toBe('than the 55 g shaft');
    expect(words.certainty).toBe('settled');
  });

  it('buildInPlainWords, the same difference in metric units, says 5 m (5.4864 m rounded by hand)', () => {
    expect(buildInPlainWords('65 g shaft', h({ diff: SIX_YARDS_M, verdict: 'clear' }, { diff: 0.2, verdict: 'equivalent' }), 'metric').headline).toBe('The 65 g shaft: 5 m longer and as straight');
  });

  it('buildInPlainWords, clearly shorter (−9.144 m = 10 yd) and a clearly tighter spread, says "10 yd shorter and straighter"', () => {
    expect(buildInPlainWords('Birch', h({ diff: -9.144, verdict: 'clear' }, { diff: -1.5, verdict: 'clear' }, 'tradeOff'), 'imperial').headline).toBe('Birch: 10 yd shorter and straighter');
  });

  it('buildInPlainWords, a clear but tiny difference (0.3 m = 0.33 yd), says "a touch longer", never "0 yd longer"', () => {
    expect(buildInPlainWords('65 g shaft', h({ diff: 0.3, verdict: 'clear' }, { diff: 2, verdict: 'clear' }), 'imperial').headline).toBe('The 65 g shaft: a touch longer and less straight');
  });

  it('buildInPlainWords, nothing settled yet, says so and marks it not yet', () => {
    const words = buildInPlainWords('65 g shaft', h({ diff: 3, verdict: 'unclear' }, { diff: 1, verdict: 'unclear' }, 'unclear'), 'imperial');
    expect(words.headline).toBe('The 65 g shaft: no clear difference in length yet and no clear difference in straightness yet');
    expect(words.certainty).toBe('not-yet');
  });

  it('buildInPlainWords, no rival to compare with, names the choice without figures', () => {
    expect(buildInPlainWords('65 g shaft', null, 'imperial')).toEqual({ headline: 'The 65 g shaft: the one your fitter chose', against: '', certainty: 'settled' });
  });

  it('buildInPlainWords, every sentence, carries no statistics words (p, Welch, z)', () => {
    const text = JSON.stringify(buildInPlainWords('65 g shaft', h({ diff: SIX_YARDS_M, verdict: 'clear' }, { diff: 0.2, verdict: 'unclear' }, 'unclear'), 'imperial'));
    expect(text).not.toMatch(/p =|Welch|z-score|interval/);
  });
});

describe('theBuild', () => {
  it('theBuild, a description, a name and an empty label, reads "The …", the name, "This build"', () => {
    expect(theBuild('65 g shaft')).toBe('The 65 g shaft');
    expect(theBuild('stiff shaft')).toBe('The stiff shaft');
    expect(theBuild('Birch')).toBe('Birch');
    expect(theBuild('the 10.5° head')).toBe('The 10.5° head');
    expect(theBuild('')).toBe('This build');
  });
});
