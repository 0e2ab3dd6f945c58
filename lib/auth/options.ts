import 'server-only';
import type { NextAuthOptions } from 'next-auth';
import CredentialsProvider from 'next-auth/providers/credentials';
import { z } from 'zod';
import { AppError } from '../errors';
import { clientAddress } from './client-address';
import { signInWithPassword } from './sign-in';

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
      async authorize(raw, req) {
        const parsed = credentialsSchema.safeParse(raw);
        if (!parsed.success) return null;
        try {
          const user = await signInWithPassword({ ...parsed.data, address: clientAddress(req?.headers ?? {}) });
          if (!user) return null;
          return { id: String(user.id), email: user.email, name: user.name, sv: user.sessionVersion };
        } catch (e) {
          // next-auth hands a thrown Error's message to the sign-in form (res.error).
          if (e instanceof AppError && e.kind === 'rate_limited') throw new Error(e.message);
          throw e;
        }
      },
    }),
  ],
  callbacks: {
    async jwt({ token, user }) {
      if (user) {
        token.uid = Number(user.id);
        token.sv = (user as { sv?: number }).sv ?? 0;
      }
      return token;
    },
    async session({ session, token }) {
      if (session.user) {
        const u = session.user as { id?: number; sv?: number };
        u.id = token.uid as number;
        u.sv = (token.sv as number | undefined) ?? 0;
      }
      return session;
    },
  },
};
