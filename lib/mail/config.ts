import 'server-only';

/**
 * Mail settings from the environment. The same code serves development (the local SMTP fake
 * on loopback that `npm run up` and the tests start) and production (any SMTP host).
 *   SMTP_HOST, SMTP_PORT   where to deliver (port 465 means TLS from the first byte)
 *   SMTP_USER, SMTP_PASS   optional credentials
 *   MAIL_FROM              the From header, e.g. "Margin <margin@lab.example.org>"
 *   NEXTAUTH_URL           the app's public address, used to build links in mail
 */
export interface MailConfig {
  host: string;
  port: number;
  secure: boolean;
  auth?: { user: string; pass: string };
  from: string;
}

export function mailConfig(env: NodeJS.ProcessEnv = process.env): MailConfig | null {
  if (!env.SMTP_HOST) return null;
  const port = Number(env.SMTP_PORT ?? 587);
  return {
    host: env.SMTP_HOST,
    port,
    secure: port === 465,
    auth: env.SMTP_USER ? { user: env.SMTP_USER, pass: env.SMTP_PASS ?? '' } : undefined,
    from: env.MAIL_FROM ?? 'Margin <margin@localhost>',
  };
}

/** The app's public origin for links in mail. Never taken from the request's Host header, which a client controls. */
export function appUrl(env: NodeJS.ProcessEnv = process.env): string {
  return (env.NEXTAUTH_URL ?? 'http://127.0.0.1:3000').replace(/\/+$/, '');
}
