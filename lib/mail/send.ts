import 'server-only';
import nodemailer, { type Transporter } from 'nodemailer';
import { AppError } from '../errors';
import { mailConfig, type MailConfig } from './config';

export interface OutgoingMail {
  to: string;
  subject: string;
  text: string;
  html: string;
}

// One transporter per distinct configuration (tests change SMTP_PORT between files).
let cached: { key: string; transporter: Transporter } | null = null;

function transporterFor(config: MailConfig): Transporter {
  const key = JSON.stringify(config);
  if (!cached || cached.key !== key) {
    cached = {
      key,
      transporter: nodemailer.createTransport({
        host: config.host,
        port: config.port,
        secure: config.secure,
        auth: config.auth,
        connectionTimeout: 5_000,
        greetingTimeout: 5_000,
        socketTimeout: 10_000,
      }),
    };
  }
  return cached.transporter;
}

/**
 * Sends one message with a plain-text and an HTML part. Throws unavailable:mail when mail is
 * not configured or the SMTP server refuses; the caller decides whether that undoes its change.
 */
export async function sendMail(mail: OutgoingMail): Promise<void> {
  const config = mailConfig();
  if (!config) throw new AppError('unavailable:mail', 'E-mail is not set up on this server (SMTP_HOST is missing).');
  try {
    await transporterFor(config).sendMail({ from: config.from, to: mail.to, subject: mail.subject, text: mail.text, html: mail.html });
  } catch (e) {
    console.error('[margin] could not send mail:', (e as Error).message);
    throw new AppError('unavailable:mail', 'The e-mail could not be sent just now. Please try again in a moment.');
  }
}
