import type { Recipe } from '@/analysis/import';
import { keptColumnCount, recipeColumnLines, recipeFileSettings } from '@/components/recipes/recipe-columns';

// An invented recipe of a semicolon file.
const RECIPE: Recipe = {
  delimiter: ';',
  decimal: ',',
  headerRow: 0,
  columns: {
    Notes: { field: 'ignore' },
    Club: { field: 'club' },
    'Carry (yds)': { field: 'carry', unit: 'yds' },
    'Side (yds)': { field: 'offline', unit: 'yd', side: 'signed-left-positive' },
  },
};

describe('recipeColumnLines', () => {
  it('recipeColumnLines, a recipe with an ignored column first, lists the kept columns in file order and the ignored last', () => {
    expect(recipeColumnLines(RECIPE).map((l) => l.header)).toEqual(['Club', 'Carry (yds)', 'Side (yds)', 'Notes']);
  });

  it('recipeColumnLines, units written any way and a side notation, reads them in words', () => {
    const byHeader = Object.fromEntries(recipeColumnLines(RECIPE).map((l) => [l.header, l.reading]));
    expect(byHeader['Carry (yds)']).toBe('Carry, in yd');
    expect(byHeader['Side (yds)']).toBe('Offline, in yd, + is left');
    expect(byHeader.Club).toBe('Club');
    expect(byHeader.Notes).toBe('Ignored');
  });

  it('keptColumnCount, one column ignored of four, is 3', () => {
    expect(keptColumnCount(RECIPE)).toBe(3);
  });
});

describe('recipeFileSettings', () => {
  it('recipeFileSettings, every setting stated, says them (header line counted from 1)', () => {
    expect(recipeFileSettings(RECIPE).map((s) => s.value)).toEqual(['Semicolons', 'Comma', '1']);
  });

  it('recipeFileSettings, settings left open, says each file decides', () => {
    expect(recipeFileSettings({ columns: {} }).every((s) => s.value === 'As each file shows')).toBe(true);
  });
});
