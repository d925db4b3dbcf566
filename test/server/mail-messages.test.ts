import { DomUtils, parseDocument } from 'htmlparser2';
import type { BoardReply } from '../../src/shared/board-contract';
import { failureSentence } from '../../server/mail/mail-failure';
import { nextAttemptAt, RETRY_DELAYS_MS } from '../../server/mail/mail-outbox';
import { filmLowMessage, rollLength } from '../../server/mail/messages/film-low-message';
import type { ShopIdentity } from '../../server/mail/messages/mail-content';
import { escapeHtml } from '../../server/mail/messages/mail-html';
import { orderReadyMessage, sortedSizes, type OrderReadyFacts } from '../../server/mail/messages/order-ready-message';
import { shiftSummaryMessage } from '../../server/mail/messages/shift-summary-message';
import { endedShift } from '../../server/mail/shift-summary-scheduler';
import { MAIL_MAX_ATTEMPTS } from '../../src/shared/mail-contract';

// escape-html ships no types; it is the escaper Express itself depends on.
const escapeHtmlReference = require('escape-html') as (text: string) => string;

// Invented demo shop and customer (demo data only).
const shop: ShopIdentity = { name: 'Bramble Yard Apparel', address: 'Unit 4, Bramble Yard, Tanner Row, Hollinford', phone: '01632 960000', email: 'hello@brambleyard.example' };
const TRICKY = `O'Brien & <Sons>`;

/** The text a conforming HTML parser reads out of a document, and the names of its elements. */
function readHtml(html: string): { text: string; tags: string[] } {
  const doc = parseDocument(html);
  const tags = DomUtils.findAll(() => true, doc.children).map((el) => el.name);
  return { text: DomUtils.textContent(doc).replace(/\s+/g, ' '), tags };
}

describe('escapeHtml', () => {
  it('escapes exactly as the escape-html package does for markup characters and both quotes', () => {
    // escape-html (the escaper Express itself uses) is the independent reference.
    for (const sample of [TRICKY, '"quoted" <b>bold</b>', 'plain text', '&amp; already']) {
      expect(escapeHtml(sample)).toBe(escapeHtmlReference(sample));
    }
  });
});

describe('the order ready message', () => {
  const facts: OrderReadyFacts = {
    shop,
    orderCode: '1042',
    customerName: TRICKY,
    contactName: TRICKY,
    lines: [
      { jobName: 'Café logo', garment: 'Apron', sizes: { L: 2, S: 3, M: 4 } },
      { jobName: 'Back print', garment: 'Tee', sizes: { XL: 1, '2XL': 1 } },
    ],
  };

  it('names the order in the subject and lists pieces per job, garment and size with the total', () => {
    const message = orderReadyMessage(facts);
    expect(message.subject).toBe('Order 1042 is ready to collect from Bramble Yard Apparel');
    expect(message.text).toContain(`Hello ${TRICKY},`);
    expect(message.text).toContain('- Café logo on Apron: S × 3, M × 4, L × 2 (9 pieces)');
    expect(message.text).toContain('- Back print on Tee: XL × 1, 2XL × 1 (2 pieces)');
    expect(message.text).toContain('Total: 11 pieces');
    expect(message.text).toContain('Unit 4, Bramble Yard, Tanner Row, Hollinford');
    expect(message.text).toContain('Phone 01632 960000');
  });

  it("escapes a customer name like O'Brien & <Sons> in the HTML so a parser reads it back as text", () => {
    const { html } = orderReadyMessage(facts);
    expect(html).toContain('O&#39;Brien &amp; &lt;Sons&gt;');
    expect(html).not.toContain('<Sons>');
    // htmlparser2 (an independent HTML parser from npm) reads the name back as text, with no element made of it.
    const read = readHtml(html);
    expect(read.text).toContain(`Hello ${TRICKY},`);
    expect(read.tags).not.toContain('sons');
    expect(read.tags).not.toContain('script');
    expect(read.tags).not.toContain('img');
    expect(read.text).toContain('S × 3, M × 4, L × 2');
  });

  it('falls back to the customer name when there is no contact name', () => {
    expect(orderReadyMessage({ ...facts, contactName: '  ' }).text.startsWith(`Hello ${TRICKY},`)).toBe(true);
  });

  it('sorts sizes youth first, then adult small to large, then unknown sizes by name', () => {
    expect(sortedSizes({ XL: 1, Custom: 2, YM: 1, S: 1, '2XL': 1, M: 0 }).map(([s]) => s)).toEqual(['YM', 'S', 'XL', '2XL', 'Custom']);
  });
});

