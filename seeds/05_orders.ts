import type { Knex } from 'knex';
import { randomBytes } from 'node:crypto';
import { BAG_STAGES, type BagStage } from '../src/shared/names';
import type { Placement } from '../server/db/tables';

const HOUR_MS = 60 * 60 * 1000;

type Sizes = Record<string, number>;
/** Pieces done per stage, in stage order: cut, weeded, pressed, packed. */
type Done = [number, number, number, number];

interface OrderSeed {
  code: string;
  customer: string;
  dueInHours: number;
  readyHoursAgo?: number;
  notes: string;
  job: {
    name: string;
    widthMm: number;
    heightMm: number;
    placement: Placement;
    garment: string;
    fabric: string;
    personalised: boolean;
    rotationAllowed: boolean;
  };
  layers: [filmType: string, colour: string][];
  bags: { sizes: Sizes; done: Done }[];
  roster?: [name: string, number: string, size: string, extra?: string][];
}

const CUSTOMERS = [
  { name: 'Hollinford Harriers Youth FC', contact_name: 'Dee Arkwright', email: 'kit@harriers-fc.example', phone: '01632 960101', notes: 'Under-12s. Names in capitals on the back.' },
  { name: 'Lantern Street Café', contact_name: 'Ines Calloway', email: 'hello@lanternstreet.example', phone: '01632 960215', notes: 'Collects on foot: keep bags light.' },
  { name: 'Hollinford Meadows Trust', contact_name: 'Gareth Pellow', email: 'events@meadowstrust.example', phone: '01632 960330', notes: 'Charity rate agreed by Maren.' },
  { name: 'Saltmarsh Lane School Art Club', contact_name: 'Ms Oduya-Frane', email: 'artclub@saltmarsh-lane.example', phone: '01632 960447', notes: 'Invoice the school office, not the teacher.' },
  { name: 'Hollinford Bowls Club', contact_name: 'Wendell Amory', email: 'secretary@hollinford-bowls.example', phone: '01632 960512', notes: 'Collects on Fridays after the green is cut.' },
];

const HARRIERS_ROSTER: OrderSeed['roster'] = [
  ['Zoë Marchetti', '7', 'YM', 'Captain'],
  ['Mateus Ólafsson', '00', 'YL'],
  ['Amara Bellweather', '4', 'YS'],
  ['Finn Haddow', '9', 'YM'],
  ['Priya Lindqvist', '11', 'YL'],
  ['Oskar Brennan', '3', 'YM'],
  ['Chloé Devereaux', '14', 'YS'],
  ['Kai Ashdown', '10', 'YL'],
  ['Ruby Tansley', '6', 'YM'],
  ['Jonas Fairleigh', '2', 'S'],
  ['Léa Moreau', '8', 'YL'],
  ['Ellis Penhaligon', '5', 'YM'],
  ['Noor Castellane', '12', 'YS'],
  ['Tomás Rivelle', '15', 'S'],
  ['Isla Grennock', '1', 'S'],
  ['Dara Whitlock', '16', 'YL'],
];

