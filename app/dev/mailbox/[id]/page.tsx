import type { Metadata } from 'next';
import Link from 'next/link';
import { notFound } from 'next/navigation';
import { Wordmark } from '@/components/wordmark';
import { findDevMail } from '@/db/queries/dev-mail';
import { mailboxEnabled } from '../enabled';

export const dynamic = 'force-dynamic';
export const metadata: Metadata = { title: 'Captured message', robots: { index: false } };

/**
 * One captured message: headers, the HTML part in a sandboxed frame (no scripts, no same-origin
 * access), and the plain-text part. Links in the HTML part open in a new tab.
 */
export default async function MailPage({ params }: { params: Promise<{ id: string }> }) {
  if (!mailboxEnabled()) notFound();
  const id = Number((await params).id);
  if (!Number.isInteger(id) || id <= 0) notFound();
  const mail = await findDevMail(id);
  if (!mail) notFound();
  return (
    <main className="margin-rule min-h-screen">
      <div className="mx-auto max-w-5xl px-6 py-10 pl-20">
        <Wordmark />
        <p className="mt-8 text-sm">
          <Link href="/dev/mailbox" className="text-river underline">
            ← Mailbox
          </Link>
        </p>
        <h1 className="mt-2 text-2xl font-semibold">{mail.subject}</h1>
        <dl className="mt-3 grid grid-cols-[5rem_1fr] gap-1 text-sm">
          <dt className="text-ink-faint">From</dt>
          <dd>{mail.fromAddress}</dd>
          <dt className="text-ink-faint">To</dt>
          <dd>{mail.toAddresses}</dd>
          <dt className="text-ink-faint">Received</dt>
          <dd className="font-mono text-xs">{mail.receivedAt.toISOString()}</dd>
        </dl>
        {mail.html && (
          <section aria-labelledby="html-heading" className="mt-6">
            <h2 id="html-heading" className="text-lg font-semibold">
              HTML part
            </h2>
            <iframe
              title="HTML part of the message"
              sandbox="allow-popups allow-popups-to-escape-sandbox"
              srcDoc={mail.html.replace(/<head>/i, '<head><base target="_blank">')}
              className="mt-2 h-[560px] w-full rounded border border-paper-edge bg-white"
            />
          </section>
        )}
        <section aria-labelledby="text-heading" className="mt-6">
          <h2 id="text-heading" className="text-lg font-semibold">
            Plain-text part
          </h2>
          <pre className="mt-2 rounded border border-paper-edge bg-white p-4 font-mono text-sm whitespace-pre-wrap">{mail.text ?? '(none)'}</pre>
        </section>
      </div>
    </main>
  );
}
