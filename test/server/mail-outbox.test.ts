import request from 'supertest';
import type { RunningHub } from '../../server/hub';
import { SmtpSink } from '../../server/mail/smtp-sink';
import { MAIL_MAX_ATTEMPTS } from '../../src/shared/mail-contract';
import { DEMO_ACCOUNTS } from '../../seeds/data/demo-accounts';
import { leadCookie, operatorOn, startTestHub } from './events-fixtures';
import { parsed, waitForRow } from './mail-fixtures';

// The mail service is down: SMTP_URL points at a port where nothing listens until a sink is started there.
let hub: RunningHub;
let port: number;
let lead: string;
let revived: SmtpSink | null = null;

beforeAll(async () => {
  const probe = new SmtpSink();
  port = await probe.start();
  await probe.close();
  hub = await startTestHub({ SMTP_URL: `smtp://127.0.0.1:${port}` });
  lead = await leadCookie(hub.url);
});
afterAll(async () => {
  await hub.close();
  await revived?.close();
});

const askSummary = async () => (await request(hub.url).post('/api/mail/shift-summary').set('Cookie', lead).expect(201)).body as { id: number };

describe('a message the mail service does not take', () => {
  it('stays failed with its attempts and a sentence, waits longer after each try, and is delivered by a lead\'s retry once the service is back', async () => {
    expect(hub.mail.sink).toBeNull();
    const { id } = await askSummary();
    const failed = await waitForRow(hub.db, id, (row) => row.status === 'failed');
    expect(failed.attempts).toBe(1);
    expect(failed.last_error).toMatch(/^The mail service did not answer \(.*ECONNREFUSED.*\)\. Check SMTP_URL/);
    expect(failed.last_error).not.toMatch(/\n|    at /);
    const firstWait = new Date(failed.next_attempt_at!).getTime() - Date.now();
    expect(firstWait).toBeGreaterThan(20_000);
    expect(firstWait).toBeLessThanOrEqual(30_000);

    // Not due yet: a pass now leaves it alone.
    await hub.mail.sendDue();
    expect((await hub.db('mail_log').where({ id }).first())!.attempts).toBe(1);

    const byHand = await request(hub.url).post(`/api/mail/${id}/retry`).set('Cookie', lead).expect(200);
    expect(byHand.body).toMatchObject({ id, status: 'failed', attempts: 2 });
    expect(byHand.body.lastError).toMatch(/did not answer/);
    const secondWait = new Date((await hub.db('mail_log').where({ id }).first())!.next_attempt_at!).getTime() - Date.now();
    expect(secondWait).toBeGreaterThan(100_000);

    revived = new SmtpSink();
    await revived.start(port);
    const retried = await request(hub.url).post(`/api/mail/${id}/retry`).set('Cookie', lead).expect(200);
    expect(retried.body).toMatchObject({ id, status: 'sent', attempts: 3, lastError: null });
    const delivered = revived.messages.filter((m) => m.to.includes(DEMO_ACCOUNTS.owner.email));
    expect(delivered).toHaveLength(1);
    expect((await parsed(delivered[0]!)).subject).toMatch(/^Shift so far/);

    const twice = await request(hub.url).post(`/api/mail/${id}/retry`).set('Cookie', lead).expect(409);
    expect(twice.body.error).toMatch(/already sent/);
    await revived.close();
    revived = null;
  });

  it('is retried by the outbox itself once its wait is over', async () => {
    const { id } = await askSummary();
    await waitForRow(hub.db, id, (row) => row.status === 'failed');
    revived = new SmtpSink();
    await revived.start(port);
    // Stand in for the 30 s wait by passing a later clock to one pass of the retry loop.
    await hub.mail.sendDue(new Date(Date.now() + 31_000));
    const sent = await waitForRow(hub.db, id, (row) => row.status === 'sent');
    expect(sent.attempts).toBe(2);
    expect(revived.messages.some((m) => m.to.includes(DEMO_ACCOUNTS.owner.email))).toBe(true);
    await revived.close();
    revived = null;
  });

  it(`waits for a lead after ${MAIL_MAX_ATTEMPTS} failed tries`, async () => {
    const { id } = await askSummary();
    await waitForRow(hub.db, id, (row) => row.status === 'failed');
    let clock = Date.now();
    for (let attempt = 2; attempt <= MAIL_MAX_ATTEMPTS + 1; attempt += 1) {
      clock += 60 * 60_000;
      await hub.mail.sendDue(new Date(clock));
    }
    const row = (await hub.db('mail_log').where({ id }).first())!;
    expect(row).toMatchObject({ status: 'failed', attempts: MAIL_MAX_ATTEMPTS, next_attempt_at: null });
  });
});

