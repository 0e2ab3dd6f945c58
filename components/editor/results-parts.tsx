'use client';

import { formatNumber } from '@/blocks/live-value/format';
import { INTERVAL_LABEL, type IntervalMethod } from '@/blocks/shared/settings';
import type { EngineResponse } from '@/lib/resampling';

/** θ̂, SE, bias and each interval of one engine response, in a small table. */
export function ResultTable({ r, label }: { r: EngineResponse; label?: string }) {
  const se = r.se;
  const rows: [string, string][] = [
    ['Estimate θ̂', formatNumber(r.estimate, se)],
    ['Standard error', se === null ? '—' : `${formatNumber(se, se)}${r.seMonteCarloError !== null ? ` (Monte Carlo error ${formatNumber(r.seMonteCarloError, r.seMonteCarloError)})` : ''}`],
    ['Bias', r.bias === null ? '—' : formatNumber(r.bias, se)],
  ];
  if (r.exact) rows.push([`Exact SE (${r.exact.method})`, formatNumber(r.exact.se, r.exact.se)]);
  for (const [m, iv] of Object.entries(r.intervals) as [IntervalMethod, NonNullable<EngineResponse['intervals'][IntervalMethod]>][]) {
    rows.push([`${INTERVAL_LABEL[m]} ${Math.round(iv.level * 1000) / 10}% interval`, iv.lower === null || iv.upper === null ? 'not available' : `${formatNumber(iv.lower, se)} to ${formatNumber(iv.upper, se)}`]);
  }
  return (
    <table className="w-full text-sm" aria-label={label ?? 'Results'}>
      <tbody>
        {rows.map(([k, v]) => (
          <tr key={k} className="border-b border-paper-deep last:border-0">
            <th scope="row" className="py-1 pr-4 text-left font-normal text-ink-soft">
              {k}
            </th>
            <td className="tabular py-1 text-right font-mono text-ink" data-output={k}>
              {v}
            </td>
          </tr>
        ))}
      </tbody>
    </table>
  );
}

/** The engine's warnings in plain words, and its advice on B. Always shown, never folded away. */
export function Cautions({ r, n, dropped }: { r: EngineResponse; n?: number; dropped?: number }) {
  const items = r.warnings.map((w) => ({ key: w.code, text: w.message }));
  if (dropped) items.push({ key: 'dropped', text: `${dropped} row${dropped === 1 ? ' was' : 's were'} left out because a needed value was empty; ${n} used.` });
  return (
    <div className="mt-3 space-y-2 text-sm">
      <div role="note" aria-label="Warnings" className={`rounded border px-3 py-2 ${items.length ? 'border-amber/40 bg-amber-wash/60' : 'border-paper-edge bg-paper/60'}`}>
        <p className="text-xs font-semibold tracking-wide text-ink-soft uppercase">{items.length ? 'Read before use' : 'Diagnostics'}</p>
        {items.length ? (
          <ul className="mt-1 list-disc space-y-1 pl-5">
            {items.map((w) => (
              <li key={w.key}>{w.text}</li>
            ))}
          </ul>
        ) : (
          <p className="mt-1 text-ink-soft">The diagnostics found nothing to warn about for this sample and statistic.</p>
        )}
      </div>
      {r.advice?.message && <p className="text-ink-soft">{r.advice.message}</p>}
    </div>
  );
}
