import fc from 'fast-check';
import { ImportError, importBayFile, recipeSchema, suggestMapping, type Recipe } from '@/analysis/import';
import { generateBayFile } from '@/scripts/bench/import';

// Conversion factors: NIST Special Publication 811 (2008), Appendix B.8 — yard 0.9144 m, mph 0.44704 m/s.
const YARD_M = 0.9144;
const MPH_MPS = 0.44704;

function codeOf(f: () => unknown): string | null {
  try {
    f();
    return null;
  } catch (e) {
    return e instanceof ImportError ? e.code : `not an ImportError: ${String(e)}`;
  }
}

const BASIC = 'Club,Ball Speed (mph),Club Speed (mph),Carry (yds),Offline (yds)\n7 Iron,112.0,84.0,165.0,3.0\nDriver,157.9,107.2,252.4,-6.1\n';

describe('importBayFile bad input', () => {
  it.each([
    ['an empty file', '', 'EMPTY_FILE'],
    ['white space only', ' \n\t\n', 'EMPTY_FILE'],
    ['a binary file', 'PK\u0003\u0004\u0000\u0000\u0008\u0000', 'NOT_TEXT'],
    ['text with NUL bytes', 'Club,Carry\n7 Iron,150\u0000\n', 'NOT_TEXT'],
    ['numbers without a header', '150,6500\n151,6400\n', 'NO_HEADER'],
    ['only a header', 'Club,Carry (m),Spin (rpm)\n', 'NO_DATA_ROWS'],
    ['a header, a units row and blank lines', 'Club,Carry,Spin\n,m,rpm\n\n\n', 'NO_DATA_ROWS'],
    ['an unknown unit', 'Club,Carry (furlongs)\n7 Iron,0.75\n', 'UNKNOWN_UNIT'],
  ])('importBayFile of %s throws ImportError %s', (_, text, code) => {
    expect(codeOf(() => importBayFile(text))).toBe(code);
  });

  it('importBayFile of an unknown unit throws UNKNOWN_UNIT naming the column', () => {
    expect(() => importBayFile('Club,Carry (furlongs)\n7 Iron,0.75\n')).toThrow(
      expect.objectContaining({ code: 'UNKNOWN_UNIT', column: 'Carry (furlongs)' }),
    );
  });

  it('importBayFile of ragged rows rejects them with the row and the reason', () => {
    const r = importBayFile('Club,Carry (m),Spin (rpm)\n7 Iron,150,6500\n7 Iron,151\n7 Iron,149,6400,extra\n7 Iron,152,6300,\n');
    expect(r.shots.map((s) => s.row)).toEqual([1, 4]);
    expect(r.rejected).toEqual([
      { row: 2, line: 3, reason: 'the row has 2 cells; the header has 3' },
      { row: 3, line: 4, reason: 'the row has 4 cells; the header has 3' },
    ]);
  });

  it('importBayFile of an unreadable cell rejects its row with the column and keeps no part of it', () => {
    const r = importBayFile('Club,Carry (m),Spin (rpm)\n7 Iron,150,6500\n7 Iron,abc,6400\n');
    expect(r.rejected).toEqual([{ row: 2, line: 3, column: 'Carry (m)', reason: expect.stringContaining('abc') }]);
    expect(r.shots).toHaveLength(1);
  });

  it('importBayFile of blank and "-" cells leaves the values missing, not rejected', () => {
    const r = importBayFile('Club,Carry (m),Spin (rpm),Apex (m)\n7 Iron,150,-,\n');
    expect(r.rejected).toEqual([]);
    expect(r.shots[0].values).toEqual({ carry: 150 });
  });

  it('importBayFile of a row with no values rejects it', () => {
    const r = importBayFile('Club,Carry (m)\n7 Iron,150\n7 Iron,-\n');
    expect(r.rejected).toEqual([{ row: 2, line: 3, reason: 'the row has no shot values' }]);
  });

  it('importBayFile of a formula in a number column rejects the row; in a text column keeps the text', () => {
    const r = importBayFile('Club,Build,Carry (m)\n"=HYPERLINK(""x"")","=HYPERLINK(""y"")",150\n7 Iron,A,=1+2\n');
    expect(r.shots).toEqual([{ row: 1, club: '=HYPERLINK("x")', build: '=HYPERLINK("y")', values: { carry: 150 }, derived: [] }]);
    expect(r.rejected[0]).toMatchObject({ row: 2, column: 'Carry (m)', reason: expect.stringMatching(/formula/) });
    expect(r.unknownClubs).toEqual(['=HYPERLINK("x")']);
  });

  // Limits named in the product's import issue: ball speed ≤ 110 m/s, club speed ≤ ~70 m/s,
  // smash ≤ ~1.60, spin ≤ 15,000 rpm, launch −20..70°, carry ≥ 0.
  it.each([
    ['Ball Speed (m/s)', '110.5', 'ball speed'],
    ['Club Speed (m/s)', '71', 'club speed'],
    ['Spin Rate (rpm)', '15001', 'spin rate'],
    ['Launch Angle (deg)', '71', 'launch angle'],
    ['Launch Angle (deg)', '-21', 'launch angle'],
    ['Carry (m)', '-1', 'carry'],
  ])('importBayFile of %s %s rejects the row naming %s', (header, value, words) => {
    const r = importBayFile(`Club,Total (m),${header}\n7 Iron,160,${value}\n7 Iron,161,-\n`);
    expect(r.rejected).toEqual([{ row: 1, line: 2, column: header, reason: expect.stringContaining(words) }]);
  });

  it('importBayFile of a derived smash factor above 1.60 rejects the row', () => {
    const r = importBayFile('Club,Ball Speed (m/s),Club Speed (m/s)\n7 Iron,80,40\n7 Iron,50,37.5\n');
    expect(r.rejected).toEqual([{ row: 1, line: 2, column: 'smashFactor', reason: expect.stringContaining('smash factor') }]);
    expect(r.shots).toHaveLength(1);
  });

  it('importBayFile of repeated headers warns and keeps the first for the field', () => {
    const r = importBayFile('Club,Carry (m),Carry (m)\n7 Iron,150,999\n');
    expect(r.warnings.map((w) => w.code)).toContain('DUPLICATE_HEADER');
    expect(r.shots[0].values).toEqual({ carry: 150 });
  });

  it('importBayFile of a file over 10 MB reads every row', () => {
    const text = generateBayFile(100_000);
    expect(text.length).toBeGreaterThan(10 * 1024 * 1024);
    const r = importBayFile(text);
    expect(r.rows).toBe(100_000);
    expect(r.shots.length + r.rejected.length).toBe(100_000);
    expect(r.shots.length).toBeGreaterThan(99_000);
  });

  it('importBayFile lists blank lines, summary rows and the units row as skipped', () => {
    const r = importBayFile('Club\tCarry\n\tm\n7 Iron\t150\n\n7 Iron\t151\nAverage\t150.5\n');
    expect(r.skipped).toEqual([
      { line: 2, reason: 'units row' },
      { line: 4, reason: 'blank line' },
      { line: 6, reason: 'summary row' },
    ]);
    expect(r.rows).toBe(2);
  });
});

