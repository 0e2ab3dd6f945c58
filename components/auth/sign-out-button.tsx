'use client';

import { signOut } from 'next-auth/react';

export function SignOutButton() {
  return (
    <button type="button" onClick={() => signOut({ callbackUrl: '/sign-in' })} className="text-sm text-ink-soft hover:text-oxide">
      Sign out
    </button>
  );
}
