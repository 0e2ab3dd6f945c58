'use client';

import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import Link from 'next/link';
import { useRouter } from 'next/navigation';
import { useEffect, useState } from 'react';
import type { MemoSearchHit } from '@/lib/memos/service';
import { api } from './api';

/** The lab's memos with search (title and text), and create / rename / duplicate / archive. */
export function MemoList(props: { labId: number; canWrite: boolean; initial: MemoSearchHit[] }) {
  const router = useRouter();
  const client = useQueryClient();
  const [q, setQ] = useState('');
  const [debounced, setDebounced] = useState('');
  const [archived, setArchived] = useState(false);
  const [renaming, setRenaming] = useState<{ id: number; title: string } | null>(null);
  useEffect(() => {
    const t = setTimeout(() => setDebounced(q.trim()), 200);
    return () => clearTimeout(t);
  }, [q]);
  const base = `/api/labs/${props.labId}/memos`;
  const list = useQuery({
    queryKey: ['memos', props.labId, debounced, archived],
    queryFn: ({ signal }) => api<{ memos: MemoSearchHit[] }>(`${base}?${new URLSearchParams({ ...(debounced ? { q: debounced } : {}), ...(archived ? { archived: '1' } : {}) })}`, { signal }).then((r) => r.memos),
    initialData: debounced === '' && !archived ? props.initial : undefined,
    placeholderData: (p) => p,
  });
  const refresh = () => client.invalidateQueries({ queryKey: ['memos', props.labId] });
  const create = useMutation({ mutationFn: () => api<{ memo: { url: string } }>(base, { method: 'POST', json: {} }), onSuccess: (r) => router.push(r.memo.url) });
  const duplicate = useMutation({ mutationFn: (id: number) => api(`${base}/${id}/duplicate`, { method: 'POST', json: {} }), onSuccess: refresh });
  const patch = useMutation({ mutationFn: (v: { id: number; title?: string; archived?: boolean }) => api(`${base}/${v.id}`, { method: 'PATCH', json: { title: v.title, archived: v.archived } }), onSuccess: refresh });
  const error = create.error ?? duplicate.error ?? patch.error ?? list.error;

  return (
    <div>
      <div className="flex flex-wrap items-end gap-3">
        <div className="flex-1">
          <label htmlFor="memo-search" className="mb-1 block text-xs font-medium text-ink-soft">
            Search memos
          </label>
          <input id="memo-search" type="search" value={q} onChange={(e) => setQ(e.target.value)} placeholder="Words in the title or text" className="w-full rounded border border-paper-edge bg-white px-3 py-1.5 text-sm" />
        </div>
        <label className="flex items-center gap-1.5 pb-1.5 text-sm text-ink-soft">
          <input type="checkbox" checked={archived} onChange={(e) => setArchived(e.target.checked)} className="accent-river" /> Archived
        </label>
        {props.canWrite && (
          <button type="button" onClick={() => create.mutate()} disabled={create.isPending} className="rounded bg-oxide px-4 py-1.5 text-sm font-medium text-white hover:bg-oxide/90 disabled:opacity-60">
            New memo
          </button>
        )}
      </div>
      <p role="status" aria-live="polite" className="mt-2 min-h-5 text-sm text-oxide">
        {error ? error.message : ''}
      </p>
      <ul className="mt-2 divide-y divide-paper-edge rounded-lg border border-paper-edge bg-white/70" aria-label="Memos">
        {list.data?.length === 0 && <li className="p-6 text-center text-sm text-ink-faint">{debounced ? `No memo mentions “${debounced}”.` : archived ? 'No archived memos.' : 'No memos yet.'}</li>}
        {list.data?.map((m) => (
          <li key={m.id} className="flex items-start gap-4 p-4">
            <div className="min-w-0 flex-1">
              {renaming?.id === m.id ? (
                <form
                  onSubmit={(e) => {
                    e.preventDefault();
                    patch.mutate({ id: m.id, title: renaming.title });
                    setRenaming(null);
                  }}
                >
                  <label htmlFor={`rename-${m.id}`} className="sr-only">
                    New title
                  </label>
                  <input id={`rename-${m.id}`} autoFocus value={renaming.title} onChange={(e) => setRenaming({ id: m.id, title: e.target.value })} className="w-full rounded border border-paper-edge px-2 py-1 font-serif text-lg" />
                </form>
              ) : (
                <Link href={`/labs/${props.labId}/memos/${m.id}`} className="font-serif text-lg text-ink hover:underline">
                  {m.title}
                </Link>
              )}
              {m.snippet && <p className="mt-1 truncate text-sm text-ink-soft">{m.snippet}</p>}
              <p className="mt-1 text-xs text-ink-faint">
                Changed {new Date(m.updatedAt).toLocaleString('en-GB', { dateStyle: 'medium', timeStyle: 'short' })}
                {m.updatedByName ? ` by ${m.updatedByName}` : ''}
              </p>
            </div>
            {props.canWrite && (
              <div className="flex shrink-0 gap-2 text-xs">
                <button type="button" className="text-river hover:underline" onClick={() => setRenaming({ id: m.id, title: m.title })}>
                  Rename
                </button>
                <button type="button" className="text-river hover:underline" onClick={() => duplicate.mutate(m.id)}>
                  Duplicate
                </button>
                <button type="button" className="text-river hover:underline" onClick={() => patch.mutate({ id: m.id, archived: !m.archived })}>
                  {m.archived ? 'Restore' : 'Archive'}
                </button>
              </div>
            )}
          </li>
        ))}
      </ul>
    </div>
  );
}
