import Link from 'next/link';
import { SignOutButton } from './auth/sign-out-button';
import { Wordmark } from './wordmark';

export interface ShellLab {
  id: number;
  name: string;
  role: string;
}

const ROLE_LABEL: Record<string, string> = { owner: 'Owner', author: 'Author', reviewer: 'Reviewer', reader: 'Reader' };

/**
 * The frame around signed-in pages: wordmark, the lab switcher (a plain <details> menu, no
 * script needed), the account link, and a reminder while the e-mail address is unconfirmed.
 */
export function AppShell(props: {
  user: { name: string; email: string; emailVerified?: boolean };
  labs: ShellLab[];
  currentLabId?: number;
  children: React.ReactNode;
}) {
  const current = props.labs.find((l) => l.id === props.currentLabId);
  return (
    <div className="margin-rule min-h-screen">
      <header className="border-b border-paper-edge bg-paper/90 backdrop-blur">
        <div className="mx-auto flex max-w-6xl items-center gap-6 px-6 py-3 pl-20">
          <Wordmark />
          <nav aria-label="Labs" className="relative text-sm">
            <details className="group">
              <summary className="flex cursor-pointer list-none items-center gap-2 rounded px-2 py-1 text-ink-soft hover:bg-paper-deep">
                <span className="text-ink-faint">Lab</span>
                <span className="font-medium text-ink">{current ? current.name : props.labs.length ? 'Choose a lab' : 'No lab yet'}</span>
                <span aria-hidden className="text-ink-faint group-open:rotate-180">
                  ▾
                </span>
              </summary>
              <ul className="absolute left-0 z-20 mt-1 min-w-64 rounded-md border border-paper-edge bg-white py-1 shadow-md">
                {props.labs.map((lab) => (
                  <li key={lab.id}>
                    <Link
                      href={`/labs/${lab.id}`}
                      aria-current={lab.id === props.currentLabId ? 'page' : undefined}
                      className={`flex justify-between gap-4 px-3 py-1.5 ${lab.id === props.currentLabId ? 'bg-river-wash text-river' : 'text-ink hover:bg-paper-deep'}`}
                    >
                      <span>{lab.name}</span>
                      <span className="text-ink-faint">{ROLE_LABEL[lab.role] ?? lab.role}</span>
                    </Link>
                  </li>
                ))}
                <li className={props.labs.length ? 'mt-1 border-t border-paper-edge pt-1' : ''}>
                  <Link href="/labs/new" className="block px-3 py-1.5 text-river hover:bg-paper-deep">
                    + Create a lab
                  </Link>
                </li>
              </ul>
            </details>
          </nav>
          <div className="ml-auto flex items-center gap-4">
            <Link href="/account" className="text-sm text-ink-soft hover:text-ink" title={props.user.email}>
              {props.user.name}
            </Link>
            <SignOutButton />
          </div>
        </div>
      </header>
      {props.user.emailVerified === false && (
        <div role="note" className="border-b border-amber/30 bg-amber-wash">
          <p className="mx-auto max-w-6xl px-6 py-2 pl-20 text-sm text-ink-soft">
            Confirm your e-mail address with the link we sent to <strong className="font-medium text-ink">{props.user.email}</strong>. Until then you
            cannot invite others.{' '}
            <Link href="/account#verification" className="text-river underline">
              Send it again
            </Link>
          </p>
        </div>
      )}
      <div className="mx-auto max-w-6xl px-6 py-8 pl-20">{props.children}</div>
    </div>
  );
}
