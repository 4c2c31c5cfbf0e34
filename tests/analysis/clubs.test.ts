import { CLUB_CODES, clubInfo, compareClubs } from '@/analysis/clubs';

describe('clubInfo', () => {
  it('clubInfo with canonical codes gives their kinds', () => {
    expect(clubInfo('DR')?.kind).toBe('driver');
    expect(clubInfo('7W')?.kind).toBe('wood');
    expect(clubInfo('4H')?.kind).toBe('hybrid');
    expect(clubInfo('7I')?.kind).toBe('iron');
    expect(clubInfo('W56')?.kind).toBe('wedge');
    expect(clubInfo('PT')?.kind).toBe('putter');
  });
  it('clubInfo with a code out of range gives null', () => {
    expect(clubInfo('W70')).toBeNull();
    expect(clubInfo('10I')).toBeNull();
    expect(clubInfo('Chipper')).toBeNull();
  });
});

describe('compareClubs', () => {
  it('compareClubs over a bag sorts driver first and putter last', () => {
    const bag = ['PT', '7I', 'DR', 'SW', '4H', '3W', 'PW'];
    expect([...bag].sort(compareClubs)).toEqual(['DR', '3W', '4H', '7I', 'PW', 'SW', 'PT']);
  });
  it('compareClubs puts unknown names after every canonical code', () => {
    expect(['Chipper', 'PT'].sort(compareClubs)).toEqual(['PT', 'Chipper']);
  });
  it('CLUB_CODES lists each code once, in bag order', () => {
    expect(new Set(CLUB_CODES).size).toBe(CLUB_CODES.length);
    expect(CLUB_CODES[0]).toBe('DR');
    expect(CLUB_CODES[CLUB_CODES.length - 1]).toBe('PT');
  });
});
