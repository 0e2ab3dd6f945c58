import type { Metadata } from 'next';
import { AppShell } from '@/components/app-shell';
import { LabDatasetsCard } from '@/components/datasets/lab-datasets-card';
import { LabMemosCard } from '@/components/editor/lab-memos-card';
import { LabHeader } from '@/components/lab-header';
import { membersOf } from '@/db/queries/labs';
import { can } from '@/lib/authz';
import { ROLE_LABEL } from '@/lib/labs/schema';
import { labPage } from '@/lib/labs/page-access';

export const dynamic = 'force-dynamic';
export const metadata: Metadata = { title: 'Lab' };

export default async function LabHome({ params }: { params: Promise<{ labId: string }> }) {
  const { labId: raw } = await params;
  const { user, labId, membership, labs } = await labPage(raw, `/labs/${raw}`);
  const members = await membersOf(labId);

  return (
    <AppShell user={user} labs={labs} currentLabId={labId}>
      <LabHeader labId={labId} labName={membership.labName} role={membership.role} current="memos" />

      <div className="mt-8 grid gap-8 md:grid-cols-[minmax(0,2fr)_minmax(0,1fr)]">
        <LabMemosCard labId={labId} canWrite={can(membership.role, 'memo:write')} />
        <aside className="space-y-6">
          <section aria-labelledby="members-heading" className="rounded-lg border border-paper-edge bg-white/60 p-6">
            <h2 id="members-heading" className="text-lg font-semibold">
              Members
            </h2>
            <ul className="mt-3 space-y-2 text-sm">
              {members.map((m) => (
                <li key={m.userId} className="flex justify-between gap-2">
                  <span>{m.name}</span>
                  <span className="text-ink-faint">{ROLE_LABEL[m.role]}</span>
                </li>
              ))}
            </ul>
          </section>
          <LabDatasetsCard labId={labId} />
        </aside>
      </div>
    </AppShell>
  );
}
