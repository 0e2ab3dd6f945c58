import type { EngineRequest } from '../contract/schema';
import type { SchemeDefinition, PreparedScheme } from '../schemes/types';
import type { PreparedStatistic, StatisticData, StatisticDefinition } from '../statistics/types';

/** A validated request turned into prepared parts, ready to draw replicates. */
export interface Problem {
  request: EngineRequest;
  statisticDef: StatisticDefinition<{ name: string }>;
  schemeDef: SchemeDefinition<{ name: string }>;
  statistic: PreparedStatistic;
  scheme: PreparedScheme;
  data: StatisticData;
  n: number;
  /** Original row of each unit. */
  rows: Int32Array;
  /** Rows left out for missing / non-finite values, and the columns they were missing in. */
  dropped: number;
  droppedColumns: string[];
  /** Strata for the jackknife: the scheme's, else the statistic's groups, else one. */
  strata: readonly Int32Array[];
  /** Sizes of the two groups (two-group statistics). */
  groupSizes: [number, number] | null;
  /** The two levels of a two-group statistic, in group order. */
  groupLevels: readonly [string, string] | null;
  /** Request column of a numeric role (`x` → the column's name). */
  columnOf(role: string): string;
  /** Every column the statistic and the scheme read. */
  usedColumns: string[];
  description: string;
}
