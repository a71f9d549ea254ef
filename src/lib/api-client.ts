import type { z } from 'zod';
import { errorBodySchema, type FieldIssue } from '#shared/errors.ts';

/**
 * The client's one door to the API: same-origin JSON with the session cookie.
 * Every failure becomes an ApiError carrying the server's stable `code` (or one of ours for
 * failures that never reached the server), the HTTP `status` (0 when there was no answer)
 * and `details` as sent.
 */
export class ApiError extends Error {
  readonly code: string;
  readonly status: number;
  readonly details: unknown;
  /** From details.retryAfterSeconds or the Retry-After header, when the server gives one. */
  readonly retryAfterSeconds: number | undefined;

  constructor(opts: {
    code: string;
    status: number;
    message: string;
    details?: unknown;
    retryAfterSeconds?: number;
  }) {
    super(opts.message);
    this.name = 'ApiError';
    this.code = opts.code;
    this.status = opts.status;
    this.details = opts.details;
    this.retryAfterSeconds = opts.retryAfterSeconds;
  }

  /** True when the server could not be reached or answered without being itself. */
  get isUnreachable(): boolean {
    return this.code === 'network_error' || this.code === 'server_unavailable';
  }

  /** For validation_failed: the offending fields, `path` reduced to the field name. */
  get fieldIssues(): FieldIssue[] {
    if (!Array.isArray(this.details)) return [];
    return this.details.flatMap((d): FieldIssue[] => {
      if (!d || typeof d !== 'object') return [];
      const { path, message } = d as { path?: unknown; message?: unknown };
      if (typeof message !== 'string') return [];
      const p = Array.isArray(path) ? path.join('.') : typeof path === 'string' ? path : '';
      return [{ path: p.split('.').pop() ?? '', message }];
    });
  }
}

export function isApiError(error: unknown): error is ApiError {
  return error instanceof ApiError;
}

/** Codes of our own, for failures without a server error body. */
export const CLIENT_ERROR_CODES = {
  network: 'network_error',
  unavailable: 'server_unavailable',
  badResponse: 'bad_response',
} as const;

type Method = 'GET' | 'POST' | 'PATCH' | 'PUT' | 'DELETE';

interface RequestOptions<T> {
  method?: Method;
  body?: unknown;
  /** Parses the success body: the shared zod schema is the contract. Omit for 204. */
  schema?: z.ZodType<T>;
  signal?: AbortSignal;
}

function retryAfterFrom(details: unknown, header: string | null): number | undefined {
  if (details && typeof details === 'object' && 'retryAfterSeconds' in details) {
    const v = Number((details as { retryAfterSeconds: unknown }).retryAfterSeconds);
    if (Number.isFinite(v) && v >= 0) return v;
  }
  if (header) {
    const v = Number(header);
    if (Number.isFinite(v) && v >= 0) return v;
  }
  return undefined;
}

export async function apiRequest<T = void>(path: string, options: RequestOptions<T> = {}): Promise<T> {
  const { method = 'GET', body, schema, signal } = options;
  const headers: Record<string, string> = { Accept: 'application/json' };
  if (body !== undefined) headers['Content-Type'] = 'application/json';

  let response: Response;
  try {
    response = await fetch(path, {
      method,
      headers,
      body: body === undefined ? undefined : JSON.stringify(body),
      credentials: 'same-origin',
      // The app keeps its own cache (TanStack Query): the browser revalidates every answer (a cheap
      // 304 when nothing changed), so a correction shows at once; max-age is for shared caches.
      cache: 'no-cache',
      signal,
    });
  } catch (cause) {
    if (cause instanceof DOMException && cause.name === 'AbortError') throw cause;
    throw new ApiError({
      code: CLIENT_ERROR_CODES.network,
      status: 0,
      message: "Can't reach the server. Check your connection and try again.",
    });
  }

  const text = await response.text();
  let json: unknown = undefined;
  if (text) {
    try {
      json = JSON.parse(text);
    } catch {
      json = undefined;
    }
  }

  if (!response.ok) {
    const parsed = errorBodySchema.safeParse(json);
    if (parsed.success) {
      const { code, message, details } = parsed.data.error;
      throw new ApiError({
        code,
        status: response.status,
        message,
        details,
        retryAfterSeconds: retryAfterFrom(details, response.headers.get('Retry-After')),
      });
    }
    // No error body of ours: a proxy or gateway answered, or the server is down.
    const unavailable = response.status >= 500;
    throw new ApiError({
      code: unavailable ? CLIENT_ERROR_CODES.unavailable : `http_${response.status}`,
      status: response.status,
      message: unavailable
        ? "Can't reach the server. It may be starting or down; try again in a moment."
        : `The server answered ${response.status}.`,
    });
  }

  if (!schema) return undefined as T;
  const parsed = schema.safeParse(json);
  if (!parsed.success) {
    throw new ApiError({
      code: CLIENT_ERROR_CODES.badResponse,
      status: response.status,
      message: 'The server sent an answer this page does not understand.',
      details: parsed.error.issues,
    });
  }
  return parsed.data;
}

export const api = {
  get: <T>(path: string, schema: z.ZodType<T>, signal?: AbortSignal) =>
    apiRequest<T>(path, { schema, signal }),
  post: <T = void>(path: string, body?: unknown, schema?: z.ZodType<T>) =>
    apiRequest<T>(path, { method: 'POST', body, schema }),
  patch: <T = void>(path: string, body?: unknown, schema?: z.ZodType<T>) =>
    apiRequest<T>(path, { method: 'PATCH', body, schema }),
  put: <T = void>(path: string, body?: unknown, schema?: z.ZodType<T>) =>
    apiRequest<T>(path, { method: 'PUT', body, schema }),
};
