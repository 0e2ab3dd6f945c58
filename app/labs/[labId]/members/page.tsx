import type { Metadata } from 'next';
import { AppShell } from '@/components/app-shell';
import { LabHeader } from '@/components/lab-header';
import { pendingInvitations } from '@/db/queries/invitations';
import { membersOf } from '@/db/queries/labs';
import { can } from '@/lib/authz';
import { labPage } from '@/lib/labs/page-access';
import { InviteForm, LeaveLab, MemberRow, PendingInvitation, RenameLabForm } from './members-panel';

export const dynamic = 'force-dynamic';
export const metadata: Metadata = { title: 'Members' };

/** Who is in the lab and with which role. Owners also manage members and invitations here. */
export default async function MembersPage({ params }: { params: Promise<{ labId: string }> }) {
  const { labId: raw } = await params;
  const { user, labId, membership, labs } = await labPage(raw, `/labs/${raw}/members`);
  // What shows is cosmetic; every change is authorized again by the route it calls.
  const manages = can(membership.role, 'lab:manage-members');
  const [members, invitations] = await Promise.all([membersOf(labId), manages ? pendingInvitations(labId, new Date()) : Promise.resolve([])]);
  const owners = members.filter((m) => m.role === 'owner').length;

  return (
    <AppShell user={user} labs={labs} currentLabId={labId}>
      <LabHeader labId={labId} labName={membership.labName} role={membership.role} current="members" />

      <div className="mt-8 grid gap-8 md:grid-cols-[minmax(0,2fr)_minmax(0,1fr)]">
        <section aria-labelledby="members-heading" className="rounded-lg border border-paper-edge bg-white/60 p-6">
          <h2 id="members-heading" className="text-xl font-semibold">
            Members <span className="text-base font-normal text-ink-faint">({members.length})</span>
          </h2>
          <table className="mt-4 w-full text-sm">
            <thead className="text-left text-ink-faint">
              <tr>
                <th className="py-1 font-normal">Name</th>
                <th className="py-1 font-normal">E-mail</th>
                <th className="py-1 font-normal">Role</th>
                {manages && <th className="py-1 font-normal">
                  <span className="sr-only">Actions</span>
                </th>}
              </tr>
            </thead>
            <tbody>
              {members.map((m) => (
                <MemberRow
                  key={m.userId}
                  labId={labId}
                  member={{ userId: m.userId, name: m.name, email: m.email, role: m.role }}
                  isMe={m.userId === user.id}
                  manages={manages}
                  lastOwner={m.role === 'owner' && owners <= 1}
                />
              ))}
            </tbody>
          </table>
          <p className="mt-4 text-xs text-ink-faint">
            Owner: members, reading links and everything else. Author: writes memos, data and blocks. Reviewer: reads and leaves margin notes. Reader: reads.
          </p>
        </section>

        <aside className="space-y-6">
          {manages && (
            <section aria-labelledby="invite-heading" className="rounded-lg border border-paper-edge bg-white/60 p-6">
              <h2 id="invite-heading" className="text-lg font-semibold">
                Invite a colleague
              </h2>
              {user.emailVerified ? (
                <InviteForm labId={labId} />
              ) : (
                <p className="mt-2 text-sm text-ink-soft">Confirm your own e-mail address first (see the note at the top of the page).</p>
              )}
              {invitations.length > 0 && (
                <div className="mt-6 border-t border-paper-edge pt-4">
                  <h3 className="text-sm font-medium text-ink-soft">Pending invitations</h3>
                  <ul className="mt-2 space-y-2 text-sm">
                    {invitations.map((i) => (
                      <PendingInvitation key={i.id} labId={labId} invitation={{ id: i.id, email: i.email, role: i.role, expiresAt: i.expiresAt.toISOString() }} />
                    ))}
                  </ul>
                </div>
              )}
            </section>
          )}
          {can(membership.role, 'lab:rename') && (
            <section aria-labelledby="rename-heading" className="rounded-lg border border-paper-edge bg-white/60 p-6">
              <h2 id="rename-heading" className="text-lg font-semibold">
                Lab name
              </h2>
              <RenameLabForm labId={labId} name={membership.labName} />
            </section>
          )}
          <section aria-labelledby="leave-heading" className="rounded-lg border border-paper-edge bg-white/60 p-6">
            <h2 id="leave-heading" className="text-lg font-semibold">
              Leave this lab
            </h2>
            <LeaveLab labId={labId} blocked={membership.role === 'owner' && owners <= 1} />
          </section>
        </aside>
      </div>
    </AppShell>
  );
}