describe('importBayFile conversion', () => {
  it('importBayFile converts to canonical units with NIST SP 811 factors', () => {
    const r = importBayFile(BASIC);
    expect(r.shots[0].values.ballSpeed).toBeCloseTo(112 * MPH_MPS, 12);
    expect(r.shots[0].values.carry).toBeCloseTo(165 * YARD_M, 12);
    expect(r.shots[1].values.offline).toBeCloseTo(-6.1 * YARD_M, 12);
  });

  it('importBayFile derives the smash factor only when the file lacks it', () => {
    const derived = importBayFile(BASIC).shots[0];
    expect(derived.derived).toEqual(['smashFactor']);
    expect(derived.values.smashFactor).toBeCloseTo(112 / 84, 12);
    const given = importBayFile('Club,Ball Speed (mph),Club Speed (mph),Smash\n7 Iron,112.0,84.0,1.35\n').shots[0];
    expect(given.derived).toEqual([]);
    expect(given.values.smashFactor).toBe(1.35);
  });

  it('importBayFile reads a unit written in the cell', () => {
    expect(importBayFile('Club,Carry (yds)\n7 Iron,150 m\n').shots[0].values.carry).toBe(150);
  });
});

describe('importBayFile options', () => {
  it('importBayFile without a build column uses buildByClub, then defaultBuild', () => {
    const r = importBayFile(BASIC, { buildByClub: { DR: 'Head B' }, defaultBuild: 'Own set' });
    expect(r.shots.map((s) => s.build)).toEqual(['Own set', 'Head B']);
  });

  it('importBayFile without a club column uses defaultClub', () => {
    const r = importBayFile('Carry (m),Spin (rpm)\n150,6500\n', { defaultClub: '7 iron' });
    expect(r.shots[0].club).toBe('7I');
    expect(r.warnings.map((w) => w.code)).not.toContain('NO_CLUB_COLUMN');
  });

  it('importBayFile joins several build columns', () => {
    const r = importBayFile('Club,Head,Shaft,Carry (m)\nDriver,Head A,Shaft X,230\n');
    expect(r.shots[0].build).toBe('Head A / Shaft X');
  });

  it('importBayFile calls fillFlight and marks its fields as derived', () => {
    const r = importBayFile('Club,Ball Speed (m/s),Launch Angle (deg)\n7 Iron,50,17\n', {
      fillFlight: (values) => ({ values: { ...values, carry: 150 }, derived: ['carry'] }),
    });
    expect(r.shots[0].values.carry).toBe(150);
    expect(r.shots[0].derived).toEqual(['carry']);
  });

  it('importBayFile keeps a shot whose fillFlight value breaks a limit, without the fill', () => {
    const r = importBayFile('Club,Ball Speed (m/s)\n7 Iron,50\n', {
      fillFlight: (values) => ({ values: { ...values, carry: -5 }, derived: ['carry'] }),
    });
    expect(r.rejected).toEqual([]);
    expect(r.shots[0].values.carry).toBeUndefined();
    expect(r.shots[0].derived).not.toContain('carry');
  });
});

