'use client';

import { useRouter } from 'next/navigation';
import { useState } from 'react';
import { api } from './api';

export function NewMemoButton({ labId }: { labId: number }) {
  const router = useRouter();
  const [error, setError] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);
  return (
    <>
      <button
        type="button"
        disabled={busy}
        className="rounded bg-oxide px-3 py-1 font-medium text-white hover:bg-oxide/90 disabled:opacity-60"
        onClick={async () => {
          setBusy(true);
          try {
            const r = await api<{ memo: { url: string } }>(`/api/labs/${labId}/memos`, { method: 'POST', json: {} });
            router.push(r.memo.url);
          } catch (e) {
            setError((e as Error).message);
            setBusy(false);
          }
        }}
      >
        New memo
      </button>
      {error && (
        <span role="alert" className="text-oxide">
          {error}
        </span>
      )}
    </>
  );
}
