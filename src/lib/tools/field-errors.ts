/**
 * Placing the API's field errors (dotted paths of the request, e.g. "readings.3.fieldUT") next to the
 * inputs they belong to: through a map from request path to table cell or form field, falling back to the
 * nearest mapped parent path, and listing what cannot be placed.
 */
/** Field name (dotted path) → messages, as the API sends them. */
type ApiFieldErrors = Record<string, string[]>;

export interface PlacedFieldErrors {
  /** Input key (a table cell key or a form field name) → first message. */
  placed: Record<string, string>;
  /** Messages with no input to sit next to, as "path: message". */
  unplaced: string[];
}

/**
 * Splits API field errors into those an input shows and the rest. `inputOfPath` maps request paths to input
 * keys; a path not in it is tried with its last segments removed ("readings.3.fieldUT" → "readings.3").
 */
export function fieldErrorsPlace(
  fields: ApiFieldErrors,
  inputOfPath: Readonly<Record<string, string>>,
): PlacedFieldErrors {
  const out: PlacedFieldErrors = { placed: {}, unplaced: [] };
  for (const [path, messages] of Object.entries(fields)) {
    const message = messages[0];
    if (!message) continue;
    let p = path;
    let key: string | undefined = inputOfPath[p];
    while (key === undefined && p.includes('.')) {
      p = p.slice(0, p.lastIndexOf('.'));
      key = inputOfPath[p];
    }
    if (key !== undefined && out.placed[key] === undefined) out.placed[key] = message;
    else if (key === undefined) out.unplaced.push(path === '' ? message : `${path}: ${message}`);
  }
  return out;
}
