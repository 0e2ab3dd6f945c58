'use client';

import { createContext, useContext } from 'react';
import type { RunView, UnreadyView } from '@/lib/runs/types';
import type { ResultsStore } from './results-store';

export interface PickerDataset {
  id: number;
  name: string;
  latestVersionId: number | null;
  latestVersion: number;
  rowCount: number;
  columns: { name: string; type: string; values?: string[] }[];
}

export interface MemoContextValue {
  labId: number;
  memoId: number;
  canWrite: boolean;
  canCompute: boolean;
  datasets: PickerDataset[];
  store: ResultsStore;
  /** Results found when the page was rendered, by block id, with the settings they were for. */
  initial: Record<string, { settingsJson: string; view: RunView | UnreadyView }>;
}

export const MemoContext = createContext<MemoContextValue | null>(null);

export function useMemoContext(): MemoContextValue {
  const v = useContext(MemoContext);
  if (!v) throw new Error('block views render inside a memo editor');
  return v;
}
