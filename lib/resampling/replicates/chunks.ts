/**
 * Replicates are drawn in fixed-size chunks, chunk k from its own random stream
 * (seed, "chunk:k"), so the replicate sequence is the same whether one thread draws every
 * chunk or several workers share them. CHUNK_SIZE is part of the engine's definition:
 * changing it changes results (bump ENGINE_VERSION).
 */
export const CHUNK_SIZE = 500;

export function chunkCount(B: number): number {
  return Math.ceil(B / CHUNK_SIZE);
}

export function chunkRange(B: number, k: number): [number, number] {
  const start = k * CHUNK_SIZE;
  return [start, Math.min(B, start + CHUNK_SIZE)];
}
