/** Thrown when a series cannot have a block length chosen for it; `code` says why. */
export class BlockLengthError extends Error {
  readonly code: 'too-short' | 'non-finite' | 'constant';
  constructor(code: BlockLengthError['code'], message: string) {
    super(message);
    this.name = 'BlockLengthError';
    this.code = code;
  }
}
