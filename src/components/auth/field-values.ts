/**
 * What a form's number box hands to its schema: an empty box is "none" (null); text that is not a number stays
 * text, so the schema names the mistake instead of a silent NaN.
 */
export const numberOrNull = (v: string | number | null) =>
  v === '' || v === null ? null : Number.isNaN(Number(v)) ? v : Number(v);
