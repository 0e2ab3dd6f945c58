'use client';

import { NodeViewWrapper } from '@tiptap/react';
import type { RunView } from '@/lib/runs/types';

const STATE_LABEL: Record<string, string> = {
  queued: 'Queued',
  running: 'Computing',
  current: 'Current',
  stale: 'Stale',
  failed: 'Failed',
  unready: 'Needs settings',
};

const STATE_STYLE: Record<string, string> = {
  current: 'bg-moss-wash text-moss',
  queued: 'bg-amber-wash text-amber',
  running: 'bg-amber-wash text-amber',
  stale: 'bg-amber-wash text-amber',
  failed: 'bg-oxide-wash text-oxide',
  unready: 'bg-paper-deep text-ink-soft',
};

export interface BlockRunState {
  run: RunView | null;
  shown: RunView | null;
  stale: boolean;
  waiting: boolean;
  error: Error | null;
  cancel: () => void;
  retry: () => void;
}

/** The state a block shows in its badge: the newest run's state, or stale while it lags. */
export function badgeState(r: BlockRunState, reason: string | null): string {
  if (reason) return 'unready';
  if (r.error) return 'failed';
  if (r.run) return r.run.state === 'current' && r.stale ? 'stale' : r.run.state;
  return r.waiting ? 'queued' : 'stale';
}

/**
 * The frame every block sits in: its name and run state, a progress bar with Cancel while
 * a run computes, the run's error in plain words, then the block's own settings and
 * results, and a footer saying exactly what the result was computed from.
 */
export function BlockFrame(props: {
  type: string;
  label: string;
  blockId: string | null;
  selected: boolean;
  state?: BlockRunState;
  reason?: string | null;
  exportHref?: string | null;
  /** Controls for the header, such as the dataset version picker. */
  header?: React.ReactNode;
  children: React.ReactNode;
}) {
  const { state } = props;
  const badge = state ? badgeState(state, props.reason ?? null) : null;
  const run = state?.run;
  const computing = run && (run.state === 'queued' || run.state === 'running');
  const failure = state?.error?.message ?? (run?.state === 'failed' ? run.error?.message : null);
  return (
    <NodeViewWrapper
      as="section"
      data-block-type={props.type}
      data-block-id={props.blockId ?? ''}
      data-run-state={badge ?? ''}
      aria-label={props.label}
      className={`not-prose my-5 rounded-lg border bg-white/80 font-sans shadow-sm ${props.selected ? 'border-river ring-2 ring-river/30' : 'border-paper-edge'}`}
      contentEditable={false}
    >
      <header className="flex items-center gap-3 border-b border-paper-edge px-4 py-2" data-drag-handle>
        <span aria-hidden className="h-4 w-[3px] rounded-full bg-oxide" />
        <h3 className="font-sans text-sm font-semibold tracking-wide text-ink uppercase">{props.label}</h3>
        {badge && (
          <span role="status" aria-label={`Run state: ${STATE_LABEL[badge]}`} className={`rounded px-2 py-0.5 text-xs font-medium ${STATE_STYLE[badge]}`}>
            {STATE_LABEL[badge]}
          </span>
        )}
        <span className="ml-auto flex items-center gap-4">
          {props.header}
          {props.exportHref && (
            <a href={props.exportHref} className="text-xs text-river underline-offset-2 hover:underline" download>
              Download SVG
            </a>
          )}
        </span>
      </header>
      {computing && (
        <div className="flex items-center gap-3 border-b border-paper-edge bg-amber-wash/40 px-4 py-2 text-sm">
          <progress className="h-2 flex-1 accent-river" max={1} value={run.progress} aria-label="Computing progress" />
          <span className="tabular w-10 text-right text-ink-soft">{Math.round(run.progress * 100)}%</span>
          <button type="button" onClick={state!.cancel} className="rounded border border-paper-edge px-2 py-0.5 text-xs hover:bg-paper-deep">
            Cancel
          </button>
        </div>
      )}
      {failure && (
        <div role="alert" className="flex items-start gap-3 border-b border-paper-edge bg-oxide-wash/60 px-4 py-2 text-sm text-oxide">
          <p className="flex-1">{failure}</p>
          {/^(cancelled|interrupted|internal)/.test(run?.error?.code ?? state?.error?.name ?? '') || run?.error?.code?.startsWith('cancelled') ? (
            <button type="button" onClick={state!.retry} className="rounded border border-oxide/40 px-2 py-0.5 text-xs">
              Run again
            </button>
          ) : null}
        </div>
      )}
      <div className="px-4 py-3">{props.children}</div>
    </NodeViewWrapper>
  );
}

/** The line under a result: which data version, seed, B and engine produced it. */
export function Provenance({ run }: { run: RunView }) {
  const r = run.result as { dataset?: { name: string; version: number; sha256: string }; response?: { provenance: { engine: string; seed: string; rng: string } }; difference?: { provenance: { engine: string; seed: string; rng: string } } } | null;
  const p = r?.response?.provenance ?? r?.difference?.provenance;
  if (!r?.dataset || !p) return null;
  return (
    <p className="mt-3 border-t border-dashed border-paper-edge pt-2 font-mono text-[11px] text-ink-faint">
      {r.dataset.name} v{r.dataset.version} · data {r.dataset.sha256.slice(0, 12)} · seed “{p.seed}” · {p.rng} · {p.engine}
      {run.computeMs !== null ? ` · computed in ${run.computeMs < 1000 ? `${run.computeMs} ms` : `${(run.computeMs / 1000).toFixed(1)} s`}` : ''}
    </p>
  );
}
