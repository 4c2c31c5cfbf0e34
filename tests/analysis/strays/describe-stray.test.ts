import { describeStray, describeStrayFlag, formatMetres } from '@/analysis/strays';

describe('describeStrayFlag', () => {
  it('describeStrayFlag on a short carry gives the plain sentence in metres', () => {
    expect(describeStrayFlag({ rule: 'carry', value: 112.2, median: 148.1, modifiedZ: -5.23 })).toBe(
      "carry 112 m is far short of this group's median 148 m (modified z −5.2)",
    );
  });

  it('describeStrayFlag on a long carry says far beyond, with a plus sign', () => {
    expect(describeStrayFlag({ rule: 'carry', value: 171, median: 148, modifiedZ: 4.06 })).toBe(
      "carry 171 m is far beyond this group's median 148 m (modified z +4.1)",
    );
  });

  it('describeStrayFlag on a low smash factor says far below', () => {
    expect(describeStrayFlag({ rule: 'smashFactor', value: 1.21, median: 1.45, modifiedZ: -6 })).toBe(
      "smash factor 1.21 is far below this group's median 1.45 (modified z −6.0)",
    );
  });

  // 1 yd = 0.9144 m (NIST SP 811, 2008, Appendix B).
  it('describeStrayFlag on the ground with a yard formatter gives left and short in yards', () => {
    const text = describeStrayFlag(
      { rule: 'ground', distance: 5.04, limit: 3.7169, offlineFromCenterM: -18.288, carryFromCenterM: -9.144 },
      (m) => `${Math.round(m / 0.9144)} yd`,
    );
    expect(text).toBe("lands far from this group's pattern: 20 yd left and 10 yd short of its median centre (robust distance 5.0, limit 3.7)");
  });

  it('formatMetres rounds to whole metres', () => {
    expect(formatMetres(147.6)).toBe('148 m');
  });
});

describe('describeStray', () => {
  it('describeStray with two flags joins them with a semicolon', () => {
    const text = describeStray({
      row: 4,
      index: 3,
      flags: [
        { rule: 'carry', value: 112, median: 148, modifiedZ: -5.2 },
        { rule: 'smashFactor', value: 1.2, median: 1.33, modifiedZ: -4 },
      ],
    });
    expect(text.split('; ')).toHaveLength(2);
  });
});
