import fc from 'fast-check';
import { compileNumberReader, detectNumberFormat, isFormulaLike, newCellState, quickDecimal } from '@/analysis/import/number-format';

function read(cell: string, decimal: '.' | ',', thousands: string | null = null) {
  const state = newCellState();
  const value = compileNumberReader(decimal, thousands)(cell, state);
  return { value, error: state.error, unit: state.unit?.unit ?? null };
}

describe('compileNumberReader', () => {
  it.each<[string, '.' | ',', string | null, number]>([
    ['150.3', '.', null, 150.3],
    ['-3.4', '.', null, -3.4],
    ['+3.4', '.', null, 3.4],
    ['.5', '.', null, 0.5],
    [' 12.5 ', '.', null, 12.5],
    ['150,3', ',', null, 150.3],
    ['-0,8', ',', null, -0.8],
    ['6.512', ',', '.', 6512],
    ['6.512,5', ',', '.', 6512.5],
    ['6,410', '.', ',', 6410],
    ['16,950.5', '.', ',', 16950.5],
    ['1 234,5', ',', null, 1234.5],
    ['\u22123.2', '.', null, -3.2],
    ['1.5e2', '.', null, 150],
  ])('reading "%s" (decimal "%s", thousands %s) gives %d', (cell, decimal, thousands, value) => {
    const r = read(cell, decimal, thousands);
    expect(r.error).toBeNull();
    expect(r.value).toBeCloseTo(value, 12);
  });

  it.each([[''], ['-'], ['  '], ['--'], ['N/A'], ['—']])('reading the missing cell "%s" gives NaN without an error', (cell) => {
    const r = read(cell, '.');
    expect(r.value).toBeNaN();
    expect(r.error).toBeNull();
  });

  it.each<[string, '.' | ',', string | null]>([
    ['abc', '.', null],
    ['12.3.4', '.', null],
    ['12,5', '.', null],
    ['12.5', ',', null],
    ['12.5', ',', '.'],
    ['0x1A', '.', null],
    ['Infinity', '.', null],
    ['=HYPERLINK("x")', '.', null],
    ['@SUM(A1)', '.', null],
    ['-A1', '.', null],
    ['12 furlongs', '.', null],
  ])('reading the unreadable "%s" (decimal "%s") gives NaN with a reason', (cell, decimal, thousands) => {
    const r = read(cell, decimal, thousands);
    expect(r.value).toBeNaN();
    expect(r.error).toEqual(expect.any(String));
  });

  it('reading a cell with its own unit gives the number and the unit', () => {
    expect(read('152.3 m', '.')).toEqual({ value: 152.3, error: null, unit: 'm' });
    expect(read('98 mph', '.')).toEqual({ value: 98, error: null, unit: 'mph' });
    expect(read('12,5°', ',')).toEqual({ value: 12.5, error: null, unit: 'deg' });
  });

  it('reading a formula-looking cell names it in the reason', () => {
    expect(read('=1+2', '.').error).toMatch(/formula/);
  });
});

describe('quickDecimal', () => {
  // Clinger (1990) fast path: with ≤ 15 digits the result must be the double Number() gives
  it('quickDecimal of any plain decimal equals Number() of it (property)', () => {
    fc.assert(
      fc.property(fc.integer({ min: -999_999_999, max: 999_999_999 }), fc.integer({ min: 0, max: 6 }), (m, k) => {
        const digits = Math.abs(m).toString().padStart(k + 1, '0');
        const text = `${m < 0 ? '-' : ''}${k === 0 ? digits : `${digits.slice(0, digits.length - k)}.${digits.slice(digits.length - k)}`}`;
        const expected = Number(text);
        const got = quickDecimal(text, 46);
        return got === (Object.is(expected, -0) ? 0 : expected);
      }),
      { numRuns: 2000 },
    );
  });

  it('quickDecimal with a decimal comma equals Number() with the point', () => {
    fc.assert(
      fc.property(fc.double({ min: -1000, max: 1000, noNaN: true }), (x) => {
        const text = x.toFixed(3);
        const expected = Number(text);
        return quickDecimal(text.replace('.', ','), 44) === (Object.is(expected, -0) ? 0 : expected);
      }),
    );
  });

  it('quickDecimal refuses what it cannot read exactly', () => {
    expect(quickDecimal('1234567890123456', 46)).toBeNaN();
    expect(quickDecimal('1e5', 46)).toBeNaN();
    expect(quickDecimal('', 46)).toBeNaN();
    expect(quickDecimal('-', 46)).toBeNaN();
    expect(quickDecimal('1.2.3', 46)).toBeNaN();
  });
});

describe('detectNumberFormat', () => {
  it('detectNumberFormat of decimal commas with thousands points gives "," and "."', () => {
    expect(detectNumberFormat(['180,4', '6.512', '150,3', '-3,4'], ';')).toEqual({ decimal: ',', thousands: '.', doubt: null });
  });
  it('detectNumberFormat of decimal points with quoted thousands commas gives "." and ","', () => {
    expect(detectNumberFormat(['113.2', '6,410', '162.4'], ',')).toEqual({ decimal: '.', thousands: ',', doubt: null });
  });
  it('detectNumberFormat of a cell with both marks takes the last as the decimal', () => {
    expect(detectNumberFormat(['1.234,5'], ';').decimal).toBe(',');
    expect(detectNumberFormat(['1,234.5'], ',').decimal).toBe('.');
  });
  it('detectNumberFormat of plain decimals gives "." and no thousands', () => {
    expect(detectNumberFormat(['12.5', '150.25', '3'], ',')).toEqual({ decimal: '.', thousands: null, doubt: null });
  });
  it('detectNumberFormat of only three-digit groups states a doubt', () => {
    expect(detectNumberFormat(['1,452', '2,345'], ';').doubt).toEqual(expect.any(String));
  });
  it('detectNumberFormat reads numbers with side marks and units', () => {
    expect(detectNumberFormat(['3,2 L', 'R 1,5', '56,5°'], ';').decimal).toBe(',');
  });
});

describe('isFormulaLike', () => {
  it.each([['=HYPERLINK("x")', true], ['@SUM(A1)', true], ['+A1', true], ['-B2', true], ['-3.2', false], ['+3', false], ['7 Iron', false]])(
    'isFormulaLike of "%s" gives %s',
    (cell, expected) => {
      expect(isFormulaLike(cell)).toBe(expected);
    },
  );
});
