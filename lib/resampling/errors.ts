/**
 * The engine's one error class. `code` reads `kind:subject` (e.g. `invalid:request`,
 * `unsupported:scheme`, `limit:work`); `path` names the request field at fault in dotted
 * form (`statistic.column`, `data.x[3]`), or '' when no single field is to blame.
 * Every bad input ends here: the engine never returns NaN and never crashes on input.
 */
export class EngineError extends Error {
  readonly code: string;
  readonly path: string;

  constructor(code: string, message: string, path = '') {
    super(message);
    this.name = 'EngineError';
    this.code = code;
    this.path = path;
  }

  toJSON(): { error: { code: string; message: string; path: string } } {
    return { error: { code: this.code, message: this.message, path: this.path } };
  }
}

/** Formats a zod-style path (['data', 'x', 3]) as `data.x[3]`. */
export function formatPath(path: ReadonlyArray<PropertyKey>): string {
  let out = '';
  for (const part of path) {
    if (typeof part === 'number') out += `[${part}]`;
    else out += out === '' ? String(part) : `.${String(part)}`;
  }
  return out;
}
