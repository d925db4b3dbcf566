import type { MailKind, MailStatus } from '../../shared/mail-contract';

/** How each kind of message is named on screen. */
export const MAIL_KIND_LABELS: Readonly<Record<MailKind, string>> = {
  order_ready: 'Order ready',
  film_low: 'Film running low',
  shift_summary: 'Shift summary',
};

/** Each status as a word and an icon, so it reads without colour. */
export const MAIL_STATUS_DISPLAY: Readonly<Record<MailStatus, { label: string; icon: string }>> = {
  queued: { label: 'Waiting', icon: 'schedule' },
  sent: { label: 'Sent', icon: 'check' },
  failed: { label: 'Failed', icon: 'error' },
};