describe('the film low message', () => {
  const roll = { label: 'R-12', filmType: 'Standard PU 90 µm', colour: 'Red & White', rackSlot: 'B2', remainingMm: 600, reorderMm: 2000 };

  it('gives lengths in inches for an imperial shop and in metres for a metric one', () => {
    // NIST SP 811 (2008), appendix B: 1 in = 25.4 mm exactly, so 600 mm = 23.62 in and 2000 mm = 78.74 in.
    expect(rollLength(600, 'imperial')).toBe('23.6 in');
    expect(rollLength(2000, 'imperial')).toBe('78.7 in');
    // SI: 1 m = 1000 mm.
    expect(rollLength(600, 'metric')).toBe('0.60 m');
    const imperial = filmLowMessage({ shop, units: 'imperial', roll });
    expect(imperial.subject).toBe('Film running low: roll R-12 (Standard PU 90 µm, Red & White)');
    expect(imperial.text).toContain('Roll R-12 of Standard PU 90 µm, Red & White has 23.6 in left, below its reorder length of 78.7 in.');
    expect(imperial.text).toContain('Rack slot: B2');
    expect(filmLowMessage({ shop, units: 'metric', roll }).text).toContain('has 0.60 m left, below its reorder length of 2.00 m.');
  });

  it('escapes the film colour in the HTML part', () => {
    const { html } = filmLowMessage({ shop, units: 'metric', roll });
    expect(html).toContain('Red &amp; White');
    expect(readHtml(html).text).toContain('Red & White');
  });
});

describe('the shift summary message', () => {
  // An invented board for the demo shop (numbers made up for this check only).
  const board: BoardReply = {
    generatedAt: '2026-07-14T14:30:00.000Z',
    shift: { startAt: '2026-07-14T06:00:00.000Z', endAt: '2026-07-14T14:30:00.000Z' },
    stations: [
      { id: 1, name: 'Press 1', kind: 'press', piecesPerHour: 20, shiftPieces: 150, shiftPiecesPerHour: 17.647, online: true, lastEventAt: null, lastSyncAt: null, lastSeenAt: null },
      { id: 2, name: 'Pack', kind: 'pack', piecesPerHour: 12, shiftPieces: 120, shiftPiecesPerHour: 14.1, online: true, lastEventAt: null, lastSyncAt: null, lastSeenAt: null },
    ],
    stages: { queued: { bags: 1, pieces: 10 }, cut: { bags: 0, pieces: 0 }, weeded: { bags: 0, pieces: 0 }, pressed: { bags: 0, pieces: 0 }, packed: { bags: 4, pieces: 120 } },
    orders: [
      { id: 7, code: '1043', customerName: TRICKY, dueAt: '2026-07-14T15:00:00.000Z', etaAt: '2026-07-14T17:15:00.000Z', atRisk: true, remainingPieces: 40, bottleneck: 'press', rateSource: 'observed' },
      { id: 8, code: '1044', customerName: 'Saltmarsh Lane', dueAt: '2026-07-17T15:00:00.000Z', etaAt: '2026-07-15T10:00:00.000Z', atRisk: false, remainingPieces: 10, bottleneck: 'cut', rateSource: 'standard' },
    ],
    firstPassYield: 0.95,
    spoilRate: 0.05,
    spoilReasons: [
      { reason: 'Peeled too early', pieces: 4, share: 0.5, cumulativeShare: 0.5 },
      { reason: 'Crooked placement', pieces: 2, share: 0.25, cumulativeShare: 0.75 },
      { reason: 'Torn film', pieces: 1, share: 0.125, cumulativeShare: 0.875 },
      { reason: 'Scorched', pieces: 1, share: 0.125, cumulativeShare: 1 },
    ],
    taktS: null,
    piecesDueToday: 0,
    lowRolls: [],
    flags: [],
    hourly: { hours: [], stations: [] },
  };

  it('reports pieces per station, the top three spoil reasons, first-pass yield and only the orders at risk, in shop time', () => {
    const message = shiftSummaryMessage({ shop, timeZone: 'Europe/London', shiftDate: '2026-07-14', final: true, board });
    expect(message.subject).toBe('End-of-shift summary for Tuesday 14 July 2026');
    // Europe/London keeps British Summer Time (UTC+1) in July (IANA time zone database).
    expect(message.text).toContain('Shift Tue 14 Jul 07:00 to Tue 14 Jul 15:30.');
    expect(message.text).toContain('- Press 1 (press): 150 pieces, 17.6 per hour');
    expect(message.text).toContain('120 pieces packed this shift.');
    expect(message.text).toContain('8 pieces spoiled; spoil rate 5.0 %.');
    expect(message.text).toContain('- Peeled too early: 4 pieces (50.0 %)');
    expect(message.text).toContain('- Torn film: 1 piece (12.5 %)');
    expect(message.text).not.toContain('Scorched');
    expect(message.text).toContain('First-pass yield: 95.0 %.');
    expect(message.text).toContain(`- 1043 for ${TRICKY}: due Tue 14 Jul 16:00, expected Tue 14 Jul 18:15, 40 pieces to go`);
    expect(message.text).not.toContain('1044');
    expect(readHtml(message.html).text).toContain(TRICKY);
    expect(message.html).not.toContain('<Sons>');
  });

  it('calls a summary asked for during the shift the shift so far', () => {
    const message = shiftSummaryMessage({ shop, timeZone: 'Europe/London', shiftDate: '2026-07-14', final: false, board: { ...board, generatedAt: '2026-07-14T10:05:00.000Z' } });
    expect(message.subject).toBe('Shift so far, Tuesday 14 July 2026 (at Tue 14 Jul 11:05)');
  });
});

