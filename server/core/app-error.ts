import { ERROR_STATUS, type ErrorCode, type FieldIssue } from '#shared/errors.ts';

/** An error with a stable code that the error middleware turns into a JSON answer. */
export class AppError extends Error {
  readonly code: ErrorCode;
  readonly status: number;
  readonly details: unknown;
  readonly headers: Record<string, string>;

  constructor(code: ErrorCode, message: string, details?: unknown, headers: Record<string, string> = {}) {
    super(message);
    this.name = 'AppError';
    this.code = code;
    this.status = ERROR_STATUS[code];
    this.details = details;
    this.headers = headers;
  }
}

export const notFound = (what = 'That record') => new AppError('not_found', `${what} was not found.`);
export const forbidden = (message = 'Your role does not allow this.') => new AppError('forbidden', message);
export const unauthenticated = () => new AppError('unauthenticated', 'Sign in first.');
export const validationFailed = (details: FieldIssue[]) =>
  new AppError('validation_failed', 'Some fields are not valid.', details);
