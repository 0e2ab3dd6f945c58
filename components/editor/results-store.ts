'use client';

import { useSyncExternalStore } from 'react';
import type { RunView } from '@/lib/runs/types';

/** What one block shows right now, published by its node view for Live values to read. */
export interface BlockResult {
  type: string;
  /** The newest run (may be computing) and the last run that finished `current`. */
  run: RunView | null;
  shown: RunView | null;
  /** True while the shown result is not for the block's present settings and data. */
  stale: boolean;
  reason?: string;
}

/**
 * A small external store shared by the block views of one memo: block id → its result, and
 * dataset id → the newest version id this page knows of (bumped after a Data table edit so
 * every block following "latest" asks again). React reads it with useSyncExternalStore.
 */
export class ResultsStore {
  private blocks = new Map<string, BlockResult>();
  private latest = new Map<number, number>();
  private listeners = new Set<() => void>();

  subscribe = (fn: () => void) => {
    this.listeners.add(fn);
    return () => this.listeners.delete(fn);
  };

  private emit() {
    for (const fn of this.listeners) fn();
  }

  block(blockId: string | null | undefined): BlockResult | undefined {
    return blockId ? this.blocks.get(blockId) : undefined;
  }

  publish(blockId: string, value: BlockResult) {
    const prev = this.blocks.get(blockId);
    if (prev && prev.run === value.run && prev.shown === value.shown && prev.stale === value.stale && prev.reason === value.reason) return;
    this.blocks.set(blockId, value);
    this.emit();
  }

  forget(blockId: string) {
    if (this.blocks.delete(blockId)) this.emit();
  }

  latestVersion(datasetId: number | undefined): number {
    return datasetId ? (this.latest.get(datasetId) ?? 0) : 0;
  }

  datasetChanged(datasetId: number, versionId: number) {
    if ((this.latest.get(datasetId) ?? 0) >= versionId) return;
    this.latest.set(datasetId, versionId);
    this.emit();
  }
}

export function useBlockResult(store: ResultsStore, blockId: string | null | undefined): BlockResult | undefined {
  return useSyncExternalStore(store.subscribe, () => store.block(blockId), () => store.block(blockId));
}

export function useLatestVersion(store: ResultsStore, datasetId: number | undefined): number {
  return useSyncExternalStore(store.subscribe, () => store.latestVersion(datasetId), () => 0);
}