describe('the Mail outbox routes', () => {
  it('list newest first with status and kind filters and pages, and refuse a bad filter with a sentence', async () => {
    const failedPage = await request(hub.url).get('/api/mail?status=failed&kind=shift_summary&pageSize=2').set('Cookie', lead).expect(200);
    expect(failedPage.body.page).toBe(1);
    expect(failedPage.body.pageSize).toBe(2);
    expect(failedPage.body.items.length).toBeLessThanOrEqual(2);
    expect(failedPage.body.total).toBeGreaterThanOrEqual(1);
    for (const item of failedPage.body.items) expect(item).toMatchObject({ status: 'failed', kind: 'shift_summary' });
    const ids = failedPage.body.items.map((i: { id: number }) => i.id);
    expect(ids).toEqual([...ids].sort((a, b) => b - a));

    const all = await request(hub.url).get('/api/mail?status=&kind=').set('Cookie', lead).expect(200);
    expect(all.body.total).toBeGreaterThanOrEqual(failedPage.body.total);

    const bad = await request(hub.url).get('/api/mail?status=lost').set('Cookie', lead).expect(400);
    expect(bad.body.error).toMatch(/status: Filter by status queued, sent, failed/);
    const badPage = await request(hub.url).get('/api/mail?page=0').set('Cookie', lead).expect(400);
    expect(badPage.body.error).toMatch(/page/);
  });

  it('open one message with its text, serve its HTML alone under a sandboxing policy, and answer 404 for an unknown one', async () => {
    const { id } = await askSummary();
    const detail = await request(hub.url).get(`/api/mail/${id}`).set('Cookie', lead).expect(200);
    expect(detail.body).toMatchObject({ id, kind: 'shift_summary', to: DEMO_ACCOUNTS.owner.email });
    expect(detail.body.text).toMatch(/^Shift so far/);

    const html = await request(hub.url).get(`/api/mail/${id}/html`).set('Cookie', lead).expect(200);
    expect(html.headers['content-type']).toBe('text/html; charset=utf-8');
    expect(html.headers['content-security-policy']).toBe("default-src 'none'; style-src 'unsafe-inline'; img-src data:; sandbox; frame-ancestors 'self'");
    expect(html.headers['x-content-type-options']).toBe('nosniff');
    expect(html.text).toContain('<!doctype html>');
    expect(html.text).not.toMatch(/<script|<img/i);

    for (const path of ['/api/mail/999999', '/api/mail/999999/html']) {
      const missing = await request(hub.url).get(path).set('Cookie', lead).expect(404);
      expect(missing.body.error).toBe('There is no message 999999 in the Mail outbox. Reload the list.');
    }
    expect((await request(hub.url).post('/api/mail/999999/retry').set('Cookie', lead).expect(404)).body.error).toMatch(/no message 999999/);
    expect((await request(hub.url).get('/api/mail/abc').set('Cookie', lead).expect(400)).body.error).toMatch(/message id is a whole number/);
  });

  it('are closed to operators', async () => {
    const packer = await operatorOn(hub.url, hub.db, 'Pack 1');
    await request(hub.url).get('/api/mail').set('Cookie', packer.cookie).expect(403);
  });
});
