import type { Db } from '../db/tables';
import type { MailOutbox } from '../mail/mail-outbox';
import { MailRepository } from '../mail/mail-repository';
import { filmLowMessage } from '../mail/messages/film-low-message';
import { RollsRepository } from './rolls-repository';

/**
 * Film running low: the first time a roll is below its reorder length, the leads (or, with no active
 * lead, the owners) get one message. The roll remembers it was reported until it is measured back up.
 */
export class RollLowNotice {
  constructor(private readonly mail: MailOutbox) {}

  /** Inside the transaction that shortened the roll: reports it if it is now low and not reported yet; answers how many messages were queued. */
  async afterCut(trx: Db, rollId: number): Promise<number> {
    const rolls = new RollsRepository(trx);
    const roll = await rolls.find(rollId);
    if (!roll || roll.remaining_mm >= roll.reorder_mm || roll.low_notified_at) return 0;
    if (!(await rolls.markLowNotified(rollId, new Date()))) return 0;

    const directory = new MailRepository(trx);
    const leads = await directory.activeAddresses('lead');
    const recipients = leads.length > 0 ? leads : await directory.activeAddresses('owner');
    const shop = await directory.shop();
    const content = filmLowMessage({
      shop: await directory.shopIdentity(),
      units: shop.units,
      roll: { label: roll.label, filmType: roll.film_type_name, colour: roll.colour, rackSlot: roll.rack_slot, remainingMm: roll.remaining_mm, reorderMm: roll.reorder_mm },
    });
    for (const to of recipients) {
      await this.mail.enqueue(trx, { kind: 'film_low', to, related: { rollId, rollLabel: roll.label }, ...content });
    }
    return recipients.length;
  }

  /** After the commit: sends what was queued. */
  kick(): void {
    this.mail.kick();
  }
}
