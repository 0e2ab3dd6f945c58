import 'server-only';

/** The development mailbox exists only where the local SMTP fake runs (npm run up, tests). */
export function mailboxEnabled(): boolean {
  return process.env.MARGIN_DEV_MAILBOX === '1';
}
