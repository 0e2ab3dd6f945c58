import { AppError } from '../errors';
import { idParam } from './schema';

/** A route's `[labId]`-style segment as a positive integer; anything else is a lab that does not exist. */
export function idFrom(value: string | undefined, subject: 'lab' | 'member' | 'invitation'): number {
  const r = idParam.safeParse(value);
  if (!r.success) throw new AppError(`not_found:${subject}`, subject === 'lab' ? 'No such lab, or you are not a member of it.' : `No such ${subject}.`);
  return r.data;
}
