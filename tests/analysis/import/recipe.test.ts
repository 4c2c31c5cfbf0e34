import { recipeSchema } from '@/analysis/import';

describe('recipeSchema', () => {
  it('recipeSchema accepts a full recipe', () => {
    const recipe = {
      delimiter: ';',
      decimal: ',',
      headerRow: 4,
      columns: {
        Club: { field: 'club' },
        Shaft: { field: 'build' },
        'Carry (m)': { field: 'carry', unit: 'm' },
        'Offline (m)': { field: 'offline', unit: 'yds', side: 'suffix-LR' },
        Notes: { field: 'ignore' },
      },
    };
    expect(recipeSchema.parse(recipe)).toEqual(recipe);
  });

  it('recipeSchema accepts signed path, face and face-to-path columns written for the player\'s hand', () => {
    const recipe = {
      columns: {
        'Path (deg)': { field: 'clubPath', unit: 'deg', side: 'signed-right-positive', handed: true },
        'Face (deg)': { field: 'faceAngle', unit: 'deg', side: 'signed-left-positive', handed: true },
        'Face to path': { field: 'faceToPath', unit: 'deg', handed: true },
      },
    };
    expect(recipeSchema.parse(recipe)).toEqual(recipe);
  });

  it('recipeSchema accepts a recipe of columns only', () => {
    expect(recipeSchema.safeParse({ columns: {} }).success).toBe(true);
  });

  it.each([
    ['no columns', {}],
    ['an unknown delimiter', { delimiter: '|', columns: {} }],
    ['an unknown decimal mark', { decimal: ';', columns: {} }],
    ['a negative header row', { headerRow: -1, columns: {} }],
    ['a fractional header row', { headerRow: 1.5, columns: {} }],
    ['an unknown field', { columns: { A: { field: 'distance' } } }],
    ['an unknown unit', { columns: { A: { field: 'carry', unit: 'furlongs' } } }],
    ['a unit of the wrong dimension', { columns: { A: { field: 'carry', unit: 'rpm' } } }],
    ['an unknown side notation', { columns: { A: { field: 'offline', side: 'left-right' } } }],
    ['a side on a field without one', { columns: { A: { field: 'carry', side: 'suffix-LR' } } }],
    ['an extra key', { columns: {}, mystery: 1 }],
    ['an extra column key', { columns: { A: { field: 'carry', scale: 2 } } }],
    ['a field that is the same for both hands written for the hand', { columns: { A: { field: 'carry', handed: true } } }],
    ['L and R letters written for the hand', { columns: { A: { field: 'offline', side: 'suffix-LR', handed: true } } }],
  ])('recipeSchema refuses a recipe with %s', (_, recipe) => {
    expect(recipeSchema.safeParse(recipe).success).toBe(false);
  });
});
