import type { z } from 'zod';

/** Form state: every input is text until it is parsed. */
export type FieldErrors = Record<string, string>;

/**
 * Parses an optional number field: blank → null; "12,5" and "12.5" → 12.5 (a decimal comma is
 * accepted, common practice on European keyboards, no source); anything else → NaN.
 */
export function parseOptionalNumber(text: string): number | null {
  const t = text.trim().replace(/\s/g, '');
  if (t === '') return null;
  const normal = t.replace('−', '-').replace(/^([+-]?\d*),(\d+)$/, '$1.$2');
  if (!/^[+-]?(\d+\.?\d*|\.\d+)$/.test(normal)) return Number.NaN;
  return Number(normal);
}

/** Number inputs as text, parsed: numbers (or null) and the fields that are not numbers. */
export function parseNumberFields<K extends string>(
  texts: Record<K, string>,
): { values: Record<K, number | null>; errors: FieldErrors } {
  const values = {} as Record<K, number | null>;
  const errors: FieldErrors = {};
  for (const key of Object.keys(texts) as K[]) {
    const n = parseOptionalNumber(texts[key]);
    if (Number.isNaN(n)) {
      errors[key] = 'Enter a number, or leave it blank.';
      values[key] = null;
    } else {
      values[key] = n;
    }
  }
  return { values, errors };
}

/** zod issues → the first message per top-level field. */
export function fieldErrorsFromZod(error: z.ZodError): FieldErrors {
  const out: FieldErrors = {};
  for (const issue of error.issues) {
    const key = issue.path.length > 0 ? String(issue.path[0]) : '_form';
    if (!out[key]) out[key] = friendlyMessage(issue);
  }
  return out;
}

/** A number as an input's text ('' for null). */
export const numberText = (n: number | null | undefined): string => (n === null || n === undefined ? '' : String(n));

/** zod's default range messages ("Too small: expected number to be >=100") in plain words. */
function friendlyMessage(issue: z.core.$ZodIssue): string {
  if (issue.code === 'too_small' && issue.origin === 'number' && issue.message.startsWith('Too small')) {
    return `Enter at least ${String(issue.minimum)}.`;
  }
  if (issue.code === 'too_big' && issue.origin === 'number' && issue.message.startsWith('Too big')) {
    return `Enter at most ${String(issue.maximum)}.`;
  }
  if (issue.code === 'too_big' && issue.origin === 'string' && issue.message.startsWith('Too big')) {
    return `Keep it to ${String(issue.maximum)} characters.`;
  }
  return issue.message;
}
