import type { Shot } from '@/analysis/fields';
import { analyseSession } from '@/analysis/session';
import { courseChanges } from '@/components/analysis/course-changes';

// Invented carries: the course answer carries every shot 5 m farther.
function shots(extra: number): Shot[] {
  return [150, 152, 149, 151].flatMap((c, i) => [
    { row: i + 1, club: '7I', build: 'A', values: { carry: c + extra }, derived: [] },
    { row: i + 11, club: '7I', build: 'B', values: { carry: c - 4 + extra }, derived: [] },
    { row: i + 21, club: 'DR', build: null, values: { carry: 220 + c / 10 + extra }, derived: [] },
  ]);
}

describe('courseChanges', () => {
  it('courseChanges gives each group of the club its measured and course carry and the change', () => {
    const changes = courseChanges(analyseSession(shots(0)).groups, analyseSession(shots(5)).groups, '7I');
    expect(changes.map((c) => c.build)).toEqual(['A', 'B']);
    expect(changes[0].measuredCarryM).toBeCloseTo(150.5, 12);
    expect(changes[0].changeM).toBeCloseTo(5, 12);
  });

  it('courseChanges of a club not hit is empty', () => {
    expect(courseChanges(analyseSession(shots(0)).groups, analyseSession(shots(5)).groups, 'PW')).toEqual([]);
  });
});
