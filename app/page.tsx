import { redirect } from 'next/navigation';
import { AppShell } from '@/components/app-shell';
import { labsForUser } from '@/db/queries/labs';
import { currentUser } from '@/lib/auth/session';

export const dynamic = 'force-dynamic';

/** Signed-out visitors go to sign-in; members go to their first lab. */
export default async function Home() {
  const user = await currentUser();
  if (!user) redirect('/sign-in');
  const labs = await labsForUser(user.id);
  if (labs.length > 0) redirect(`/labs/${labs[0].id}`);
  return (
    <AppShell user={user} labs={[]}>
      <h1 className="text-3xl font-semibold">Welcome to Margin</h1>
      <p className="mt-3 max-w-prose text-ink-soft">
        You are not a member of any lab yet. Ask a lab Owner to invite you, or create a lab of your own.
      </p>
    </AppShell>
  );
}
