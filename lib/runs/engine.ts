import 'server-only';
import { compute } from '@/lib/compute';
import type { EngineRequestInput, EngineResponse } from '@/lib/resampling';

/**
 * Runs one engine request on the worker pool (lib/compute), so the web server's event
 * loop stays free while replicates are drawn. Progress arrives as a fraction in [0, 1].
 */
export async function computeOnWorkers(request: EngineRequestInput, opts: { signal: AbortSignal; onProgress: (fraction: number) => void }): Promise<EngineResponse> {
  return compute(request, {
    signal: opts.signal,
    onProgress: (done, total) => opts.onProgress(progressFraction({ done, total })),
  });
}

/** Accepts a fraction, or `{ done, total }`, or `{ fraction }` / `{ progress }`. */
export function progressFraction(p: unknown): number {
  let f = 0;
  if (typeof p === 'number') f = p;
  else if (p && typeof p === 'object') {
    const o = p as Record<string, unknown>;
    if (typeof o.done === 'number' && typeof o.total === 'number' && o.total > 0) f = o.done / o.total;
    else if (typeof o.fraction === 'number') f = o.fraction;
    else if (typeof o.progress === 'number') f = o.progress;
  }
  return Number.isFinite(f) ? Math.min(1, Math.max(0, f)) : 0;
}
