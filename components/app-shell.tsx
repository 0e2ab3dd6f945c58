import Link from 'next/link';
import { SignOutButton } from './auth/sign-out-button';
import { Wordmark } from './wordmark';

export interface ShellLab {
  id: number;
  name: string;
  role: string;
}

/** The frame around signed-in pages: wordmark, the user's labs, and the account. */
export function AppShell(props: { user: { name: string; email: string }; labs: ShellLab[]; currentLabId?: number; children: React.ReactNode }) {
  return (
    <div className="margin-rule min-h-screen">
      <header className="border-b border-paper-edge bg-paper/90 backdrop-blur">
        <div className="mx-auto flex max-w-6xl items-center gap-6 px-6 py-3 pl-20">
          <Wordmark />
          <nav aria-label="Labs" className="flex flex-wrap gap-1 text-sm">
            {props.labs.map((lab) => (
              <Link
                key={lab.id}
                href={`/labs/${lab.id}`}
                aria-current={lab.id === props.currentLabId ? 'page' : undefined}
                className={`rounded px-2 py-1 ${lab.id === props.currentLabId ? 'bg-river-wash text-river' : 'text-ink-soft hover:bg-paper-deep'}`}
              >
                {lab.name}
              </Link>
            ))}
          </nav>
          <div className="ml-auto flex items-center gap-4">
            <span className="text-sm text-ink-faint" title={props.user.email}>
              {props.user.name}
            </span>
            <SignOutButton />
          </div>
        </div>
      </header>
      <div className="mx-auto max-w-6xl px-6 py-8 pl-20">{props.children}</div>
    </div>
  );
}
