import { useState } from 'react';
import { fieldErrorsFromApi } from './api-client';
import type { z } from 'zod';
import { fieldErrorsFromZod, type FieldErrors } from './forms';

export type Parsed<B> = { ok: true; body: B } | { ok: false; errors: FieldErrors };

/**
 * A form kept as text (what the inputs show) and parsed on submit with the shared schema:
 * `set(key)` makes an input's change handler; `shown` merges the client's field errors over the
 * server's (VALIDATION_FAILED details); `submit` parses and calls onSubmit with the body.
 */
export function useTextForm<T extends object, B>(initial: () => T, parse: (text: T) => Parsed<B>, onSubmit: (body: B) => void, serverError: unknown) {
  const [text, setText] = useState<T>(initial);
  const [errors, setErrors] = useState<FieldErrors>({});
  const set =
    <K extends keyof T>(key: K) =>
    (value: T[K]) =>
      setText((t) => ({ ...t, [key]: value }));
  const shown: FieldErrors = { ...fieldErrorsFromApi(serverError), ...errors };
  const submit = () => {
    const result = parse(text);
    if (!result.ok) {
      setErrors(result.errors);
      return;
    }
    setErrors({});
    onSubmit(result.body);
  };
  return { text, set, errors, shown, submit };
}

/** A parser for useTextForm from a zod schema (inputs that need no text-to-number step). */
export function parseWith<S extends z.ZodType>(schema: S) {
  return (text: unknown): Parsed<z.output<S>> => {
    const parsed = schema.safeParse(text);
    return parsed.success ? { ok: true, body: parsed.data } : { ok: false, errors: fieldErrorsFromZod(parsed.error) };
  };
}
