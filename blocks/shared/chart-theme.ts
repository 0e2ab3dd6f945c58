import type { Config } from 'vega-lite';

/** Margin's chart look: paper background, graphite axes, river blue data, oxide marks for θ̂. */
export const COLORS = { ink: '#23272b', soft: '#4a5157', faint: '#7b8288', river: '#2f5d73', riverSoft: '#5b8aa0', riverWash: '#dde9ee', oxide: '#a8452a', amber: '#9a6a12', paper: '#f6f2ea' };

export const CHART_CONFIG: Config = {
  background: '#ffffff',
  font: 'IBM Plex Sans, system-ui, sans-serif',
  view: { stroke: null },
  axis: { labelColor: COLORS.soft, titleColor: COLORS.ink, gridColor: '#ece5d8', domainColor: COLORS.faint, tickColor: COLORS.faint, titleFontWeight: 500 },
  legend: { labelColor: COLORS.soft, titleColor: COLORS.ink },
  title: { color: COLORS.ink, fontWeight: 500, anchor: 'start' },
};

/** Finite numbers only (replicates can hold null where the statistic was undefined). */
export function finite(xs: readonly (number | null)[] | null | undefined): number[] {
  const out: number[] = [];
  for (const x of xs ?? []) if (typeof x === 'number' && Number.isFinite(x)) out.push(x);
  return out;
}
