import { DERIVED_MARK, shotCellText, shotStatusText } from '@/components/analysis/shot-table-cells';

const YD = 0.9144; // NIST SP 811 (2008), Appendix B: 1 yd = 0.9144 m exactly

describe('shotCellText', () => {
  it('shotCellText writes offline with L or R in yards', () => {
    expect(shotCellText({ values: { offline: -4.1 * YD }, derived: [] }, 'offline', 'imperial')).toBe('4.1 L');
    expect(shotCellText({ values: { offline: 2 * YD }, derived: [] }, 'offline', 'imperial')).toBe('2.0 R');
  });
  it('shotCellText marks a derived value', () => {
    expect(shotCellText({ values: { smashFactor: 1.452 }, derived: ['smashFactor'] }, 'smashFactor', 'imperial')).toBe(`1.45${DERIVED_MARK}`);
  });
  it('shotCellText of a missing field is a dash', () => {
    expect(shotCellText({ values: {}, derived: [] }, 'apexHeight', 'metric')).toBe('–');
  });
});

describe('shotStatusText', () => {
  it('shotStatusText says the kind of stray and whether it is in the figures', () => {
    expect(shotStatusText({ stray: { kind: 'mishit', reason: 'x' }, decision: null, inFigures: false })).toBe('Mishit · left out');
    expect(shotStatusText({ stray: { kind: 'review', reason: 'x' }, decision: null, inFigures: true })).toBe('For review · in');
    expect(shotStatusText({ stray: { kind: 'mishit', reason: 'x' }, decision: 'keep', inFigures: true })).toBe('Mishit · kept by the fitter');
    expect(shotStatusText({ stray: null, decision: 'drop', inFigures: false })).toBe('Dropped by the fitter');
    expect(shotStatusText({ stray: null, decision: null, inFigures: true })).toBe('In');
  });
});
