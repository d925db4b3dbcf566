import knex from 'knex';
import { pino } from 'pino';
import request from 'supertest';
import { BoardService } from '../../server/board/board-service';
import { knexConfig } from '../../server/db/connection';
import { MailRepository } from '../../server/mail/mail-repository';
import { OrderReadiness } from '../../server/orders/order-readiness';
import type { RunningHub } from '../../server/hub';
import { ShiftSummaryScheduler, endedShift } from '../../server/mail/shift-summary-scheduler';
import type { SmtpSink } from '../../server/mail/smtp-sink';
import { isoWeekdayOf, localDate, shiftWindow } from '../../src/shared/floor/shift-window';
import { ISO_WEEKDAYS, workingDaysText } from '../../src/shared/shop-contract';
import type { ShopSettingsRow } from '../../server/db/tables';
import { DEMO_ACCOUNTS } from '../../seeds/data/demo-accounts';
import { cutWorld } from './cut-fixtures';
import { freshBag, leadCookie, operatorOn, startTestHub, stationEvent } from './events-fixtures';
import { parsed, pressedOrder, to, waitForMail, waitForRow } from './mail-fixtures';

let hub: RunningHub;
let sink: SmtpSink;
let lead: string;
const leftOver = `left-over-${Date.now()}@harbour.example`;

beforeAll(async () => {
  // A message queued by a hub that stopped before sending it.
  const before = knex(knexConfig(process.env['DATABASE_URL']!, 1));
  await new MailRepository(before).insert({ kind: 'order_ready', to: leftOver, subject: 'Left over', text: 'Queued before a restart.', html: '<p>Queued before a restart.</p>', related: {} }, new Date());
  await before.destroy();
  hub = await startTestHub();
  sink = hub.mail.sink!;
  lead = await leadCookie(hub.url);
});
afterAll(() => hub.close());

const settle = () => new Promise((resolve) => setTimeout(resolve, 300));

describe('a hub starting', () => {
  it('sends a message that was left queued before the restart', async () => {
    await waitForMail(sink, to(leftOver));
    // The sink holds the message a moment before the hub hears the SMTP server's reply and marks it sent.
    const row = (await hub.db('mail_log').where({ to: leftOver }).first())!;
    expect((await waitForRow(hub.db, row.id, (r) => r.status !== 'queued')).status).toBe('sent');
  });
});

