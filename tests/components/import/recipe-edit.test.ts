import fs from 'node:fs';
import path from 'node:path';
import { SIDE_FIELDS } from '@/analysis/fields';
import { importBayFile, recipeSchema, type ColumnSuggestion } from '@/analysis/import';
import { findUnit } from '@/analysis/units';
import {
  columnWithField,
  confidenceLevel,
  effectiveColumn,
  isSideTarget,
  recipeFromOverrides,
  recipeWithOverrides,
  setColumnField,
  answerSignQuestion,
  setColumnHanded,
  setColumnSide,
  setColumnUnit,
  TARGET_OPTIONS,
  unitOptionsFor,
} from '@/components/import/recipe-edit';

const suggestion = (over: Partial<ColumnSuggestion>): ColumnSuggestion => ({
  header: 'Carry yds',
  index: 0,
  field: 'carry',
  unit: 'yd',
  side: null,
  confidence: 0.9,
  reason: 'header says carry',
  samples: ['150.1'],
  ...over,
});

describe('unitOptionsFor', () => {
  it('unitOptionsFor, a length field, offers only length units', () => {
    // Length units of NIST SP 811 (2008), App. B.8: metre, yard, foot — every one is length.
    const units = unitOptionsFor('carry').map((o) => o.value);
    expect(units).toEqual(expect.arrayContaining(['m', 'yd', 'ft']));
    for (const u of units) expect(findUnit(u)?.dimension).toBe('length');
    expect(units).not.toContain('mph');
  });

  it('unitOptionsFor, a speed field, offers mph, km/h and m/s but no length unit', () => {
    const units = unitOptionsFor('ballSpeed').map((o) => o.value);
    expect(units).toEqual(expect.arrayContaining(['mph', 'km/h', 'm/s']));
    expect(units).not.toContain('yd');
  });

  it('unitOptionsFor, club, build and ignore, offers no unit', () => {
    expect(unitOptionsFor('club')).toEqual([]);
    expect(unitOptionsFor('build')).toEqual([]);
    expect(unitOptionsFor('ignore')).toEqual([]);
  });
});

describe('columnWithField', () => {
  it('columnWithField, carry in yards changed to ball speed, resets the unit to a speed unit', () => {
    const next = columnWithField({ field: 'carry', unit: 'yd' }, 'ballSpeed');
    expect(next.field).toBe('ballSpeed');
    expect(findUnit(next.unit!)?.dimension).toBe('speed');
    expect(recipeSchema.safeParse({ columns: { c: next } }).success).toBe(true);
  });

  it('columnWithField, carry in yards changed to total, keeps yards', () => {
    expect(columnWithField({ field: 'carry', unit: 'yds' }, 'total')).toEqual({ field: 'total', unit: 'yd' });
  });

  it('columnWithField, an unknown unit changed to a field the suggestion states a unit for, takes the suggestion unit', () => {
    const next = columnWithField({ field: 'ignore' }, 'carry', suggestion({ field: 'ignore', unit: 'yd' }));
    expect(next).toEqual({ field: 'carry', unit: 'yd' });
  });

  it('columnWithField, a side field, gets a side notation; a plain field gets none', () => {
    expect(columnWithField({ field: 'carry', unit: 'm' }, 'offline').side).toBe('signed-right-positive');
    expect(columnWithField({ field: 'offline', unit: 'm', side: 'suffix-LR' }, 'carry').side).toBeUndefined();
  });

  it('columnWithField, set to club or ignore, drops unit and side', () => {
    expect(columnWithField({ field: 'offline', unit: 'm', side: 'prefix-LR' }, 'ignore')).toEqual({ field: 'ignore' });
    expect(columnWithField({ field: 'carry', unit: 'm' }, 'club')).toEqual({ field: 'club' });
  });

  it('columnWithField, any target from any column, always passes the recipe schema', () => {
    const starts = [{ field: 'carry', unit: 'yd' }, { field: 'offline', unit: 'm', side: 'prefix-LR' }, { field: 'ignore' }] as const;
    for (const start of starts) {
      for (const { value } of TARGET_OPTIONS) {
        const parsed = recipeSchema.safeParse({ columns: { c: columnWithField({ ...start }, value) } });
        expect({ value, ok: parsed.success }).toEqual({ value, ok: true });
      }
    }
  });
});

