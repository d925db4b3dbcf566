import type { Knex } from 'knex';
import { BagsService } from '../server/bags/bags-service';
import { JobsService } from '../server/jobs/jobs-service';
import { OrdersService } from '../server/orders/orders-service';
import { readEnv } from '../server/config/env';

const DAY_MS = 24 * 60 * 60 * 1000;

// An invented choir's concert polos: made through the same services as the API, so the demo shows
// real bag codes, tokens and labels.
const SINGERS: [name: string, size: 'S' | 'M' | 'L' | 'XL' | '2XL'][] = [
  ['Agnès', 'S'], ['Bronwen', 'M'], ['Cormac', 'L'], ['Dafydd', 'XL'], ['Eluned', 'S'], ['Fintan', 'L'],
  ['Gráinne', 'M'], ['Hywel', '2XL'], ['Iolo', 'L'], ['Jóhanna', 'M'], ['Kerensa', 'S'], ['Łucja', 'M'],
  ['Maelon', 'XL'], ['Nesta', 'S'], ['Oisín', 'L'], ['Peredur', 'XL'], ['Rhian', 'M'], ['Siân', 'S'],
  ['Tegid', 'L'], ['Ursula', 'M'], ['Vérane', 'S'], ['Wynfor', '2XL'], ['Ysolde', 'M'], ['Zsófia', 'S'],
  ['Aled', 'L'], ['Bethan', 'M'], ['Ceridwen', 'S'], ['Deiniol', 'XL'],
];

/** The Hollinford Riverside Choir's order: a crest job and a personalised name job, split into bags. */
export async function seed(knex: Knex): Promise<void> {
  const env = readEnv({ ...process.env });
  const orders = new OrdersService(knex);
  const jobs = new JobsService(knex, env.UPLOADS_DIR);
  const bags = new BagsService(knex);
  const lead = (await knex('users').where({ role: 'lead' }).first('id'))?.id ?? null;
  const fabric = await knex('fabrics').where({ name: '100% cotton' }).first('id');
  const film = (type: string, colour: string) =>
    knex('films').join('film_types', 'film_types.id', 'films.film_type_id').where('film_types.name', type).andWhere('films.colour', colour).first('films.id');
  const white = await film('Standard PU 90 µm', 'White');
  const gold = await film('Glitter 200 µm', 'Gold glitter');

  const order = await orders.create(
    {
      newCustomer: { name: 'Hollinford Riverside Choir', contactName: 'Perpetua Lowe', email: 'secretary@riversidechoir.example', phone: '01632 960512' },
      dueAt: new Date(Date.now() + 10 * DAY_MS).toISOString(),
      notes: 'Concert polos: crest on the left chest, first name across the back in gold glitter.',
    },
    lead,
  );
  const crest = await jobs.create(order.id, {
    name: 'Choir crest',
    designWidthMm: 90,
    designHeightMm: 90,
    placement: 'left_chest',
    garment: 'Piqué polo, bottle green',
    fabricId: fabric!.id,
    layers: [white!.id],
    quantities: SINGERS.reduce<Record<string, number>>((q, [, size]) => ({ ...q, [size]: (q[size] ?? 0) + 1 }), {}),
    rotationAllowed: true,
  });
  const names = await jobs.create(order.id, {
    name: 'First names on the back',
    designWidthMm: 250,
    designHeightMm: 40,
    placement: 'full_back',
    garment: 'Piqué polo, bottle green',
    fabricId: fabric!.id,
    layers: [gold!.id],
    rosterLines: SINGERS.map(([name, size]) => ({ name: name.toUpperCase(), number: '', size, extraText: '' })),
    letterHeightMm: 40,
    rotationAllowed: false,
  });
  await bags.split(crest.id, 12);
  await bags.split(names.id, 12);
}
