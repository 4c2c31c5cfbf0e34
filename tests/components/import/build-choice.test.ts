import fs from 'node:fs';
import path from 'node:path';
import { importBayFile, type Recipe } from '@/analysis/import';
import { buildAssignmentSchema } from '@/server/schemas';
import { buildAssignmentFor, buildChoiceOfStored, clubsOfGroups, INITIAL_BUILD_CHOICE } from '@/components/import/build-choice';

describe('buildAssignmentFor', () => {
  it('buildAssignmentFor, column mode without a fallback, is the plain column mode', () => {
    expect(buildAssignmentFor(INITIAL_BUILD_CHOICE)).toEqual({ mode: 'column' });
  });

  it('buildAssignmentFor, column mode with a fallback, trims it', () => {
    expect(buildAssignmentFor({ ...INITIAL_BUILD_CHOICE, fallback: '  Own club ' })).toEqual({ mode: 'column', fallback: 'Own club' });
  });

  it('buildAssignmentFor, file mode without a name, is null (incomplete)', () => {
    expect(buildAssignmentFor({ ...INITIAL_BUILD_CHOICE, mode: 'file', fileBuild: '   ' })).toBeNull();
  });

  it('buildAssignmentFor, per club, leaves blank clubs out', () => {
    const out = buildAssignmentFor({ ...INITIAL_BUILD_CHOICE, mode: 'club', byClub: { DR: 'Head A', '7I': ' ' } });
    expect(out).toEqual({ mode: 'club', byClub: { DR: 'Head A' } });
  });

  it('buildAssignmentFor, a very long name, is cut to what the server schema accepts', () => {
    const out = buildAssignmentFor({ ...INITIAL_BUILD_CHOICE, mode: 'file', fileBuild: 'x'.repeat(200) });
    expect(buildAssignmentSchema.safeParse(out).success).toBe(true);
  });
});

describe('clubsOfGroups', () => {
  it('clubsOfGroups, groups in file order, lists each club once in bag order (driver first, wedges last)', () => {
    // Bag order: longest club first — common practice, no source.
    const groups = [{ club: 'PW' }, { club: '7I' }, { club: 'DR' }, { club: '7I' }, { club: '3W' }];
    expect(clubsOfGroups(groups)).toEqual(['DR', '3W', '7I', 'PW']);
  });
});

describe('buildChoiceOfStored', () => {
  // An invented bay file with a Build column (fixtures/bay-files/club-names.csv), imported as the
  // server imports it, then read back: the choice found must give the same builds again.
  const text = fs.readFileSync(path.resolve(__dirname, '../../../fixtures/bay-files/club-names.csv'), 'utf8');
  const suggested = importBayFile(text).recipe;
  const withoutBuildColumn: Recipe = { ...suggested, columns: { ...suggested.columns, Build: { field: 'ignore' } } };
  const groupsOf = (shots: readonly { club: string; build: string | null }[]) => {
    const seen = new Map<string, { club: string; build: string | null }>();
    for (const s of shots) seen.set(`${s.club}|${s.build ?? ''}`, { club: s.club, build: s.build });
    return [...seen.values()];
  };

  it('buildChoiceOfStored, a recipe with a build column, is the column mode', () => {
    const { recipe, shots } = importBayFile(text);
    expect(buildChoiceOfStored(recipe, groupsOf(shots))).toEqual(INITIAL_BUILD_CHOICE);
  });

  it('buildChoiceOfStored, builds given per club, gives the same per-club assignment back', () => {
    const byClub = { DR: 'Head A 9°', '7I': 'Set 2' };
    const { recipe, shots } = importBayFile(text, { recipe: withoutBuildColumn, buildByClub: byClub });
    const choice = buildChoiceOfStored(recipe, groupsOf(shots));
    expect(buildAssignmentFor(choice)).toEqual({ mode: 'club', byClub });
  });

  it('buildChoiceOfStored, one build for every shot, is one build for the file', () => {
    const { recipe, shots } = importBayFile(text, { recipe: withoutBuildColumn, defaultBuild: 'Stock' });
    expect(buildAssignmentFor(buildChoiceOfStored(recipe, groupsOf(shots)))).toEqual({ mode: 'file', build: 'Stock' });
  });

  it('buildChoiceOfStored, no build on any shot, is the column mode', () => {
    const { recipe, shots } = importBayFile(text, { recipe: withoutBuildColumn });
    expect(buildChoiceOfStored(recipe, groupsOf(shots))).toEqual(INITIAL_BUILD_CHOICE);
  });

  it('buildChoiceOfStored, two builds for one club without a build column, leaves the column mode to the fitter', () => {
    const groups = [{ club: 'DR', build: 'A' }, { club: 'DR', build: 'B' }];
    expect(buildChoiceOfStored({ columns: {} }, groups)).toEqual(INITIAL_BUILD_CHOICE);
  });
});
