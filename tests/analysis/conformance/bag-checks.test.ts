import { bagLadder, type BagLadderClub } from '@/analysis/ladder';
import { bagChecks, type CheckedClub } from '@/analysis/conformance';

// Rules of Golf, Rule 4.1b: at most 14 clubs in a round. Equipment Rules (R&A / USGA): clubs
// other than putters at most 48 in; a putter's loft at most 10°. Model Local Rule G-10 (from
// 1 January 2022): clubs other than putters at most 46 in where a committee adopts it.
const club = (id: string, code: string, loftDeg: number | null = null, lengthIn: number | null = null): CheckedClub => ({ id, club: code, loftDeg, lengthIn });
const codes = (clubs: CheckedClub[], ladder: ReturnType<typeof bagLadder> = []) => bagChecks(clubs, ladder).map((c) => c.code);

const FOURTEEN = ['DR', '3W', '5W', '4H', '5I', '6I', '7I', '8I', '9I', 'PW', 'W50', 'W54', 'W58', 'PT'];

describe('bagChecks', () => {
  it('bagChecks of 14 clubs has no note on the count', () => {
    expect(codes(FOURTEEN.map((c, i) => club(String(i), c)))).toEqual([]);
  });

  it('bagChecks of 15 clubs notes Rule 4.1b and names every club', () => {
    const clubs = [...FOURTEEN, '4I'].map((c, i) => club(String(i), c));
    const [note] = bagChecks(clubs);
    expect(note).toMatchObject({ code: 'over-14-clubs', severity: 'nonconforming' });
    expect(note.clubIds).toHaveLength(15);
    expect(note.text).toMatch(/Rule 4\.1b/);
  });

  it.each([
    ['DR', 46, []],
    ['DR', 46.25, ['over-46-local-rule']],
    ['DR', 48, ['over-46-local-rule']],
    ['DR', 48.5, ['over-48']],
    ['PT', 50, []],
    ['7I', 17.5, ['too-short']],
  ])('bagChecks of a %s of %p in notes %j', (code, lengthIn, expected) => {
    expect(codes([club('a', code, null, lengthIn)])).toEqual(expected);
  });

  it.each([
    [10, []],
    [10.5, ['putter-loft']],
  ])('bagChecks of a putter lofted %p° notes %j (Equipment Rules: at most 10°)', (loft, expected) => {
    expect(codes([club('p', 'PT', loft)])).toEqual(expected);
  });

  it('bagChecks of neighbours whose middle halves of carry overlap notes them as advice', () => {
    const ladder = bagLadder([
      { id: 'a', club: '7I', loftDeg: 31, carryM: 140, carrySource: 'hit', carryQ1M: 134, carryQ3M: 145 },
      { id: 'b', club: '8I', loftDeg: 35, carryM: 131, carrySource: 'hit', carryQ1M: 126, carryQ3M: 136 },
      { id: 'c', club: '9I', loftDeg: 39, carryM: 118, carrySource: 'hit', carryQ1M: 114, carryQ3M: 121 },
    ]);
    const notes = bagChecks([], ladder);
    expect(notes).toHaveLength(1);
    expect(notes[0]).toMatchObject({ code: 'carry-overlap', severity: 'advice', clubIds: ['a', 'b'] });
  });

  it('bagChecks of a longer club that carries no farther than its neighbour (single carries) notes the overlap', () => {
    const clubs: BagLadderClub[] = [
      { id: 'h', club: '4H', loftDeg: 22, carryM: 150, carrySource: 'estimate' },
      { id: 'i', club: '5I', loftDeg: 25, carryM: 152, carrySource: 'entered' },
    ];
    expect(codes([], bagLadder(clubs))).toEqual(['carry-overlap']);
  });
});
