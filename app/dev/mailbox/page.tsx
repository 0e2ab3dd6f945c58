import type { Metadata } from 'next';
import Link from 'next/link';
import { notFound } from 'next/navigation';
import { Wordmark } from '@/components/wordmark';
import { listDevMail } from '@/db/queries/dev-mail';
import { mailboxEnabled } from './enabled';

export const dynamic = 'force-dynamic';
export const metadata: Metadata = { title: 'Development mailbox', robots: { index: false } };

/** Every message the local SMTP fake captured, newest first. Development and tests only. */
export default async function MailboxPage() {
  if (!mailboxEnabled()) notFound();
  const messages = await listDevMail(200);
  return (
    <main className="margin-rule min-h-screen">
      <div className="mx-auto max-w-5xl px-6 py-10 pl-20">
        <Wordmark />
        <p className="mt-8 text-sm tracking-wide text-amber uppercase">Development only</p>
        <h1 className="text-3xl font-semibold">Mailbox</h1>
        <p className="mt-2 text-sm text-ink-soft">Mail the app sent to the local SMTP fake. Nothing here left this machine.</p>
        {messages.length === 0 ? (
          <p className="mt-8 text-ink-faint">No mail yet.</p>
        ) : (
          <table className="mt-6 w-full text-sm">
            <thead className="text-left text-ink-faint">
              <tr>
                <th className="py-1 font-normal">Received (UTC)</th>
                <th className="py-1 font-normal">To</th>
                <th className="py-1 font-normal">Subject</th>
              </tr>
            </thead>
            <tbody>
              {messages.map((m) => (
                <tr key={m.id} className="border-t border-paper-edge">
                  <td className="py-2 font-mono text-xs text-ink-faint tabular">{m.receivedAt.toISOString().replace('T', ' ').slice(0, 19)}</td>
                  <td className="py-2 pr-4">{m.toAddresses}</td>
                  <td className="py-2">
                    <Link href={`/dev/mailbox/${m.id}`} className="text-river underline">
                      {m.subject}
                    </Link>
                  </td>
                </tr>
              ))}
            </tbody>
          </table>
        )}
      </div>
    </main>
  );
}