describe('isSideTarget', () => {
  it('isSideTarget, every target, is true exactly for the left/right fields', () => {
    // Left/right fields as analysis/fields.ts signs them (+ is right).
    for (const { value } of TARGET_OPTIONS) {
      expect(isSideTarget(value)).toBe((SIDE_FIELDS as ReadonlySet<string>).has(value));
    }
    expect(isSideTarget('offline')).toBe(true);
    expect(isSideTarget('carry')).toBe(false);
  });
});

describe('setColumnField', () => {
  it('setColumnField, a field another overridden column holds, sets that column to Ignore', () => {
    const out = setColumnField({ A: { field: 'carry', unit: 'm' } }, 'B', 'carry', { field: 'total', unit: 'm' });
    expect(out.A).toEqual({ field: 'ignore' });
    expect(out.B).toEqual({ field: 'carry', unit: 'm' });
  });

  it('setColumnField, build on two columns, keeps both', () => {
    const out = setColumnField({ A: { field: 'build' } }, 'B', 'build', { field: 'ignore' });
    expect(out).toEqual({ A: { field: 'build' }, B: { field: 'build' } });
  });

  it('setColumnField, the input overrides, leaves them unchanged', () => {
    const before = { A: { field: 'carry' as const, unit: 'm' } };
    setColumnField(before, 'B', 'carry', null);
    expect(before).toEqual({ A: { field: 'carry', unit: 'm' } });
  });
});

describe('setColumnUnit and setColumnSide', () => {
  it('setColumnUnit, a unit of another dimension, is refused', () => {
    expect(setColumnUnit({}, 'C', { field: 'carry', unit: 'm' }, 'mph')).toEqual({});
  });

  it('setColumnUnit, a fitting unit, replaces it', () => {
    expect(setColumnUnit({}, 'C', { field: 'carry', unit: 'm' }, 'yd')).toEqual({ C: { field: 'carry', unit: 'yd' } });
  });

  it('setColumnSide, a column without a side, is refused', () => {
    expect(setColumnSide({}, 'C', { field: 'carry', unit: 'm' }, 'suffix-LR')).toEqual({});
  });

  it('setColumnSide, a side field, sets the notation', () => {
    expect(setColumnSide({}, 'S', { field: 'offline', unit: 'm' }, 'signed-left-positive')).toEqual({
      S: { field: 'offline', unit: 'm', side: 'signed-left-positive' },
    });
  });
});

describe('setColumnHanded (signed values written for the player\'s hand)', () => {
  it('marks a signed path column and clears the mark again', () => {
    const marked = setColumnHanded({}, 'P', { field: 'clubPath', unit: 'deg', side: 'signed-right-positive' }, true);
    expect(marked).toEqual({ P: { field: 'clubPath', unit: 'deg', side: 'signed-right-positive', handed: true } });
    expect(setColumnHanded(marked, 'P', marked.P, false)).toEqual({ P: { field: 'clubPath', unit: 'deg', side: 'signed-right-positive' } });
  });

  it('marks face to path (no side notation of its own)', () => {
    expect(setColumnHanded({}, 'F', { field: 'faceToPath', unit: 'deg' }, true)).toEqual({ F: { field: 'faceToPath', unit: 'deg', handed: true } });
  });

  it('refuses a field that is the same for both hands and L/R letters', () => {
    expect(setColumnHanded({}, 'C', { field: 'carry', unit: 'm' }, true)).toEqual({});
    expect(setColumnHanded({}, 'S', { field: 'offline', unit: 'm', side: 'suffix-LR' }, true)).toEqual({});
  });

  it('answers a sign question as a notation, or as written for the hand (signed, + right for a right-hander, marked)', () => {
    const path = { field: 'clubPath', unit: 'deg' } as const;
    expect(answerSignQuestion({}, 'P', path, 'signed-left-positive')).toEqual({ P: { field: 'clubPath', unit: 'deg', side: 'signed-left-positive' } });
    expect(answerSignQuestion({}, 'P', path, 'for-hand')).toEqual({ P: { field: 'clubPath', unit: 'deg', side: 'signed-right-positive', handed: true } });
  });

  it('drops the mark when the column turns to L/R letters', () => {
    expect(setColumnSide({}, 'P', { field: 'clubPath', unit: 'deg', side: 'signed-right-positive', handed: true }, 'prefix-LR')).toEqual({
      P: { field: 'clubPath', unit: 'deg', side: 'prefix-LR' },
    });
  });
});

