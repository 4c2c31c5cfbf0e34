import { DEFAULT_MARGINS, resolveMargins } from '@/analysis/head-to-head';
import { marginBody, marginTexts } from '@/components/settings/margin-form-values';
import type { ShopMarginsView } from '@/server/schemas';

const YD = 0.9144; // NIST SP 811 (2008), Appendix B: 1 yd = 0.9144 m exactly
const MPH = 0.44704; // NIST SP 811: 1 mph = 0.44704 m/s exactly

function view(custom: Partial<Record<string, number>> = {}): ShopMarginsView {
  return { margins: resolveMargins(custom), custom, defaults: { ...DEFAULT_MARGINS }, fairwayWidthM: 30 * YD, greenRadiusM: 12 * YD, defaultFairwayWidthM: 30 * YD, defaultGreenRadiusM: 12 * YD, canEdit: true, updatedAt: null };
}

describe('marginTexts', () => {
  it('marginTexts shows the common-practice defaults in yards, mph, degrees and rpm', () => {
    const t = marginTexts(view(), 'imperial');
    expect([t.carry, t.offline, t.ballSpeed, t.launchAngle, t.spinRate, t.smashFactor, t.fairwayWidthM, t.greenRadiusM]).toEqual(['3', '3', '1', '0.5', '150', '0.01', '30', '12']);
  });
  it('marginTexts shows metric defaults in metres and km/h', () => {
    const t = marginTexts(view(), 'metric');
    expect(t.carry).toBe('2.7432');
    expect(t.ballSpeed).toBe('1.60934'); // 1 mph = 1.609344 km/h
  });
});

describe('marginBody', () => {
  it('marginBody of the untouched form stores nothing: every default kept', () => {
    const { body } = marginBody(marginTexts(view(), 'imperial'), view(), 'imperial');
    expect(body).toEqual({ margins: {}, fairwayWidthM: null, greenRadiusM: null });
  });
  it('marginBody of a changed carry and ball speed stores them in metres and m/s', () => {
    const texts = { ...marginTexts(view(), 'imperial'), carry: '5', ballSpeed: '2', fairwayWidthM: '25' };
    const { body } = marginBody(texts, view(), 'imperial');
    expect(body!.margins!.carry).toBeCloseTo(5 * YD, 12);
    expect(body!.margins!.ballSpeed).toBeCloseTo(2 * MPH, 12);
    expect(body!.fairwayWidthM).toBeCloseTo(25 * YD, 12);
  });
  it('marginBody of an empty box keeps the default; of a word or 0 gives an error', () => {
    const texts = { ...marginTexts(view({ carry: 5 * YD }), 'imperial'), carry: '' };
    expect(marginBody(texts, view({ carry: 5 * YD }), 'imperial').body!.margins).toEqual({});
    const bad = marginBody({ ...texts, spinRate: 'lots', smashFactor: '0' }, view(), 'imperial');
    expect(bad.body).toBeNull();
    expect(Object.keys(bad.errors).sort()).toEqual(['smashFactor', 'spinRate']);
  });
});
