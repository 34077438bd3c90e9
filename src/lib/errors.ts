/**
 * Business errors, framework-free. Domain code throws these; src/lib/http/respond.ts maps each to one HTTP
 * status and the JSON error shape `{ error: { code, message, fields? } }`. Messages are written for the
 * teacher or coordinator who will read them: what was received and what would work.
 */

/** Field name (dotted path) → messages for that field. */
export type FieldErrors = Record<string, string[]>;

export abstract class AppError extends Error {
  abstract readonly status: number;
  abstract readonly code: string;
  readonly fields?: FieldErrors;

  constructor(message: string, fields?: FieldErrors) {
    super(message);
    this.name = new.target.name;
    if (fields) this.fields = fields;
  }
}

/** 400: the input cannot be used as given. */
export class InputError extends AppError {
  readonly status = 400;
  readonly code = 'invalid_input';
}

/** 401: the request needs a signed-in account or a class session. */
export class AuthenticationError extends AppError {
  readonly status = 401;
  readonly code = 'not_signed_in';
}

/** 403: signed in, but this role or this account may not do it. */
export class ForbiddenError extends AppError {
  readonly status = 403;
  readonly code = 'forbidden';
}

/** 404: no such thing, or not one the caller may know exists. */
export class NotFoundError extends AppError {
  readonly status = 404;
  readonly code = 'not_found';
}

/** 405: the route exists but does not answer this method; `allowed` lists the ones it does. */
export class MethodNotAllowedError extends AppError {
  readonly status = 405;
  readonly code = 'method_not_allowed';
  constructor(
    message: string,
    readonly allowed: readonly string[],
  ) {
    super(message);
  }
}

/** 409: the request conflicts with the current state (a taken e-mail, an entry already reviewed). */
export class ConflictError extends AppError {
  readonly status = 409;
  readonly code = 'conflict';
}

/** 413: the input is larger than the stated limit. */
export class PayloadTooLargeError extends AppError {
  readonly status = 413;
  readonly code = 'too_large';
}

/** An error the caller may retry after the given number of seconds (answered with Retry-After). */
export abstract class RetryLaterError extends AppError {
  constructor(
    message: string,
    readonly retryAfterSeconds: number,
  ) {
    super(message);
  }
}

/** 429: too many attempts; retry after the given number of seconds. */
export class RateLimitError extends RetryLaterError {
  readonly status = 429;
  readonly code = 'rate_limited';
}

/** 503: the server is busy (its work queue is full); retry after the given number of seconds. */
export class ServiceUnavailableError extends RetryLaterError {
  readonly status = 503;
  readonly code = 'busy';
}
