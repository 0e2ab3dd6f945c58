/**
 * Thrown when a family cannot be fitted to the data. `code` says why; `index` (0-based) is
 * the first value at fault, if one is; `reason` is the words without the position, so a
 * caller can name the value its own way (a request field, a row).
 */
export class FitError extends Error {
  readonly code: 'empty' | 'non-finite' | 'negative' | 'non-positive' | 'non-integer' | 'degenerate' | 'unknown-family';
  readonly index: number | undefined;
  readonly reason: string;
  constructor(code: FitError['code'], reason: string, index?: number) {
    super(index === undefined ? reason : `value ${index + 1} ${reason}`);
    this.name = 'FitError';
    this.code = code;
    this.index = index;
    this.reason = reason;
  }
}
