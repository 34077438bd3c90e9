/** A short random request id (12 hex characters) for logs and 500 answers. */
export function requestIdNew(): string {
  const bytes = new Uint8Array(6);
  crypto.getRandomValues(bytes);
  return Array.from(bytes, (b) => b.toString(16).padStart(2, '0')).join('');
}
