import type { Shot } from '@/analysis/fields';
import { shotColumns } from '@/analysis/session';

// Invented shots.
const SHOTS: Shot[] = [
  { row: 1, club: '7I', build: 'A', values: { carry: 150, ballSpeed: 53, clubSpeed: 40 }, derived: [] },
  { row: 2, club: 'DR', build: null, values: { carry: 230 }, derived: [] },
  { row: 3, club: '7I', build: 'A', values: { offline: 2, carry: 148, smashFactor: 1.31 }, derived: [] },
  { row: 4, club: '7I', build: 'B', values: { carry: 152 }, derived: [] },
];

describe('shotColumns', () => {
  it('shotColumns groups by club and build in order of first appearance', () => {
    expect(shotColumns(SHOTS).map((c) => [c.club, c.build, [...c.rows]])).toEqual([
      ['7I', 'A', [1, 3]],
      ['DR', null, [2]],
      ['7I', 'B', [4]],
    ]);
  });

  it('shotColumns marks a field a shot lacks as NaN and leaves out fields no shot has', () => {
    const [a] = shotColumns(SHOTS);
    expect([...a.fields.carry!]).toEqual([150, 148]);
    expect(a.fields.offline![0]).toBeNaN();
    expect(a.fields.offline![1]).toBe(2);
    expect(a.fields.spinRate).toBeUndefined();
  });

  it('shotColumns takes smash factor from the field, else from ball over club speed', () => {
    const [a, dr] = shotColumns(SHOTS);
    expect(a.smashFactor[0]).toBeCloseTo(53 / 40, 15);
    expect(a.smashFactor[1]).toBe(1.31);
    expect(dr.smashFactor[0]).toBeNaN();
  });

  it('shotColumns with shots whose keys come in different orders reads each value', () => {
    const mixed: Shot[] = [
      { row: 1, club: '9I', build: null, values: { carry: 130, offline: -1 }, derived: [] },
      { row: 2, club: '9I', build: null, values: { offline: 3, carry: 128 }, derived: [] },
    ];
    const [c] = shotColumns(mixed);
    expect([...c.fields.carry!]).toEqual([130, 128]);
    expect([...c.fields.offline!]).toEqual([-1, 3]);
  });
});
