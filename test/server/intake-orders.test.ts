import { signedInOperator, signedInPerson, testApp } from './support/test-hub';

const hub = testApp();
let lead: Awaited<ReturnType<typeof signedInPerson>>;
beforeAll(async () => {
  lead = await signedInPerson(hub.app, 'lead');
}, 30_000);
afterAll(() => hub.close());
jest.setTimeout(30_000);

const inDays = (days: number) => new Date(Date.now() + days * 86_400_000).toISOString();

async function materials() {
  const fabric = await hub.db('fabrics').where({ name: '100% cotton' }).first('id');
  const film = await hub.db('films').first('id');
  return { fabricId: fabric!.id, filmId: film!.id };
}

describe('orders', () => {
  it('creates an order with a new customer and numbers it after the highest code', async () => {
    const highest = await hub.db('orders').whereRaw("code REGEXP '^[0-9]+$'").orderByRaw('CAST(code AS UNSIGNED) DESC').first('code');
    const res = await lead
      .post('/api/orders')
      .send({ newCustomer: { name: 'Wickford Bowls Club', contactName: 'Ada Penn', email: 'ada@wickbowls.example', phone: '01632 960999' }, dueAt: inDays(5) })
      .expect(201);
    expect(res.body.code).toBe(String(Number(highest!.code) + 1));
    expect(res.body.customer).toMatchObject({ name: 'Wickford Bowls Club', email: 'ada@wickbowls.example' });
    expect(res.body).toMatchObject({ status: 'open', jobs: [], bags: [] });
  });

  it('refuses a due date more than a day in the past, or not a date, with a sentence', async () => {
    const customer = await hub.db('customers').first('id');
    const past = await lead.post('/api/orders').send({ customerId: customer!.id, dueAt: inDays(-3) }).expect(400);
    expect(past.body.error).toMatch(/more than a day in the past/);
    const nonsense = await lead.post('/api/orders').send({ customerId: customer!.id, dueAt: 'next tuesday' }).expect(400);
    expect(nonsense.body.error).toMatch(/not a valid date/);
    const nobody = await lead.post('/api/orders').send({ customerId: 999999, dueAt: inDays(2) }).expect(400);
    expect(nobody.body.error).toMatch(/There is no customer 999999/);
  });

  it('lists orders filtered, sorted and paged', async () => {
    const all = await lead.get('/api/orders?sort=code&dir=asc&pageSize=100').expect(200);
    const codes = all.body.items.map((o: { code: string }) => Number(o.code));
    expect(codes).toEqual([...codes].sort((a, b) => a - b));
    expect(all.body.total).toBe(all.body.items.length);

    const page2 = await lead.get('/api/orders?sort=code&dir=asc&pageSize=2&page=2').expect(200);
    expect(page2.body).toMatchObject({ page: 2, pageSize: 2, total: all.body.total });
    expect(page2.body.items.map((o: { code: string }) => o.code)).toEqual(all.body.items.slice(2, 4).map((o: { code: string }) => o.code));

    // The seeded 5K fun-run order has 24 + 24 + 24 + 24 + 24 = 120 pieces in five bags.
    const harriers = await lead.get('/api/orders?q=Meadows').expect(200);
    expect(harriers.body.items).toEqual([expect.objectContaining({ code: '1043', pieces: 120, bagCount: 5 })]);
    expect(harriers.body.items[0].piecesByStage).toEqual({ queued: 48, cut: 9 + 15, weeded: 24, pressed: 24, packed: 0 });

    const byPieces = await lead.get('/api/orders?sort=pieces&dir=desc').expect(200);
    const pieces = byPieces.body.items.map((o: { pieces: number }) => o.pieces);
    expect(pieces).toEqual([...pieces].sort((a, b) => b - a));

    const ready = await lead.get('/api/orders?status=ready').expect(200);
    expect(ready.body.items.every((o: { status: string }) => o.status === 'ready')).toBe(true);
    await lead.get('/api/orders?pageSize=500').expect(400);
  });

  it('finds customers by name', async () => {
    const res = await lead.get('/api/customers?q=lantern').expect(200);
    expect(res.body).toEqual([expect.objectContaining({ name: 'Lantern Street Café' })]);
  });

  it('refuses to cancel an order with a packed bag', async () => {
    const packed = await hub.db('orders').where({ code: '1045' }).first('id');
    const res = await lead.post(`/api/orders/${packed!.id}/cancel`).expect(409);
    expect(res.body.error).toMatch(/packed bags and cannot be cancelled/);
  });
});

