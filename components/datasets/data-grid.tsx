'use client';

import { useQueries } from '@tanstack/react-query';
import { useCallback, useMemo, useRef, useState } from 'react';
import type { ColumnType } from '@/db/tables/datasets';
import { TypeBadge } from './type-badge';

type Cell = number | string | null;

const ROW_HEIGHT = 28;
const VIEW_HEIGHT = 480;
const PAGE = 200;
const OVERSCAN = 6;
// Browsers cap an element's height (Chrome near 33,554,428 px, Firefox lower); past this the
// scroll range is scaled, so a million rows still scroll from top to bottom.
const MAX_SCROLL_PX = 8_000_000;

interface Props {
  labId: number;
  datasetId: number;
  version: number;
  rowCount: number;
  columns: { name: string; type: ColumnType }[];
}

/**
 * A windowed table: only the ~25 rows in view (plus a few either side) are in the page, and
 * rows arrive from the rows route in pages of 200 through react-query, so scrolling through
 * 1,000,000 rows costs what scrolling through 30 does.
 */
export function DataGrid({ labId, datasetId, version, rowCount, columns }: Props) {
  const scroller = useRef<HTMLDivElement>(null);
  const [scrollTop, setScrollTop] = useState(0);
  const [jump, setJump] = useState('');

  const natural = rowCount * ROW_HEIGHT;
  const scaled = natural > MAX_SCROLL_PX;
  const height = scaled ? MAX_SCROLL_PX : natural;
  const visible = Math.ceil(VIEW_HEIGHT / ROW_HEIGHT);
  // Rows that fit whole in the view: the last start shows the last row entirely.
  const fit = Math.floor(VIEW_HEIGHT / ROW_HEIGHT);
  const maxStart = Math.max(0, rowCount - fit);

  const start = scaled ? Math.min(maxStart, Math.floor((scrollTop / Math.max(1, height - VIEW_HEIGHT)) * maxStart)) : Math.floor(scrollTop / ROW_HEIGHT);
  const from = Math.max(0, start - OVERSCAN);
  const to = Math.min(rowCount, start + visible + OVERSCAN);
  const top = scaled ? scrollTop - (start - from) * ROW_HEIGHT : from * ROW_HEIGHT;

  const pages = useMemo(() => {
    const out: number[] = [];
    for (let p = Math.floor(from / PAGE); p <= Math.floor(Math.max(from, to - 1) / PAGE); p++) out.push(p);
    return out;
  }, [from, to]);

  const results = useQueries({
    queries: pages.map((p) => ({
      queryKey: ['dataset-rows', labId, datasetId, version, p],
      // A version never changes, so a page fetched once is good for the whole visit.
      staleTime: Infinity,
      queryFn: async ({ signal }: { signal: AbortSignal }) => {
        const res = await fetch(`/api/labs/${labId}/datasets/${datasetId}/versions/${version}/rows?offset=${p * PAGE}&limit=${PAGE}`, { signal });
        if (!res.ok) throw new Error((await res.json().catch(() => null))?.error?.message ?? `rows could not be loaded (${res.status})`);
        return (await res.json()).rows as Cell[][];
      },
    })),
  });

  const rowAt = (i: number): Cell[] | undefined => {
    const k = pages.indexOf(Math.floor(i / PAGE));
    return k >= 0 ? results[k]?.data?.[i % PAGE] : undefined;
  };
  const failed = results.find((r) => r.error)?.error as Error | undefined;

  const goTo = useCallback(
    (row: number) => {
      const el = scroller.current;
      if (!el) return;
      const i = Math.min(Math.max(0, row - 1), maxStart);
      el.scrollTop = scaled ? (i / Math.max(1, maxStart)) * (height - VIEW_HEIGHT) : i * ROW_HEIGHT;
    },
    [height, maxStart, scaled],
  );

  const template = `5.5rem repeat(${columns.length}, minmax(8rem, 1fr))`;
  return (
    <div className="rounded-lg border border-paper-edge bg-white">
      <div className="flex items-center justify-between gap-3 border-b border-paper-edge px-3 py-2 text-sm">
        <p className="text-ink-soft tabular" aria-live="polite">
          Rows {rowCount === 0 ? 0 : (start + 1).toLocaleString('en')}–{Math.min(rowCount, start + fit).toLocaleString('en')} of {rowCount.toLocaleString('en')}
        </p>
        <form
          className="flex items-center gap-2"
          onSubmit={(e) => {
            e.preventDefault();
            const n = Number(jump.replace(/[,\s]/g, ''));
            if (Number.isInteger(n) && n >= 1) goTo(n);
          }}
        >
          <label htmlFor="grid-jump" className="text-ink-faint">
            Go to row
          </label>
          <input id="grid-jump" value={jump} onChange={(e) => setJump(e.target.value)} inputMode="numeric" className="w-28 rounded border border-paper-edge px-2 py-1 text-right tabular" />
        </form>
      </div>
      <div role="table" aria-label="Dataset rows" aria-rowcount={rowCount + 1} aria-colcount={columns.length + 1} className="text-sm">
        <div role="rowgroup" className="border-b border-paper-edge bg-paper-deep/50">
          <div role="row" aria-rowindex={1} className="grid" style={{ gridTemplateColumns: template }}>
            <div role="columnheader" className="px-3 py-2 text-right text-xs text-ink-faint">
              row
            </div>
            {columns.map((c) => (
              <div key={c.name} role="columnheader" className={`flex items-center gap-2 px-3 py-2 font-medium ${c.type === 'number' ? 'justify-end' : ''}`}>
                <span className="truncate" title={c.name}>
                  {c.name}
                </span>
                <TypeBadge type={c.type} />
              </div>
            ))}
          </div>
        </div>
        <div
          ref={scroller}
          role="rowgroup"
          tabIndex={0}
          aria-label="Scrollable rows"
          onScroll={(e) => setScrollTop(e.currentTarget.scrollTop)}
          className="relative overflow-auto outline-none"
          style={{ height: Math.min(VIEW_HEIGHT, Math.max(natural, ROW_HEIGHT)) }}
        >
          <div style={{ height }} />
          <div className="absolute inset-x-0" style={{ top }}>
            {Array.from({ length: to - from }, (_, k) => {
              const i = from + k;
              const row = rowAt(i);
              return (
                <div key={i} role="row" aria-rowindex={i + 2} className={`grid border-b border-paper-edge/50 ${i % 2 ? 'bg-paper/40' : ''}`} style={{ gridTemplateColumns: template, height: ROW_HEIGHT }}>
                  <div role="cell" className="px-3 text-right font-mono text-xs leading-7 text-ink-faint tabular">
                    {(i + 1).toLocaleString('en')}
                  </div>
                  {columns.map((c, j) => {
                    const v = row?.[j];
                    return (
                      <div key={j} role="cell" className={`truncate px-3 leading-7 ${c.type === 'number' ? 'text-right font-mono text-xs tabular' : ''}`}>
                        {row === undefined ? <span className="text-ink-faint/50">·</span> : v === null ? <span className="text-ink-faint" title="missing">—</span> : String(v)}
                      </div>
                    );
                  })}
                </div>
              );
            })}
          </div>
        </div>
      </div>
      {failed && <p className="border-t border-paper-edge px-3 py-2 text-sm text-oxide">{failed.message}</p>}
    </div>
  );
}
