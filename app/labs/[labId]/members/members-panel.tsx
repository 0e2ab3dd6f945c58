'use client';

import { useRouter } from 'next/navigation';
import { useState } from 'react';
import { Field, FormStatus, SelectField, SubmitButton } from '@/components/auth/field';
import { callApi, useJsonForm } from '@/components/auth/form-kit';
import { inviteSchema, renameLabSchema, ROLE_LABEL, ROLE_VALUES } from '@/lib/labs/schema';

type Role = (typeof ROLE_VALUES)[number];
const ROLE_OPTIONS = ROLE_VALUES.map((r) => ({ value: r, label: ROLE_LABEL[r] }));

export function MemberRow(props: { labId: number; member: { userId: number; name: string; email: string; role: Role }; isMe: boolean; manages: boolean; lastOwner: boolean }) {
  const router = useRouter();
  const [message, setMessage] = useState<string>();
  const [pending, setPending] = useState(false);
  const { member } = props;
  const base = `/api/labs/${props.labId}/members/${member.userId}`;

  async function run(method: 'PATCH' | 'DELETE', body?: unknown) {
    setPending(true);
    const r = await callApi(base, method, body);
    setPending(false);
    if (!r.ok) {
      setMessage(r.message);
      router.refresh();
      return;
    }
    setMessage(undefined);
    router.refresh();
  }

  return (
    <tr className="border-t border-paper-edge align-top" data-member={member.email}>
      <td className="py-2 pr-2">
        {member.name}
        {props.isMe && <span className="ml-1 text-ink-faint">(you)</span>}
      </td>
      <td className="py-2 pr-2 text-ink-soft">{member.email}</td>
      <td className="py-2 pr-2">
        {props.manages ? (
          <>
            <label htmlFor={`role-${member.userId}`} className="sr-only">
              Role of {member.name}
            </label>
            <select
              id={`role-${member.userId}`}
              value={member.role}
              disabled={pending}
              onChange={(e) => run('PATCH', { role: e.target.value })}
              className="rounded border border-paper-edge bg-white px-2 py-1"
            >
              {ROLE_OPTIONS.map((o) => (
                <option key={o.value} value={o.value} disabled={props.lastOwner && o.value !== 'owner'}>
                  {o.label}
                </option>
              ))}
            </select>
          </>
        ) : (
          ROLE_LABEL[member.role]
        )}
        {message && (
          <p role="alert" className="mt-1 text-xs text-oxide">
            {message}
          </p>
        )}
      </td>
      {props.manages && (
        <td className="py-2 text-right">
          {!props.isMe && (
            <button
              type="button"
              disabled={pending || props.lastOwner}
              onClick={() => {
                if (window.confirm(`Remove ${member.name} from the lab?`)) void run('DELETE');
              }}
              className="text-sm text-oxide hover:underline disabled:opacity-40"
            >
              Remove<span className="sr-only"> {member.name}</span>
            </button>
          )}
        </td>
      )}
    </tr>
  );
}

export function InviteForm({ labId }: { labId: number }) {
  const router = useRouter();
  const { state, setState, pending, onSubmit } = useJsonForm(
    inviteSchema,
    ['email', 'role'],
    (data) => callApi(`/api/labs/${labId}/invitations`, 'POST', data),
    (result, data) => {
      const { invitation } = result.data as { invitation: { email: string } };
      setState({ errors: {}, message: `Invitation sent to ${invitation.email} as ${ROLE_LABEL[data.role]}.`, tone: 'ok' });
      (document.getElementById('invite-field-email') as HTMLInputElement | null)?.form?.reset();
      router.refresh();
    },
  );
  return (
    <form onSubmit={onSubmit} noValidate className="mt-4 space-y-4">
      <Field prefix="invite" label="E-mail address" name="email" type="email" autoComplete="off" error={state.errors.email} />
      <SelectField prefix="invite" label="Role" name="role" options={ROLE_OPTIONS} defaultValue="author" error={state.errors.role} />
      <FormStatus message={state.message} tone={state.tone} />
      <SubmitButton pending={pending} label="Send invitation" pendingLabel="Sending…" />
    </form>
  );
}

export function PendingInvitation({ labId, invitation }: { labId: number; invitation: { id: number; email: string; role: Role; expiresAt: string } }) {
  const router = useRouter();
  const [message, setMessage] = useState<string>();
  return (
    <li className="flex items-start justify-between gap-2">
      <span>
        {invitation.email} <span className="text-ink-faint">· {ROLE_LABEL[invitation.role]}</span>
        <span className="block text-xs text-ink-faint">expires {invitation.expiresAt.slice(0, 10)}</span>
        {message && <span className="block text-xs text-oxide">{message}</span>}
      </span>
      <button
        type="button"
        className="text-oxide hover:underline"
        onClick={async () => {
          const r = await callApi(`/api/labs/${labId}/invitations/${invitation.id}`, 'DELETE');
          if (!r.ok) setMessage(r.message);
          router.refresh();
        }}
      >
        Revoke<span className="sr-only"> the invitation for {invitation.email}</span>
      </button>
    </li>
  );
}

export function RenameLabForm({ labId, name }: { labId: number; name: string }) {
  const router = useRouter();
  const { state, setState, pending, onSubmit } = useJsonForm(
    renameLabSchema,
    ['name'],
    (data) => callApi(`/api/labs/${labId}`, 'PATCH', data),
    () => {
      setState({ errors: {}, message: 'Renamed.', tone: 'ok' });
      router.refresh();
    },
  );
  return (
    <form onSubmit={onSubmit} noValidate className="mt-4 space-y-4">
      <Field prefix="rename" label="Name" name="name" defaultValue={name} maxLength={120} error={state.errors.name} />
      <FormStatus message={state.message} tone={state.tone} />
      <SubmitButton pending={pending} label="Rename lab" pendingLabel="Saving…" tone="quiet" />
    </form>
  );
}

export function LeaveLab({ labId, blocked }: { labId: number; blocked: boolean }) {
  const router = useRouter();
  const [message, setMessage] = useState<string>();
  if (blocked) return <p className="mt-2 text-sm text-ink-soft">You are the only Owner. Make another member an Owner before you leave.</p>;
  return (
    <div className="mt-2 space-y-2 text-sm">
      <p className="text-ink-soft">You lose access to the lab&apos;s memos and data until someone invites you again.</p>
      <button
        type="button"
        className="rounded-md border border-oxide/40 px-3 py-1.5 text-oxide hover:bg-oxide-wash"
        onClick={async () => {
          if (!window.confirm('Leave this lab?')) return;
          const r = await callApi(`/api/labs/${labId}/membership`, 'DELETE');
          if (!r.ok) {
            setMessage(r.message);
            return;
          }
          router.push('/');
          router.refresh();
        }}
      >
        Leave lab
      </button>
      <FormStatus message={message} />
    </div>
  );
}
