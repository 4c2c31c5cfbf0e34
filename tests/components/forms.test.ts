import fc from 'fast-check';
import { z } from 'zod';
import { fieldErrorsFromZod, parseNumberFields, parseOptionalNumber } from '@/components/forms';

describe('parseOptionalNumber', () => {
  it('parseOptionalNumber, blank or spaces, gives null', () => {
    expect(parseOptionalNumber('')).toBeNull();
    expect(parseOptionalNumber('   ')).toBeNull();
  });

  it('parseOptionalNumber, plain decimals, agrees with ECMAScript Number()', () => {
    // Reference: ECMA-262 (ECMAScript Language Specification), StringToNumber, as implemented by
    // the engine's Number(); fixed-point text with two decimals.
    fc.assert(
      fc.property(fc.double({ min: -1e6, max: 1e6, noNaN: true }), (x) => {
        const text = x.toFixed(2);
        expect(parseOptionalNumber(text)).toBe(Number(text));
      }),
    );
  });

  it('parseOptionalNumber, decimal comma, reads it as a decimal point', () => {
    // A decimal comma is what many European keyboards type: common practice, no source.
    expect(parseOptionalNumber('12,5')).toBe(12.5);
    expect(parseOptionalNumber('-0,75')).toBe(-0.75);
  });

  it('parseOptionalNumber, typographic minus sign (U+2212), reads it as minus', () => {
    // Unicode Standard: U+2212 MINUS SIGN is the typographic minus.
    expect(parseOptionalNumber('\u22123')).toBe(-3);
  });

  it('parseOptionalNumber, text, thousands separators or exponents, gives NaN', () => {
    for (const t of ['abc', '12a', '1,234.5', '1.2.3', '1e3', '--2', ',']) {
      expect(parseOptionalNumber(t)).toBeNaN();
    }
  });
});

describe('parseNumberFields', () => {
  it('parseNumberFields, one bad field, names only that field', () => {
    const { values, errors } = parseNumberFields({ heightCm: '180', handicap: 'x' });
    expect(values).toEqual({ heightCm: 180, handicap: null });
    expect(Object.keys(errors)).toEqual(['handicap']);
  });
});

describe('fieldErrorsFromZod', () => {
  it('fieldErrorsFromZod, several issues on one field, keeps the first per field', () => {
    const schema = z.object({ a: z.string().min(3, 'too short').regex(/^x/, 'starts with x'), b: z.number() });
    const result = schema.safeParse({ a: 'y', b: 'no' });
    expect(result.success).toBe(false);
    if (result.success) return;
    const errors = fieldErrorsFromZod(result.error);
    expect(errors.a).toBe('too short');
    expect(Object.keys(errors).sort()).toEqual(['a', 'b']);
  });

  it('fieldErrorsFromZod, default number range message, says it in plain words', () => {
    const result = z.object({ h: z.number().min(100) }).safeParse({ h: 90 });
    if (result.success) throw new Error('expected a failure');
    expect(fieldErrorsFromZod(result.error).h).toBe('Enter at least 100.');
  });
});
