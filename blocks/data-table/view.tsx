'use client';

import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { NodeViewProps } from '@tiptap/react';
import { useRef, useState } from 'react';
import { api } from '@/components/editor/api';
import { BlockFrame } from '@/components/editor/block-frame';
import { SelectField } from '@/components/editor/fields';
import { useMemoContext } from '@/components/editor/memo-context';
import { useLatestVersion } from '@/components/editor/results-store';
import { VersionPicker } from '@/components/editor/version-picker';
import type { DataTableAttrs } from './schema';

export interface TablePage {
  datasetId: number;
  versionId: number;
  version: number;
  latestVersion: number;
  name: string;
  rowCount: number;
  columns: { name: string; type: string; missing: number }[];
  rows: (number | string | null)[][];
  editable: boolean;
}

const ROW_H = 28;
const VIEW_H = 320;

/**
 * The table is drawn in a window: only the rows in view (plus a margin) are in the page,
 * so a long version scrolls smoothly. A double-click (or Enter) on a cell edits it; the
 * edit is saved as a new version of the dataset.
 */
export function DataTableView(props: NodeViewProps) {
  const { blockId, ...attrs } = props.node.attrs as DataTableAttrs & { blockId: string | null };
  const ctx = useMemoContext();
  const client = useQueryClient();
  const editable = props.editor.isEditable && ctx.canWrite;
  const ref = attrs.dataset;
  const epoch = useLatestVersion(ctx.store, ref?.datasetId);
  const [scroll, setScroll] = useState(0);
  const [editing, setEditing] = useState<{ row: number; col: number; text: string } | null>(null);
  const url = ref ? `/api/labs/${ctx.labId}/memos/${ctx.memoId}/table?datasetId=${ref.datasetId}${ref.versionId ? `&versionId=${ref.versionId}` : ''}` : null;
  const table = useQuery({ queryKey: ['table', url, epoch], enabled: !!url, queryFn: ({ signal }) => api<TablePage>(url!, { signal }), placeholderData: (prev) => prev, staleTime: 30_000 });
  const page = table.data;

  // Edits run one after another (one mutation scope per block), each on the version the
  // previous one made, even before the table has been fetched again.
  const lastSaved = useRef<{ datasetId: number; versionId: number } | null>(null);
  const baseVersion = () => (lastSaved.current && lastSaved.current.datasetId === page!.datasetId && lastSaved.current.versionId > page!.versionId ? lastSaved.current.versionId : page!.versionId);
  const edit = useMutation({
    scope: { id: `table-${blockId}` },
    mutationFn: (e: { row: number; column: string; value: string }) =>
      api<{ versionId: number; version: number }>(`/api/labs/${ctx.labId}/memos/${ctx.memoId}/table`, { method: 'POST', json: { datasetId: page!.datasetId, baseVersionId: baseVersion(), edits: [e] } }),
    onMutate: (e) => {
      // Show the new value at once; the server's new version replaces it when it lands.
      client.setQueryData(['table', url, epoch], (old: TablePage | undefined) => {
        if (!old) return old;
        const rows = old.rows.slice();
        const c = old.columns.findIndex((x) => x.name === e.column);
        rows[e.row] = rows[e.row].slice();
        rows[e.row][c] = old.columns[c].type === 'number' && e.value.trim() !== '' && Number.isFinite(Number(e.value)) ? Number(e.value) : e.value;
        return { ...old, rows };
      });
    },
    onSuccess: (r) => {
      lastSaved.current = { datasetId: page!.datasetId, versionId: r.versionId };
      if (ref && ref.versionId !== null) props.updateAttributes({ dataset: { datasetId: ref.datasetId, versionId: r.versionId } });
      ctx.store.datasetChanged(page!.datasetId, r.versionId);
    },
    onError: () => client.invalidateQueries({ queryKey: ['table', url] }),
  });

  const commit = () => {
    if (!editing || !page) return;
    const column = page.columns[editing.col].name;
    const before = page.rows[editing.row][editing.col];
    setEditing(null);
    if (String(before ?? '') !== editing.text) edit.mutate({ row: editing.row, column, value: editing.text });
  };

  const first = Math.max(0, Math.floor(scroll / ROW_H) - 8);
  const last = Math.min(page?.rows.length ?? 0, Math.ceil((scroll + VIEW_H) / ROW_H) + 8);
  const canEdit = editable && !!page?.editable;

  return (
    <BlockFrame
      type="data-table"
      label="Data table"
      blockId={blockId}
      selected={props.selected}
      reason={ref ? null : 'Choose a dataset.'}
      header={<VersionPicker value={ref} onChange={(dataset) => props.updateAttributes({ dataset })} disabled={!editable} />}
    >
      <div className="flex flex-wrap items-end gap-4">
        <SelectField
          className="min-w-56"
          label="Dataset"
          value={ref ? String(ref.datasetId) : ''}
          options={[{ value: '', label: 'Choose a dataset…' }, ...ctx.datasets.map((d) => ({ value: String(d.id), label: d.name }))]}
          onChange={(v) => v && props.updateAttributes({ dataset: { datasetId: Number(v), versionId: null } })}
          disabled={!editable}
        />
        {page && (
          <p className="pb-1 text-sm text-ink-soft">
            v{page.version}
            {ref?.versionId === null ? ' (latest)' : page.version < page.latestVersion ? ` (pinned; latest is v${page.latestVersion})` : ''} · {page.rowCount.toLocaleString('en')} rows × {page.columns.length} columns
            {page.rows.length < page.rowCount && ` · showing the first ${page.rows.length.toLocaleString('en')}`}
            {canEdit ? ' · double-click a cell to edit' : page.editable ? '' : ' · too large to edit here'}
          </p>
        )}
        {edit.isPending && <span className="pb-1 text-xs text-amber">Saving a new version…</span>}
      </div>
      {edit.error && (
        <p role="alert" className="mt-2 rounded bg-oxide-wash px-3 py-1.5 text-sm text-oxide">
          {edit.error.message}
        </p>
      )}
      {table.error && (
        <p role="alert" className="mt-2 text-sm text-oxide">
          {table.error.message}
        </p>
      )}
      {page && (
        <div className="mt-3 overflow-auto rounded border border-paper-edge" style={{ height: Math.min(VIEW_H, ROW_H * (page.rows.length + 1) + 2) }} onScroll={(e) => setScroll(e.currentTarget.scrollTop)}>
          <table className="w-full border-collapse font-mono text-xs" aria-label={`${page.name} v${page.version}`} aria-rowcount={page.rowCount + 1}>
            <thead className="sticky top-0 z-10 bg-paper-deep">
              <tr style={{ height: ROW_H }}>
                <th className="w-12 px-2 text-right font-normal text-ink-faint">#</th>
                {page.columns.map((c) => (
                  <th key={c.name} scope="col" className={`px-2 font-sans font-medium ${c.type === 'number' ? 'text-right' : 'text-left'}`}>
                    {c.name} <span className="font-normal text-ink-faint">{c.type}</span>
                  </th>
                ))}
              </tr>
            </thead>
            <tbody>
              {first > 0 && <tr style={{ height: first * ROW_H }} aria-hidden />}
              {page.rows.slice(first, last).map((row, k) => {
                const i = first + k;
                return (
                  <tr key={i} style={{ height: ROW_H }} className="border-t border-paper-deep" aria-rowindex={i + 2}>
                    <td className="px-2 text-right text-ink-faint">{i + 1}</td>
                    {row.map((v, j) =>
                      editing && editing.row === i && editing.col === j ? (
                        <td key={j} className="p-0">
                          <input
                            autoFocus
                            aria-label={`Row ${i + 1}, ${page.columns[j].name}`}
                            className="h-full w-full bg-river-wash px-2 text-right outline-none"
                            value={editing.text}
                            onChange={(e) => setEditing({ ...editing, text: e.target.value })}
                            onBlur={commit}
                            onKeyDown={(e) => {
                              if (e.key === 'Enter') commit();
                              if (e.key === 'Escape') setEditing(null);
                            }}
                          />
                        </td>
                      ) : (
                        <td
                          key={j}
                          tabIndex={canEdit ? 0 : undefined}
                          data-cell={`${i}:${j}`}
                          className={`px-2 whitespace-nowrap ${page.columns[j].type === 'number' ? 'tabular text-right' : ''} ${v === null ? 'text-ink-faint' : ''} ${canEdit ? 'cursor-cell hover:bg-river-wash/50' : ''}`}
                          onDoubleClick={() => canEdit && setEditing({ row: i, col: j, text: v === null ? '' : String(v) })}
                          onKeyDown={(e) => canEdit && e.key === 'Enter' && setEditing({ row: i, col: j, text: v === null ? '' : String(v) })}
                        >
                          {v === null ? '·' : String(v)}
                        </td>
                      ),
                    )}
                  </tr>
                );
              })}
              {last < page.rows.length && <tr style={{ height: (page.rows.length - last) * ROW_H }} aria-hidden />}
            </tbody>
          </table>
        </div>
      )}
    </BlockFrame>
  );
}
