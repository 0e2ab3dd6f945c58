'use client';

import type { NodeViewProps } from '@tiptap/react';
import { useMemo } from 'react';
import { BlockFrame, Provenance } from '@/components/editor/block-frame';
import { CheckField, parseNumber, SelectField, TextField } from '@/components/editor/fields';
import { useMemoContext, type PickerDataset } from '@/components/editor/memo-context';
import { Cautions, ResultTable } from '@/components/editor/results-parts';
import { useBlockRun } from '@/components/editor/use-block-run';
import { VersionPicker } from '@/components/editor/version-picker';
import { VegaChart } from '@/components/charts/vega-chart';
import { formatNumber } from '../live-value/format';
import type { EngineOutput } from '../shared/output';
import { changeStatistic, defaultScheme, INTERVAL_LABEL, INTERVAL_METHODS, SCHEME_LABEL, STATISTIC_LABEL, statisticColumns, type Scheme, type SchemeName, type Statistic, type StatisticName } from '../shared/settings';
import { estimateChart } from './chart';
import { estimateRunSettings } from './index';
import type { EstimateAttrs } from './schema';

export function EstimateView(props: NodeViewProps) {
  const { blockId, ...attrs } = props.node.attrs as EstimateAttrs & { blockId: string | null };
  const ctx = useMemoContext();
  const editable = props.editor.isEditable && ctx.canWrite;
  const attrsJson = JSON.stringify(attrs);
  // eslint-disable-next-line react-hooks/exhaustive-deps
  const rs = useMemo(() => estimateRunSettings(attrs), [attrsJson]);
  const state = useBlockRun(blockId, 'estimate', rs, attrs.dataset?.datasetId);
  const set = (patch: Partial<EstimateAttrs>) => props.updateAttributes(patch);
  const dataset = ctx.datasets.find((d) => d.id === attrs.dataset?.datasetId);
  const out = state.shown?.result as EngineOutput | undefined;

  return (
    <BlockFrame type="estimate" label="Estimate" blockId={blockId} selected={props.selected} state={state} reason={rs.ok ? null : rs.reason} exportHref={blockId && out ? `/api/labs/${ctx.labId}/memos/${ctx.memoId}/blocks/${blockId}/svg` : null}
      header={<VersionPicker value={attrs.dataset} onChange={(dataset) => set({ dataset })} disabled={!editable} />}
    >
      <EstimateSettingsForm attrs={attrs} set={set} datasets={ctx.datasets} dataset={dataset} disabled={!editable} />
      {!rs.ok && <p className="mt-3 rounded bg-paper-deep px-3 py-2 text-sm text-ink-soft" role="status">{rs.reason}</p>}
      {out && (
        <div className={`mt-4 transition-opacity ${state.stale ? 'opacity-60' : ''}`} aria-busy={state.stale}>
          <p className="font-serif text-2xl text-ink" data-testid="estimate-headline">
            <span className="text-ink-soft">{STATISTIC_LABEL[attrs.statistic.name as StatisticName] ?? 'θ̂'} = </span>
            <span className="tabular">{formatNumber(out.response.estimate, out.response.se)}</span>
            {out.response.se !== null && <span className="ml-2 text-lg text-ink-soft">(SE {formatNumber(out.response.se, out.response.se)})</span>}
            {state.stale && (
              <span className="ml-3 align-middle font-sans text-xs text-amber">
                {state.waiting || state.run?.state === 'queued' || state.run?.state === 'running' ? 'stale — recomputing' : 'stale — not for the present settings'}
              </span>
            )}
          </p>
          <p className="mt-1 text-xs text-ink-faint">
            n = {out.n}, B = {out.response.B} ({out.response.replicatesUsed} usable replicates)
          </p>
          <div className="mt-3 grid gap-4 lg:grid-cols-[1fr_1fr]">
            <ResultTable r={out.response} label="Estimate results" />
            <VegaChart spec={estimateChart(out.response)} label="Intervals chart" />
          </div>
          <Cautions r={out.response} n={out.n} dropped={out.dropped} />
          {state.shown && <Provenance run={state.shown} />}
        </div>
      )}
    </BlockFrame>
  );
}

