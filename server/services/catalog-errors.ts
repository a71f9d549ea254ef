import { AppError } from '../core/app-error.ts';

/** A 409 that says which field clashes, so a form can put the message beside it. */
export function duplicate(path: string, message: string): AppError {
  return new AppError('conflict', message, [{ path, message }]);
}
