import { ImportError, detectSideNotation, parseSide, type SideNotation } from '@/analysis/import';

// Ovalyard's sign convention (product page, "Canonical data"): + is right of the target line.
describe('parseSide', () => {
  it.each<[string, SideNotation, '.' | ',', number]>([
    ['12.3 L', 'suffix-LR', '.', -12.3],
    ['12.3L', 'suffix-LR', '.', -12.3],
    ['12.3 R', 'suffix-LR', '.', 12.3],
    ['4.5r', 'suffix-LR', '.', 4.5],
    ['4.2 left', 'suffix-LR', '.', -4.2],
    ['4.2 Right', 'suffix-LR', '.', 4.2],
    ['R 4.5', 'prefix-LR', '.', 4.5],
    ['L 4.5', 'prefix-LR', '.', -4.5],
    ['L4.5', 'prefix-LR', '.', -4.5],
    ['Left 2', 'prefix-LR', '.', -2],
    ['0', 'suffix-LR', '.', 0],
    ['0.0', 'prefix-LR', '.', 0],
    ['12,3 L', 'suffix-LR', ',', -12.3],
    ['-3.2', 'signed-right-positive', '.', -3.2],
    ['3.2', 'signed-right-positive', '.', 3.2],
    ['+3.2', 'signed-right-positive', '.', 3.2],
    ['-3.2', 'signed-left-positive', '.', 3.2],
    ['3.2', 'signed-left-positive', '.', -3.2],
    ['-3,2', 'signed-left-positive', ',', 3.2],
    ['3.2 L', 'signed-right-positive', '.', -3.2],
    ['3.2 L', 'signed-left-positive', '.', -3.2],
    ['R 1', 'suffix-LR', '.', 1],
  ])('parseSide of "%s" in %s (decimal "%s") gives %d', (cell, notation, decimal, value) => {
    expect(parseSide(cell, notation, decimal)).toBeCloseTo(value, 12);
  });

  it.each([[''], ['-'], ['  '], ['n/a']])('parseSide of the missing cell "%s" gives null', (cell) => {
    expect(parseSide(cell, 'suffix-LR', '.')).toBeNull();
    expect(parseSide(cell, 'signed-right-positive', '.')).toBeNull();
  });

  it.each<[string, SideNotation]>([
    ['3.2', 'suffix-LR'],
    ['-3.2 L', 'suffix-LR'],
    ['L', 'prefix-LR'],
    ['abc', 'signed-right-positive'],
    ['=1+2', 'signed-right-positive'],
    ['3.2 X', 'suffix-LR'],
  ])('parseSide of the unreadable "%s" in %s throws ImportError BAD_CELL', (cell, notation) => {
    expect(() => parseSide(cell, notation, '.')).toThrow(ImportError);
    expect(() => parseSide(cell, notation, '.')).toThrow(expect.objectContaining({ code: 'BAD_CELL' }));
  });

  it('parseSide of zero with a left mark gives positive zero', () => {
    expect(Object.is(parseSide('0.0 L', 'suffix-LR', '.'), 0)).toBe(true);
  });
});

describe('detectSideNotation', () => {
  it('detectSideNotation of suffixed cells gives suffix-LR', () => {
    expect(detectSideNotation(['3.2 L', '1.1 R', '0.0']).notation).toBe('suffix-LR');
  });
  it('detectSideNotation of prefixed cells gives prefix-LR', () => {
    expect(detectSideNotation(['R 4.5', 'L 2.1']).notation).toBe('prefix-LR');
  });
  it('detectSideNotation of signed numbers gives signed-right-positive with no letters', () => {
    expect(detectSideNotation(['-3.2', '2.1'])).toEqual({ notation: 'signed-right-positive', lettered: 0, signed: 1 });
  });
});
