/** Thrown when a family cannot be fitted to the data; `code` says why, `message` says where. */
export class FitError extends Error {
  readonly code: 'empty' | 'non-finite' | 'negative' | 'non-positive' | 'non-integer' | 'degenerate' | 'unknown-family';
  constructor(code: FitError['code'], message: string) {
    super(message);
    this.name = 'FitError';
    this.code = code;
  }
}