describe('effectiveColumn and recipeFromOverrides', () => {
  it('effectiveColumn, an override, wins over the preview recipe and the suggestion', () => {
    const s = suggestion({});
    expect(effectiveColumn('Carry yds', { 'Carry yds': { field: 'ignore' } }, { columns: { 'Carry yds': { field: 'carry', unit: 'yd' } } }, s)).toEqual({ field: 'ignore' });
    expect(effectiveColumn('Carry yds', {}, { columns: { 'Carry yds': { field: 'total', unit: 'm' } } }, s)).toEqual({ field: 'total', unit: 'm' });
    expect(effectiveColumn('Carry yds', {}, undefined, s)).toEqual({ field: 'carry', unit: 'yd' });
  });

  it('recipeFromOverrides, no overrides, is undefined; some, a valid recipe', () => {
    expect(recipeFromOverrides({})).toBeUndefined();
    const recipe = recipeFromOverrides({ 'Carry yds': { field: 'carry', unit: 'm' } });
    expect(recipeSchema.parse(recipe)).toEqual({ columns: { 'Carry yds': { field: 'carry', unit: 'm' } } });
  });
});

describe('confidenceLevel', () => {
  it('confidenceLevel, the cut points, split high, medium and low (common practice, no source)', () => {
    expect(confidenceLevel(0.95)).toBe('high');
    expect(confidenceLevel(0.8)).toBe('high');
    expect(confidenceLevel(0.6)).toBe('medium');
    expect(confidenceLevel(0.49)).toBe('low');
  });
});

describe('recipeWithOverrides', () => {
  // An invented bay file (fixtures/bay-files/club-names.csv): mph, yards, "R 4.5" sides, a build column.
  const text = fs.readFileSync(path.resolve(__dirname, '../../../fixtures/bay-files/club-names.csv'), 'utf8');
  const stored = importBayFile(text).recipe;

  it('recipeWithOverrides, no base, is the overrides alone', () => {
    expect(recipeWithOverrides(undefined, {})).toBeUndefined();
    expect(recipeWithOverrides(undefined, { A: { field: 'ignore' } })).toEqual({ columns: { A: { field: 'ignore' } } });
  });

  it('recipeWithOverrides, a stored recipe and one column set to Ignore, keeps every other column and the file format', () => {
    const out = recipeWithOverrides(stored, { 'Carry yds': { field: 'ignore' } })!;
    expect(out.delimiter).toBe(stored.delimiter);
    expect(out.headerRow).toBe(stored.headerRow);
    expect(out.columns['Carry yds']).toEqual({ field: 'ignore' });
    expect(out.columns['Ball Speed mph']).toEqual(stored.columns['Ball Speed mph']);
    expect(Object.keys(out.columns)).toEqual(Object.keys(stored.columns));
  });

  it('recipeWithOverrides, an override taking a field a stored column holds, ignores that column so the importer accepts it', () => {
    // Without the rule the importer refuses the recipe: "maps both … to ballSpeed" (BAD_RECIPE).
    const overrides = { 'Club Speed mph': { field: 'ballSpeed' as const, unit: 'mph' } };
    const naive = { ...stored, columns: { ...stored.columns, ...overrides } };
    expect(() => importBayFile(text, { recipe: naive })).toThrow(/maps both/);
    const out = recipeWithOverrides(stored, overrides)!;
    expect(out.columns['Ball Speed mph']).toEqual({ field: 'ignore' });
    const shot = importBayFile(text, { recipe: out }).shots[0];
    // The first row's club speed, 104.5 mph, now read as ball speed: 1 mph = 0.44704 m/s exactly
    // (NIST SP 811, Guide for the Use of the SI, 2008, App. B.8).
    expect(shot.values.ballSpeed).toBeCloseTo(104.5 * 0.44704, 6);
    expect(shot.values.clubSpeed).toBeUndefined();
  });

  it('recipeWithOverrides, a second build column, keeps both build columns', () => {
    const out = recipeWithOverrides(stored, { 'Club Speed mph': { field: 'build' } })!;
    expect(out.columns.Build).toEqual({ field: 'build' });
    expect(recipeSchema.safeParse(out).success).toBe(true);
  });

  it('recipeWithOverrides, the base, is left unchanged', () => {
    const copy = JSON.parse(JSON.stringify(stored));
    recipeWithOverrides(stored, { 'Carry yds': { field: 'total', unit: 'yd' } });
    expect(stored).toEqual(copy);
  });
});
