import { buildName, buildSpecLines as specLines, buildSummary as summary, groupBuildsByClub, NBSP, specNumber } from '@/components/builds/build-summary';
import type { BuildSpec } from '@/components/builds/build-summary';

/** The texts with no-break spaces written as plain ones (they are checked on their own below). */
const buildSummary = (spec: Partial<BuildSpec>) => summary(spec)?.split(NBSP).join(' ') ?? null;
const buildSpecLines = (spec: Partial<BuildSpec>) => specLines(spec).map((l) => l.split(NBSP).join(' '));
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
  it('buildSummary, loft hosel length shaft and mass, labels each part, one line per group in workshop order', () => {
    expect(
      buildSummary({ loftDeg: 10.5, hoselSetting: '+1', lengthIn: 45.75, shaft: 'Graphite', shaftWeightG: 60, shaftFlex: 'S', addedMassG: 6, addedMassWhere: 'heel' }),
    ).toBe('Loft 10.5° · Hosel: +1 · Length 45.75 in\nShaft: Graphite · 60 g · S flex\nAdded mass: 6 g heel');
  });

  it('buildSummary, every spec, includes each once and leaves the notes out', () => {
    expect(
      buildSummary({
        ...EMPTY, head: 'Larch 440', loftDeg: 9, hoselSetting: 'Upright', lieDeg: 58.5, lengthIn: 45.875, shaft: 'Birch', shaftWeightG: 65,
        shaftFlex: 'X', torqueDeg: 3.8, grip: 'Midsize', swingWeight: 'D3', addedMassG: 4, addedMassWhere: 'back', notes: 'Try a lighter grip',
      }),
    ).toBe(
      'Head: Larch 440 · Loft 9° · Hosel: Upright · Lie 58.5° · Length 45.875 in\n' +
        'Shaft: Birch · 65 g · X flex · 3.8° torque\n' +
        'Grip: Midsize · Swing weight D3 · Added mass: 4 g back',
    );
  });

  it('buildSummary, a number in the shaft name and the same weight, keeps them apart with labels', () => {
    expect(buildSummary({ shaft: 'Test graphite 75', shaftWeightG: 75, shaftFlex: 'R' })).toBe('Shaft: Test graphite 75 · 75 g · R flex');
  });

  it('buildSummary, shaft weight and flex without a name, still labels the shaft', () => {
    expect(buildSummary({ shaftWeightG: 65, shaftFlex: 'Stiff flex' })).toBe('Shaft: 65 g · Stiff flex');
  });

  it('buildSummary, nothing set or only blanks, is null', () => {
    expect(buildSummary(EMPTY)).toBeNull();
    expect(buildSummary({ ...EMPTY, head: '  ', notes: 'notes alone are not specs' })).toBeNull();
  });

  it('buildSummary, zero added mass, is a value and not a blank', () => {
    expect(buildSummary({ addedMassG: 0 })).toBe('Added mass: 0 g');
    expect(buildSummary({ addedMassWhere: 'toe' })).toBe('Added mass: toe');
  });

  it('buildSummary, a value that starts with its label, is not labelled twice', () => {
    expect(buildSummary({ hoselSetting: 'Hosel 3', grip: 'Grip wrap, midsize' })).toBe('Hosel 3\nGrip wrap, midsize');
  });

  it('buildSummary, numbers and their units and labels, are joined by no-break spaces (wraps fall between parts)', () => {
    expect(summary({ loftDeg: 9, lengthIn: 45.5, shaftWeightG: 65, shaftFlex: 'X', swingWeight: 'D2' })).toBe(
      `Loft${NBSP}9°${NBSP}· Length${NBSP}45.5${NBSP}in\nShaft: 65${NBSP}g${NBSP}· X${NBSP}flex\nSwing${NBSP}weight${NBSP}D2`,
    );
  });

  it('buildSpecLines, only the shaft set, is that one line', () => {
    expect(buildSpecLines({ shaft: 'Birch', torqueDeg: 4 })).toEqual(['Shaft: Birch · 4° torque']);
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
