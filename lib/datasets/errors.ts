import { AppError } from '@/lib/errors';

/**
 * A problem with the uploaded table, naming the line (1-based, as an editor counts lines).
 * The path reads `line.N` so a client can point at the line in its preview.
 */
export function lineError(line: number, message: string): AppError {
  return new AppError('invalid:dataset', message, `line.${line}`);
}

/** A problem with the table as a whole (empty, no numeric column ...). */
export function tableError(message: string, path = 'file'): AppError {
  return new AppError('invalid:dataset', message, path);
}
