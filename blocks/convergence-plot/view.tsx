'use client';

import type { NodeViewProps } from '@tiptap/react';
import { useMemo } from 'react';
import { VegaChart } from '@/components/charts/vega-chart';
import { BlockFrame, Provenance } from '@/components/editor/block-frame';
import { estimatesOf, useDocBlocks } from '@/components/editor/doc-blocks';
import { SelectField } from '@/components/editor/fields';
import { useMemoContext } from '@/components/editor/memo-context';
import { SourcePicker } from '@/components/editor/source-picker';
import { useBlockRun } from '@/components/editor/use-block-run';
import { formatNumber } from '../live-value/format';
import type { EngineOutput } from '../shared/output';
import { linkedEstimateSettings } from '../shared/linked';
import { convergenceChart } from './chart';
import type { ConvergenceAttrs } from './schema';

export function ConvergencePlotView(props: NodeViewProps) {
  const { blockId, ...attrs } = props.node.attrs as ConvergenceAttrs & { blockId: string | null };
  const ctx = useMemoContext();
  const editable = props.editor.isEditable && ctx.canWrite;
  const { blocks, find } = useDocBlocks(props.editor);
  const rs = useMemo(() => linkedEstimateSettings(attrs.source, find), [attrs.source, find]);
  const state = useBlockRun(blockId, 'convergence-plot', rs, rs.ok ? rs.settings.dataset.datasetId : undefined);
  const out = state.shown?.result as EngineOutput | undefined;
  const spec = useMemo(() => (out ? convergenceChart(out.response, { show: attrs.show }) : null), [out, attrs.show]);
  const r = out?.response;
  return (
    <BlockFrame type="convergence-plot" label="Convergence plot" blockId={blockId} selected={props.selected} state={state} reason={rs.ok ? null : rs.reason} exportHref={blockId && out ? `/api/labs/${ctx.labId}/memos/${ctx.memoId}/blocks/${blockId}/svg` : null}>
      <div className="flex flex-wrap items-end gap-4">
        <SourcePicker value={attrs.source} estimates={estimatesOf(blocks)} onChange={(id) => props.updateAttributes({ source: id })} disabled={!editable} />
        <SelectField
          label="Show"
          value={attrs.show}
          options={[
            { value: 'both', label: 'SE and intervals' },
            { value: 'se', label: 'SE only' },
            { value: 'intervals', label: 'Intervals only' },
          ]}
          onChange={(v) => props.updateAttributes({ show: v })}
          disabled={!editable}
        />
      </div>
      {!rs.ok && <p className="mt-3 rounded bg-paper-deep px-3 py-2 text-sm text-ink-soft">{rs.reason}</p>}
      {r && spec && (
        <div className={`mt-3 ${state.stale ? 'opacity-60' : ''}`} aria-busy={state.stale}>
          <VegaChart spec={spec} label="Convergence of the SE and interval end points" />
          <p className="mt-2 text-sm text-ink-soft">
            At B = {r.B}: SE {r.se === null ? '—' : formatNumber(r.se, r.se)}
            {r.seMonteCarloError !== null && <>, Monte Carlo error {formatNumber(r.seMonteCarloError, r.seMonteCarloError)}</>}. {r.advice?.message}
          </p>
          {state.shown && <Provenance run={state.shown} />}
        </div>
      )}
    </BlockFrame>
  );
}
