/** Thrown for a permutation test that cannot be run; `code` says why. */
export class PermutationError extends Error {
  readonly code: 'empty-group' | 'non-finite' | 'bad-B' | 'non-finite-statistic' | 'bad-alternative';
  constructor(code: PermutationError['code'], message: string) {
    super(message);
    this.name = 'PermutationError';
    this.code = code;
  }
}
