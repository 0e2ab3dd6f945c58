import type { Metadata } from 'next';
import Link from 'next/link';
import { notFound } from 'next/navigation';
import { AppShell } from '@/components/app-shell';
import { MemoEditor } from '@/components/editor/memo-editor';
import { LabNav } from '@/components/lab-nav';
import { findMemo } from '@/db/queries/memos';
import { membershipOf } from '@/db/queries/labs';
import { currentUser } from '@/lib/auth/session';
import { can } from '@/lib/authz';
import { idParam, labPage } from '@/lib/labs/page-access';
import { pickerDatasets } from '@/lib/memos/picker';
import { memoResults } from '@/lib/memos/results';

export const dynamic = 'force-dynamic';

export async function generateMetadata({ params }: { params: Promise<{ labId: string; memoId: string }> }): Promise<Metadata> {
  const user = await currentUser();
  const { labId, memoId } = await params;
  const memo = user ? await findMemo(Number(memoId)) : undefined;
  const member = memo && user ? await membershipOf(user.id, memo.labId) : undefined;
  return { title: memo && member && memo.labId === Number(labId) ? memo.title : 'Memo' };
}

/**
 * A memo: loads it and every block's current result on the server (cached results come
 * with the page; missing ones start computing), then hands over to the client editor.
 */
export default async function MemoPage({ params }: { params: Promise<{ labId: string; memoId: string }> }) {
  const raw = await params;
  const { user, labId, membership, labs } = await labPage(raw.labId, `/labs/${raw.labId}/memos/${raw.memoId}`, 'memo:read');
  const memoId = idParam(raw.memoId);
  if (!memoId) notFound();
  const memo = await findMemo(memoId);
  if (!memo || memo.labId !== labId) notFound();
  const canWrite = can(membership.role, 'memo:write');
  const canCompute = can(membership.role, 'run:compute');
  const [datasets, initial] = await Promise.all([pickerDatasets(labId), memoResults({ labId, memoId, doc: memo.doc, userId: user.id, canCompute })]);

  return (
    <AppShell user={user} labs={labs} currentLabId={labId}>
      <p className="text-sm text-ink-faint">
        <Link href={`/labs/${labId}/memos`} className="hover:underline">
          {membership.labName} · Memos
        </Link>
      </p>
      <LabNav labId={labId} role={membership.role} current="memos" />
      <div className="mx-auto mt-6 max-w-4xl">
        <MemoEditor labId={labId} memoId={memoId} title={memo.title} doc={memo.doc} revision={memo.revision} archived={memo.archivedAt !== null} canWrite={canWrite} canCompute={canCompute} datasets={datasets} initial={initial} />
      </div>
    </AppShell>
  );
}
