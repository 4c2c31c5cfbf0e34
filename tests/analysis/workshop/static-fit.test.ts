import { defaultStaticFitTable, STATIC_FIT_RULE, staticFitRuleIn, staticFitStart, type StaticFitRow } from '@/analysis/workshop';

// The default table is our own plain rule (common practice only as a starting point, no source,
// never a maker's chart): ¼ in per 10 cm of height and per 5 cm of wrist-to-floor away from
// 178 cm / 86 cm, rounded to ¼ in, within ±1½ in; lie 1° per ½ in (common practice).
describe('staticFitRuleIn', () => {
  it.each([
    [178, 86, 0],
    [188, 91, 0.5],
    [168, 81, -0.5],
    [188, 81, 0],
    [198, 96, 1],
    [230, 120, 1.5],
    [140, 60, -1.5],
  ])('staticFitRuleIn(%p cm, %p cm) is %p in', (h, w, inches) => {
    expect(staticFitRuleIn(h, w)).toBe(inches);
  });

  it('staticFitRuleIn keeps within the rule’s ±1½ in', () => {
    expect(STATIC_FIT_RULE.maxChangeIn).toBe(1.5);
  });
});

describe('staticFitStart', () => {
  const table = defaultStaticFitTable();

  it('staticFitStart with the default table gives the rule at the band’s middle and the lie that goes with it', () => {
    // 190 cm lies in the 188–198 band (middle 193), 90 cm in 88.5–93.5 (middle 91): ¼ · (1.5 + 1) = 0.625 → 0.75 in
    expect(staticFitStart(190, 90, table)).toMatchObject({ lengthChangeIn: 0.75, lieChangeDeg: 1.5 });
  });

  it('staticFitStart with the default table holds every pair of positive measures', () => {
    for (const h of [120, 158, 163, 178, 199, 230]) {
      for (const w of [50, 73.5, 80, 86, 98.5, 130]) expect(staticFitStart(h, w, table)).not.toBeNull();
    }
  });

  it('staticFitStart with a shop’s own table uses the first row that holds the player', () => {
    const shop: StaticFitRow[] = [
      { heightFromCm: 180, heightToCm: null, wristFromCm: null, wristToCm: null, lengthChangeIn: 1 },
      { heightFromCm: null, heightToCm: null, wristFromCm: null, wristToCm: null, lengthChangeIn: -0.25 },
    ];
    expect(staticFitStart(185, 80, shop)).toEqual({ lengthChangeIn: 1, lieChangeDeg: 2, row: 0 });
    expect(staticFitStart(170, 80, shop)).toEqual({ lengthChangeIn: -0.25, lieChangeDeg: -0.5, row: 1 });
  });

  it('staticFitStart without a measure, or with no row for it, is null', () => {
    expect(staticFitStart(null, 86, table)).toBeNull();
    expect(staticFitStart(178, null, table)).toBeNull();
    expect(staticFitStart(178, 86, [])).toBeNull();
  });

  it('staticFitStart of a measure that is not positive throws', () => {
    expect(() => staticFitStart(-1, 86, table)).toThrow(RangeError);
    expect(() => staticFitStart(178, Number.NaN, table)).toThrow(RangeError);
  });
});
