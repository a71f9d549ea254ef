/** The provider's error answers: `{ error: { type, message, code?, param? } }` with its status. */
export class FakeApiError extends Error {
  constructor(
    readonly status: number,
    readonly type: 'invalid_request_error' | 'idempotency_error' | 'api_error' | 'card_error',
    message: string,
    readonly code?: string,
    readonly param?: string,
  ) {
    super(message);
  }

  body() {
    return { error: { type: this.type, message: this.message, ...(this.code ? { code: this.code } : {}), ...(this.param ? { param: this.param } : {}) } };
  }
}

export const missing = (param: string) => new FakeApiError(400, 'invalid_request_error', `Missing required param: ${param}.`, 'parameter_missing', param);

export const invalid = (param: string, message: string, code = 'parameter_invalid') =>
  new FakeApiError(400, 'invalid_request_error', `Invalid ${param}: ${message}`, code, param);

export const noSuch = (object: string, id: string, param: string) =>
  new FakeApiError(404, 'invalid_request_error', `No such ${object}: '${id}'`, 'resource_missing', param);

/** A whole number of minor units as the form encoding carries it ("1234"). */
export function integerParam(value: unknown, param: string, min: number): number {
  if (typeof value !== 'string' || !/^-?\d+$/.test(value)) throw invalid(param, 'expected an integer.', 'parameter_invalid_integer');
  const n = Number(value);
  if (!Number.isSafeInteger(n) || n < min) throw invalid(param, `must be at least ${min}.`, 'parameter_invalid_integer');
  return n;
}

/** `metadata[key]=value` pairs as strings (the provider keeps metadata as strings only). */
export function metadataParam(value: unknown, param: string): Record<string, string> {
  if (value === undefined || value === '') return {};
  if (typeof value !== 'object' || value === null || Array.isArray(value)) throw invalid(param, 'expected a hash of keys and values.');
  const out: Record<string, string> = {};
  for (const [k, v] of Object.entries(value)) {
    if (typeof v !== 'string') throw invalid(`${param}[${k}]`, 'expected a string.');
    out[k] = v;
  }
  return out;
}

export function optionalString(value: unknown, param: string): string | null {
  if (value === undefined || value === '') return null;
  if (typeof value !== 'string') throw invalid(param, 'expected a string.');
  return value;
}
