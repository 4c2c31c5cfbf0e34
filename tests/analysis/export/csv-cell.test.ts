import Papa from 'papaparse';
import { csvCell, csvLine } from '@/analysis/export';

describe('csvCell', () => {
  // OWASP, "CSV Injection" (owasp.org/www-community/attacks/CSV_Injection): cells beginning with
  // =, +, -, @, tab (0x09) or carriage return (0x0D) are prefixed with a single quote.
  it.each(['=1+2', '+1', '-1+1', '@SUM(A1)', '\tcmd', '\rcmd'])('csvCell of the formula-looking text %j prefixes an apostrophe', (text) => {
    const cell = csvCell(text);
    const parsed = Papa.parse<string[]>(cell, { delimiter: ',' }).data[0]?.[0] ?? '';
    expect(parsed).toBe(`'${text}`);
  });

  it('csvCell of plain text leaves it alone', () => {
    expect(csvCell('7 Iron')).toBe('7 Iron');
  });

  // RFC 4180 §2 (Shafranovich, 2005): fields with commas, quotes or line breaks are enclosed in
  // double quotes, and a quote inside is doubled.
  it('csvCell of text with a comma and a quote quotes it as RFC 4180 says', () => {
    expect(csvCell('Birch, "stiff"')).toBe('"Birch, ""stiff"""');
  });

  it('csvCell of a negative number writes the number, not text', () => {
    expect(csvCell(-12.5)).toBe('-12.5');
    expect(csvCell(Number.NaN)).toBe('');
    expect(csvCell(null)).toBe('');
  });

  it('csvCell with a semicolon delimiter quotes a cell holding a semicolon only', () => {
    expect(csvCell('a;b', ';')).toBe('"a;b"');
    expect(csvCell('a,b', ';')).toBe('a,b');
  });
});

describe('csvLine', () => {
  // papaparse as an independent reader: what the line says is what a reader gets back.
  it('csvLine of hostile cells reads back neutralised through papaparse', () => {
    const line = csvLine(['=HYPERLINK("http://x")', 'a,b', -3, '@x']);
    expect(Papa.parse<string[]>(line).data[0]).toEqual([`'=HYPERLINK("http://x")`, 'a,b', '-3', `'@x`]);
  });
});
