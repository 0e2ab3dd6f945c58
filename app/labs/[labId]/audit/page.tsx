import type { Metadata } from 'next';
import Link from 'next/link';
import { AppShell } from '@/components/app-shell';
import { LabNav } from '@/components/lab-nav';
import { listLabAudit } from '@/db/queries/audit';
import { membersOf } from '@/db/queries/labs';
import { labPage } from '@/lib/labs/page-access';
import { describeEvent } from './describe';

export const dynamic = 'force-dynamic';
export const metadata: Metadata = { title: 'Audit trail' };

const PAGE = 50;

/** The lab's audit trail, newest first (Owners only; others get "not found"). */
export default async function AuditPage({ params, searchParams }: { params: Promise<{ labId: string }>; searchParams: Promise<{ before?: string }> }) {
  const { labId: raw } = await params;
  const { user, labId, membership, labs } = await labPage(raw, `/labs/${raw}/audit`, 'lab:read-audit');
  const before = Number((await searchParams).before);
  const [events, members] = await Promise.all([
    listLabAudit(labId, { limit: PAGE, beforeId: Number.isInteger(before) && before > 0 ? before : undefined }),
    membersOf(labId),
  ]);
  const names = new Map(members.map((m) => [`user:${m.userId}`, m.name]));

  return (
    <AppShell user={user} labs={labs} currentLabId={labId}>
      <p className="text-sm tracking-wide text-ink-faint uppercase">Lab</p>
      <h1 className="text-3xl font-semibold">{membership.labName}</h1>
      <LabNav labId={labId} role={membership.role} current="audit" />
      <section aria-labelledby="audit-heading" className="mt-8 rounded-lg border border-paper-edge bg-white/60 p-6">
        <h2 id="audit-heading" className="text-xl font-semibold">
          Audit trail
        </h2>
        <p className="mt-1 text-sm text-ink-faint">Every change to members, invitations, data and memos, as recorded on the server. Times in UTC.</p>
        {events.length === 0 ? (
          <p className="mt-4 text-sm text-ink-faint">No events yet.</p>
        ) : (
          <ol className="mt-4 divide-y divide-paper-edge text-sm">
            {events.map((e) => (
              <li key={e.id} className="grid grid-cols-[11rem_1fr] gap-4 py-2">
                <time dateTime={e.createdAt.toISOString()} className="font-mono text-xs text-ink-faint tabular">
                  {e.createdAt.toISOString().replace('T', ' ').slice(0, 19)}
                </time>
                <span>
                  <strong className="font-medium">{e.actorName ?? 'Someone (account deleted)'}</strong> {describeEvent(e.action, names.get(e.subject) ?? null, e.detail ?? null)}
                </span>
              </li>
            ))}
          </ol>
        )}
        {events.length === PAGE && (
          <Link href={`/labs/${labId}/audit?before=${events[events.length - 1].id}`} className="mt-4 inline-block text-sm text-river underline">
            Older events
          </Link>
        )}
      </section>
    </AppShell>
  );
}
