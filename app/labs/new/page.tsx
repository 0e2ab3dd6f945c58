import type { Metadata } from 'next';
import { redirect } from 'next/navigation';
import { AppShell } from '@/components/app-shell';
import { labsForUser } from '@/db/queries/labs';
import { currentUser } from '@/lib/auth/session';
import { CreateLabForm } from './create-lab-form';

export const dynamic = 'force-dynamic';
export const metadata: Metadata = { title: 'Create a lab' };

export default async function NewLabPage() {
  const user = await currentUser();
  if (!user) redirect('/sign-in?callbackUrl=/labs/new');
  const labs = await labsForUser(user.id);
  return (
    <AppShell user={user} labs={labs}>
      <div className="max-w-xl">
        <p className="text-sm tracking-wide text-ink-faint uppercase">New lab</p>
        <h1 className="text-3xl font-semibold">Create a lab</h1>
        <p className="mt-3 text-ink-soft">
          A lab holds your team&apos;s memos and datasets. You will be its Owner: you invite members and give each one a role — Author, Reviewer or
          Reader.
        </p>
        <CreateLabForm />
      </div>
    </AppShell>
  );
}
