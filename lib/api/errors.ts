import { z } from 'zod';

export type ApiErrorCode =
  | 'bad_request'
  | 'unauthenticated'
  | 'forbidden'
  | 'not_found'
  | 'conflict'
  | 'too_large'
  | 'unsupported_media_type'
  | 'unprocessable'
  | 'too_many_requests'
  | 'internal'
  | 'unavailable';

const STATUS: Record<ApiErrorCode, number> = {
  bad_request: 400,
  unauthenticated: 401,
  forbidden: 403,
  not_found: 404,
  conflict: 409,
  too_large: 413,
  unsupported_media_type: 415,
  unprocessable: 422,
  too_many_requests: 429,
  internal: 500,
  unavailable: 503,
};

/** The one error type of Nodewright's server code; translated to JSON by toErrorBody. */
export class ApiError extends Error {
  readonly code: ApiErrorCode;
  readonly fields?: Record<string, string>;
  readonly details?: Record<string, unknown>;
  /** Sent as `Retry-After` (RFC 9110 §10.2.3) with a 429 or 503, and as `retryAfterSeconds` in the body for scripts and the editor. */
  readonly retryAfterSeconds?: number;

  constructor(
    code: ApiErrorCode,
    message: string,
    opts: { fields?: Record<string, string>; details?: Record<string, unknown>; retryAfterSeconds?: number } = {},
  ) {
    super(message);
    this.name = 'ApiError';
    this.code = code;
    this.fields = opts.fields;
    this.details = opts.details;
    this.retryAfterSeconds = opts.retryAfterSeconds;
  }

  get status(): number {
    return STATUS[this.code];
  }
}

export const badRequest = (message: string, fields?: Record<string, string>) =>
  new ApiError('bad_request', message, { fields });
export const unauthenticated = () => new ApiError('unauthenticated', 'Sign in first.');
export const forbidden = (message = 'Your role does not allow this.') => new ApiError('forbidden', message);
export const notFound = (what: string) => new ApiError('not_found', `${what} was not found.`);
export const conflict = (message: string, details?: Record<string, unknown>) =>
  new ApiError('conflict', message, { details });

/** Turns a zod error into field → message (first message per field path). */
export function fieldsFromZod(error: z.ZodError): Record<string, string> {
  const fields: Record<string, string> = {};
  for (const issue of error.issues) {
    const key = issue.path.length > 0 ? issue.path.map(String).join('.') : '_';
    if (!(key in fields)) fields[key] = issue.message;
  }
  return fields;
}

export interface ErrorBody {
  error: string;
  code: ApiErrorCode;
  fields?: Record<string, string>;
  [detail: string]: unknown;
}

/** The JSON error shape (and the headers that go with it). Unknown errors never leak their text to the client. */
export function toErrorBody(err: unknown): { status: number; body: ErrorBody; headers?: Record<string, string> } {
  if (err instanceof ApiError) {
    const retryAfter = err.retryAfterSeconds === undefined ? undefined : Math.max(1, Math.ceil(err.retryAfterSeconds));
    const body: ErrorBody = {
      ...err.details,
      error: err.message,
      code: err.code,
      ...(err.fields ? { fields: err.fields } : {}),
      ...(retryAfter ? { retryAfterSeconds: retryAfter } : {}),
    };
    return { status: err.status, body, headers: retryAfter ? { 'Retry-After': String(retryAfter) } : undefined };
  }
  if (err instanceof z.ZodError) {
    const fields = fieldsFromZod(err);
    return { status: 400, body: { error: describeFields(fields), code: 'bad_request', fields } };
  }
  console.error('[nodewright] unexpected error', err);
  return { status: 500, body: { error: 'Something went wrong on the server; nothing was changed.', code: 'internal' } };
}

export function describeFields(fields: Record<string, string>): string {
  const parts = Object.entries(fields).map(([k, v]) => (k === '_' ? v : `${k}: ${v}`));
  return parts.length > 0 ? `Invalid input — ${parts.join('; ')}` : 'Invalid input';
}
