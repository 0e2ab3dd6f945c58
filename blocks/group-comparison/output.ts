import type { EngineResponse } from '@/lib/resampling';
import type { DatasetInfo } from '../shared/output';

export interface GroupSummary {
  level: string;
  n: number;
  response: EngineResponse;
  /** The group's values, for the side-by-side strip plot (capped: see compute.ts). */
  values: number[];
}

export interface GroupComparisonOutput {
  difference: EngineResponse;
  groups: [GroupSummary, GroupSummary];
  n: number;
  dropped: number;
  dataset: DatasetInfo;
}