const ORDERS: OrderSeed[] = [
  {
    code: '1041', customer: 'Hollinford Harriers Youth FC', dueInHours: 7 * 24,
    notes: 'Home jerseys for the new season. Name above number, centred on the back.',
    job: { name: 'Back name and number', widthMm: 279, heightMm: 305, placement: 'full_back', garment: 'Football jersey, sky blue', fabric: '100% polyester performance', personalised: true, rotationAllowed: true },
    layers: [['Stretch PU 75 µm', 'White']],
    bags: [
      { sizes: { YS: 3, YM: 5 }, done: [8, 0, 0, 0] },
      { sizes: { YL: 5, S: 3 }, done: [0, 0, 0, 0] },
    ],
    roster: HARRIERS_ROSTER,
  },
  {
    code: '1042', customer: 'Lantern Street Café', dueInHours: 24,
    notes: 'Staff aprons, logo on the left chest.',
    job: { name: 'Café logo', widthMm: 95, heightMm: 70, placement: 'left_chest', garment: 'Bib apron, natural canvas', fabric: 'Cotton canvas', personalised: false, rotationAllowed: true },
    layers: [['Standard PU 90 µm', 'Black']],
    // One more cut than ordered: the remake of the piece torn while weeding (seeds/08_floor_history.ts).
    bags: [{ sizes: { OS: 10 }, done: [11, 10, 0, 0] }],
  },
  {
    code: '1043', customer: 'Hollinford Meadows Trust', dueInHours: 4,
    notes: 'Meadows 5K fun run: runners collect their tees at registration tomorrow morning.',
    job: { name: 'Meadows 5K front', widthMm: 254, heightMm: 229, placement: 'full_front', garment: 'Cotton tee, heather green', fabric: '100% cotton', personalised: false, rotationAllowed: true },
    layers: [['Standard PU 90 µm', 'White']],
    bags: [
      // Two more cut and weeded than ordered: the remakes of the two pieces spoiled at the press (seeds/08_floor_history.ts).
      { sizes: { S: 14, M: 10 }, done: [26, 26, 24, 0] },
      { sizes: { M: 20, L: 4 }, done: [24, 24, 0, 0] },
      { sizes: { L: 24 }, done: [24, 9, 0, 0] },
      { sizes: { L: 6, XL: 18 }, done: [0, 0, 0, 0] },
      { sizes: { XL: 6, '2XL': 12, '3XL': 6 }, done: [0, 0, 0, 0] },
    ],
  },
  {
    code: '1044', customer: 'Saltmarsh Lane School Art Club', dueInHours: 3 * 24,
    notes: 'Two colours: white outline under, red lettering on top.',
    job: { name: 'Art club crest, two layers', widthMm: 229, heightMm: 203, placement: 'full_front', garment: 'Pullover hoodie, charcoal', fabric: '50/50 cotton-poly', personalised: false, rotationAllowed: false },
    layers: [['Standard PU 90 µm', 'White'], ['Standard PU 90 µm', 'Red']],
    bags: [
      { sizes: { XS: 4, S: 8 }, done: [0, 0, 0, 0] },
      { sizes: { M: 10, L: 6, XL: 2 }, done: [0, 0, 0, 0] },
    ],
  },
  {
    code: '1045', customer: 'Lantern Street Café', dueInHours: 30, readyHoursAgo: 2,
    notes: 'Market-stall tote bags.',
    job: { name: 'Tote bag logo', widthMm: 178, heightMm: 127, placement: 'full_front', garment: 'Nylon tote bag, black', fabric: 'Nylon', personalised: false, rotationAllowed: true },
    layers: [['Low-temp PU 80 µm', 'White']],
    bags: [{ sizes: { OS: 8 }, done: [8, 8, 8, 8] }],
  },
  {
    code: '1046', customer: 'Hollinford Bowls Club', dueInHours: 2 * 24,
    notes: 'Club polos, crest on the left chest. First bag already packed; the second waits at the pack bench.',
    job: { name: 'Bowls club crest', widthMm: 89, heightMm: 89, placement: 'left_chest', garment: 'Piqué polo, bottle green', fabric: '50/50 cotton-poly', personalised: false, rotationAllowed: true },
    layers: [['Standard PU 90 µm', 'White']],
    bags: [
      { sizes: { S: 2, M: 4 }, done: [6, 6, 6, 6] },
      { sizes: { L: 4, XL: 2 }, done: [6, 6, 6, 0] },
    ],
  },
];

function jsonValue<T>(knex: Knex, value: T): Knex.Raw<T> {
  return knex.raw<T>('?', [JSON.stringify(value)]);
}

function sum(sizes: Sizes): number {
  return Object.values(sizes).reduce((a, b) => a + b, 0);
}

