import type { ColumnSuggestion } from '@/analysis/import';
import { columnNote } from '@/components/import/column-note';

const suggestion: ColumnSuggestion = {
  header: 'Total (m)',
  index: 4,
  field: 'total',
  unit: 'm',
  side: null,
  confidence: 0.95,
  reason: 'header says total',
  samples: ['171.2'],
};
const plain = { suggestion, changed: false, fromRecipe: false, low: false };

describe('columnNote', () => {
  it('columnNote, read as suggested, gives the suggestion reason and no badge', () => {
    expect(columnNote({ ...plain, column: { field: 'total', unit: 'm' } })).toEqual({ text: 'header says total', attention: false });
  });

  it('columnNote, a low-confidence guess nobody changed, asks for attention', () => {
    expect(columnNote({ ...plain, low: true, column: { field: 'total', unit: 'm' } }).attention).toBe(true);
  });

  it('columnNote, changed by the fitter, says so and names the suggestion', () => {
    const note = columnNote({ ...plain, changed: true, low: true, column: { field: 'ignore' } });
    expect(note).toEqual({ badge: 'Your choice', text: 'Set by you to Ignore. Suggested: Total (header says total)', attention: false });
  });

  it('columnNote, a stored mapping that differs from the suggestion, shows it as stored', () => {
    const base = { columns: { 'Total (m)': { field: 'ignore' as const } } };
    const note = columnNote({ ...plain, base, column: { field: 'ignore' } });
    expect(note.badge).toBe('As stored');
    expect(note.text).toMatch(/^As stored: Ignore\./);
  });

  it('columnNote, Ignore because another column took the field, says so rather than "as stored"', () => {
    const base = { columns: { 'Total (m)': { field: 'total' as const, unit: 'm' } } };
    const note = columnNote({ ...plain, base, column: { field: 'ignore' } });
    expect(note.badge).toBeUndefined();
    expect(note.text).toMatch(/^Ignored: another column now holds Total\./);
  });

  it('columnNote, a chosen saved recipe that differs from the suggestion, credits the recipe', () => {
    expect(columnNote({ ...plain, fromRecipe: true, column: { field: 'carry', unit: 'm' } }).badge).toBe('Recipe');
  });
});