describe('when the end-of-shift summary is due', () => {
  it("answers today's shift once its end has passed in the shop's time zone, summer and winter", () => {
    // IANA time zone database: Europe/London is UTC+1 in July (BST) and UTC+0 in January (GMT).
    expect(endedShift(new Date('2026-07-14T14:29:00Z'), 'Europe/London', '07:00:00', '15:30:00')).toBeNull();
    expect(endedShift(new Date('2026-07-14T14:31:00Z'), 'Europe/London', '07:00:00', '15:30:00')).toEqual({ shiftDate: '2026-07-14', endAt: new Date('2026-07-14T14:30:00Z') });
    expect(endedShift(new Date('2026-01-14T15:29:00Z'), 'Europe/London', '07:00', '15:30')).toBeNull();
    expect(endedShift(new Date('2026-01-14T15:31:00Z'), 'Europe/London', '07:00', '15:30')?.shiftDate).toBe('2026-01-14');
  });

  it('answers an overnight shift by the day it started, after it ends the next morning', () => {
    const ended = endedShift(new Date('2026-01-15T02:05:00Z'), 'Europe/London', '22:00', '02:00');
    expect(ended).toEqual({ shiftDate: '2026-01-14', endAt: new Date('2026-01-15T02:00:00Z') });
  });

  it('answers nothing for a shift that ended more than twelve hours ago', () => {
    expect(endedShift(new Date('2026-01-15T04:00:00Z'), 'Europe/London', '07:00', '15:30')).toBeNull();
  });
});

describe('the retry schedule', () => {
  it('waits longer after each failure and then waits for a lead', () => {
    const at = new Date('2026-07-14T10:00:00Z');
    const waits = [1, 2, 3, 4].map((attempts) => nextAttemptAt(attempts, at)!.getTime() - at.getTime());
    expect(waits).toEqual([...RETRY_DELAYS_MS]);
    expect(nextAttemptAt(MAIL_MAX_ATTEMPTS, at)).toBeNull();
  });

  it('says why a send failed in a sentence without a stack trace', () => {
    const refused = Object.assign(new Error('connect ECONNREFUSED 127.0.0.1:2525\n    at TCPConnectWrap'), { code: 'ESOCKET' });
    expect(failureSentence(refused)).toBe('The mail service did not answer (connect ECONNREFUSED 127.0.0.1:2525). Check SMTP_URL and that the mail service is running.');
    expect(failureSentence(Object.assign(new Error('Message failed: 550 mailbox unavailable'), { code: 'EMESSAGE', responseCode: 550 }))).toBe(
      'The mail service refused the message with code 550 (Message failed: 550 mailbox unavailable).',
    );
    expect(failureSentence(Object.assign(new Error('Invalid login'), { code: 'EAUTH' }))).toMatch(/refused the sign-in/);
  });
});