describe('importBayFile recipes', () => {
  it('importBayFile with a recipe column overrides the suggestion for that header', () => {
    const recipe: Recipe = { columns: { 'Offline (yds)': { field: 'offline', unit: 'm', side: 'signed-left-positive' } } };
    const r = importBayFile(BASIC, { recipe });
    expect(r.shots[0].values.offline).toBe(-3);
    expect(r.recipe.columns['Offline (yds)']).toEqual({ field: 'offline', unit: 'm', side: 'signed-left-positive' });
    expect(r.recipe.columns['Carry (yds)']).toEqual({ field: 'carry', unit: 'yd' });
  });

  it('importBayFile with a recipe that moves a field takes it from the suggested column', () => {
    const r = importBayFile('Club,Carry (yds),Flat Carry (yds)\n7 Iron,165,160\n', {
      recipe: { columns: { 'Flat Carry (yds)': { field: 'carry' } } },
    });
    expect(r.shots[0].values.carry).toBeCloseTo(160 * YARD_M, 12);
    expect(r.recipe.columns['Carry (yds)'].field).toBe('ignore');
    expect(r.warnings.map((w) => w.code)).toContain('RECIPE_OVERRIDE');
  });

  it('importBayFile with a recipe naming an absent header ignores it with a warning', () => {
    const r = importBayFile(BASIC, { recipe: { columns: { 'Roll (yds)': { field: 'ignore' } } } });
    expect(r.warnings).toContainEqual(expect.objectContaining({ code: 'RECIPE_COLUMN_MISSING', column: 'Roll (yds)' }));
    expect(r.shots).toHaveLength(2);
  });

  it('importBayFile with a recipe can ignore a suggested column', () => {
    const r = importBayFile(BASIC, { recipe: { columns: { 'Carry (yds)': { field: 'ignore' } } } });
    expect(r.shots[0].values).not.toHaveProperty('carry');
  });

  it('importBayFile with a recipe header row and delimiter reads a file the sniffer would misread', () => {
    const text = 'a;b\n1;2\nClub;Carry (m)\n7 Iron;150,5\n';
    const r = importBayFile(text, { recipe: { delimiter: ';', decimal: ',', headerRow: 2, columns: {} } });
    expect(r.sniff.headerRow).toBe(2);
    expect(r.shots[0].values.carry).toBe(150.5);
  });

  it('importBayFile with the recipe it returned gives the same shots', () => {
    const first = importBayFile(BASIC);
    expect(recipeSchema.safeParse(first.recipe).success).toBe(true);
    expect(importBayFile(BASIC, { recipe: first.recipe }).shots).toEqual(first.shots);
  });

  it.each([
    ['an unknown unit', { columns: { Carry: { field: 'carry', unit: 'furlongs' } } }, 'UNKNOWN_UNIT'],
    ['a unit of the wrong dimension', { columns: { Carry: { field: 'carry', unit: 'mph' } } }, 'UNIT_MISMATCH'],
    ['an unknown field', { columns: { Carry: { field: 'distance' } } }, 'BAD_RECIPE'],
    ['a side on a field without one', { columns: { Carry: { field: 'carry', side: 'suffix-LR' } } }, 'BAD_RECIPE'],
    ['two columns for one field', { columns: { 'Carry (yds)': { field: 'carry' }, 'Offline (yds)': { field: 'carry' } } }, 'BAD_RECIPE'],
    ['no columns', { delimiter: ';' }, 'BAD_RECIPE'],
  ])('importBayFile with a recipe with %s throws ImportError %s', (_, recipe, code) => {
    expect(codeOf(() => importBayFile(BASIC, { recipe: recipe as Recipe }))).toBe(code);
  });
});

