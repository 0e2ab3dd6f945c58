import type { RunState } from '@/db/schema';

export interface RunError {
  code: string;
  message: string;
  path: string;
}

/** A run as the client sees it: state, progress and (once current) the block's result. */
export interface RunView {
  id: number;
  blockId: string;
  kind: string;
  key: string;
  state: RunState;
  progress: number;
  error: RunError | null;
  result: unknown | null;
  datasetVersionId: number | null;
  computeMs: number | null;
  createdAt: string;
  finishedAt: string | null;
}

/** What a block shows before it can run: its settings are incomplete or invalid. */
export interface UnreadyView {
  blockId: string;
  state: 'unready';
  reason: string;
}
