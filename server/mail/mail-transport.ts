import { createTransport } from 'nodemailer';
import type Mail from 'nodemailer/lib/mailer';
import type SMTPTransport from 'nodemailer/lib/smtp-transport';

/** A nodemailer transport over SMTP. */
export type MailTransport = Mail<SMTPTransport.SentMessageInfo, SMTPTransport.Options>;

// Fail a dead mail service in seconds, not nodemailer's default minutes: the outbox retries later anyway.
const TIMEOUTS = { connectionTimeout: 10_000, greetingTimeout: 10_000, socketTimeout: 30_000 } as const;

/** A transport to the shop's mail service (SMTP_URL), or to the in-process sink when `sink` is set. */
export function createMailTransport(smtpUrl: string, options: { sink?: boolean } = {}): MailTransport {
  const url = new URL(smtpUrl);
  return createTransport({
    host: url.hostname,
    port: url.port ? Number(url.port) : url.protocol === 'smtps:' ? 465 : 587,
    secure: url.protocol === 'smtps:',
    auth: url.username ? { user: decodeURIComponent(url.username), pass: decodeURIComponent(url.password) } : undefined,
    // The sink is plain SMTP on the loopback interface; a real service upgrades with STARTTLS when it offers it.
    ignoreTLS: options.sink === true,
    ...TIMEOUTS,
  } satisfies SMTPTransport.Options);
}
