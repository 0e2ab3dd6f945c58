import type { Diagnostic } from './types';

/** Intervals that could not be computed, and replicates the studentized interval had to leave out. */
export const intervalNotes: Diagnostic = ({ unavailable, studentizedDropped, B, jackknifeUndefined }) => {
  const parts = unavailable.map((u) => `${u.method}: ${u.reason}`);
  if (studentizedDropped) parts.push(`studentized: ${studentizedDropped} of ${B} replicates had an inner SE of 0 or undefined and were left out`);
  if (jackknifeUndefined) parts.push('the jackknife is undefined for these data (a leave-one-out value is undefined)');
  if (!parts.length) return null;
  return { code: 'interval-unavailable', message: `${parts.join('; ')}.` };
};
