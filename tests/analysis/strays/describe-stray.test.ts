import { describeStray, describeStrayFlag, formatCanonical, strayFormatterFor } from '@/analysis/strays';

const YD = 0.9144; // NIST SP 811 (2008), Appendix B: 1 yd = 0.9144 m exactly
const MPH = 0.44704; // NIST SP 811: 1 mph = 0.44704 m/s exactly
const imperial = (value: number, field: 'carry' | 'offline' | 'ballSpeed') =>
  field === 'ballSpeed' ? `${(value / MPH).toFixed(1)} mph` : `${Math.round(value / YD)} yd`;

describe('describeStrayFlag', () => {
  it('describeStrayFlag on a short carry gives the plain sentence in metres', () => {
    expect(describeStrayFlag({ rule: 'carry', kind: 'mishit', value: 112.2, median: 148.1, modifiedZ: -5.23, madUsed: 4, floored: false })).toBe(
      "carry 112 m, far short of this group's 148 m (modified z −5.2)",
    );
  });

  it('describeStrayFlag on a low ball speed writes it in the units asked for', () => {
    expect(describeStrayFlag({ rule: 'ballSpeed', kind: 'mishit', value: 58.1 * MPH * 2, median: 73 * MPH * 2, modifiedZ: -6, madUsed: 1, floored: true }, imperial)).toBe(
      "ball speed 116.2 mph, far below this group's 146.0 mph (modified z −6.0)",
    );
  });

  it('describeStrayFlag on a launch far above says far above', () => {
    expect(describeStrayFlag({ rule: 'launchAngle', kind: 'mishit', value: 24, median: 12.3, modifiedZ: 8.2, madUsed: 1, floored: true })).toBe(
      "launch 24.0°, far above this group's 12.3° (modified z +8.2)",
    );
  });

  it('describeStrayFlag on a misread names the impact bound', () => {
    expect(describeStrayFlag({ rule: 'misread', kind: 'misread', field: 'smashFactor', value: 1.62, limit: 1.538 })).toBe(
      'smash factor 1.62 is more than the impact of this club allows (at most 1.54, measurement error allowed)',
    );
  });

  it('describeStrayFlag on a shot far left says a directional miss, the player’s dispersion, in yards', () => {
    const text = describeStrayFlag(
      { rule: 'ground', kind: 'review', direction: 'left', distance: 7.04, limit: 6.77, offlineFromCenterM: -20 * YD, carryFromCenterM: -2 * YD },
      imperial,
    );
    expect(text).toBe("a directional miss 20 yd left of this group's pattern: the player's dispersion (robust distance 7.0, limit 6.8)");
  });

  it('describeStrayFlag on a shot far short of the pattern says short', () => {
    const text = describeStrayFlag({ rule: 'ground', kind: 'review', direction: 'short', distance: 8, limit: 6.77, offlineFromCenterM: 1, carryFromCenterM: -30 * YD }, imperial);
    expect(text).toBe("lands 30 yd short of this group's pattern (robust distance 8.0, limit 6.8)");
  });

  it('formatCanonical writes whole metres and m/s to 0.1', () => {
    expect(formatCanonical(147.6, 'carry')).toBe('148 m');
    expect(formatCanonical(58.14, 'ballSpeed')).toBe('58.1 m/s');
  });
});

describe('describeStray', () => {
  it('describeStray with two flags starts with its kind and joins them with a semicolon', () => {
    const text = describeStray({
      row: 4,
      index: 3,
      kind: 'mishit',
      flags: [
        { rule: 'smashFactor', kind: 'mishit', value: 1.2, median: 1.33, modifiedZ: -4, madUsed: 0.02, floored: false },
        { rule: 'carry', kind: 'mishit', value: 112, median: 148, modifiedZ: -5.2, madUsed: 4, floored: false },
      ],
    });
    expect(text).toBe("Mishit: smash factor 1.20, far below this group's 1.33 (modified z −4.0); carry 112 m, far short of this group's 148 m (modified z −5.2)");
  });
});

describe('strayFormatterFor', () => {
  // NIST SP 811 (2008), Appendix B: 1 yd = 0.9144 m, 1 mph = 0.44704 m/s, 1 km/h = 1/3.6 m/s (exact).
  it('strayFormatterFor writes yards and mph, or metres and km/h', () => {
    expect(strayFormatterFor('imperial')(91.44, 'carry')).toBe('100 yd');
    expect(strayFormatterFor('imperial')(44.704, 'ballSpeed')).toBe('100.0 mph');
    expect(strayFormatterFor('metric')(91.44, 'offline')).toBe('91 m');
    expect(strayFormatterFor('metric')(10, 'ballSpeed')).toBe('36.0 km/h');
  });
});

describe('describeStrayFlag signs and directions', () => {
  it('describeStrayFlag writes a modified z that rounds to 0.0 without a sign', () => {
    expect(describeStrayFlag({ rule: 'smashFactor', kind: 'mishit', value: 1.3, median: 1.3, modifiedZ: -0.04, madUsed: 0.01, floored: true })).toBe(
      "smash factor 1.30, far below this group's 1.30 (modified z 0.0)",
    );
  });
  it('describeStrayFlag on a launch far below says far below, with a minus sign', () => {
    expect(describeStrayFlag({ rule: 'launchAngle', kind: 'mishit', value: 2.1, median: 12.2, modifiedZ: -6.81, madUsed: 1, floored: true })).toBe(
      "launch 2.1°, far below this group's 12.2° (modified z −6.8)",
    );
  });
  it('describeStrayFlag on a shot far right says right, the distance in the units asked for', () => {
    const text = describeStrayFlag({ rule: 'ground', kind: 'review', direction: 'right', distance: 9.04, limit: 6.77, offlineFromCenterM: 30 * YD, carryFromCenterM: 2 }, imperial);
    expect(text).toBe("a directional miss 30 yd right of this group's pattern: the player's dispersion (robust distance 9.0, limit 6.8)");
  });
});

describe('describeStray kinds', () => {
  it('describeStray of a misread and of a shot for review starts with the kind’s word; review says it stays in', () => {
    expect(describeStray({ row: 2, index: 1, kind: 'misread', flags: [{ rule: 'misread', kind: 'misread', field: 'smashFactor', value: 1.62, limit: 1.538 }] })).toBe(
      'Misread: smash factor 1.62 is more than the impact of this club allows (at most 1.54, measurement error allowed)',
    );
    expect(
      describeStray({ row: 3, index: 2, kind: 'review', flags: [{ rule: 'ground', kind: 'review', direction: 'short', distance: 8, limit: 6.77, offlineFromCenterM: 0, carryFromCenterM: -30 }] }),
    ).toBe("For review: lands 30 m short of this group's pattern (robust distance 8.0, limit 6.8); kept in the figures unless you drop it");
  });
});
