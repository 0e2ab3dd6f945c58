import type { TopLevelSpec } from 'vega-lite';
import { CHART_CONFIG, COLORS } from '../shared/chart-theme';
import type { GroupComparisonOutput } from './output';

/**
 * Left: each group's values as a strip (ticks), with its statistic and percentile interval.
 * Right: the difference (first − second) with its interval, and a rule at 0 (no difference).
 */
export function groupComparisonChart(o: GroupComparisonOutput, opts: { statistic: string; valueLabel: string }): TopLevelSpec {
  const values = o.groups.flatMap((g) => g.values.map((v) => ({ group: g.level, value: v })));
  const summaries = o.groups.map((g) => {
    const iv = g.response.intervals.percentile;
    return { group: g.level, estimate: g.response.estimate, lower: iv?.lower ?? g.response.estimate, upper: iv?.upper ?? g.response.estimate };
  });
  const method = Object.keys(o.difference.intervals)[0] as keyof typeof o.difference.intervals | undefined;
  const div = method ? o.difference.intervals[method] : undefined;
  const diff = [{ label: `${o.groups[0].level} − ${o.groups[1].level}`, estimate: o.difference.estimate, lower: div?.lower ?? o.difference.estimate, upper: div?.upper ?? o.difference.estimate }];
  const y = { field: 'group', type: 'nominal' as const, title: null, sort: o.groups.map((g) => g.level) };
  return {
    $schema: 'https://vega.github.io/schema/vega-lite/v6.json',
    config: CHART_CONFIG,
    hconcat: [
      {
        width: 320,
        height: 120,
        layer: [
          { data: { values }, mark: { type: 'tick', color: COLORS.riverSoft, opacity: 0.6, thickness: 1.5 }, encoding: { y, x: { field: 'value', type: 'quantitative', title: opts.valueLabel, scale: { zero: false } } } },
          { data: { values: summaries }, mark: { type: 'rule', color: COLORS.ink, strokeWidth: 3, yOffset: 14 }, encoding: { y, x: { field: 'lower', type: 'quantitative' }, x2: { field: 'upper' } } },
          { data: { values: summaries }, mark: { type: 'point', color: COLORS.oxide, filled: true, size: 60, yOffset: 14 }, encoding: { y, x: { field: 'estimate', type: 'quantitative' }, tooltip: [{ field: 'group' }, { field: 'estimate', format: '.4~g', title: opts.statistic }, { field: 'lower', format: '.4~g' }, { field: 'upper', format: '.4~g' }] } },
        ],
      },
      {
        width: 200,
        height: 120,
        layer: [
          { data: { values: [{ zero: 0 }] }, mark: { type: 'rule', color: COLORS.faint, strokeDash: [3, 3] }, encoding: { x: { field: 'zero', type: 'quantitative' } } },
          { data: { values: diff }, mark: { type: 'rule', color: COLORS.river, strokeWidth: 3 }, encoding: { y: { field: 'label', type: 'nominal', title: null }, x: { field: 'lower', type: 'quantitative', title: 'Difference' }, x2: { field: 'upper' } } },
          { data: { values: diff }, mark: { type: 'point', color: COLORS.oxide, filled: true, size: 70 }, encoding: { y: { field: 'label', type: 'nominal' }, x: { field: 'estimate', type: 'quantitative' }, tooltip: [{ field: 'estimate', format: '.4~g' }, { field: 'lower', format: '.4~g' }, { field: 'upper', format: '.4~g' }] } },
        ],
      },
    ],
  } as TopLevelSpec;
}
