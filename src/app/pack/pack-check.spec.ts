import 'fake-indexeddb/auto';
import { ComponentFixture, TestBed } from '@angular/core/testing';
import { signal } from '@angular/core';
import type { StationTicket } from '../../shared/events-contract';
import type { StationKind } from '../../shared/names';
import { Session } from '../auth/session';
import { STATION_DB, type StationDb } from '../sync/station-db';
import { SyncService } from '../sync/sync-service';
import { cacheTicket, freshStationDb, operatorSession, plainTicket, until } from '../sync/station-testing';
import { PackCheck } from './pack-check';
import { screenTestProviders } from '../core/screen-testing';

/** A bag of 2 S and 3 M with every piece pressed, unless the counts say otherwise; spoils are per stage. */
function pressedTicket(counts: { pressed?: number; packed?: number } = {}, spoiledAt: Partial<Record<StationKind, number>> = {}): StationTicket {
  const ticket = plainTicket(1, { S: 2, M: 3 }, 5);
  ticket.bag.stage = 'pressed';
  const perStage = { ...ticket.bag.counts.spoiledAt, ...spoiledAt };
  const spoiled = Object.values(perStage).reduce((a, b) => a + b, 0);
  ticket.bag.counts = { ...ticket.bag.counts, pressed: 5, ...counts, spoiled, spoiledAt: perStage };
  ticket.bag.remakeCount = spoiled;
  return ticket;
}

/** A personalised bag of three names, all pressed. */
function rosterTicket(): StationTicket {
  const ticket = plainTicket(2, { M: 2, L: 1 }, 3);
  ticket.bag.counts.pressed = 3;
  ticket.job.personalised = true;
  ticket.rosterLines = [
    { id: 21, name: 'Quill', number: '4', size: 'M', extraText: '', bagId: 2 },
    { id: 22, name: 'Tamsin', number: '9', size: 'M', extraText: '', bagId: 2 },
    { id: 23, name: 'Orrin', number: '15', size: 'L', extraText: '', bagId: 2 },
  ];
  return ticket;
}