describe('an order whose last bag is packed', () => {
  it('becomes ready and its customer gets exactly one ready-for-pickup message, even when the batch is pushed again', async () => {
    const email = `obrien-${Date.now()}@sons.example`;
    const order = await pressedOrder(hub.db, { name: `O'Brien & <Sons>`, contactName: 'Aoife O\'Brien', email }, [{ M: 3, L: 2 }, { S: 4 }]);
    const packer = await operatorOn(hub.url, hub.db, 'Pack 1');
    const batch = order.bags.map((bag) => stationEvent({ bagId: bag.id, stationId: packer.stationId, userId: packer.userId }, 'pack_done', bag.pieces));

    const first = await request(hub.url).post('/api/events').set('Cookie', packer.cookie).send({ events: batch }).expect(200);
    expect(first.body.accepted).toHaveLength(2);
    const row = (await hub.db('orders').where({ id: order.orderId }).first())!;
    expect(row.status).toBe('ready');
    expect(row.ready_at).not.toBeNull();

    const [message] = await waitForMail(sink, to(email));
    const mail = await parsed(message!);
    // mailparser (an independent MIME parser) reads the recipient, subject and both parts back.
    expect(mail.to && !Array.isArray(mail.to) ? mail.to.value.map((a) => a.address) : []).toEqual([email]);
    expect(mail.subject).toBe(`Order ${order.code} is ready to collect from Bramble Yard Apparel`);
    expect(mail.from?.value[0]).toEqual({ name: 'Bramble Yard Apparel', address: 'hello@brambleyard.example' });
    expect(mail.text).toContain("Hello Aoife O'Brien,");
    expect(mail.text).toContain('- Harbour crest on Polo: S × 4, M × 3, L × 2 (9 pieces)');
    expect(mail.text).toContain('Unit 4, Bramble Yard, Tanner Row, Hollinford');
    expect(mail.html).toContain('O&#39;Brien &amp; &lt;Sons&gt;');
    expect(mail.html).not.toContain('<Sons>');
    expect(mail.headers.get('auto-submitted')).toBe('auto-generated');

    const again = await request(hub.url).post('/api/events').set('Cookie', packer.cookie).send({ events: batch }).expect(200);
    expect(again.body.duplicates).toHaveLength(2);
    // Checking the same bags again (as a second batch touching them would) readies nothing twice.
    expect(await new OrderReadiness(hub.db, hub.mail, pino({ level: 'silent' })).bagsChanged(order.bags.map((b) => b.id))).toEqual([]);
    await hub.mail.sendDue();
    await settle();
    expect(sink.messages.filter(to(email))).toHaveLength(1);
    const logged = await hub.db('mail_log').where({ kind: 'order_ready', to: email });
    expect(logged).toHaveLength(1);
    const settled = await waitForRow(hub.db, logged[0]!.id, (r) => r.status !== 'queued');
    expect([settled.status, settled.attempts]).toEqual(['sent', 1]);
  });

  it('stays open while one bag is still unpacked', async () => {
    const email = `partial-${Date.now()}@harbour.example`;
    const order = await pressedOrder(hub.db, { name: 'Harbour Rowing Club', contactName: 'Pim', email }, [{ M: 2 }, { M: 2 }]);
    const packer = await operatorOn(hub.url, hub.db, 'Pack 1');
    const one = stationEvent({ bagId: order.bags[0]!.id, stationId: packer.stationId, userId: packer.userId }, 'pack_done', 2);
    await request(hub.url).post('/api/events').set('Cookie', packer.cookie).send({ events: [one] }).expect(200);
    expect((await hub.db('orders').where({ id: order.orderId }).first())!.status).toBe('open');
    expect(await hub.db('mail_log').where({ to: email })).toHaveLength(0);
  });

  it('becomes ready without a message when the customer has no e-mail', async () => {
    const order = await pressedOrder(hub.db, { name: 'Walk-in without e-mail', contactName: '', email: '' }, [{ L: 1 }]);
    const packer = await operatorOn(hub.url, hub.db, 'Pack 1');
    const event = stationEvent({ bagId: order.bags[0]!.id, stationId: packer.stationId, userId: packer.userId }, 'pack_done', 1);
    await request(hub.url).post('/api/events').set('Cookie', packer.cookie).send({ events: [event] }).expect(200);
    expect((await hub.db('orders').where({ id: order.orderId }).first())!.status).toBe('ready');
    expect(await hub.db('mail_log').whereRaw("JSON_EXTRACT(related, '$.orderId') = ?", [order.orderId])).toHaveLength(0);
  });
});

describe('film running low', () => {
  it('is sent once per roll, not again on the next cut, and again after the roll is measured back up and runs low once more', async () => {
    const world = await cutWorld(hub.db);
    const rollId = await world.roll(world.filmId, 381, 22_860, 2_500, 2_000);
    const label = (await hub.db('rolls').where({ id: rollId }).first())!.label;
    const leads = (await hub.db('users').where({ role: 'lead', active: true }).whereNotNull('email').select('email')).map((u) => u.email!);
    expect(leads).toContain(DEMO_ACCOUNTS.lead.email);
    const cut = async (lengthMm: number) => {
      const bagIds = await world.job({ widthMm: 60, heightMm: 40, rotate: true, films: [world.filmId], bagPieces: [1] });
      return request(hub.url).post('/api/cut-plans/confirm').set('Cookie', lead).send({ bagIds, filmId: world.filmId, rollId, cutterId: world.cutterId, lengthMm }).expect(200);
    };
    const aboutRoll = (m: { raw: Buffer }) => m.raw.toString('utf8').includes(`roll ${label} `);
    const lowRows = () => hub.db('mail_log').where({ kind: 'film_low' }).whereRaw("JSON_EXTRACT(related, '$.rollId') = ?", [rollId]);

    await cut(300); // 2200 mm left, still above the 2000 mm reorder length
    await settle();
    expect(await lowRows()).toHaveLength(0);

    const crossing = await cut(400); // 1800 mm left
    expect(crossing.body.crossedReorder).toBe(true);
    const [message] = await waitForMail(sink, (m) => m.to.includes(DEMO_ACCOUNTS.lead.email) && aboutRoll(m));
    const mail = await parsed(message!);
    // The demo shop is imperial. NIST SP 811 (2008), appendix B: 1 in = 25.4 mm, so 1800 mm = 70.87 in and 2000 mm = 78.74 in.
    expect(mail.subject).toContain(`Film running low: roll ${label}`);
    expect(mail.text).toContain('has 70.9 in left, below its reorder length of 78.7 in.');
    expect((await lowRows()).map((r) => r.to).sort()).toEqual([...leads].sort());
    expect((await hub.db('rolls').where({ id: rollId }).first())!.low_notified_at).not.toBeNull();

    await cut(100); // still low: no second message
    await settle();
    expect(await lowRows()).toHaveLength(leads.length);

    await request(hub.url).post(`/api/rolls/${rollId}/measure`).set('Cookie', lead).send({ remainingMm: 5_000, note: 'Spliced on the rest of a returned roll' }).expect(200);
    expect((await hub.db('rolls').where({ id: rollId }).first())!.low_notified_at).toBeNull();
    await cut(3_200); // 1800 mm left again
    expect(await lowRows()).toHaveLength(2 * leads.length);
    await waitForMail(sink, (m) => aboutRoll(m) && sink.messages.filter(aboutRoll).length === 2 * leads.length);
  });
});

