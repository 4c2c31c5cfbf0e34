import { buildFormText, parseBuildForm, typedLengthIn } from '@/components/builds/build-form-values';

const blank = buildFormText();

describe('parseBuildForm', () => {
  it('parseBuildForm, decimal comma and point, reads both as numbers', () => {
    // Decimal comma: common practice on European keyboards, no source.
    const result = parseBuildForm({ ...blank, loftDeg: '10,5', lengthIn: '45.75', shaftWeightG: ' 60 ' });
    expect(result.ok).toBe(true);
    if (!result.ok) return;
    expect(result.body.loftDeg).toBe(10.5);
    expect(result.body.lengthIn).toBe(45.75);
    expect(result.body.shaftWeightG).toBe(60);
  });

  it('parseBuildForm, blank fields, sends every key as null so they clear', () => {
    const result = parseBuildForm(blank);
    expect(result).toEqual({
      ok: true,
      body: {
        head: null, hoselSetting: null, shaft: null, shaftFlex: null, grip: null, gripSize: null, swingWeight: null, addedMassWhere: null, notes: null,
        loftDeg: null, hoselLoftChangeDeg: null, hoselLieChangeDeg: null, hoselFaceChangeDeg: null, lieDeg: null, lengthIn: null,
        shaftWeightG: null, torqueDeg: null, totalWeightG: null, balancePointIn: null, addedMassG: null,
      },
    });
  });

  it('parseBuildForm, text with spaces, is trimmed by the shared schema', () => {
    const result = parseBuildForm({ ...blank, head: '  Larch 440 ', shaftFlex: 'S ' });
    expect(result.ok && result.body.head).toBe('Larch 440');
    expect(result.ok && result.body.shaftFlex).toBe('S');
  });

  it('parseBuildForm, not a number, gives a field error', () => {
    const result = parseBuildForm({ ...blank, lieDeg: 'flat' });
    expect(result).toEqual({ ok: false, errors: { lieDeg: 'Enter a number, or leave it blank.' } });
  });

  it('parseBuildForm, values outside the shared schema, gives range errors per field', () => {
    // Physical ranges (server/schemas/build-spec.ts): length 28–50 in, loft 0–70°, lie 40–80°, no negative mass.
    const result = parseBuildForm({ ...blank, lengthIn: '51', loftDeg: '-1', lieDeg: '81', addedMassG: '-2' });
    expect(result).toEqual({
      ok: false,
      errors: {
        lengthIn: 'Length must lie between 28 in and 50 in.',
        loftDeg: 'Loft must lie between 0° and 70°.',
        lieDeg: 'Lie must lie between 40° and 80°.',
        addedMassG: 'Added mass cannot be negative.',
      },
    });
  });

  it('parseBuildForm, a length over 48 in, still saves (conformance notes never block)', () => {
    expect(parseBuildForm({ ...blank, lengthIn: '49' }).ok).toBe(true);
  });
});

describe('buildFormText', () => {
  it('buildFormText, a build with specs, fills the inputs and round-trips through parseBuildForm', () => {
    const spec = { loftDeg: 10.5, lengthIn: 45.75, head: 'Larch 440', notes: null };
    const text = buildFormText(spec);
    expect(text.loftDeg).toBe('10.5');
    expect(text.notes).toBe('');
    const again = parseBuildForm(text);
    expect(again.ok && again.body).toMatchObject(spec);
  });

  it('typedLengthIn, text as typed, is a number or null', () => {
    expect(typedLengthIn({ ...blank, lengthIn: '46,5' })).toBe(46.5);
    expect(typedLengthIn({ ...blank, lengthIn: '46,' })).toBeNull();
    expect(typedLengthIn({ ...blank, lengthIn: '' })).toBeNull();
  });
});
