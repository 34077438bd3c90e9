/**
 * Errors across the worker boundary: structured clone keeps an Error's message but not its class, so a worker
 * sends the class name and fields, and the request's thread raises the same AppError again (400 stays 400).
 */
import { AppError, ConflictError, InputError, NotFoundError, PayloadTooLargeError, type FieldErrors } from '../errors';

export interface WorkErrorData {
  name: string;
  message: string;
  fields?: FieldErrors;
}

/** The AppErrors a task may throw, by class name. */
const APP_ERRORS = { InputError, NotFoundError, ConflictError, PayloadTooLargeError } as const;

/** What a worker sends for a thrown value. */
export function workErrorData(err: unknown): WorkErrorData {
  if (err instanceof AppError)
    return { name: err.name, message: err.message, ...(err.fields ? { fields: err.fields } : {}) };
  if (err instanceof Error) return { name: err.name, message: err.stack ?? err.message };
  return { name: 'Error', message: String(err) };
}

/** The error to throw on the request's thread: the same AppError, an AbortError, or a plain Error (a 500). */
export function workErrorRaise(data: WorkErrorData): Error {
  const AppErrorClass = APP_ERRORS[data.name as keyof typeof APP_ERRORS];
  if (AppErrorClass) return new AppErrorClass(data.message, data.fields);
  if (data.name === 'AbortError') return new DOMException(data.message, 'AbortError');
  return new Error(`A worker thread failed: ${data.message}`);
}
