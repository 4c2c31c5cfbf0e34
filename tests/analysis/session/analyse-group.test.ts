import type { Shot } from '@/analysis/fields';
import { analyseGroup, shotColumns } from '@/analysis/session';

// Invented 8-iron group, one shot pulled far left (row 6).
const SHOTS: Shot[] = [
  [138, 1], [140, -2], [137, 0], [139, 2], [141, -1], [139, -35], [138, 1], [140, 0],
].map(([carry, offline], i) => ({ row: i + 1, club: '8I', build: null, values: { carry, offline }, derived: [] }));

describe('analyseGroup', () => {
  const settings = { level: 0.95, includeStrays: false, decisions: {} };

  it('analyseGroup with a pulled shot flags it for review as a directional miss and keeps it in the oval', () => {
    const { analysis, kept } = analyseGroup(shotColumns(SHOTS)[0], settings);
    expect(analysis.strays.map((s) => [s.row, s.kind, s.inFigures])).toEqual([[6, 'review', true]]);
    expect(analysis.strays[0].reason).toMatch(/^For review: a directional miss 35 m left of this group's pattern/);
    expect(kept[5]).toBe(1);
    expect(analysis.fields.offline!.min).toBe(-35);
    expect(analysis.oval!.centerOffline).toBeCloseTo(-34 / 8, 12);
  });

  it('analyseGroup with a thin strike calls it a mishit and leaves it out of the figures', () => {
    const shots = SHOTS.map((s, i) => (i === 2 ? { ...s, values: { ...s.values, carry: 104 } } : s));
    const { analysis, kept } = analyseGroup(shotColumns(shots)[0], settings);
    const thin = analysis.strays.find((s) => s.row === 3)!;
    expect([thin.kind, thin.inFigures]).toEqual(['mishit', false]);
    expect(kept[2]).toBe(0);
  });

  it('analyseGroup with a small scratch still works', () => {
    const a = analyseGroup(shotColumns(SHOTS)[0], settings, new Float64Array(1));
    const b = analyseGroup(shotColumns(SHOTS)[0], settings);
    expect(a.analysis).toEqual(b.analysis);
  });

  it('analyseGroup with the fitter dropping a shot on its own lists why', () => {
    const { analysis } = analyseGroup(shotColumns(SHOTS)[0], { ...settings, decisions: { 1: 'drop', 6: 'drop' } });
    expect(analysis.kept).toBe(6);
    expect(analysis.strays[0]).toEqual({ row: 1, kind: null, reason: 'Dropped by the fitter', inFigures: false });
    expect(analysis.strays[1].reason).toMatch(/\(dropped by the fitter\)$/);
  });
});