describe('the end-of-shift summary', () => {
  // These tests set the shop's working days and shift they need, so they pass on any day of the week, and put the settings back.
  let saved: ShopSettingsRow;
  beforeAll(async () => {
    saved = (await hub.db('shop_settings').where({ id: 1 }).first())!;
  });
  afterEach(async () => {
    const { time_zone, shift_start, shift_end, working_days } = saved;
    await hub.db('shop_settings').where({ id: 1 }).update({ time_zone, shift_start, shift_end, working_days });
  });
  const workEveryDay = () => hub.db('shop_settings').where({ id: 1 }).update({ working_days: workingDaysText(ISO_WEEKDAYS) });
  const summariesOf = (shiftDate: string) => hub.db('mail_log').where({ kind: 'shift_summary' }).whereRaw("JSON_UNQUOTE(JSON_EXTRACT(related, '$.shiftDate')) = ?", [shiftDate]);
  const londonClock = (at: Date) => new Intl.DateTimeFormat('en-GB', { timeZone: 'Europe/London', hour: '2-digit', minute: '2-digit', second: '2-digit', hourCycle: 'h23' }).format(at);

  /**
   * Starts a shift a second from now that runs a day less one second (London wall clock), on a day the shop does
   * not work: it opens half a second before its start, so no earlier test's events count as work in it. Answers
   * the shift's day and a moment a minute after it ends.
   */
  async function freshShiftOnDayOff(): Promise<{ shiftDate: string; afterEnd: Date }> {
    const start = new Date(Math.ceil((Date.now() + 1000) / 1000) * 1000);
    const shiftDate = localDate(start, 'Europe/London');
    const dayOff = isoWeekdayOf(shiftDate);
    await hub.db('shop_settings').where({ id: 1 }).update({
      time_zone: 'Europe/London',
      shift_start: londonClock(start),
      shift_end: londonClock(new Date(start.getTime() - 1000)),
      working_days: workingDaysText(ISO_WEEKDAYS.filter((day) => day !== dayOff)),
    });
    await new Promise((resolve) => setTimeout(resolve, start.getTime() - Date.now() + 20));
    const shop = (await hub.db('shop_settings').where({ id: 1 }).first())!;
    const shift = shiftWindow(new Date(), shop.time_zone, shop.shift_start, shop.shift_end);
    expect(shift.startAt).toBe(start.toISOString());
    await summariesOf(shiftDate).delete();
    return { shiftDate, afterEnd: new Date(Date.parse(shift.endAt) + 60_000) };
  }

  const newScheduler = () => {
    const board = new BoardService(hub.db);
    return new ShiftSummaryScheduler(hub.db, hub.mail, (now) => board.board(now), pino({ level: 'silent' }));
  };

  it("is queued once to every active owner after the shop's shift ends, and not again on the next check", async () => {
    await workEveryDay();
    const shop = (await hub.db('shop_settings').where({ id: 1 }).first())!;
    const shift = shiftWindow(new Date(), shop.time_zone, shop.shift_start, shop.shift_end);
    const afterEnd = new Date(new Date(shift.endAt).getTime() + 60_000);
    const ended = endedShift(afterEnd, shop.time_zone, shop.shift_start, shop.shift_end)!;
    await hub.db('mail_log').where({ kind: 'shift_summary' }).whereRaw("JSON_UNQUOTE(JSON_EXTRACT(related, '$.shiftDate')) = ?", [ended.shiftDate]).delete();
    const board = new BoardService(hub.db);
    const scheduler = new ShiftSummaryScheduler(hub.db, hub.mail, (now) => board.board(now), pino({ level: 'silent' }));
    const owners = (await hub.db('users').where({ role: 'owner', active: true }).whereNotNull('email').select('email')).map((u) => u.email!);

    expect(await scheduler.check(new Date(new Date(shift.endAt).getTime() - 60_000))).toBe(0);
    expect(await scheduler.check(afterEnd)).toBe(owners.length);
    expect(await scheduler.check(new Date(afterEnd.getTime() + 60_000))).toBe(0);

    const [message] = await waitForMail(sink, (m) => m.to.includes(DEMO_ACCOUNTS.owner.email) && m.raw.toString('utf8').includes('End-of-shift summary'));
    const mail = await parsed(message!);
    expect(mail.subject).toMatch(/^End-of-shift summary for \w+day \d{1,2} \w+ \d{4}$/);
    expect(mail.text).toContain('Pieces per station');
    expect(mail.text).toContain('First-pass yield');
    expect(mail.html).toContain('Orders at risk');
  });

  it('is queued once when two hub processes look at the same moment', async () => {
    await workEveryDay();
    const shop = (await hub.db('shop_settings').where({ id: 1 }).first())!;
    const afterEnd = new Date(new Date(shiftWindow(new Date(), shop.time_zone, shop.shift_start, shop.shift_end).endAt).getTime() + 120_000);
    const ended = endedShift(afterEnd, shop.time_zone, shop.shift_start, shop.shift_end)!;
    const summaries = () => hub.db('mail_log').where({ kind: 'shift_summary' }).whereRaw("JSON_UNQUOTE(JSON_EXTRACT(related, '$.shiftDate')) = ?", [ended.shiftDate]);
    await summaries().delete();
    const board = new BoardService(hub.db);
    const scheduler = () => new ShiftSummaryScheduler(hub.db, hub.mail, (now) => board.board(now), pino({ level: 'silent' }));
    const owners = await hub.db('users').where({ role: 'owner', active: true }).whereNotNull('email');

    const queued = await Promise.all([scheduler().check(afterEnd), scheduler().check(afterEnd)]);

    expect(queued.reduce((a, b) => a + b, 0)).toBe(owners.length);
    expect(await summaries()).toHaveLength(owners.length);
  });

  it('is not queued for a quiet shift on a day the shop does not work, and is once that day is a working day', async () => {
    const { shiftDate, afterEnd } = await freshShiftOnDayOff();
    const owners = await hub.db('users').where({ role: 'owner', active: true }).whereNotNull('email');

    expect(await newScheduler().check(afterEnd)).toBe(0);
    expect(await summariesOf(shiftDate)).toHaveLength(0);

    // The same quiet shift on a working day still gets its summary: the day off is what kept it back.
    await workEveryDay();
    expect(await newScheduler().check(afterEnd)).toBe(owners.length);
    expect(await summariesOf(shiftDate)).toHaveLength(owners.length);
  });

  it('is queued for a shift on a day off when someone recorded one piece in it', async () => {
    const { shiftDate, afterEnd } = await freshShiftOnDayOff();
    const owners = await hub.db('users').where({ role: 'owner', active: true }).whereNotNull('email');
    const cutter = await operatorOn(hub.url, hub.db, 'Cut 1', 1);
    const bag = await freshBag(hub.db, 1);
    await request(hub.url).post('/api/events').set('Cookie', cutter.cookie).send({ events: [stationEvent({ bagId: bag.id, stationId: cutter.stationId, userId: cutter.userId }, 'cut_done', 1)] }).expect(200);

    expect(await newScheduler().check(afterEnd)).toBe(owners.length);
    expect(await summariesOf(shiftDate)).toHaveLength(owners.length);
  });

  it('goes to the owner at once when a lead asks for the shift so far', async () => {
    const res = await request(hub.url).post('/api/mail/shift-summary').set('Cookie', lead).expect(201);
    expect(res.body).toMatchObject({ kind: 'shift_summary', to: DEMO_ACCOUNTS.owner.email, related: { final: false } });
    await waitForMail(sink, (m) => m.raw.toString('utf8').includes('Shift so far'));
  });
});
