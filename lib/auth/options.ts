import 'server-only';
import type { NextAuthOptions } from 'next-auth';
import CredentialsProvider from 'next-auth/providers/credentials';
import { z } from 'zod';
import { findUserByEmail } from '@/db/queries/users';
import { verifyPassword } from './password';

const credentialsSchema = z.object({
  email: z.email().max(254),
  password: z.string().min(1).max(200),
});

// Sessions expire after 12 hours of inactivity (a working day), refreshed while in use.
const SESSION_MAX_AGE = 12 * 60 * 60;

export const authOptions: NextAuthOptions = {
  secret: process.env.NEXTAUTH_SECRET,
  session: { strategy: 'jwt', maxAge: SESSION_MAX_AGE, updateAge: 15 * 60 },
  pages: { signIn: '/sign-in' },
  providers: [
    CredentialsProvider({
      name: 'E-mail and password',
      credentials: { email: { label: 'E-mail', type: 'email' }, password: { label: 'Password', type: 'password' } },
      async authorize(raw) {
        const parsed = credentialsSchema.safeParse(raw);
        if (!parsed.success) return null;
        const user = await findUserByEmail(parsed.data.email);
        // Compare against a dummy hash when the user is unknown so timing does not reveal accounts.
        const ok = await verifyPassword(parsed.data.password, user?.passwordHash ?? '$2b$10$CwTycUXWue0Thq9StjUM0uJ8.jZ6Vv7Ww6Q0k3hS6Wq1e6Hf4r7yK');
        if (!user || !ok) return null;
        return { id: String(user.id), email: user.email, name: user.name };
      },
    }),
  ],
  callbacks: {
    async jwt({ token, user }) {
      if (user) token.uid = Number(user.id);
      return token;
    },
    async session({ session, token }) {
      if (session.user) (session.user as { id?: number }).id = token.uid as number;
      return session;
    },
  },
};
