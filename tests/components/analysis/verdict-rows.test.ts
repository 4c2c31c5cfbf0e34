import { compareBuilds } from '@/analysis/head-to-head';
import { verdictRows } from '@/components/analysis/verdict-rows';

const YD = 0.9144; // NIST SP 811 (2008), Appendix B: 1 yd = 0.9144 m exactly

// Invented builds: A carries about 6 yd farther, same spread.
const A = { club: '7I', build: 'Birch', columns: { carry: [150, 152, 149, 151, 153, 150, 152, 151].map((x) => x * YD), offline: [-3, 2, 0, 4, -2, 1, -1, 3].map((x) => x * YD) } };
const B = { club: '7I', build: 'Ash', columns: { carry: [144, 146, 143, 145, 147, 144, 146, 145].map((x) => x * YD), offline: [-4, 3, 1, 2, -3, 0, -2, 4].map((x) => x * YD) } };

describe('verdictRows', () => {
  const h = compareBuilds(A, B, { units: 'imperial' });

  it('verdictRows writes the difference, interval and margin in yards with the analysis’s verdict', () => {
    const [carry] = verdictRows(h, ['carry'], [], 'imperial');
    expect(carry.label).toBe('Carry');
    expect(carry.verdict).toBe(h.fields.carry!.verdict);
    expect(carry.verdictText).toBe('clear');
    expect(carry.detail).toMatch(/^\+6\.0 yd \(95%: \+\d\.\d yd to \+\d\.\d yd\), margin ±3\.0 yd$/);
    expect(carry.more).toBeNull();
  });

  it('verdictRows gives a spread row with both sds, their ratio and the Brown–Forsythe p', () => {
    const rows = verdictRows(h, [], ['offline'], 'metric');
    expect(rows[0].label).toBe('Left–right spread');
    expect(rows[0].detail).toMatch(/^sd \d\.\d m vs \d\.\d m, ratio \d\.\d\d, Brown–Forsythe p 0\.\d{3}$/);
  });

  it('verdictRows of an unclear field says how many more shots would settle it', () => {
    const rows = verdictRows(h, ['offline'], [], 'imperial');
    expect(rows[0].verdictText).toBe('not yet clear');
    expect(rows[0].more).toMatch(/^(About \d+|More than 100) more shots per build would settle it$/);
  });

  it('verdictRows leaves out fields the comparison does not have', () => {
    expect(verdictRows(h, ['spinRate'], ['spinRate'], 'imperial')).toEqual([]);
  });
});
