import type { IntervalMethod } from '../contract/schema';
import { basicInterval } from './basic';
import { bcaInterval } from './bca';
import { normalInterval } from './normal';
import { percentileInterval } from './percentile';
import { studentizedInterval } from './studentized';
import type { IntervalInput, IntervalOutcome } from './types';

/** Every interval method, by its contract name. */
export const INTERVALS: Record<IntervalMethod, (input: IntervalInput) => IntervalOutcome | null> = {
  normal: normalInterval,
  basic: basicInterval,
  percentile: percentileInterval,
  bca: bcaInterval,
  studentized: studentizedInterval,
};
