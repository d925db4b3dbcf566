import type { MailKind } from '../../../src/shared/mail-contract';

/** A message's words: the subject with a plain-text and an HTML part. */
export interface MailContent {
  subject: string;
  text: string;
  html: string;
}

/** A message ready for the outbox: its words, one recipient, and what it is about. */
export interface OutgoingMail extends MailContent {
  kind: MailKind;
  to: string;
  related: Record<string, unknown>;
}

/** The shop as its messages name it. */
export interface ShopIdentity {
  name: string;
  address: string;
  phone: string;
  email: string;
}
