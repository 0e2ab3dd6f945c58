'use client';

import type { NodeViewProps } from '@tiptap/react';
import { useMemo } from 'react';
import { VegaChart } from '@/components/charts/vega-chart';
import { BlockFrame, Provenance } from '@/components/editor/block-frame';
import { parseNumber, SelectField, TextField } from '@/components/editor/fields';
import { useMemoContext } from '@/components/editor/memo-context';
import { Cautions, ResultTable } from '@/components/editor/results-parts';
import { useBlockRun } from '@/components/editor/use-block-run';
import { VersionPicker } from '@/components/editor/version-picker';
import { INTERVAL_LABEL, INTERVAL_METHODS } from '../shared/settings';
import { groupComparisonChart } from './chart';
import { groupComparison } from './index';
import type { GroupComparisonOutput } from './output';
import type { GroupComparisonAttrs } from './schema';

export function GroupComparisonView(props: NodeViewProps) {
  const { blockId, ...attrs } = props.node.attrs as GroupComparisonAttrs & { blockId: string | null };
  const ctx = useMemoContext();
  const editable = props.editor.isEditable && ctx.canWrite;
  const json = JSON.stringify(attrs);
  // eslint-disable-next-line react-hooks/exhaustive-deps
  const rs = useMemo(() => groupComparison.runSettings!(attrs, () => undefined), [json]);
  const state = useBlockRun(blockId, 'group-comparison', rs, attrs.dataset?.datasetId);
  const out = state.shown?.result as GroupComparisonOutput | undefined;
  const set = (patch: Partial<GroupComparisonAttrs>) => props.updateAttributes(patch);
  const dataset = ctx.datasets.find((d) => d.id === attrs.dataset?.datasetId);
  const cols = dataset?.columns ?? [];
  const groupValues = cols.find((c) => c.name === attrs.group)?.values ?? [];
  const disabled = !editable;
  const spec = useMemo(() => (out ? groupComparisonChart(out, { statistic: attrs.statistic, valueLabel: attrs.value }) : null), [out, attrs.statistic, attrs.value]);
  return (
    <BlockFrame type="group-comparison" label="Group comparison" blockId={blockId} selected={props.selected} state={state} reason={rs.ok ? null : rs.reason} exportHref={blockId && out ? `/api/labs/${ctx.labId}/memos/${ctx.memoId}/blocks/${blockId}/svg` : null}
      header={<VersionPicker value={attrs.dataset} onChange={(dataset) => set({ dataset })} disabled={disabled} />}
    >
      <details open={editable}>
        <summary className="cursor-pointer text-sm text-river select-none">Settings</summary>
        <div className="mt-2 grid grid-cols-2 gap-3 md:grid-cols-4">
          <SelectField label="Dataset" value={attrs.dataset ? String(attrs.dataset.datasetId) : ''} options={ctx.datasets.map((d) => ({ value: String(d.id), label: d.name }))} onChange={(v) => {
              const d = ctx.datasets.find((x) => x.id === Number(v));
              const text = d?.columns.find((c) => c.type === 'text');
              set({ dataset: { datasetId: Number(v), versionId: null }, value: d?.columns.find((c) => c.type === 'number')?.name ?? '', group: text?.name ?? '', levels: [text?.values?.[0] ?? '', text?.values?.[1] ?? ''] });
            }} disabled={disabled} />
          <SelectField label="Values" value={attrs.value} options={cols.filter((c) => c.type === 'number').map((c) => ({ value: c.name, label: c.name }))} onChange={(v) => set({ value: v })} disabled={disabled} />
          <SelectField
            label="Groups in"
            value={attrs.group}
            options={cols.filter((c) => c.type !== 'number').map((c) => ({ value: c.name, label: c.name }))}
            onChange={(v) => {
              const vals = cols.find((c) => c.name === v)?.values ?? [];
              set({ group: v, levels: [vals[0] ?? '', vals[1] ?? ''] });
            }}
            disabled={disabled}
          />
          <SelectField label="Statistic" value={attrs.statistic} options={[{ value: 'mean', label: 'Mean' }, { value: 'median', label: 'Median' }]} onChange={(v) => set({ statistic: v })} disabled={disabled} />
          <SelectField label="First group" value={attrs.levels[0]} options={groupValues.map((v) => ({ value: v, label: v }))} onChange={(v) => set({ levels: [v, attrs.levels[1]] })} disabled={disabled} />
          <SelectField label="Second group" value={attrs.levels[1]} options={groupValues.map((v) => ({ value: v, label: v }))} onChange={(v) => set({ levels: [attrs.levels[0], v] })} disabled={disabled} />
          <SelectField label="Interval" value={attrs.method} options={INTERVAL_METHODS.map((m) => ({ value: m, label: INTERVAL_LABEL[m] }))} onChange={(v) => set({ method: v })} disabled={disabled} />
          <TextField number label="Replicates B" value={attrs.B} onChange={(t) => parseNumber(t) !== null && set({ B: parseNumber(t)! })} disabled={disabled} />
          <TextField label="Seed" value={attrs.seed} onChange={(t) => set({ seed: t })} disabled={disabled} />
          <TextField number label="Level" value={attrs.level} onChange={(t) => parseNumber(t) !== null && set({ level: parseNumber(t)! })} disabled={disabled} />
        </div>
      </details>
      {!rs.ok && <p className="mt-3 rounded bg-paper-deep px-3 py-2 text-sm text-ink-soft">{rs.reason}</p>}
      {out && spec && (
        <div className={`mt-4 ${state.stale ? 'opacity-60' : ''}`} aria-busy={state.stale}>
          <VegaChart spec={spec} label="Groups side by side and their difference" />
          <div className="mt-3 grid gap-4 md:grid-cols-3">
            <div>
              <h4 className="font-sans text-sm font-medium">
                Difference ({out.groups[0].level} − {out.groups[1].level})
              </h4>
              <ResultTable r={out.difference} label="Difference results" />
            </div>
            {out.groups.map((g) => (
              <div key={g.level}>
                <h4 className="font-sans text-sm font-medium">
                  {g.level} (n = {g.n})
                </h4>
                <ResultTable r={g.response} label={`${g.level} results`} />
              </div>
            ))}
          </div>
          <Cautions r={{ ...out.difference, warnings: [...out.difference.warnings, ...out.groups.flatMap((g) => g.response.warnings.map((w) => ({ ...w, code: `${g.level}:${w.code}`, message: `${g.level}: ${w.message}` })))] }} n={out.n} dropped={out.dropped} />
          {state.shown && <Provenance run={state.shown} />}
        </div>
      )}
    </BlockFrame>
  );
}
