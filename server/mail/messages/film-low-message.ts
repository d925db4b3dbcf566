import { MM_PER_INCH, MM_PER_METRE } from '../../../src/shared/cutting/length-units';
import type { MailContent, ShopIdentity } from './mail-content';
import { dataTable, mailPage, paragraph } from './mail-html';

/** The roll that ran low, lengths in millimetres as stored. */
export interface FilmLowFacts {
  shop: ShopIdentity;
  units: 'imperial' | 'metric';
  roll: { label: string; filmType: string; colour: string; rackSlot: string; remainingMm: number; reorderMm: number };
}

/** A roll length in the shop's units: inches for imperial shops, metres for metric ones. */
export function rollLength(mm: number, units: 'imperial' | 'metric'): string {
  return units === 'imperial' ? `${(mm / MM_PER_INCH).toFixed(1)} in` : `${(mm / MM_PER_METRE).toFixed(2)} m`;
}

/** The lead's "film running low" message, sent once per roll until it is measured back above its reorder length. */
export function filmLowMessage(facts: FilmLowFacts): MailContent {
  const { roll, units, shop } = facts;
  const film = `${roll.filmType}, ${roll.colour}`;
  const remaining = rollLength(roll.remainingMm, units);
  const reorder = rollLength(roll.reorderMm, units);
  const slot = roll.rackSlot.trim() || 'no slot recorded';
  const subject = `Film running low: roll ${roll.label} (${film})`;
  const says = `Roll ${roll.label} of ${film} has ${remaining} left, below its reorder length of ${reorder}.`;
  const todo = 'Order more of this film before the next long run, or plan the next cuts on another roll.';
  const once = 'This is the only message about this roll until it is measured back at or above its reorder length on the Roll rack.';

  const text = [says, '', `Roll: ${roll.label}`, `Film: ${film}`, `Left: ${remaining}`, `Reorder at: ${reorder}`, `Rack slot: ${slot}`, '', todo, once, '', `Dwell at ${shop.name}`].join('\n');
  const html = mailPage(
    shop.name,
    subject,
    [
      paragraph(says),
      dataTable(['Roll', 'Film', 'Left', 'Reorder at', 'Rack slot'], [[roll.label, film, remaining, reorder, slot]], [2, 3]),
      paragraph(todo),
      paragraph(once),
    ],
    `Sent by Dwell at ${shop.name} to the floor leads.`,
  );
  return { subject, text, html };
}
