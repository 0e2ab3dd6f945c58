import 'server-only';

/**
 * Decoded chunks kept in memory, least recently used out first. Versions never change once
 * stored, so a cached chunk can never be stale; the budget bounds memory (about 16 bytes a
 * number cell, more for text).
 */
const BUDGET_CELLS = 4_000_000;

type Cells = (number | string | null)[];
const holder = globalThis as unknown as { __marginChunkCache?: { map: Map<string, Cells>; cells: number } };
const cache = (holder.__marginChunkCache ??= { map: new Map(), cells: 0 });

export function getChunk(key: string): Cells | undefined {
  const v = cache.map.get(key);
  if (v) {
    cache.map.delete(key);
    cache.map.set(key, v);
  }
  return v;
}

export function putChunk(key: string, cells: Cells): void {
  if (cache.map.has(key)) return;
  cache.map.set(key, cells);
  cache.cells += cells.length;
  for (const [k, v] of cache.map) {
    if (cache.cells <= BUDGET_CELLS) break;
    cache.map.delete(k);
    cache.cells -= v.length;
  }
}
