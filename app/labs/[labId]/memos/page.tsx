import type { Metadata } from 'next';
import { AppShell } from '@/components/app-shell';
import { MemoList } from '@/components/editor/memo-list';
import { LabNav } from '@/components/lab-nav';
import { can } from '@/lib/authz';
import { labPage } from '@/lib/labs/page-access';
import { searchMemos } from '@/lib/memos';

export const dynamic = 'force-dynamic';
export const metadata: Metadata = { title: 'Memos' };

/** The lab's memos, searchable by title and text. */
export default async function MemosPage({ params }: { params: Promise<{ labId: string }> }) {
  const { labId: raw } = await params;
  const { user, labId, membership, labs } = await labPage(raw, `/labs/${raw}/memos`, 'memo:read');
  const memos = await searchMemos(labId, undefined);
  return (
    <AppShell user={user} labs={labs} currentLabId={labId}>
      <p className="text-sm tracking-wide text-ink-faint uppercase">Lab</p>
      <h1 className="text-3xl font-semibold">{membership.labName}</h1>
      <LabNav labId={labId} role={membership.role} current="memos" />
      <section aria-labelledby="memos-heading" className="mt-6">
        <h2 id="memos-heading" className="mb-4 text-2xl font-semibold">
          Memos
        </h2>
        <MemoList labId={labId} canWrite={can(membership.role, 'memo:write')} initial={memos} />
      </section>
    </AppShell>
  );
}
