import { ImportError, sniff, disambiguateHeaders } from '@/analysis/import';

function codeOf(f: () => unknown): string | null {
  try {
    f();
    return null;
  } catch (e) {
    return e instanceof ImportError ? e.code : `not an ImportError: ${String(e)}`;
  }
}

describe('sniff', () => {
  it('sniff of a comma file gives the comma, the point and header row 0', () => {
    const s = sniff('Club,Carry (yds),Ball Speed (mph)\n7 Iron,165.2,112.4\n7 Iron,163.0,111.9\n');
    expect(s).toMatchObject({ delimiter: ',', decimal: '.', thousands: null, headerRow: 0, unitsRow: false, dataStartLine: 1 });
    expect(s.headers).toEqual(['Club', 'Carry (yds)', 'Ball Speed (mph)']);
  });

  it('sniff of a semicolon file with decimal commas after a preamble finds the header', () => {
    const s = sniff('Export of a fitting\nPlayer;Someone Invented\n\nClub;Carry (m);Spin (rpm)\n7 Iron;150,3;6.512\n7 Iron;149,1;6.388\n');
    expect(s).toMatchObject({ delimiter: ';', decimal: ',', thousands: '.', headerRow: 3, dataStartLine: 4 });
    expect(s.preamble).toEqual(['Export of a fitting', 'Player;Someone Invented', '']);
  });

  it('sniff of a tab file with a units row reports it and starts the data after it', () => {
    const s = sniff('Club\tCarry\tBall Speed\n\tyds\t(mph)\nDriver\t250.1\t157.3\nDriver\t248.2\t156.0\n');
    expect(s).toMatchObject({ delimiter: '\t', headerRow: 0, unitsRow: true, dataStartLine: 2 });
    expect(s.units).toEqual([null, 'yds', 'mph']);
  });

  it('sniff of a file with CRLF line ends reports the line break', () => {
    expect(sniff('Club,Carry\r\n7 Iron,150\r\n').newline).toBe('\r\n');
  });

  it('sniff of a file with a byte-order mark reads the first header without it', () => {
    expect(sniff('\ufeffClub,Carry\n7 Iron,150\n').headers[0]).toBe('Club');
  });

  it('sniff of repeated headers names the repeats and lists them', () => {
    const s = sniff('Club,Carry,Carry,\n7 Iron,150,151,3\n');
    expect(s.headers).toEqual(['Club', 'Carry', 'Carry (2)', 'Column 4']);
    expect(s.duplicates).toEqual(['Carry']);
  });

  it('sniff with a header row hint uses that line', () => {
    expect(sniff('a,b\n1,2\nClub,Carry\n7 Iron,150\n', { headerRow: 2 }).headerRow).toBe(2);
  });

  it('sniff of a file whose preamble has number lines still picks the widest header', () => {
    const s = sniff('Temperature;21\nAltitude;120\nClub;Ball Speed;Carry;Spin\n7 Iron;50,1;150,2;6500\n7 Iron;49,8;149,9;6400\n');
    expect(s.headerRow).toBe(2);
  });

  it.each([
    ['', 'EMPTY_FILE'],
    ['   \n\n  ', 'EMPTY_FILE'],
    ['Club,Carry\u0000\u0001\n', 'NOT_TEXT'],
    ['\u0001\u0002\u0003\u0004\u0005\u0006\u0007\u0008'.repeat(20), 'NOT_TEXT'],
    ['1,2,3\n4,5,6\n', 'NO_HEADER'],
    ['just one line of words', 'NO_HEADER'],
    ['Club,Carry (m),Spin (rpm)\n', 'NO_DATA_ROWS'],
    ['Club,Carry,Spin\n,m,rpm\n\n', 'NO_DATA_ROWS'],
    ['Club,Carry,Spin\nAverage,150,6000\n', 'NO_DATA_ROWS'],
  ])('sniff of %j throws ImportError %s', (text, code) => {
    expect(codeOf(() => sniff(text))).toBe(code);
  });

  it('sniff with a header row hint past the end throws NO_HEADER', () => {
    expect(codeOf(() => sniff('Club,Carry\n7 Iron,150\n', { headerRow: 9 }))).toBe('NO_HEADER');
  });
});

describe('disambiguateHeaders', () => {
  it('disambiguateHeaders of three equal headers numbers the second and third', () => {
    expect(disambiguateHeaders(['Carry', 'Carry', 'Carry'])).toEqual({ headers: ['Carry', 'Carry (2)', 'Carry (3)'], duplicates: ['Carry'] });
  });
});
