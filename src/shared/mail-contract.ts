/** The messages Dwell sends. */
export const MAIL_KINDS = ['order_ready', 'film_low', 'shift_summary'] as const;
export type MailKind = (typeof MAIL_KINDS)[number];

export const MAIL_STATUSES = ['queued', 'sent', 'failed'] as const;
export type MailStatus = (typeof MAIL_STATUSES)[number];

/** One message in the Mail outbox. `failed` stays retried until MAIL_MAX_ATTEMPTS, then waits for a lead. */
export interface MailSummary {
  id: number;
  kind: MailKind;
  to: string;
  subject: string;
  status: MailStatus;
  attempts: number;
  lastError: string | null;
  createdAt: string;
  sentAt: string | null;
  /** What it is about, e.g. { orderId, orderCode } or { rollId, rollLabel } or { shiftDate }. */
  related: Record<string, unknown>;
}

/** GET /api/mail/:id: the message as sent. The HTML part is served alone from GET /api/mail/:id/html. */
export interface MailDetail extends MailSummary {
  text: string;
}

/** GET /api/mail?status=&kind=&page=&pageSize= (owner, lead), newest first. */
export interface MailPage {
  items: MailSummary[];
  total: number;
  page: number;
  pageSize: number;
}

/** Automatic tries before a failed message waits for a lead's Retry. */
export const MAIL_MAX_ATTEMPTS = 5;
