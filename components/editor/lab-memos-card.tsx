import Link from 'next/link';
import { searchMemos } from '@/lib/memos';
import { NewMemoButton } from './new-memo-button';

/**
 * A lab's recent memos with a "New memo" action, for the lab home. Server component: the
 * page that uses it has already checked that the user is a member of the lab.
 */
export async function LabMemosCard({ labId, canWrite }: { labId: number; canWrite: boolean }) {
  const memos = (await searchMemos(labId, undefined)).slice(0, 8);
  return (
    <section aria-labelledby="lab-memos-heading" className="rounded-lg border border-paper-edge bg-white/60 p-6">
      <div className="flex items-baseline justify-between gap-4">
        <h2 id="lab-memos-heading" className="text-xl font-semibold">
          Memos
        </h2>
        <div className="flex items-center gap-3 text-sm">
          <Link href={`/labs/${labId}/memos`} className="text-river hover:underline">
            All memos
          </Link>
          {canWrite && <NewMemoButton labId={labId} />}
        </div>
      </div>
      {memos.length === 0 ? (
        <div className="mt-4 rounded-md border border-dashed border-paper-edge p-8 text-center">
          <p className="font-serif text-lg">No memos yet.</p>
          <p className="mt-1 text-sm text-ink-faint">A memo is text with live Estimate blocks in it: every number is recomputed when its data or settings change.</p>
        </div>
      ) : (
        <ul className="mt-4 divide-y divide-paper-edge">
          {memos.map((m) => (
            <li key={m.id} className="py-2">
              <Link href={`/labs/${labId}/memos/${m.id}`} className="font-serif text-lg hover:underline">
                {m.title}
              </Link>
              <p className="truncate text-sm text-ink-faint">{m.snippet}</p>
            </li>
          ))}
        </ul>
      )}
    </section>
  );
}
