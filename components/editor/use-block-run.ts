'use client';

import { keepPreviousData, useMutation, useQuery, useQueryClient, type QueryClient } from '@tanstack/react-query';
import { useEffect, useRef, useState } from 'react';
import type { RunSettingsResult } from '@/blocks/shared/types';
import { canonicalJson } from '@/lib/runs/canonical-json';
import type { RunView } from '@/lib/runs/types';
import { cancelRun, fetchRun, requestRun, type ApiError } from './api';
import { useMemoContext } from './memo-context';
import { useLatestVersion } from './results-store';

function useDebounced<T>(value: T, ms: number): T {
  const [v, setV] = useState(value);
  useEffect(() => {
    if (v === value) return;
    const t = setTimeout(() => setV(value), ms);
    return () => clearTimeout(t);
  }, [value, ms, v]);
  return v;
}

const inProgress = (r: RunView | null | undefined) => !!r && (r.state === 'queued' || r.state === 'running');

// Event streams open at once on this page. A browser keeps about six HTTP/1.1 connections
// per server, and each stream holds one for the whole run: when many blocks compute at once
// (a memo opened with twenty new results), the rest poll, so saves and run requests never
// queue behind streams.
const MAX_STREAMS = 2;
let openStreams = 0;

/**
 * Follows a computing run through its server-sent events (GET /api/runs/:id/events):
 * progress as it moves, then the finished run, written into the same query cache entry the
 * polling fallback uses. Returns true when this run is to be polled instead (every 150 ms):
 * the stream failed, or enough streams are open already.
 */
function useRunEvents(run: RunView | undefined, client: QueryClient): boolean {
  const [failed, setFailed] = useState<number | null>(null);
  const id = run && inProgress(run) ? run.id : null;
  const base = useRef(run);
  base.current = run;
  useEffect(() => {
    if (id === null || failed === id) return;
    if (typeof EventSource === 'undefined' || openStreams >= MAX_STREAMS) return setFailed(id);
    openStreams++;
    const es = new EventSource(`/api/runs/${id}/events`);
    let finished = false;
    let counted = true;
    const close = () => {
      es.close();
      if (counted) openStreams--;
      counted = false;
    };
    es.addEventListener('progress', (e) => {
      const p = JSON.parse((e as MessageEvent<string>).data) as { state: RunView['state']; progress: number };
      client.setQueryData<RunView>(['run-poll', id], (old) => {
        const prev = old ?? base.current;
        return prev && prev.id === id && inProgress(prev) ? { ...prev, state: p.state, progress: p.progress } : prev;
      });
    });
    es.addEventListener('run', (e) => {
      finished = true;
      close();
      client.setQueryData<RunView>(['run-poll', id], JSON.parse((e as MessageEvent<string>).data) as RunView);
    });
    const fail = () => {
      if (finished) return;
      close();
      setFailed(id);
    };
    es.addEventListener('failure', fail);
    es.addEventListener('gone', fail);
    es.onerror = fail;
    return () => {
      finished = true;
      close();
    };
  }, [id, failed, client]);
  return id !== null && failed === id;
}

/**
 * A computing block's run, through react-query: asks the server for the result of the
 * block's present settings (debounced while someone types), polls a computing run's
 * progress, keeps showing the last current result — marked stale — until the new one is
 * in, and publishes what it shows for the block's Live values.
 */
export function useBlockRun(blockId: string | null, type: string, rs: RunSettingsResult<unknown>, datasetId: number | undefined) {
  const ctx = useMemoContext();
  const client = useQueryClient();
  const settingsJson = rs.ok ? canonicalJson(rs.settings) : null;
  const asked = useDebounced(settingsJson, 250);
  const epoch = useLatestVersion(ctx.store, datasetId);
  const initial = blockId ? ctx.initial[blockId] : undefined;
  const initialView = initial && initial.settingsJson === asked && epoch === 0 && initial.view.state !== 'unready' ? (initial.view as RunView) : undefined;

  const query = useQuery<RunView, ApiError>({
    queryKey: ['run', ctx.memoId, blockId, asked, epoch],
    enabled: !!blockId && asked !== null,
    queryFn: ({ signal }) => requestRun(ctx.labId, ctx.memoId, { blockId: blockId!, type, settings: JSON.parse(asked!) }, signal),
    initialData: initialView,
    placeholderData: keepPreviousData,
    staleTime: Infinity,
    retry: false,
  });
  const run = query.isPlaceholderData ? undefined : query.data;
  const streamFailed = useRunEvents(run, client);
  const poll = useQuery<RunView, ApiError>({
    queryKey: ['run-poll', run?.id],
    enabled: inProgress(run) && streamFailed,
    queryFn: ({ signal }) => fetchRun(run!.id, signal),
    refetchInterval: (q) => (q.state.data && !inProgress(q.state.data) ? false : 150),
    retry: false,
  });
  const latest: RunView | undefined = poll.data && poll.data.id === run?.id ? poll.data : run;

  const lastGood = useRef<RunView | null>(null);
  if (latest?.state === 'current') lastGood.current = latest;
  else if (!lastGood.current && query.data?.state === 'current') lastGood.current = query.data;
  const shown = lastGood.current;
  const stale = !rs.ok || asked !== settingsJson || !latest || latest.state !== 'current';

  const cancel = useMutation({
    mutationFn: (id: number) => cancelRun(id),
    onSuccess: (view) => client.setQueryData(['run-poll', view.id], view),
  });

  useEffect(() => {
    if (!blockId) return;
    ctx.store.publish(blockId, { type, run: latest ?? null, shown, stale, reason: rs.ok ? undefined : rs.reason });
  }, [ctx.store, blockId, type, latest, shown, stale, rs]);
  useEffect(() => () => (blockId ? ctx.store.forget(blockId) : undefined), [ctx.store, blockId]);

  return {
    run: latest ?? null,
    shown,
    stale,
    waiting: query.isFetching && !latest,
    error: query.error ?? poll.error ?? null,
    cancel: () => latest && cancel.mutate(latest.id),
    retry: () => query.refetch(),
  };
}
