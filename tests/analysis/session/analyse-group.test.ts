import type { Shot } from '@/analysis/fields';
import { analyseGroup, shotColumns } from '@/analysis/session';

// Invented 8-iron group, one shot pulled far left (row 6).
const SHOTS: Shot[] = [
  [138, 1], [140, -2], [137, 0], [139, 2], [141, -1], [139, -35], [138, 1], [140, 0],
].map(([carry, offline], i) => ({ row: i + 1, club: '8I', build: null, values: { carry, offline }, derived: [] }));

describe('analyseGroup', () => {
  const settings = { level: 0.95, includeStrays: false, decisions: {} };

  it('analyseGroup with a pulled shot flags it on the ground and leaves it out of the oval', () => {
    const { analysis, kept } = analyseGroup(shotColumns(SHOTS)[0], settings);
    expect(analysis.strays.map((s) => s.row)).toEqual([6]);
    expect(analysis.strays[0].reason).toMatch(/^lands far from this group's pattern: 35 m left/);
    expect(kept[5]).toBe(0);
    expect(analysis.fields.offline!.min).toBe(-2);
    expect(analysis.oval!.centerOffline).toBeCloseTo(1 / 7, 12);
  });

  it('analyseGroup with a small scratch still works', () => {
    const a = analyseGroup(shotColumns(SHOTS)[0], settings, new Float64Array(1));
    const b = analyseGroup(shotColumns(SHOTS)[0], settings);
    expect(a.analysis).toEqual(b.analysis);
  });

  it('analyseGroup with the fitter dropping a shot on its own lists why', () => {
    const { analysis } = analyseGroup(shotColumns(SHOTS)[0], { ...settings, decisions: { 1: 'drop', 6: 'drop' } });
    expect(analysis.kept).toBe(6);
    expect(analysis.strays[0]).toEqual({ row: 1, reason: 'dropped by the fitter' });
    expect(analysis.strays[1].reason).toMatch(/\(dropped by the fitter\)$/);
  });
});
