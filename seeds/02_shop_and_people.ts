import type { Knex } from 'knex';
import { hashSecret } from '../server/auth/secrets';
import { toShopRow } from '../server/shop/shop-view';
import { DEMO_ACCOUNTS } from './data/demo-accounts';
import { DEMO_SHOP } from './data/demo-shop';

// Kept out of DEMO_ACCOUNTS on purpose: this person has left, so the PIN must be refused.
const FORMER_OPERATOR = { name: 'Pat Ferrow', pin: '9999' };

/** The demo shop's settings and its people: owner, lead, operators and one inactive operator. */
export async function seed(knex: Knex): Promise<void> {
  await knex('shop_settings').insert({ id: 1, ...toShopRow(DEMO_SHOP) });

  const { owner, lead, operators } = DEMO_ACCOUNTS;
  const [ownerHash, leadHash, formerHash, ...operatorHashes] = await Promise.all([
    hashSecret(owner.password),
    hashSecret(lead.password),
    hashSecret(FORMER_OPERATOR.pin),
    ...operators.map((operator) => hashSecret(operator.pin)),
  ]);

  await knex('users').insert([
    { name: owner.name, email: owner.email, role: 'owner', password_hash: ownerHash, active: true },
    { name: lead.name, email: lead.email, role: 'lead', password_hash: leadHash, active: true },
    ...operators.map((operator, i) => ({
      name: operator.name,
      email: null,
      role: 'operator' as const,
      pin_hash: operatorHashes[i],
      active: true,
    })),
    { name: FORMER_OPERATOR.name, email: null, role: 'operator', pin_hash: formerHash, active: false },
  ]);
}
