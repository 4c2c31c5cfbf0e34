/**
 * Every invented bay file in fixtures/bay-files/ against its <name>.expected.json: the suggested
 * mapping, the sniffed dialect, the counts, the clubs and builds, and converted values.
 * Expected values are the file's numbers times the exact factors of NIST Special Publication 811
 * (2008), Appendix B.8 (yard 0.9144 m, foot 0.3048 m, mph 0.44704 m/s, km/h 1/3.6 m/s), or the
 * derivations the product page defines (smash = ball/club speed, spin rate = hypot(back, side),
 * spin axis = atan2(side, back)), computed outside this code (the expected files).
 */
import { readdirSync, readFileSync } from 'fs';
import { join } from 'path';
import type { ShotField } from '@/analysis/fields';
import { importBayFile, suggestMapping } from '@/analysis/import';

const DIR = join(__dirname, '../../../fixtures/bay-files');

interface Expected {
  sniff: Record<string, unknown>;
  mapping: Record<string, { field: string; unit?: string; side?: string }>;
  counts: { rows: number; shots: number; rejected: number; skipped: number };
  shots: { row: number; club: string; build: string | null }[];
  values: { row: number; field: ShotField; value: number }[];
  missing?: { row: number; field: ShotField }[];
  derived: Record<string, ShotField[]>;
  rejected: { row: number; column?: string }[];
  warnings?: string[];
  unknownClubs: string[];
}

const cases = readdirSync(DIR)
  .filter((f) => !f.endsWith('.expected.json'))
  .map((file) => {
    const base = file.replace(/\.[a-z]+$/, '');
    const expected = JSON.parse(readFileSync(join(DIR, `${base}.expected.json`), 'utf8')) as Expected;
    return { file, text: readFileSync(join(DIR, file), 'utf8'), expected };
  });

describe('bay-file fixtures', () => {
  it('fixtures folder holds at least five dialects', () => {
    expect(cases.length).toBeGreaterThanOrEqual(5);
  });

  describe.each(cases)('$file', ({ text, expected }) => {
    it('suggestMapping of the file gives the expected mapping and dialect', () => {
      const suggestion = suggestMapping(text);
      expect(suggestion.sniff).toMatchObject(expected.sniff);
      expect(Object.keys(suggestion.recipe.columns)).toEqual(Object.keys(expected.mapping));
      for (const [header, want] of Object.entries(expected.mapping)) {
        const got = suggestion.recipe.columns[header];
        expect({ header, ...got }).toEqual({ header, ...want });
      }
    });

    it('importBayFile of the file gives the expected shots, rows and values', () => {
      const result = importBayFile(text);
      expect({
        rows: result.rows,
        shots: result.shots.length,
        rejected: result.rejected.length,
        skipped: result.skipped.length,
      }).toEqual(expected.counts);
      expect(result.shots.map((s) => ({ row: s.row, club: s.club, build: s.build }))).toEqual(expected.shots);
      for (const v of expected.values) {
        const shot = result.shots.find((s) => s.row === v.row);
        expect({ row: v.row, field: v.field, value: shot?.values[v.field] }).toEqual({
          row: v.row,
          field: v.field,
          value: expect.closeTo(v.value, 9),
        });
      }
      for (const m of expected.missing ?? []) {
        const shot = result.shots.find((s) => s.row === m.row);
        expect(shot?.row).toBe(m.row);
        expect(shot!.values).not.toHaveProperty(m.field);
      }
      for (const [row, fields] of Object.entries(expected.derived)) {
        expect(result.shots.find((s) => s.row === Number(row))?.derived).toEqual(fields);
      }
      expect(result.rejected.map((r) => (r.column ? { row: r.row, column: r.column } : { row: r.row }))).toEqual(expected.rejected);
      expect(result.unknownClubs).toEqual(expected.unknownClubs);
      for (const code of expected.warnings ?? []) {
        expect(result.warnings.map((w) => w.code)).toContain(code);
      }
    });
  });
});
