import { buildAssignmentSchema } from '@/server/schemas';
import { buildAssignmentFor, clubsOfGroups, INITIAL_BUILD_CHOICE } from '@/components/import/build-choice';

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
