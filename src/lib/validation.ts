import type { ZodError, ZodType, ZodTypeDef } from 'zod';
import { InputError, type FieldErrors } from './errors';

/** Turns zod issues into field errors keyed by dotted path ("" for the whole input). */
export function zodFieldErrors(error: ZodError): FieldErrors {
  const fields: FieldErrors = {};
  for (const issue of error.issues) {
    const key = issue.path.join('.');
    (fields[key] ??= []).push(issue.message);
  }
  return fields;
}

/**
 * Parses input with a schema, or throws one InputError whose message names the first problem and whose
 * fields list every problem by path.
 */
export function parseInput<Out, In>(schema: ZodType<Out, ZodTypeDef, In>, input: unknown, what = 'request'): Out {
  const result = schema.safeParse(input);
  if (result.success) return result.data;
  const fields = zodFieldErrors(result.error);
  const first = result.error.issues[0];
  const where = first && first.path.length > 0 ? `${first.path.join('.')}: ` : '';
  throw new InputError(
    `The ${what} has ${result.error.issues.length === 1 ? 'a problem' : `${result.error.issues.length} problems`}. ${where}${first?.message ?? ''}`.trim(),
    fields,
  );
}
