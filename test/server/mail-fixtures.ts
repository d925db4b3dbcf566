import { randomBytes } from 'node:crypto';
import { simpleParser, type ParsedMail } from 'mailparser';
import type { Db } from '../../server/db/tables';
import type { SmtpSink, SunkMessage } from '../../server/mail/smtp-sink';

/**
 * An open order of an invented customer whose bags have all been cut, weeded and pressed, so only
 * packing is left. Answers the order and its bags (each with its pieces).
 */
export async function pressedOrder(db: Db, customer: { name: string; contactName: string; email: string }, bagSizes: Record<string, number>[]) {
  const tag = randomBytes(3).toString('hex');
  const [customerId] = await db('customers').insert({ name: customer.name, contact_name: customer.contactName, email: customer.email, phone: '01632 960999', notes: '' });
  const code = `M${tag}`;
  const [orderId] = await db('orders').insert({ code, customer_id: customerId!, due_at: new Date(Date.now() + 86_400_000), notes: '' });
  const fabric = (await db('fabrics').first('id'))!;
  const total = (sizes: Record<string, number>) => Object.values(sizes).reduce((a, b) => a + b, 0);
  const [jobId] = await db('jobs').insert({
    order_id: orderId!,
    name: 'Harbour crest',
    design_width_mm: 90,
    design_height_mm: 90,
    placement: 'left_chest',
    garment: 'Polo',
    fabric_id: fabric.id,
    quantities: db.raw('?', [JSON.stringify({})]) as never,
  });
  const bags: { id: number; pieces: number }[] = [];
  for (const [i, sizes] of bagSizes.entries()) {
    const pieces = total(sizes);
    const [id] = await db('bags').insert({
      order_id: orderId!,
      job_id: jobId!,
      code: `${code}-${String.fromCharCode(65 + i)}`,
      token: randomBytes(32).toString('base64url'),
      sizes: db.raw('?', [JSON.stringify(sizes)]) as never,
      pieces,
      qty_cut: pieces,
      qty_weeded: pieces,
      qty_pressed: pieces,
      stage: 'pressed',
    });
    bags.push({ id: id!, pieces });
  }
  return { orderId: orderId!, code, bags };
}

/** Waits until the sink holds a message matching `match` (mail leaves in the background after the commit). */
export async function waitForMail(sink: SmtpSink, match: (message: SunkMessage) => boolean, timeoutMs = 8000): Promise<SunkMessage[]> {
  const deadline = Date.now() + timeoutMs;
  for (;;) {
    const found = sink.messages.filter(match);
    if (found.length > 0) return found;
    if (Date.now() > deadline) throw new Error('No matching message reached the mail sink in time.');
    await new Promise((resolve) => setTimeout(resolve, 50));
  }
}

/** Waits until a mail_log row satisfies `done`. */
export async function waitForRow(db: Db, id: number, done: (row: { status: string; attempts: number }) => boolean, timeoutMs = 8000) {
  const deadline = Date.now() + timeoutMs;
  for (;;) {
    const row = (await db('mail_log').where({ id }).first())!;
    if (done(row)) return row;
    if (Date.now() > deadline) throw new Error(`Message ${id} stayed ${row.status} after ${row.attempts} attempt(s).`);
    await new Promise((resolve) => setTimeout(resolve, 50));
  }
}

/** A sunk message parsed by mailparser, an independent RFC 5322 / MIME parser. */
export function parsed(message: SunkMessage): Promise<ParsedMail> {
  return simpleParser(message.raw);
}

/** Whether a sunk message was addressed to this recipient. */
export const to = (address: string) => (message: SunkMessage) => message.to.includes(address);
