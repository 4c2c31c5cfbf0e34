import {
  LOCAL_RULE_G10_MAX_LENGTH_IN,
  MAX_CLUB_LENGTH_IN,
  MIN_CLUB_LENGTH_IN,
  lengthConformanceNotes,
} from '@/analysis/conformance';

// Sources for every value below:
// - R&A / USGA, Equipment Rules (2019), Part 2, Section 1c "Length": a club's overall length is at
//   least 18 in and, except for putters, not more than 48 in.
// - R&A / USGA, Model Local Rule G-10 (available from 1 January 2022; announced October 2021):
//   committees may limit the maximum length of a club, excluding putters, to 46 in.
const codes = (club: string, lengthIn: number | null) => lengthConformanceNotes(club, lengthIn).map((n) => n.code);

describe('length limits', () => {
  it('constants, the rules, are 18, 48 and 46 in', () => {
    expect([MIN_CLUB_LENGTH_IN, MAX_CLUB_LENGTH_IN, LOCAL_RULE_G10_MAX_LENGTH_IN]).toEqual([18, 48, 46]);
  });
});

describe('lengthConformanceNotes', () => {
  it('lengthConformanceNotes, driver at exactly 46 in, has no note (the limit is "more than")', () => {
    expect(codes('DR', 46)).toEqual([]);
  });

  it('lengthConformanceNotes, driver at 46.01 in, notes Local Rule G-10', () => {
    const notes = lengthConformanceNotes('DR', 46.01);
    expect(notes.map((n) => n.code)).toEqual(['over-46-local-rule']);
    expect(notes[0].severity).toBe('local-rule');
    expect(notes[0].text).toContain('G-10');
    expect(notes[0].text).toContain('The committee in charge of a competition decides.');
  });

  it('lengthConformanceNotes, driver at exactly 48 in, conforms but is over the local rule', () => {
    expect(codes('DR', 48)).toEqual(['over-46-local-rule']);
  });

  it('lengthConformanceNotes, driver at 48.5 in, does not conform (one note, the stronger)', () => {
    const notes = lengthConformanceNotes('DR', 48.5);
    expect(notes.map((n) => n.code)).toEqual(['over-48']);
    expect(notes[0].severity).toBe('nonconforming');
  });

  it('lengthConformanceNotes, 7 iron at 48.5 in, does not conform either', () => {
    expect(codes('7I', 48.5)).toEqual(['over-48']);
  });

  it('lengthConformanceNotes, putter at 50 in, is allowed (putters are excepted from 48 in and G-10)', () => {
    expect(codes('PT', 50)).toEqual([]);
    expect(codes('PT', 46.5)).toEqual([]);
  });

  it('lengthConformanceNotes, driver and 3 wood at 46.5 in, both get the G-10 note (it covers every club but the putter)', () => {
    // G-10 limits any club other than a putter, not only drivers; in practice drivers are the
    // clubs it reaches (a 3 wood is rarely built past 44 in: common practice, no source).
    expect(codes('DR', 46.5)).toEqual(['over-46-local-rule']);
    expect(codes('3W', 46.5)).toEqual(['over-46-local-rule']);
  });

  it('lengthConformanceNotes, typical 3 wood at 43 in, has no note', () => {
    expect(codes('3W', 43)).toEqual([]);
  });

  it('lengthConformanceNotes, any club under 18 in (putters too), does not conform', () => {
    expect(codes('PT', 17.5)).toEqual(['too-short']);
    expect(codes('PW', 17.9)).toEqual(['too-short']);
    expect(codes('PW', 18)).toEqual([]);
  });

  it('lengthConformanceNotes, no length or not a number, has no note', () => {
    expect(codes('DR', null)).toEqual([]);
    expect(lengthConformanceNotes('DR', undefined)).toEqual([]);
    expect(codes('DR', Number.NaN)).toEqual([]);
  });

  it('lengthConformanceNotes, unknown club code, is held to the non-putter limits', () => {
    expect(codes('CHIPPER', 46.5)).toEqual(['over-46-local-rule']);
  });
});
