/**
 * Reads an analysis request body that may be JSON or CSV text, each with its own byte cap (413 above
 * it); any other content type is a 400 that says which two would work. Not a route (leading underscore).
 */
import { InputError } from '../../../lib/errors';
import { readJson, readTextCapped } from '../../../lib/http/respond';

export type AnalysisBody = { kind: 'json'; body: unknown } | { kind: 'csv'; text: string };

/** Reads JSON (application/json) or CSV (text/csv) from the request within the given caps, bytes. */
export async function analysisBodyRead(
  request: Request,
  limits: { jsonBytes: number; csvBytes: number },
): Promise<AnalysisBody> {
  const type = (request.headers.get('content-type') ?? '').toLowerCase();
  if (type.includes('application/json')) return { kind: 'json', body: await readJson(request, limits.jsonBytes) };
  if (type.includes('text/csv')) {
    const text = await readTextCapped(request, limits.csvBytes);
    if (text.trim() === '') throw new InputError('The CSV body is empty; send a header row and one reading a row.');
    return { kind: 'csv', text };
  }
  throw new InputError(
    `Send the data as JSON (Content-Type: application/json) or as CSV text (Content-Type: text/csv); received "${type || 'none'}".`,
  );
}
