import type { Knex } from 'knex';
import { hashSecret } from '../server/auth/secrets';
import { DEMO_ACCOUNTS } from './data/demo-accounts';

// Kept out of DEMO_ACCOUNTS on purpose: this person has left, so the PIN must be refused.
const FORMER_OPERATOR = { name: 'Pat Ferrow', pin: '9999' };

/** The demo shop's settings and its people: owner, lead, operators and one inactive operator. */
export async function seed(knex: Knex): Promise<void> {
  await knex('shop_settings').insert({
    id: 1,
    shop_name: 'Bramble Yard Apparel',
    address: 'Unit 4, Bramble Yard, Tanner Row, Hollinford',
    phone: '01632 960412',
    email: 'hello@brambleyard.example',
    units: 'imperial',
    time_zone: 'Europe/London',
    bag_max_pieces: 24,
    shift_start: '07:00:00',
    shift_end: '15:30:00',
    working_days: '1,2,3,4,5',
    // Invented demo rates: weeding fine lettering is the slow stage, packing the quick one.
    standard_cut_per_hour: 120,
    standard_weed_per_hour: 30,
    standard_press_per_hour: 45,
    standard_pack_per_hour: 90,
    heat_exposure_limit_s: 45,
  });

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
