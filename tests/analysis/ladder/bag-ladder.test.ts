import { bagLadder, GAP_RULES, type BagLadderClub } from '@/analysis/ladder';

const YD = 0.9144; // NIST SP 811 (2008), Appendix B
const c = (id: string, club: string, loftDeg: number | null, carryYd: number | null, carrySource: BagLadderClub['carrySource'] = 'hit'): BagLadderClub => ({
  id,
  club,
  loftDeg,
  carryM: carryYd === null ? null : carryYd * YD,
  carrySource: carryYd === null ? null : carrySource,
});

describe('bagLadder', () => {
  it('bagLadder orders clubs by loft, leaves the putter out and links each to its neighbour', () => {
    const rungs = bagLadder([c('w', 'W56', 56, 80), c('p', 'PT', 3, null), c('d', 'DR', 10.5, 230), c('s', '7I', 31, 150)]);
    expect(rungs.map((r) => r.id)).toEqual(['d', 's', 'w']);
    expect(rungs.map((r) => r.nextId)).toEqual(['s', 'w', null]);
  });

  it('bagLadder orders a club without a loft by the typical loft of its kind', () => {
    const rungs = bagLadder([c('8', '8I', null, 140), c('7', '7I', 33, 150), c('9', '9I', 38, 130)]);
    expect(rungs.map((r) => r.id)).toEqual(['7', '8', '9']);
    expect(rungs[1].orderLoftDeg).toBe(36);
  });

  it('bagLadder gives the carry gap and loft step to the neighbour, with the common-practice flags', () => {
    // common practice, no source: under 7 yd tight, over 20 yd wide (25 for woods and hybrids); wedge steps 4–6°
    const rungs = bagLadder([c('a', 'PW', 46, 120), c('b', 'W50', 50, 115), c('c', 'W58', 58, 90), c('d', 'W60', 60, 92, 'estimate')]);
    expect(rungs[0].gapToNextM).toBeCloseTo(5 * YD, 9);
    expect(rungs[0].gapFlag).toBe('tight');
    expect(rungs[0].loftStepToNextDeg).toBe(4);
    expect(rungs[0].loftStepFlag).toBeNull();
    expect(rungs[1].gapFlag).toBe('wide'); // 25 yd between wedges
    expect(rungs[1].loftStepFlag).toBe('wide'); // 8°
    expect(rungs[2].gapFlag).toBe('reversed');
    expect(rungs[2].loftStepFlag).toBe('tight'); // 2°
    expect(rungs[3]).toMatchObject({ carrySource: 'estimate', gapToNextM: null, nextId: null });
    expect(GAP_RULES.tightBelowM).toBeCloseTo(7 * YD, 9);
  });

  it('bagLadder keeps a club without a carry on the ladder with no gap on either side', () => {
    const rungs = bagLadder([c('a', '5I', 25, 175), c('b', '6I', 28, null), c('c', '7I', 31, 150)]);
    expect(rungs.map((r) => r.gapToNextM)).toEqual([null, null, null]);
    expect(rungs[1].carrySource).toBeNull();
  });

  it('bagLadder of two clubs with the same loft puts the longer carry first', () => {
    const rungs = bagLadder([c('h', '4H', 22, 170), c('i', '4I', 22, 180)]);
    expect(rungs.map((r) => r.id)).toEqual(['i', 'h']);
  });

  it('bagLadder of no clubs is empty', () => {
    expect(bagLadder([])).toEqual([]);
  });
});
