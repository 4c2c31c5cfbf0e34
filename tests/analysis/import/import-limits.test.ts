import { ImportError, importBayFile, recipeSchema } from '@/analysis/import';
import { MAX_BUILD_CHARS, MAX_CLUB_CHARS, MAX_COLUMNS, cutName } from '@/analysis/import/import-limits';

function codeOf(f: () => unknown): string | null {
  try {
    f();
    return null;
  } catch (e) {
    return e instanceof ImportError ? e.code : `not an ImportError: ${String(e)}`;
  }
}

describe('importBayFile on very wide rows', () => {
  it('a 138 KB row of commas under a header is rejected as ragged, not a stack overflow', () => {
    const text = `Club,Carry (m),Spin (rpm)\n7 Iron,150,6500\n${','.repeat(138_000)}\n7 Iron,151,6400\n`;
    const r = importBayFile(text);
    expect(r.shots.map((s) => s.row)).toEqual([1, 2]);
  });

  it('a club followed by 138,000 commas (the issue\'s row) is read as a row, not a stack overflow', () => {
    const r = importBayFile(`Club,Carry (m)\n7 Iron,150\n7 Iron${','.repeat(138_000)}\n`);
    expect(r.shots).toHaveLength(1);
    expect(r.rejected).toEqual([{ row: 2, line: 3, reason: 'the row has no shot values' }]);
  });

  it('a file whose rows are 69,000 cells wide throws TOO_MANY_COLUMNS', () => {
    const text = `Club,Carry (m),Spin (rpm)\n7 Iron,150,6500\n${'1,'.repeat(69_000)}\n`;
    expect(codeOf(() => importBayFile(text))).toBe('TOO_MANY_COLUMNS');
  });

  it(`a header of ${MAX_COLUMNS + 1} columns throws TOO_MANY_COLUMNS`, () => {
    const header = ['Club', 'Carry (m)', ...Array.from({ length: MAX_COLUMNS - 1 }, (_, i) => `Extra ${i}`)].join(',');
    const row = ['7 Iron', '150', ...Array.from({ length: MAX_COLUMNS - 1 }, () => '1')].join(',');
    expect(codeOf(() => importBayFile(`${header}\n${row}\n`))).toBe('TOO_MANY_COLUMNS');
  });

  it(`a header of exactly ${MAX_COLUMNS} columns imports`, () => {
    const header = ['Club', 'Carry (m)', ...Array.from({ length: MAX_COLUMNS - 2 }, (_, i) => `Extra ${i}`)].join(',');
    const row = ['7 Iron', '150', ...Array.from({ length: MAX_COLUMNS - 2 }, () => '1')].join(',');
    expect(importBayFile(`${header}\n${row}\n`).shots).toHaveLength(1);
  });

  it(`a recipe of ${MAX_COLUMNS + 1} columns is refused by its schema`, () => {
    const columns = Object.fromEntries(Array.from({ length: MAX_COLUMNS + 1 }, (_, i) => [`C${i}`, { field: 'ignore' }]));
    expect(recipeSchema.safeParse({ columns }).success).toBe(false);
    delete columns.C0;
    expect(recipeSchema.safeParse({ columns }).success).toBe(true);
  });
});

describe('importBayFile of long names', () => {
  it(`cuts club names to ${MAX_CLUB_CHARS} and build labels to ${MAX_BUILD_CHARS} characters, with a warning`, () => {
    const club = `Chipper ${'x'.repeat(60)}`;
    const build = `Graphite ${'y'.repeat(100)}`;
    const r = importBayFile(`Club,Shaft,Carry (m)\n${club},${build},150\n`);
    expect(r.shots[0].club).toBe(club.slice(0, MAX_CLUB_CHARS));
    expect(r.shots[0].build).toBe(build.slice(0, MAX_BUILD_CHARS));
    expect(r.warnings.map((w) => w.code)).toContain('NAME_SHORTENED');
  });

  it('two long build labels sharing their first characters become one build, as the database keeps them', () => {
    const stem = 'z'.repeat(MAX_BUILD_CHARS);
    const r = importBayFile(`Club,Shaft,Carry (m)\n7 Iron,${stem} one,150\n7 Iron,${stem} two,151\n`);
    expect(new Set(r.shots.map((s) => s.build))).toEqual(new Set([stem]));
  });

  it('names that differ only in case or accents stay apart (names compare exactly)', () => {
    const r = importBayFile('Club,Shaft,Carry (m)\n7 Iron,Steel,150\n7 Iron,steel,151\n7 Iron,Stéel,152\n');
    expect(r.shots.map((s) => s.build)).toEqual(['Steel', 'steel', 'Stéel']);
  });

  it('cutName trims, cuts and trims again', () => {
    expect(cutName('  ab  ', 10)).toBe('ab');
    expect(cutName('abc def', 4)).toBe('abc');
  });
});
