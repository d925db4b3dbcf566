import type { MailDetail, MailSummary } from '../../src/shared/mail-contract';
import type { MailLogRow } from '../db/tables';

// MariaDB stores JSON as text, so the driver may hand it back as a string.
const relatedOf = (row: MailLogRow): Record<string, unknown> => (typeof row.related === 'string' ? (JSON.parse(row.related) as Record<string, unknown>) : (row.related ?? {}));
const iso = (at: Date | null) => (at ? new Date(at).toISOString() : null);

/** A mail_log row as the Mail outbox lists it. */
export function toMailSummary(row: MailLogRow): MailSummary {
  return {
    id: row.id,
    kind: row.kind,
    to: row.to,
    subject: row.subject,
    status: row.status,
    attempts: row.attempts,
    lastError: row.last_error,
    createdAt: iso(row.created_at)!,
    sentAt: iso(row.sent_at),
    related: relatedOf(row),
  };
}

/** A mail_log row with its plain-text part. */
export function toMailDetail(row: MailLogRow): MailDetail {
  return { ...toMailSummary(row), text: row.text };
}
