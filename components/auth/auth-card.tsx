import { Wordmark } from '../wordmark';

/** The narrow card used by sign-up, reset, verification and invitation pages. */
export function AuthCard({ title, lead, children }: { title: string; lead?: React.ReactNode; children: React.ReactNode }) {
  return (
    <main className="margin-rule min-h-screen">
      <div className="mx-auto max-w-lg px-6 py-16 pl-20">
        <Wordmark />
        <section className="mt-10 rounded-lg border border-paper-edge bg-white/70 p-8 shadow-sm">
          <h1 className="text-2xl font-semibold">{title}</h1>
          {lead && <div className="mt-1 text-sm text-ink-soft">{lead}</div>}
          {children}
        </section>
      </div>
    </main>
  );
}
