'use client';

import type { Editor } from '@tiptap/core';
import { useCallback, useEffect, useRef, useState } from 'react';
import { api, ApiError } from './api';

export type SaveStatus = { kind: 'saved' } | { kind: 'dirty' } | { kind: 'saving' } | { kind: 'error'; message: string } | { kind: 'conflict'; message: string };

/**
 * Autosave: each change schedules a save 800 ms after typing pauses; one save is in flight
 * at a time, and a change made meanwhile is saved right after. Each save names the
 * revision it builds on, so a save over someone else's newer one is refused, not lost.
 */
export function useAutosave(editor: Editor | null, opts: { labId: number; memoId: number; revision: number; enabled: boolean }) {
  const [status, setStatus] = useState<SaveStatus>({ kind: 'saved' });
  const revision = useRef(opts.revision);
  const timer = useRef<ReturnType<typeof setTimeout> | null>(null);
  const inFlight = useRef(false);
  const again = useRef(false);
  const dirty = useRef(false);
  const url = `/api/labs/${opts.labId}/memos/${opts.memoId}`;

  const save = useCallback(async () => {
    if (!editor || !dirty.current) return;
    if (inFlight.current) {
      again.current = true;
      return;
    }
    inFlight.current = true;
    dirty.current = false;
    setStatus({ kind: 'saving' });
    try {
      const r = await api<{ revision: number }>(url, { method: 'PUT', json: { revision: revision.current, doc: editor.getJSON() } });
      revision.current = r.revision;
      setStatus(dirty.current ? { kind: 'dirty' } : { kind: 'saved' });
    } catch (e) {
      dirty.current = true;
      if (e instanceof ApiError && e.status === 409) setStatus({ kind: 'conflict', message: e.message });
      else setStatus({ kind: 'error', message: e instanceof Error ? e.message : 'Could not save.' });
      inFlight.current = false;
      return;
    }
    inFlight.current = false;
    if (again.current) {
      again.current = false;
      void save();
    }
  }, [editor, url]);

  useEffect(() => {
    if (!editor || !opts.enabled) return;
    const onUpdate = () => {
      dirty.current = true;
      setStatus((s) => (s.kind === 'conflict' ? s : { kind: 'dirty' }));
      if (timer.current) clearTimeout(timer.current);
      timer.current = setTimeout(() => void save(), 800);
    };
    editor.on('update', onUpdate);
    // A last save when the page is left with changes pending (keepalive outlives the page).
    const onHide = () => {
      if (!dirty.current || inFlight.current) return;
      void fetch(url, { method: 'PUT', keepalive: true, headers: { 'content-type': 'application/json' }, body: JSON.stringify({ revision: revision.current, doc: editor.getJSON() }) });
    };
    window.addEventListener('pagehide', onHide);
    return () => {
      editor.off('update', onUpdate);
      window.removeEventListener('pagehide', onHide);
      if (timer.current) clearTimeout(timer.current);
    };
  }, [editor, opts.enabled, save, url]);

  return { status, saveNow: save };
}