describe('jobs, bags and tickets', () => {
  it('adds a personalised job from a roster, splits it into bags continuing the letters, and a station reads a ticket', async () => {
    const { fabricId, filmId } = await materials();
    const order = (await lead.post('/api/orders').send({ newCustomer: { name: 'Hollinford Netball Juniors' }, dueAt: inDays(9) }).expect(201)).body;

    const plain = await lead
      .post(`/api/orders/${order.id}/jobs`)
      .send({ name: 'Club badge', designWidthMm: 80, designHeightMm: 80, placement: 'left_chest', garment: 'Training top', fabricId, layers: [filmId], quantities: { S: 3, M: 0 } })
      .expect(201);
    expect(plain.body).toMatchObject({ quantities: { S: 3 }, pieces: 3, personalised: false });
    const plainBags = await lead.post(`/api/jobs/${plain.body.id}/bags`).send({}).expect(201);
    expect(plainBags.body.map((b: { code: string }) => b.code)).toEqual([`${order.code}-A`]);

    const roster = [
      { name: 'Zoë', number: '7', size: 'ym', extraText: '' },
      { name: 'Łucja', number: '00', size: 'YM', extraText: 'Captain' },
      { name: 'Ana', number: '', size: 'YL', extraText: '' },
    ];
    const job = await lead
      .post(`/api/orders/${order.id}/jobs`)
      .send({ name: 'Backs', designWidthMm: 250, designHeightMm: 60, placement: 'full_back', garment: 'Netball bib', fabricId, layers: [filmId], rosterLines: roster, letterHeightMm: 40 })
      .expect(201);
    expect(job.body).toMatchObject({ personalised: true, quantities: { YM: 2, YL: 1 }, pieces: 3 });

    const bags = await lead.post(`/api/jobs/${job.body.id}/bags`).send({ maxPieces: 2 }).expect(201);
    expect(bags.body.map((b: { code: string; sizes: object }) => [b.code, b.sizes])).toEqual([
      [`${order.code}-B`, { YM: 2 }],
      [`${order.code}-C`, { YL: 1 }],
    ]);
    // Splitting again replaces the queued bags and keeps the letters going from the other job's bag.
    const again = await lead.post(`/api/jobs/${job.body.id}/bags`).send({ maxPieces: 3 }).expect(201);
    expect(again.body.map((b: { code: string }) => b.code)).toEqual([`${order.code}-B`]);
    expect(await hub.db('bags').where({ token: bags.body[0].token }).first()).toBeUndefined();

    const { agent: operator } = await signedInOperator(hub.app, hub.db, 'Press 1', 0);
    const ticket = await operator.get(`/api/bags/by-token/${again.body[0].token}`).expect(200);
    expect(ticket.body.rosterLines.map((l: { name: string }) => l.name)).toEqual(['Zoë', 'Łucja', 'Ana']);
    expect(ticket.body.order).toEqual({ id: order.id, code: order.code, dueAt: expect.any(String), customerName: 'Hollinford Netball Juniors' });
  });

  it('gives an operator no customer e-mail or phone anywhere in a ticket', async () => {
    const bag = await hub.db('bags').join('orders', 'orders.id', 'bags.order_id').where('orders.code', '1042').first('bags.token');
    const customer = await hub.db('customers').where({ name: 'Lantern Street Café' }).first();
    const { agent: operator } = await signedInOperator(hub.app, hub.db, 'Weed 1', 1);
    const res = await operator.get(`/api/bags/by-token/${bag!.token}`).expect(200);
    const body = JSON.stringify(res.body);
    expect(body).toContain('Lantern Street Café');
    expect(body).not.toContain(customer!.email);
    expect(body).not.toContain(customer!.phone);
    expect(body).not.toContain(customer!.contact_name);
  });

  it('answers an unknown token with 404 and a malformed one with 400, each with a sentence', async () => {
    const unknown = await lead.get(`/api/bags/by-token/${'A'.repeat(43)}`).expect(404);
    expect(unknown.body.error).toMatch(/No bag has this code/);
    const malformed = await lead.get('/api/bags/by-token/not-a-token').expect(400);
    expect(malformed.body.error).toMatch(/not a bag code/);
  });

  it('refuses a roster with bad lines, naming each line', async () => {
    const { fabricId, filmId } = await materials();
    const order = await hub.db('orders').where({ code: '1044' }).first('id');
    const res = await lead
      .post(`/api/orders/${order!.id}/jobs`)
      .send({
        name: 'Bad roster', designWidthMm: 200, designHeightMm: 50, placement: 'full_back', garment: 'Hoodie', fabricId, layers: [filmId],
        rosterLines: [{ name: 'Ok', number: '1', size: 'M' }, { name: 'Nope', number: '123', size: 'Q' }],
      })
      .expect(400);
    expect(res.body.error).toMatch(/1 roster line\(s\) need fixing .*line 2/);
    expect(res.body.details).toEqual([
      { path: 'rosterLines.1', message: expect.stringMatching(/"Q" is not a size/) },
      { path: 'rosterLines.1', message: expect.stringMatching(/"123" is not a jersey number/) },
    ]);
  });

  it('refuses a job with five layers or an unknown film', async () => {
    const { fabricId, filmId } = await materials();
    const order = await hub.db('orders').where({ code: '1044' }).first('id');
    const base = { name: 'x', designWidthMm: 10, designHeightMm: 10, placement: 'sleeve', garment: 'Tee', fabricId, quantities: { M: 1 } };
    const five = await lead.post(`/api/orders/${order!.id}/jobs`).send({ ...base, layers: [filmId, filmId, filmId, filmId, filmId] }).expect(400);
    expect(five.body.error).toMatch(/at most 4 film layers/);
    const unknown = await lead.post(`/api/orders/${order!.id}/jobs`).send({ ...base, layers: [999999] }).expect(400);
    expect(unknown.body.error).toMatch(/There is no film 999999/);
  });

  it('refuses to split or delete a job whose bags are on the floor', async () => {
    const job = await hub.db('jobs').join('orders', 'orders.id', 'jobs.order_id').where('orders.code', '1043').first('jobs.id');
    const split = await lead.post(`/api/jobs/${job!.id}/bags`).send({}).expect(409);
    expect(split.body.error).toMatch(/already on the floor/);
    const removed = await lead.delete(`/api/jobs/${job!.id}`).expect(409);
    expect(removed.body.error).toMatch(/cannot be removed/);
  });
});

describe('the demo seed', () => {
  it('made the choir order through the services, with bags and roster lines in them', async () => {
    const order = await hub.db('orders').join('customers', 'customers.id', 'orders.customer_id').where('customers.name', 'Hollinford Riverside Choir').first('orders.id');
    const bags = await hub.db('bags').where({ order_id: order!.id });
    expect(bags.length).toBeGreaterThan(2);
    expect(bags.every((b) => /^[A-Za-z0-9_-]{43}$/.test(b.token))).toBe(true);
    const unbagged = await hub.db('roster_lines').join('jobs', 'jobs.id', 'roster_lines.job_id').where('jobs.order_id', order!.id).whereNull('roster_lines.bag_id').count({ n: '*' });
    expect(Number(unbagged[0]!['n'])).toBe(0);
  });
});
