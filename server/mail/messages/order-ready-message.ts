import { SIZES } from '../../../src/shared/intake-contract';
import type { MailContent, ShopIdentity } from './mail-content';
import { dataTable, heading, lines, mailPage, paragraph } from './mail-html';

/** One job of the order as packed: its design name, the garment, and pieces by size. */
export interface ReadyLine {
  jobName: string;
  garment: string;
  sizes: Record<string, number>;
}

/** What the ready-for-pickup message says. */
export interface OrderReadyFacts {
  shop: ShopIdentity;
  orderCode: string;
  customerName: string;
  contactName: string;
  lines: readonly ReadyLine[];
}

const sizeRank = (size: string) => {
  const i = (SIZES as readonly string[]).indexOf(size.toUpperCase());
  return i === -1 ? SIZES.length : i;
};

/** Sizes in the order a shop calls them (youth, then adult small to large), unknown sizes last by name. */
export function sortedSizes(sizes: Record<string, number>): [string, number][] {
  return Object.entries(sizes)
    .filter(([, n]) => n > 0)
    .sort(([a], [b]) => sizeRank(a) - sizeRank(b) || a.localeCompare(b));
}

const sizeList = (sizes: Record<string, number>) => sortedSizes(sizes).map(([size, n]) => `${size} × ${n}`).join(', ');
const piecesOf = (sizes: Record<string, number>) => Object.values(sizes).reduce((sum, n) => sum + n, 0);
const plural = (n: number, word: string) => `${n} ${word}${n === 1 ? '' : 's'}`;

/** The customer's "your order is ready to collect" message. */
export function orderReadyMessage(facts: OrderReadyFacts): MailContent {
  const { shop } = facts;
  const greetingName = facts.contactName.trim() || facts.customerName;
  const total = facts.lines.reduce((sum, line) => sum + piecesOf(line.sizes), 0);
  const subject = `Order ${facts.orderCode} is ready to collect from ${shop.name}`;
  const opening = `Your order ${facts.orderCode} for ${facts.customerName} is finished, checked and packed. It is ready for you to collect.`;
  const collect = 'Come by when it suits you during opening hours and give the order number at the counter. Please check the garments before you leave: if anything is not right, tell us there and then and we will put it right.';
  const contact = `Questions? Reply to this message or call ${shop.phone}.`;
  const rows = facts.lines.map((line) => [`${line.jobName} on ${line.garment}`, sizeList(line.sizes), String(piecesOf(line.sizes))]);

  const text = [
    `Hello ${greetingName},`,
    '',
    opening,
    '',
    'In the order:',
    ...rows.map(([what, sizes, n]) => `- ${what}: ${sizes} (${plural(Number(n), 'piece')})`),
    `Total: ${plural(total, 'piece')}`,
    '',
    'Collect from:',
    shop.name,
    shop.address,
    `Phone ${shop.phone}`,
    '',
    collect,
    '',
    contact,
    '',
    shop.name,
  ].join('\n');

  const html = mailPage(
    shop.name,
    subject,
    [
      paragraph(`Hello ${greetingName},`),
      paragraph(opening),
      heading('In the order'),
      dataTable(['Design and garment', 'Sizes', 'Pieces'], [...rows, ['Total', '', String(total)]], [2]),
      heading('Collect from'),
      lines([shop.name, shop.address, `Phone ${shop.phone}`]),
      paragraph(collect),
      paragraph(contact),
    ],
    `${shop.name} · ${shop.address} · ${shop.phone}`,
  );
  return { subject, text, html };
}