/** The last stage every piece has passed; 'queued' until the whole bag is cut. */
function stageOf(done: Done, pieces: number): BagStage {
  const finished = done.findIndex((count) => count < pieces);
  return BAG_STAGES[finished === -1 ? done.length : finished];
}

function addSizes(total: Sizes, sizes: Sizes): Sizes {
  for (const [size, n] of Object.entries(sizes)) total[size] = (total[size] ?? 0) + n;
  return total;
}

async function insertOrder(knex: Knex, order: OrderSeed, ids: { customers: Map<string, number>; fabrics: Map<string, number>; lead: number | null }, now: number): Promise<void> {
  const ready = order.readyHoursAgo !== undefined;
  await knex('orders').insert({
    code: order.code,
    customer_id: ids.customers.get(order.customer)!,
    due_at: new Date(now + order.dueInHours * HOUR_MS),
    status: ready ? 'ready' : 'open',
    notes: order.notes,
    created_by: ids.lead,
    created_at: new Date(now - 5 * 24 * HOUR_MS),
    ready_at: ready ? new Date(now - order.readyHoursAgo! * HOUR_MS) : null,
  });
  const { id: orderId } = (await knex('orders').where({ code: order.code }).first('id'))!;

  const { job } = order;
  const [jobId] = await knex('jobs').insert({
    order_id: orderId,
    name: job.name,
    design_width_mm: job.widthMm,
    design_height_mm: job.heightMm,
    placement: job.placement,
    garment: job.garment,
    fabric_id: ids.fabrics.get(job.fabric)!,
    quantities: jsonValue(knex, order.bags.reduce<Sizes>((total, bag) => addSizes(total, bag.sizes), {})),
    personalised: job.personalised,
    rotation_allowed: job.rotationAllowed,
    created_at: new Date(now - 5 * 24 * HOUR_MS),
  });

  for (const [i, [filmType, colour]] of order.layers.entries()) {
    const film = await knex('films')
      .join('film_types', 'film_types.id', 'films.film_type_id')
      .where('film_types.name', filmType)
      .andWhere('films.colour', colour)
      .first('films.id');
    await knex('job_layers').insert({ job_id: jobId, position: i + 1, film_id: film!.id });
  }

  for (const [i, bag] of order.bags.entries()) {
    const pieces = sum(bag.sizes);
    const [cut, weeded, pressed, packed] = bag.done;
    const [bagId] = await knex('bags').insert({
      order_id: orderId,
      job_id: jobId,
      code: `${order.code}-${String.fromCharCode(65 + i)}`,
      token: randomBytes(32).toString('base64url'),
      stage: stageOf(bag.done, pieces),
      sizes: jsonValue(knex, bag.sizes),
      pieces,
      qty_cut: cut,
      qty_weeded: weeded,
      qty_pressed: pressed,
      qty_packed: packed,
      created_at: new Date(now - 4 * 24 * HOUR_MS),
    });
    const lines = (order.roster ?? [])
      .map(([name, number, size, extra], position) => ({ name, number, size, extra_text: extra ?? '', position: position + 1 }))
      .filter((line) => line.size in bag.sizes);
    if (lines.length > 0) {
      await knex('roster_lines').insert(lines.map((line) => ({ ...line, job_id: jobId, bag_id: bagId })));
    }
  }
}

/** Five customers and six orders of different shapes, with jobs, layers, bags and a team roster. */
export async function seed(knex: Knex): Promise<void> {
  await knex('customers').insert(CUSTOMERS);
  const customers = new Map((await knex('customers').select('id', 'name')).map((c) => [c.name, c.id]));
  const fabrics = new Map((await knex('fabrics').select('id', 'name')).map((f) => [f.name, f.id]));
  const lead = (await knex('users').where({ role: 'lead' }).first('id'))?.id ?? null;
  const now = Date.now();
  for (const order of ORDERS) {
    await insertOrder(knex, order, { customers, fabrics, lead }, now);
  }
}
