import { clubInfo } from '@/analysis/clubs';
import { parseClubName } from '@/analysis/import';

// Club names as fitters and devices commonly write them (common practice, no source).
describe('parseClubName', () => {
  it.each([
    ['Driver', 'DR'], ['driver', 'DR'], ['Dr', 'DR'], ['DR', 'DR'], ['1W', 'DR'], ['1 Wood', 'DR'],
    ['3 Wood', '3W'], ['3w', '3W'], ['3W', '3W'], ['3-wood', '3W'], ['W3', '3W'], ['Wood 5', '5W'], ['5 Fairway', '5W'],
    ['4 Hybrid', '4H'], ['4H', '4H'], ['4h', '4H'], ['Hybrid 4', '4H'], ['3 Rescue', '3H'],
    ['7 Iron', '7I'], ['7i', '7I'], ['7I', '7I'], ['I7', '7I'], ['Iron 7', '7I'], ['7-iron', '7I'], ['#7 iron', '7I'], ['7', '7I'], ['1 Iron', '1I'],
    ['Pitching Wedge', 'PW'], ['PW', 'PW'], ['P', 'PW'], ['pw', 'PW'], ['P.W.', 'PW'],
    ['Gap Wedge', 'GW'], ['GW', 'GW'], ['AW', 'GW'], ['Approach Wedge', 'GW'],
    ['Sand Wedge', 'SW'], ['SW', 'SW'], ['S', 'SW'],
    ['Lob Wedge', 'LW'], ['LW', 'LW'],
    ['56°', 'W56'], ['56º', 'W56'], ['Wedge 56', 'W56'], ['56 deg', 'W56'], ['56deg', 'W56'], ['56 Degree Wedge', 'W56'],
    ['W56', 'W56'], ['56w', 'W56'], ['46°', 'W46'], ['64°', 'W64'], ['52° wedge', 'W52'],
    ['Putter', 'PT'], ['PT', 'PT'], ['putter', 'PT'],
  ])('parseClubName of "%s" gives %s', (name, code) => {
    expect(parseClubName(name)).toEqual({ code, known: true });
    expect(clubInfo(code)).not.toBeNull();
  });

  it.each([
    ['Chipper'], ['44°'], ['66 deg'], ['10 Iron'], ['56.5°'], ['Mini Driver'], ['=HYPERLINK("x")'],
  ])('parseClubName of the unknown name "%s" keeps it as written', (name) => {
    expect(parseClubName(name)).toEqual({ code: name, known: false });
  });

  it('parseClubName of an unknown name trims it', () => {
    expect(parseClubName('  Chipper ')).toEqual({ code: 'Chipper', known: false });
  });

  it('parseClubName of an empty name gives an empty unknown code', () => {
    expect(parseClubName('  ')).toEqual({ code: '', known: false });
  });
});
