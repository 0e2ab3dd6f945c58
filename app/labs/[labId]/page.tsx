import type { Metadata } from 'next';
import { notFound, redirect } from 'next/navigation';
import { AppShell } from '@/components/app-shell';
import { LabDatasetsCard } from '@/components/datasets/lab-datasets-card';
import { LabMemosCard } from '@/components/editor/lab-memos-card';
import { LabNav } from '@/components/lab-nav';
import { labsForUser, membersOf, membershipOf } from '@/db/queries/labs';
import { currentUser } from '@/lib/auth/session';
import { can } from '@/lib/authz';

export const dynamic = 'force-dynamic';
export const metadata: Metadata = { title: 'Lab' };

const ROLE_LABEL = { owner: 'Owner', author: 'Author', reviewer: 'Reviewer', reader: 'Reader' } as const;

export default async function LabHome({ params }: { params: Promise<{ labId: string }> }) {
  const user = await currentUser();
  if (!user) redirect('/sign-in');
  const labId = Number((await params).labId);
  if (!Number.isInteger(labId) || labId <= 0) notFound();
  const membership = await membershipOf(user.id, labId);
  if (!membership) notFound();
  const [labs, members] = await Promise.all([labsForUser(user.id), membersOf(labId)]);

  return (
    <AppShell user={user} labs={labs} currentLabId={labId}>
      <div className="flex items-baseline justify-between gap-4">
        <div>
          <p className="text-sm tracking-wide text-ink-faint uppercase">Lab</p>
          <h1 className="text-3xl font-semibold">{membership.labName}</h1>
        </div>
        <p className="text-sm text-ink-soft">
          You are <strong className="font-medium text-ink">{ROLE_LABEL[membership.role]}</strong> here
        </p>
      </div>
      <LabNav labId={labId} role={membership.role} current="memos" />

      <div className="mt-8 grid gap-8 md:grid-cols-[2fr_1fr]">
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
