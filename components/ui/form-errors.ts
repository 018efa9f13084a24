/**
 * Turns zod issues (client-side checks) and the server's `fields` map (DEVELOPERS.md: errors carry a dotted field
 * path → message) into one `{ field: message }` map, so each message shows beside its own field.
 */
import type { z } from 'zod';
import { ApiError } from '@/lib/api/client';

export type FieldErrors = Record<string, string>;

export function fieldErrorsFromZod(error: z.ZodError): FieldErrors {
  const out: FieldErrors = {};
  for (const issue of error.issues) {
    const key = issue.path.map(String).join('.') || '_form';
    if (!(key in out)) out[key] = issue.message;
  }
  return out;
}

/** Field messages of a failed request, or {} when the failure is not about particular fields. */
export function fieldErrorsFromApi(error: unknown): FieldErrors {
  return error instanceof ApiError ? { ...error.fields } : {};
}

/** A readable sentence for a failed request, for the banner above the form. */
export function messageOf(error: unknown): string {
  if (error instanceof ApiError) return error.message;
  if (error instanceof Error) return `Something went wrong: ${error.message}`;
  return 'Something went wrong. Try again.';
}

/**
 * Validate `value` with `schema`: `{ data }` when it passes, `{ errors }` with one message per field otherwise.
 */
export function validate<S extends z.ZodType>(
  schema: S,
  value: unknown,
): { data: z.infer<S>; errors: null } | { data: null; errors: FieldErrors } {
  const r = schema.safeParse(value);
  return r.success ? { data: r.data, errors: null } : { data: null, errors: fieldErrorsFromZod(r.error) };
}

/** The same messages without `key`: editing a field clears its own message, the others stay until the next try. */
export function withoutField(errors: FieldErrors, key: string): FieldErrors {
  if (!(key in errors)) return errors;
  const { [key]: _cleared, ...rest } = errors;
  return rest;
}
