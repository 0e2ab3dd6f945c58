'use client';

import type { NodeViewProps } from '@tiptap/react';
import { useMemo } from 'react';
import { VegaChart } from '@/components/charts/vega-chart';
import { BlockFrame, Provenance } from '@/components/editor/block-frame';
import { estimatesOf, useDocBlocks } from '@/components/editor/doc-blocks';
import { CheckField, parseNumber, SelectField, TextField } from '@/components/editor/fields';
import { useMemoContext } from '@/components/editor/memo-context';
import { SourcePicker } from '@/components/editor/source-picker';
import { useBlockRun } from '@/components/editor/use-block-run';
import { formatNumber } from '../live-value/format';
import type { EngineOutput } from '../shared/output';
import { INTERVAL_LABEL, INTERVAL_METHODS } from '../shared/settings';
import { linkedEstimateSettings } from '../shared/linked';
import { histogramChart } from './chart';
import type { HistogramAttrs } from './schema';

export function ResampleHistogramView(props: NodeViewProps) {
  const { blockId, ...attrs } = props.node.attrs as HistogramAttrs & { blockId: string | null };
  const ctx = useMemoContext();
  const editable = props.editor.isEditable && ctx.canWrite;
  const { blocks, find } = useDocBlocks(props.editor);
  const rs = useMemo(() => linkedEstimateSettings(attrs.source, find), [attrs.source, find]);
  const state = useBlockRun(blockId, 'resample-histogram', rs, rs.ok ? rs.settings.dataset.datasetId : undefined);
  const out = state.shown?.result as EngineOutput | undefined;
  const set = (patch: Partial<HistogramAttrs>) => props.updateAttributes(patch);
  const spec = useMemo(() => (out ? histogramChart(out.response, { bins: attrs.bins, normalCurve: attrs.normalCurve, qqPlot: attrs.qqPlot, method: attrs.method }) : null), [out, attrs.bins, attrs.normalCurve, attrs.qqPlot, attrs.method]);
  return (
    <BlockFrame type="resample-histogram" label="Resample histogram" blockId={blockId} selected={props.selected} state={state} reason={rs.ok ? null : rs.reason} exportHref={blockId && out ? `/api/labs/${ctx.labId}/memos/${ctx.memoId}/blocks/${blockId}/svg` : null}>
      <div className="flex flex-wrap items-end gap-4">
        <SourcePicker value={attrs.source} estimates={estimatesOf(blocks)} onChange={(id) => set({ source: id })} disabled={!editable} />
        <TextField number className="w-20" label="Bins" value={attrs.bins} onChange={(t) => parseNumber(t) !== null && set({ bins: Math.round(parseNumber(t)!) })} disabled={!editable} />
        <SelectField
          label="Interval marked"
          value={attrs.method ?? ''}
          options={[{ value: '', label: 'First of the Estimate' }, ...INTERVAL_METHODS.map((m) => ({ value: m, label: INTERVAL_LABEL[m] }))]}
          onChange={(v) => set({ method: (v || null) as HistogramAttrs['method'] })}
          disabled={!editable}
        />
        <CheckField label="Normal curve" checked={attrs.normalCurve} onChange={(v) => set({ normalCurve: v })} disabled={!editable} />
        <CheckField label="Normal quantile plot" checked={attrs.qqPlot} onChange={(v) => set({ qqPlot: v })} disabled={!editable} />
      </div>
      {!rs.ok && <p className="mt-3 rounded bg-paper-deep px-3 py-2 text-sm text-ink-soft">{rs.reason}</p>}
      {out && spec && (
        <div className={`mt-3 ${state.stale ? 'opacity-60' : ''}`} aria-busy={state.stale}>
          <p className="mb-2 text-sm text-ink-soft">
            {out.response.replicatesUsed} replicates; θ̂ = <span className="tabular font-mono text-ink">{formatNumber(out.response.estimate, out.response.se)}</span>
            {out.response.z0 !== null && <> · bias-correction z0 = <span className="tabular font-mono">{out.response.z0.toFixed(3)}</span></>}
          </p>
          <VegaChart spec={spec} label="Histogram of bootstrap replicates" />
          {state.shown && <Provenance run={state.shown} />}
        </div>
      )}
    </BlockFrame>
  );
}
