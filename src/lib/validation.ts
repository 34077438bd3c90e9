import { z, type RefinementCtx, type ZodError, type ZodType, type ZodTypeAny, type ZodTypeDef } from 'zod';
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

/**
 * `schema` followed by a cross-field check that runs only once every check of `schema` passed. zod 3 runs a
 * `.superRefine` on data whose bounds already failed (a "dirty" result: `facets: 1e308` fails `.max(256)` and
 * still reaches the refinement), so a refinement that loops over a count would do the very work the bound was
 * there to stop. `.pipe()` stops at the first failed bound; use this wherever a refinement iterates.
 */
export function refineValid<T extends ZodTypeAny>(
  schema: T,
  check: (value: z.output<T>, ctx: RefinementCtx) => void,
): z.ZodPipeline<T, z.ZodEffects<z.ZodType<z.output<T>>, z.output<T>>> {
  return schema.pipe(z.custom<z.output<T>>(() => true).superRefine(check));
}
