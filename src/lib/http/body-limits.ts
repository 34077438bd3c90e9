/**
 * Request body caps for readJson, bytes, one per kind of request, so a route names what it takes instead of
 * picking a number. Each cap is far above the largest body its schema accepts and far below what would
 * cost the server (common practice, no source). A route whose body is sized by its domain (a kit with a
 * whole model, a journal entry, a data tool's input) takes that domain's own constant instead.
 */

/** A token, a flag or a confirmation. */
export const BODY_BYTES_TOKEN = 1_000;
/** A code or an id. */
export const BODY_BYTES_ID = 2_000;
/** A short form: a few labelled fields (a class, a live link, a password change). */
export const BODY_BYTES_FORM = 4_000;
/** A form with prose or long fields: an event, a school, signing up or in. */
export const BODY_BYTES_LONG_FORM = 16_000;
/** A list: attendance rows, entries to publish at once. */
export const BODY_BYTES_LIST = 64_000;
