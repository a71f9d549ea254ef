import type { FieldValues, Path, UseFormSetError } from 'react-hook-form';
import type { FieldIssue } from '#shared/errors.ts';
import { isApiError } from './api-client.ts';

/**
 * The field issues of a refused write (409 conflict or 422 validation_failed), each path as in the
 * body ('name', 'emittingAreaCm.width': the server's leading 'body.' is dropped).
 */
export function serverFieldIssues(error: unknown): FieldIssue[] {
  if (!isApiError(error) || (error.code !== 'conflict' && error.code !== 'validation_failed')) return [];
  if (!Array.isArray(error.details)) return [];
  return error.details.flatMap((d): FieldIssue[] => {
    if (!d || typeof d !== 'object') return [];
    const { path, message } = d as { path?: unknown; message?: unknown };
    if (typeof message !== 'string') return [];
    const joined = Array.isArray(path) ? path.join('.') : typeof path === 'string' ? path : '';
    return [{ path: joined.replace(/^body\./, ''), message }];
  });
}

/**
 * Puts the server's field issues on the form through `place` (which answers false for a path it
 * has no field for). True when every issue found its field, so no general message is needed.
 */
export function placeServerIssues(error: unknown, place: (path: string, message: string, first: boolean) => boolean): boolean {
  const issues = serverFieldIssues(error);
  if (issues.length === 0) return false;
  let all = true;
  issues.forEach((issue, i) => {
    if (!place(issue.path, issue.message, i === 0)) all = false;
  });
  return all;
}

/**
 * The react-hook-form side of placeServerIssues: `isField` says which paths are fields of the
 * form, `toField` turns a body path into a field name ('price.amountMinor' → 'price.amount').
 * The first issue's field takes the focus.
 */
export function setServerErrors<V extends FieldValues>(
  error: unknown,
  setError: UseFormSetError<V>,
  isField: (field: string) => boolean,
  toField: (bodyPath: string) => string = (p) => p,
): boolean {
  return placeServerIssues(error, (path, message, first) => {
    const field = toField(path);
    if (!isField(field)) return false;
    setError(field as Path<V>, { type: 'server', message }, { shouldFocus: first });
    return true;
  });
}
