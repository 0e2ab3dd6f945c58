import { simpleParser, type AddressObject } from 'mailparser';
import { SMTPServer } from 'smtp-server';

/** A message as the local SMTP fake captured it. */
export interface CapturedMail {
  messageId: string | null;
  fromAddress: string;
  toAddresses: string;
  subject: string;
  text: string | null;
  html: string | null;
}

function addresses(a: AddressObject | AddressObject[] | undefined): string {
  if (!a) return '';
  return (Array.isArray(a) ? a : [a]).map((x) => x.text).join(', ');
}

/**
 * The local SMTP fake for development and tests: smtp-server accepts every message on
 * loopback (no TLS, any or no credentials), mailparser splits it into its text and HTML
 * parts, and `store` keeps it. Never used in production, where SMTP_HOST names a real server.
 */
export async function startMailCatcher(opts: { port: number; host?: string; store: (mail: CapturedMail) => Promise<void> }): Promise<{ port: number; close: () => Promise<void> }> {
  const server = new SMTPServer({
    secure: false,
    disabledCommands: ['STARTTLS'],
    authOptional: true,
    allowInsecureAuth: true,
    logger: false,
    size: 10 * 1024 * 1024,
    onAuth(_auth, _session, callback) {
      callback(null, { user: 'dev' });
    },
    onData(stream, _session, callback) {
      simpleParser(stream)
        .then((parsed) =>
          opts.store({
            messageId: parsed.messageId ?? null,
            fromAddress: addresses(parsed.from).slice(0, 300),
            toAddresses: addresses(parsed.to),
            subject: (parsed.subject ?? '(no subject)').slice(0, 300),
            text: parsed.text ?? null,
            html: typeof parsed.html === 'string' ? parsed.html : null,
          }),
        )
        .then(() => callback())
        .catch((e: Error) => callback(e));
    },
  });
  const host = opts.host ?? '127.0.0.1';
  await new Promise<void>((resolve, reject) => {
    server.once('error', reject);
    server.listen(opts.port, host, () => resolve());
  });
  const address = server.server.address();
  const port = typeof address === 'object' && address ? address.port : opts.port;
  return { port, close: () => new Promise<void>((resolve) => server.close(() => resolve())) };
}
