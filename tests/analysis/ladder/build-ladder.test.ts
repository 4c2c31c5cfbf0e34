import { buildLadder, groupKey } from '@/analysis/ladder';

// Invented bag carries, metres.
const BAG = [
  { club: 'PW', build: null, carryM: [112, 114, 113] },
  { club: '7I', build: 'A', carryM: [140, 142, 141] },
  { club: '7I', build: 'B', carryM: [146, 148, 147] },
  { club: '8I', build: null, carryM: [132, 133, 131] },
  { club: 'GW', build: null, carryM: [103, 104, 102] },
  { club: 'SW', build: null, carryM: [92, 93, 91] },
  { club: 'PT', build: null, carryM: [3, 4, 5] },
];

describe('buildLadder', () => {
  it('buildLadder orders clubs in bag order and leaves the putter out', () => {
    expect(buildLadder(BAG).map((r) => r.club)).toEqual(['7I', '8I', 'PW', 'GW', 'SW']);
  });

  it('buildLadder pools the builds of a club when none is chosen', () => {
    const [seven] = buildLadder(BAG);
    expect(seven.builds).toEqual(['A', 'B']);
    expect(seven.n).toBe(6);
    expect(seven.carryMedianM).toBe(144);
    expect(seven.gapToNextM).toBe(144 - 132);
  });

  it('buildLadder with a chosen build uses only that build', () => {
    const [seven] = buildLadder(BAG, { chosenBuild: { '7I': 'A' } });
    expect(seven.builds).toEqual(['A']);
    expect(seven.carryMedianM).toBe(141);
    expect(seven.gapToNextM).toBe(9);
  });

  // Gap rules, common practice: over about 20 yd (18.3 m) between neighbouring irons is wide.
  it('buildLadder flags a wide gap between neighbouring 9-iron and pitching wedge', () => {
    const rungs = buildLadder([...BAG, { club: '9I', build: null, carryM: [135, 136, 134] }]);
    const nine = rungs.find((r) => r.club === '9I')!;
    expect(nine.gapToNextM).toBe(22);
    expect(nine.neighbourToNext).toBe(true);
    expect(nine.gapFlag).toBe('wide');
    expect(rungs[rungs.length - 1].gapToNextM).toBeNull();
  });

  it('buildLadder gives the 8-iron to wedge gap without a flag when the 9-iron was not hit', () => {
    const eight = buildLadder(BAG).find((r) => r.club === '8I')!;
    expect(eight.gapToNextM).toBe(19);
    expect(eight.neighbourToNext).toBe(false);
    expect(eight.gapFlag).toBeNull();
  });

  // Seen: "driver → 7-iron 55 yd · wide" when the clubs between were not hit.
  it('buildLadder of a driver and a 7-iron alone flags no gap between them', () => {
    const rungs = buildLadder([
      { club: 'DR', build: null, carryM: [210, 214, 212] },
      { club: '7I', build: null, carryM: [160, 158, 161] },
    ]);
    expect(rungs[0].gapToNextM).toBe(212 - 160);
    expect(rungs[0].gapFlag).toBeNull();
  });

  it('buildLadder with the bag as neighbours flags a gap between clubs next to each other in the bag', () => {
    const groups = [
      { club: '5H', build: null, carryM: [170, 172, 171] },
      { club: '7I', build: null, carryM: [140, 142, 141] },
    ];
    expect(buildLadder(groups)[0].gapFlag).toBeNull();
    const rungs = buildLadder(groups, { neighbours: ['DR', '3W', '5H', '7I', '8I', '9I', 'PW'] });
    expect(rungs[0].neighbourToNext).toBe(true);
    expect(rungs[0].gapFlag).toBe('wide');
  });

  it('buildLadder with wedge lofts gives loft steps and flags', () => {
    const lofts = { [groupKey('PW', null)]: 46, [groupKey('GW', null)]: 50, [groupKey('SW', null)]: 58 };
    const rungs = buildLadder(BAG, { loftByGroup: lofts });
    const pw = rungs.find((r) => r.club === 'PW')!;
    const gw = rungs.find((r) => r.club === 'GW')!;
    expect(pw.loftStepToNextDeg).toBe(4);
    expect(pw.loftStepFlag).toBeNull();
    expect(gw.loftStepToNextDeg).toBe(8);
    expect(gw.loftStepFlag).toBe('wide');
  });

  it('buildLadder with builds of different lofts pooled gives no loft', () => {
    const lofts = { [groupKey('7I', 'A')]: 31, [groupKey('7I', 'B')]: 33 };
    expect(buildLadder(BAG, { loftByGroup: lofts })[0].loftDeg).toBeNull();
    expect(buildLadder(BAG, { loftByGroup: lofts, chosenBuild: { '7I': 'B' } })[0].loftDeg).toBe(33);
  });

  it('buildLadder skips missing carries and clubs without any', () => {
    const rungs = buildLadder([
      { club: '9I', build: null, carryM: [Number.NaN, Number.NaN] },
      { club: '6I', build: null, carryM: [150, Number.NaN, 152] },
    ]);
    expect(rungs.map((r) => [r.club, r.n])).toEqual([['6I', 2]]);
  });

  it('groupKey joins club and build with a bar, empty for no build', () => {
    expect(groupKey('7I', null)).toBe('7I|');
    expect(groupKey('7I', 'B')).toBe('7I|B');
  });
});
