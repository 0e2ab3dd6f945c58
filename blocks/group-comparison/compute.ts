import 'server-only';
import type { EngineRequestInput } from '@/lib/resampling';
import { AppError } from '@/lib/errors';
import { extractColumns, type LoadedVersion } from '../shared/columns';
import { datasetInfo, type ComputeDefinition } from '../shared/compute';
import type { GroupComparisonOutput } from './output';
import { groupComparisonSettings, type GroupComparisonSettings } from './schema';

// The strip plot shows each group's values; beyond this many per group it would be a blur
// and the stored result would grow with the data, so a regular subsample is kept.
const MAX_POINTS = 2000;

function thin(values: number[]): number[] {
  if (values.length <= MAX_POINTS) return values;
  const step = values.length / MAX_POINTS;
  return Array.from({ length: MAX_POINTS }, (_, i) => values[Math.floor(i * step)]);
}

/**
 * Three engine requests over the rows of the two chosen groups:
 *  1. the difference statistic(first) − statistic(second), resampled within each group
 *     (the two-sample bootstrap: each group is resampled separately, Efron & Tibshirani
 *     1993, An Introduction to the Bootstrap, §8.3) — the engine's stratified scheme;
 *  2–3. each group's statistic with its percentile interval, ordinary bootstrap.
 */
export function groupComparisonPlan(s: GroupComparisonSettings, version: LoadedVersion) {
  const x = extractColumns(
    version,
    [
      { name: s.value, numeric: true, field: 'value' },
      { name: s.group, numeric: false, field: 'group' },
    ],
    null,
  );
  const value: number[] = [];
  const group: string[] = [];
  const per: [number[], number[]] = [[], []];
  for (let i = 0; i < x.n; i++) {
    const g = String(x.data[s.group][i]);
    const k = g === s.levels[0] ? 0 : g === s.levels[1] ? 1 : null;
    if (k === null) continue;
    value.push(x.data[s.value][i] as number);
    group.push(g);
    per[k].push(x.data[s.value][i] as number);
  }
  s.levels.forEach((level, k) => {
    if (per[k].length === 0) throw new AppError('invalid:block', `No rows have ${s.group} = "${level}" with a value in ${s.value}.`, `levels.${k}`);
  });
  const intervals = { level: s.level, methods: [s.method] };
  const requests: EngineRequestInput[] = [
    {
      data: { value, group },
      statistic: { name: s.statistic === 'mean' ? 'mean-difference' : 'median-difference', column: 'value', group: 'group', levels: s.levels },
      scheme: { name: 'stratified', by: 'group' },
      B: s.B,
      seed: s.seed,
      intervals,
      include: [],
    },
    ...per.map((values, k) => ({
      data: { value: values },
      statistic: { name: s.statistic, column: 'value' },
      scheme: { name: 'ordinary' as const },
      B: s.B,
      seed: `${s.seed}/${s.levels[k]}`,
      intervals: { level: s.level, methods: ['percentile' as const] },
      include: [],
    })),
  ] as EngineRequestInput[];
  return { requests, per, n: value.length, dropped: x.dropped };
}

export const groupComparisonCompute: ComputeDefinition<GroupComparisonSettings, GroupComparisonOutput> = {
  kind: 'group-comparison',
  settings: groupComparisonSettings,
  dataset: (s) => s.dataset,
  plan(s, version) {
    const { requests, per, n, dropped } = groupComparisonPlan(s, version);
    return {
      requests,
      finish: ([difference, a, b]) => ({
        difference,
        groups: [
          { level: s.levels[0], n: per[0].length, response: a, values: thin(per[0]) },
          { level: s.levels[1], n: per[1].length, response: b, values: thin(per[1]) },
        ],
        n,
        dropped,
        dataset: datasetInfo(version),
      }),
    };
  },
};
