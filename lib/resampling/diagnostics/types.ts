import type { Warning } from '../contract/response';
import type { IntervalMethod } from '../contract/schema';
import type { Problem } from '../engine/problem';
import type { Moments } from '../math/moments';

/** What the diagnostics look at once the replicates are in. */
export interface DiagnosticContext {
  problem: Problem;
  B: number;
  /** Finite replicates, ascending. */
  sorted: Float64Array;
  nonFinite: number;
  moments: Moments | null;
  methods: IntervalMethod[];
  level: number;
  /** Methods whose end points fell on extreme order statistics. */
  extremeEndpoints: IntervalMethod[];
  /** Methods that could not be computed, with the reason. */
  unavailable: { method: IntervalMethod; reason: string }[];
  robustSe: number | null;
  /** Replicates dropped from the studentized interval (inner SE 0 or undefined). */
  studentizedDropped: number;
  jackknifeUndefined: boolean;
}

export type Diagnostic = (ctx: DiagnosticContext) => Warning | null;