describe('PackCheck', () => {
  let db: StationDb;
  let fixture: ComponentFixture<PackCheck>;

  async function open(ticket: StationTicket): Promise<void> {
    await cacheTicket(db, ticket);
    fixture = TestBed.createComponent(PackCheck);
    fixture.componentRef.setInput('bag', String(ticket.bag.id));
    await settle(() => lines().length > 0);
  }

  beforeEach(() => {
    db = freshStationDb();
    TestBed.configureTestingModule({
      imports: [PackCheck],
      providers: [
        ...screenTestProviders(),
        { provide: STATION_DB, useValue: db },
        { provide: Session, useValue: { ...operatorSession(), station: signal({ id: 4, name: 'Pack 1', kind: 'pack' as const }) } },
        { provide: SyncService, useValue: { nudge: jest.fn() } },
      ],
    });
  });

  afterEach(() => db.delete());

  const root = () => fixture.nativeElement as HTMLElement;
  const lines = () => [...root().querySelectorAll<HTMLElement>('[data-testid="pack-line"]')];
  const byTestId = <T extends HTMLElement = HTMLElement>(id: string) => root().querySelector<T>(`[data-testid="${id}"]`);
  const click = (id: string) => byTestId<HTMLButtonElement>(id)!.click();
  const settle = async (check: () => boolean) => until(async () => {
    await fixture.whenStable();
    return check();
  });

  it('lists the bag sizes in size order with what was ordered, and the bag numbers', async () => {
    await open(pressedTicket());

    expect(lines().map((line) => [line.querySelector('.title')?.textContent, line.querySelector('[data-testid="pack-line-count"]')?.textContent?.trim()]))
      .toEqual([['S', '0 of 2'], ['M', '0 of 3']]);
    const numbers = [...byTestId('pack-numbers')!.querySelectorAll('div')].map((pair) => [pair.querySelector('dt')?.textContent, pair.querySelector('dd')?.textContent]);
    expect(numbers).toEqual([['Ordered', '5'], ['Pressed so far', '5'], ['Packed', '0'], ['Counted now', '0']]);
    expect(byTestId('pack-remakes')).toBeNull();
  });

  it('writes one pack_done with the counted sizes and quantity when the whole bag is ticked', async () => {
    await open(pressedTicket());

    lines()[0]!.querySelector<HTMLButtonElement>('[data-testid="pack-tick"]')!.click();
    lines()[1]!.querySelector<HTMLButtonElement>('[data-testid="pack-tick"]')!.click();
    await settle(() => byTestId('pack-counted')?.textContent === '5');
    click('pack-mark');
    await settle(() => !!byTestId('pack-result'));

    const rows = await db.outbox.toArray();
    expect(rows).toHaveLength(1);
    expect(rows[0]).toMatchObject({ kind: 'pack_done', bagId: 1, stationId: 4, quantity: 5, state: 'pending', payload: { sizes: { S: 2, M: 3 } } });
    expect(byTestId('pack-result')!.textContent).toContain('Bag 2001-A packed: all 5 pieces are in.');
    expect(byTestId('pack-confirm')).toBeNull();
    await settle(() => byTestId('pack-all-done') !== null);
    expect((await db.tickets.get(1))!.ticket.bag.counts.packed).toBe(5);
  });

  it('counts single garments with the steppers and sends only those sizes', async () => {
    await open(pressedTicket());

    const m = lines()[1]!;
    m.querySelector<HTMLButtonElement>('[data-testid="pack-plus"]')!.click();
    await settle(() => byTestId('pack-counted')?.textContent === '1');
    m.querySelector<HTMLButtonElement>('[data-testid="pack-plus"]')!.click();
    await settle(() => byTestId('pack-counted')?.textContent === '2');
    click('pack-mark');
    await settle(() => !!byTestId('pack-confirm'));
    click('pack-confirm-yes');
    await settle(() => !!byTestId('pack-result'));

    const rows = await db.outbox.toArray();
    expect(rows.map((row) => [row.kind, row.quantity, row.payload])).toEqual([['pack_done', 2, { sizes: { M: 2 } }]]);
    expect(byTestId('pack-result')!.textContent).toContain('2 packed now, 3 still to pack');
  });

  it('calls out remakes still owed and packs part of the bag only after a confirmation', async () => {
    // 2 pieces spoiled at the press and not pressed again: 3 good pressed pieces of 5.
    await open(pressedTicket({ pressed: 3 }, { press: 2 }));

    expect(byTestId('pack-remakes')!.textContent).toContain('2 remakes still to come from the press.');
    click('pack-tick-all');
    await settle(() => byTestId('pack-counted')?.textContent === '5');
    click('pack-mark');
    await settle(() => !!byTestId('pack-confirm'));

    const confirm = byTestId('pack-confirm')!.textContent!;
    expect(confirm).toContain('2 remakes are still owed, so the bag cannot be complete yet.');
    expect(confirm).toContain('Only 3 pieces are recorded as pressed and not yet packed.');
    expect(await db.outbox.count()).toBe(0);

    click('pack-confirm-no');
    await settle(() => !byTestId('pack-confirm'));
    expect(await db.outbox.count()).toBe(0);

    lines()[1]!.querySelector<HTMLButtonElement>('[data-testid="pack-tick"]')!.click();
    await settle(() => byTestId('pack-counted')?.textContent === '2');
    click('pack-mark');
    await settle(() => !!byTestId('pack-confirm'));
    click('pack-confirm-yes');
    await settle(() => !!byTestId('pack-result'));

    const rows = await db.outbox.toArray();
    expect(rows.map((row) => [row.kind, row.quantity, row.payload])).toEqual([['pack_done', 2, { sizes: { S: 2 } }]]);
  });

  it('calls out the remake of a piece spoiled at the pack bench on another tablet, with nothing in this outbox', async () => {
    // 5 pressed, 1 spoiled while packing on another tablet: the press owes 6, so 1 remake; 4 ready to pack.
    await open(pressedTicket({}, { pack: 1 }));

    expect(await db.outbox.count()).toBe(0);
    expect(byTestId('pack-remakes')!.textContent).toContain('1 remake still to come from the press.');
    click('pack-tick-all');
    await settle(() => byTestId('pack-counted')?.textContent === '5');
    click('pack-mark');
    await settle(() => !!byTestId('pack-confirm'));
    expect(byTestId('pack-confirm')!.textContent).toContain('Only 4 pieces are recorded as pressed and not yet packed.');
  });

  it('shows one tile per roster line and sends the ticked names as their sizes', async () => {
    await open(rosterTicket());

    expect(lines().map((line) => line.querySelector('.title')?.textContent)).toEqual(['Quill', 'Tamsin', 'Orrin']);
    expect(lines()[2]!.querySelector('.detail')?.textContent).toBe('#15 · L');
    expect(root().querySelector('[data-testid="pack-plus"]')).toBeNull();

    click('pack-tick-all');
    await settle(() => byTestId('pack-counted')?.textContent === '3');
    click('pack-mark');
    await settle(() => !!byTestId('pack-result'));

    const rows = await db.outbox.toArray();
    expect(rows.map((row) => [row.kind, row.quantity, row.payload])).toEqual([['pack_done', 3, { sizes: { M: 2, L: 1 } }]]);
  });

  it('shows pieces this tablet packed earlier on their own size after the count is sent', async () => {
    await open(pressedTicket());

    lines()[1]!.querySelector<HTMLButtonElement>('[data-testid="pack-tick"]')!.click();
    await settle(() => byTestId('pack-counted')?.textContent === '3');
    click('pack-mark');
    await settle(() => !!byTestId('pack-confirm'));
    click('pack-confirm-yes');

    await settle(() => lines()[1]!.querySelector('[data-testid="pack-line-count"]')?.textContent?.trim() === '3 of 3');
    expect(lines()[0]!.querySelector('[data-testid="pack-line-count"]')?.textContent?.trim()).toBe('0 of 2');
    expect(lines()[1]!.classList).toContain('ticked');
  });
});