describe('importBayFile properties', () => {
  const club = fc.constantFrom('7 Iron', 'Driver', 'PW', '4H', 'Chipper');
  const row = fc.tuple(
    club,
    fc.constantFrom('Set A', 'Set B', ''),
    fc.integer({ min: 700, max: 1700 }),
    fc.integer({ min: 600, max: 1200 }),
    fc.integer({ min: -300, max: 3000 }),
    fc.oneof(fc.integer({ min: -150, max: 150 }).map(String), fc.constant('-'), fc.constant('')),
  );
  const toLine = ([c, b, ball, clubSpeed, carry, side]: [string, string, number, number, number, string]) =>
    `${c},${b},${(ball / 10).toFixed(1)},${(clubSpeed / 10).toFixed(1)},${(carry / 10).toFixed(1)},${side === '-' || side === '' ? side : (Number(side) / 10).toFixed(1)}`;
  const header = 'Club,Build,Ball Speed (mph),Club Speed (mph),Carry (yds),Offline (yds)';
  const key = (s: { club: string; build: string | null; values: object; derived: readonly string[] }) =>
    JSON.stringify([s.club, s.build, s.values, s.derived]);

  it('importBayFile of shuffled data rows gives the same set of shots', () => {
    fc.assert(
      fc.property(fc.array(row, { minLength: 1, maxLength: 40 }).chain((rows) => fc.tuple(fc.constant(rows), fc.shuffledSubarray(rows.map((_, i) => i), { minLength: rows.length, maxLength: rows.length }))), ([rows, order]) => {
        const a = importBayFile(`${header}\n${rows.map(toLine).join('\n')}\n`);
        const b = importBayFile(`${header}\n${order.map((i) => toLine(rows[i])).join('\n')}\n`);
        expect(b.shots.map(key).sort()).toEqual(a.shots.map(key).sort());
        expect(b.rejected.length).toBe(a.rejected.length);
      }),
      { numRuns: 60 },
    );
  });

  it('importBayFile accounts for every data row as a shot or a rejected row', () => {
    fc.assert(
      fc.property(fc.array(row, { minLength: 1, maxLength: 40 }), (rows) => {
        const r = importBayFile(`${header}\n${rows.map(toLine).join('\n')}\n`);
        expect(r.rows).toBe(rows.length);
        expect([...r.shots.map((s) => s.row), ...r.rejected.map((x) => x.row)].sort((p, q) => p - q)).toEqual(rows.map((_, i) => i + 1));
      }),
      { numRuns: 60 },
    );
  });

  it('suggestMapping of the same text twice gives the same suggestion', () => {
    expect(suggestMapping(BASIC)).toEqual(suggestMapping(BASIC));
  });
});
