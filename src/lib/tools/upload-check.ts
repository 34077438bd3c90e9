/** The size check an upload gets in the browser before it is sent, so a too-large file never leaves the computer. */
import { bytesFormat } from './number-format';

/** Why a file of `sizeBytes` cannot be sent to a tool taking at most `maxBytes`, or null when it can. */
export function uploadSizeProblem(name: string, sizeBytes: number, maxBytes: number): string | null {
  if (sizeBytes === 0) return `“${name}” is empty; choose a CSV file with a header row and one reading a row.`;
  if (sizeBytes <= maxBytes) return null;
  return `“${name}” is ${bytesFormat(sizeBytes)}; this tool reads files up to ${bytesFormat(maxBytes)}. Send a shorter record or a lower sample rate.`;
}
