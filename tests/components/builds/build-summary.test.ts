import { buildName, buildSummary, groupBuildsByClub, specNumber } from '@/components/builds/build-summary';
import type { Build } from '@/server/schemas';

// Invented builds (no real heads or shafts).
const EMPTY = {
  head: null, loftDeg: null, hoselSetting: null, lieDeg: null, lengthIn: null, shaft: null, shaftWeightG: null,
  shaftFlex: null, torqueDeg: null, grip: null, swingWeight: null, addedMassG: null, addedMassWhere: null, notes: null,
};
const build = (club: string, label: string, spec: Partial<typeof EMPTY> = {}): Build => ({
  id: `${club}-${label}`, fittingId: 'f1', club, label, ...EMPTY, ...spec,
});

describe('buildSummary', () => {
  it('buildSummary, loft hosel length shaft and mass, joins them with dots in workshop order', () => {
    expect(
      buildSummary({ loftDeg: 10.5, hoselSetting: '+1', lengthIn: 45.75, shaft: 'Graphite', shaftWeightG: 60, shaftFlex: 'S', addedMassG: 6, addedMassWhere: 'heel' }),
    ).toBe('10.5° · +1 hosel · 45.75 in · Graphite 60 g S · 6 g heel');
  });

  it('buildSummary, every spec, includes each once and leaves the notes out', () => {
    expect(
      buildSummary({
        ...EMPTY, head: 'Larch 440', loftDeg: 9, hoselSetting: 'Upright', lieDeg: 58.5, lengthIn: 45.875, shaft: 'Birch', shaftWeightG: 65,
        shaftFlex: 'X', torqueDeg: 3.8, grip: 'Midsize', swingWeight: 'D3', addedMassG: 4, addedMassWhere: 'back', notes: 'Try a lighter grip',
      }),
    ).toBe('Larch 440 · 9° · Upright hosel · lie 58.5° · 45.875 in · Birch 65 g X 3.8° torque · Midsize grip · D3 swing weight · 4 g back');
  });

  it('buildSummary, nothing set or only blanks, is null', () => {
    expect(buildSummary(EMPTY)).toBeNull();
    expect(buildSummary({ ...EMPTY, head: '  ', notes: 'notes alone are not specs' })).toBeNull();
  });

  it('buildSummary, zero added mass, is a value and not a blank', () => {
    expect(buildSummary({ addedMassG: 0 })).toBe('0 g added');
    expect(buildSummary({ addedMassWhere: 'toe' })).toBe('mass toe');
  });

  it('buildSummary, words already present, are not repeated', () => {
    expect(buildSummary({ hoselSetting: 'Hosel 3', grip: 'Standard grip' })).toBe('Hosel 3 · Standard grip');
  });
});

describe('specNumber', () => {
  it('specNumber, float noise, rounds to three decimals and drops trailing zeros', () => {
    expect(specNumber(0.1 + 0.2)).toBe('0.3');
    expect(specNumber(45.875)).toBe('45.875');
    expect(specNumber(10)).toBe('10');
  });
});

describe('groupBuildsByClub', () => {
  it('groupBuildsByClub, mixed clubs, orders clubs as in the bag and the unnamed build last', () => {
    const groups = groupBuildsByClub([build('7I', 'B'), build('DR', ''), build('PW', 'A'), build('DR', 'Stock 10.5'), build('DR', 'Alt 9')]);
    expect(groups.map((g) => g.club)).toEqual(['DR', '7I', 'PW']);
    expect(groups[0].clubLabel).toBe('Driver');
    expect(groups[0].builds.map((b) => b.label)).toEqual(['Alt 9', 'Stock 10.5', '']);
  });

  it('buildName, empty label, reads "No build named"', () => {
    expect(buildName('')).toBe('No build named');
    expect(buildName('Stock 10.5')).toBe('Stock 10.5');
  });
});
