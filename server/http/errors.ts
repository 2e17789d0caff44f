import type { ErrorCode } from '../../shared/schemas/common.js';

export class ApiError extends Error {
  constructor(
    readonly status: number,
    readonly code: ErrorCode,
    message: string,
    readonly fields?: Record<string, string>,
    readonly retryAfterSeconds?: number,
  ) {
    super(message);
  }
}

export class ValidationError extends ApiError {
  constructor(fields: Record<string, string>, message = 'Some fields need attention.') {
    super(400, 'validation', message, fields);
  }
}

export class UnauthenticatedError extends ApiError {
  constructor(message = 'Sign in to continue.') {
    super(401, 'unauthenticated', message);
  }
}

export class ForbiddenError extends ApiError {
  constructor(message = 'Your role does not allow this.') {
    super(403, 'forbidden', message);
  }
}

export class NotFoundError extends ApiError {
  constructor(what = 'The record') {
    super(404, 'not_found', `${what} was not found.`);
  }
}

export class ConflictError extends ApiError {
  constructor(message: string, fields?: Record<string, string>) {
    super(409, 'conflict', message, fields);
  }
}

/** A save that carried an older `version` than the record's: someone else changed it first. */
export class StaleVersionError extends ConflictError {
  constructor(subject: string, current: number, pronoun = 'it') {
    super(`Someone else changed ${subject} since you opened ${pronoun}. Reload to see their changes.`, { version: `current version is ${current}` });
  }
}

export class UnprocessableError extends ApiError {
  constructor(message: string, fields?: Record<string, string>) {
    super(422, 'unprocessable', message, fields);
  }
}

/** Text with a control or text-direction character: 422 naming each field (the other fields' problems too). */
export class InvalidCharactersError extends ApiError {
  constructor(message: string, fields: Record<string, string>) {
    super(422, 'invalid_characters', message, fields);
  }
}

export class RateLimitedError extends ApiError {
  constructor(message: string, retryAfterSeconds: number) {
    super(429, 'rate_limited', message, undefined, retryAfterSeconds);
  }
}

/** A story document with a node or mark the editor does not make, or that cannot be rendered. */
export class InvalidRichTextError extends ApiError {
  constructor(field: string, message: string) {
    super(422, 'invalid_rich_text', message, { [field]: message });
  }
}

/** A service we depend on (the payment provider) cannot be reached; nothing was recorded. */
export class ServiceUnavailableError extends ApiError {
  constructor(message: string) {
    super(503, 'unavailable', message);
  }
}