export function EstimateSettingsForm(props: { attrs: EstimateAttrs; set: (p: Partial<EstimateAttrs>) => void; datasets: PickerDataset[]; dataset: PickerDataset | undefined; disabled: boolean }) {
  const { attrs, set, dataset, disabled } = props;
  const cols = dataset?.columns ?? [];
  const numeric = cols.filter((c) => c.type === 'number').map((c) => ({ value: c.name, label: c.name }));
  const all = cols.map((c) => ({ value: c.name, label: c.name }));
  const s = attrs.statistic;
  const setStat = (patch: Partial<Statistic>) => set({ statistic: { ...s, ...patch } as Statistic });
  const filterCol = cols.find((c) => c.name === attrs.filter?.column);
  return (
    <details open={!disabled} className="group">
      <summary className="cursor-pointer text-sm text-river select-none">Settings</summary>
      <div className="mt-2 grid grid-cols-2 gap-3 md:grid-cols-4">
        <SelectField
          label="Dataset"
          value={attrs.dataset ? String(attrs.dataset.datasetId) : ''}
          options={props.datasets.map((d) => ({ value: String(d.id), label: d.name }))}
          onChange={(v) => {
            // Columns of the old dataset rarely exist in the new one: start from its first numeric column.
            const d = props.datasets.find((x) => x.id === Number(v));
            const first = d?.columns.find((c) => c.type === 'number')?.name ?? '';
            const keep = statisticColumns(s).every((c) => d?.columns.some((x) => x.name === c));
            set({ dataset: { datasetId: Number(v), versionId: null }, filter: null, scheme: { name: 'ordinary' }, statistic: keep ? s : changeStatistic({ name: 'median', column: first }, s.name) });
          }}
          disabled={disabled}
        />
        <SelectField
          label="Rows"
          value={attrs.filter?.column ?? ''}
          options={[{ value: '', label: 'All rows' }, ...cols.filter((c) => c.type !== 'number').map((c) => ({ value: c.name, label: `Where ${c.name} is…` }))]}
          onChange={(v) => set({ filter: v ? { column: v, value: cols.find((c) => c.name === v)?.values?.[0] ?? '' } : null })}
          disabled={disabled}
        />
        {attrs.filter && (
          <SelectField label={`${attrs.filter.column} =`} value={attrs.filter.value} options={(filterCol?.values ?? []).map((v) => ({ value: v, label: v }))} onChange={(v) => set({ filter: { column: attrs.filter!.column, value: v } })} disabled={disabled} />
        )}
        <SelectField
          label="Statistic"
          value={s.name}
          options={(Object.keys(STATISTIC_LABEL) as StatisticName[]).map((n) => ({ value: n, label: STATISTIC_LABEL[n] }))}
          onChange={(v) => set({ statistic: changeStatistic(s, v) })}
          disabled={disabled}
        />
        {'column' in s && <SelectField label="Column" value={s.column} options={numeric} onChange={(v) => setStat({ column: v } as Partial<Statistic>)} disabled={disabled} />}
        {'x' in s && <SelectField label="x" value={s.x} options={numeric} onChange={(v) => setStat({ x: v } as Partial<Statistic>)} disabled={disabled} />}
        {'y' in s && <SelectField label="y" value={s.y} options={numeric} onChange={(v) => setStat({ y: v } as Partial<Statistic>)} disabled={disabled} />}
        {'numerator' in s && <SelectField label="Numerator" value={s.numerator} options={numeric} onChange={(v) => setStat({ numerator: v } as Partial<Statistic>)} disabled={disabled} />}
        {'denominator' in s && <SelectField label="Denominator" value={s.denominator} options={numeric} onChange={(v) => setStat({ denominator: v } as Partial<Statistic>)} disabled={disabled} />}
        {s.name === 'trimmed-mean' && <TextField number label="Trim (each end)" value={s.trim} onChange={(t) => parseNumber(t) !== null && setStat({ trim: parseNumber(t)! } as Partial<Statistic>)} disabled={disabled} />}
        {s.name === 'quantile' && <TextField number label="p" value={s.p} onChange={(t) => parseNumber(t) !== null && setStat({ p: parseNumber(t)! } as Partial<Statistic>)} disabled={disabled} />}
        {s.name === 'correlation' && (
          <SelectField label="Method" value={s.method} options={[{ value: 'pearson', label: 'Pearson' }, { value: 'spearman', label: 'Spearman' }]} onChange={(v) => setStat({ method: v } as Partial<Statistic>)} disabled={disabled} />
        )}
        <SelectField
          label="Resampling"
          value={attrs.scheme.name}
          options={(Object.keys(SCHEME_LABEL) as SchemeName[]).map((n) => ({ value: n, label: SCHEME_LABEL[n] }))}
          onChange={(v) => set({ scheme: defaultScheme(v, cols.filter((c) => c.type !== 'number' && !statisticColumns(s).includes(c.name)).map((c) => c.name)) })}
          disabled={disabled}
        />
        {'by' in attrs.scheme && <SelectField label={attrs.scheme.name === 'cluster' ? 'Clusters' : 'Strata'} value={attrs.scheme.by} options={all} onChange={(v) => set({ scheme: { ...attrs.scheme, by: v } as Scheme })} disabled={disabled} />}
        {attrs.scheme.name === 'moving-block' && (
          <TextField label="Block length" value={String(attrs.scheme.blockLength)} hint="a whole number, or auto" onChange={(t) => set({ scheme: { name: 'moving-block', blockLength: t.trim() === 'auto' ? 'auto' : (parseNumber(t) ?? 'auto') } })} disabled={disabled} />
        )}
        {attrs.scheme.name === 'stationary' && (
          <TextField label="Mean block length" value={String(attrs.scheme.meanBlockLength)} hint="a number, or auto" onChange={(t) => set({ scheme: { name: 'stationary', meanBlockLength: t.trim() === 'auto' ? 'auto' : (parseNumber(t) ?? 'auto') } })} disabled={disabled} />
        )}
        {attrs.scheme.name === 'parametric' && (
          <SelectField
            label="Family"
            value={attrs.scheme.family}
            options={(['normal', 'exponential', 'lognormal', 'poisson'] as const).map((f) => ({ value: f, label: f[0].toUpperCase() + f.slice(1) }))}
            onChange={(v) => set({ scheme: { name: 'parametric', family: v } })}
            disabled={disabled}
          />
        )}
        <TextField number label="Replicates B" value={attrs.B} onChange={(t) => parseNumber(t) !== null && set({ B: parseNumber(t)! })} disabled={disabled} />
        <TextField label="Seed" value={attrs.seed} onChange={(t) => set({ seed: t })} disabled={disabled} />
        <TextField number label="Level" value={attrs.level} onChange={(t) => parseNumber(t) !== null && set({ level: parseNumber(t)! })} disabled={disabled} />
      </div>
      <fieldset className="mt-3 flex flex-wrap items-center gap-4" disabled={disabled}>
        <legend className="mb-1 text-xs font-medium text-ink-soft">Intervals</legend>
        {INTERVAL_METHODS.map((m) => (
          <CheckField key={m} label={INTERVAL_LABEL[m]} checked={attrs.methods.includes(m)} onChange={(on) => set({ methods: on ? INTERVAL_METHODS.filter((x) => x === m || attrs.methods.includes(x)) : attrs.methods.filter((x) => x !== m) })} disabled={disabled} />
        ))}
      </fieldset>
    </details>
  );
}
