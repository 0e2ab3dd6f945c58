'use client';

import type { RunView } from '@/lib/runs/types';

export class ApiError extends Error {
  constructor(
    readonly status: number,
    readonly code: string,
    message: string,
    readonly path = '',
  ) {
    super(message);
  }
}

/** fetch + JSON, turning the server's `{ error: { code, message, path } }` into an ApiError. */
export async function api<T>(url: string, init: RequestInit & { json?: unknown } = {}): Promise<T> {
  const { json, ...rest } = init;
  const res = await fetch(url, {
    ...rest,
    headers: { ...(json !== undefined ? { 'content-type': 'application/json' } : {}), ...rest.headers },
    body: json !== undefined ? JSON.stringify(json) : rest.body,
  });
  const body = await res.json().catch(() => null);
  if (!res.ok) {
    const e = (body as { error?: { code: string; message: string; path?: string } } | null)?.error;
    throw new ApiError(res.status, e?.code ?? 'internal:client', e?.message ?? `The server answered ${res.status}.`, e?.path);
  }
  return body as T;
}

export const requestRun = (labId: number, memoId: number, body: { blockId: string; type: string; settings: unknown }, signal?: AbortSignal) =>
  api<{ run: RunView }>(`/api/labs/${labId}/memos/${memoId}/runs`, { method: 'POST', json: body, signal }).then((r) => r.run);

export const fetchRun = (runId: number, signal?: AbortSignal) => api<{ run: RunView }>(`/api/runs/${runId}`, { signal }).then((r) => r.run);

export const cancelRun = (runId: number) => api<{ run: RunView }>(`/api/runs/${runId}/cancel`, { method: 'POST', json: {} }).then((r) => r.run);
