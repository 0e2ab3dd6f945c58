/**
 * The one error class that leaves the server. Its code reads `kind:subject`
 * (e.g. `forbidden:memo`, `invalid:dataset`); the kind picks the HTTP status.
 */
export type ErrorKind =
  | 'bad_request'
  | 'unauthorized'
  | 'forbidden'
  | 'not_found'
  | 'conflict'
  | 'invalid'
  | 'rate_limited'
  | 'too_large'
  | 'unavailable'
  | 'internal';

const STATUS: Record<ErrorKind, number> = {
  bad_request: 400,
  unauthorized: 401,
  forbidden: 403,
  not_found: 404,
  conflict: 409,
  too_large: 413,
  invalid: 422,
  rate_limited: 429,
  internal: 500,
  unavailable: 503,
};

export class AppError extends Error {
  readonly code: string;
  readonly path: string;
  constructor(code: `${ErrorKind}:${string}`, message: string, path = '') {
    super(message);
    this.name = 'AppError';
    this.code = code;
    this.path = path;
  }

  get kind(): ErrorKind {
    return this.code.split(':')[0] as ErrorKind;
  }

  get status(): number {
    return STATUS[this.kind] ?? 500;
  }

  toJSON() {
    return { error: { code: this.code, message: this.message, path: this.path } };
  }
}

export function statusOf(kind: ErrorKind): number {
  return STATUS[kind];
}
