import type { EngineResponse } from '@/lib/resampling';
import type { IntervalMethod } from './settings';
import { INTERVAL_LABEL } from './settings';
import type { LiveNumber } from './types';

/** Which dataset version a result was computed from (shown beside every result). */
export interface DatasetInfo {
  datasetId: number;
  versionId: number;
  version: number;
  name: string;
  sha256: string;
}

/** The stored result of one engine request over one dataset version. */
export interface EngineOutput {
  response: EngineResponse;
  /** Rows used, and rows left out because a column they need was empty. */
  n: number;
  dropped: number;
  dataset: DatasetInfo;
}

/** Live-value outputs every single-response block offers. */
export function engineOutputs(methods: readonly IntervalMethod[]): { key: string; label: string }[] {
  return [
    { key: 'estimate', label: 'Estimate θ̂' },
    { key: 'se', label: 'Standard error' },
    { key: 'bias', label: 'Bias' },
    ...methods.map((m) => ({ key: `interval:${m}`, label: `${INTERVAL_LABEL[m]} interval` })),
    ...methods.flatMap((m) => [
      { key: `lower:${m}`, label: `${INTERVAL_LABEL[m]} lower end` },
      { key: `upper:${m}`, label: `${INTERVAL_LABEL[m]} upper end` },
    ]),
    { key: 'mc-error', label: 'Monte Carlo error of the SE' },
  ];
}

/** Picks one output of an engine response for a Live value. */
export function pickEngine(r: EngineResponse, key: string): LiveNumber | null {
  const se = r.se;
  const num = (value: number | null, s: number | null): LiveNumber | null => (value === null ? null : { kind: 'number', value, se: s });
  if (key === 'estimate') return num(r.estimate, se);
  if (key === 'se') return num(r.se, r.se);
  if (key === 'bias') return num(r.bias, se);
  if (key === 'mc-error') return num(r.seMonteCarloError, r.seMonteCarloError);
  const [part, method] = key.split(':');
  const iv = method ? r.intervals[method as IntervalMethod] : undefined;
  if (!iv) return null;
  if (part === 'interval') return iv.lower === null || iv.upper === null ? null : { kind: 'interval', lower: iv.lower, upper: iv.upper, se, label: INTERVAL_LABEL[method as IntervalMethod] };
  if (part === 'lower') return num(iv.lower, se);
  if (part === 'upper') return num(iv.upper, se);
  return null;
}
