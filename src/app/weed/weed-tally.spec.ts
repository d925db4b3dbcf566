import 'fake-indexeddb/auto';
import { ComponentFixture, TestBed } from '@angular/core/testing';
import { Session } from '../auth/session';
import { STATION_DB, type StationDb } from '../sync/station-db';
import { SyncService } from '../sync/sync-service';
import { cacheTicket, freshStationDb, operatorSession, plainTicket, until } from '../sync/station-testing';
import { WeedTally } from './weed-tally';
import { screenTestProviders } from '../core/screen-testing';

describe('WeedTally', () => {
  let db: StationDb;
  let fixture: ComponentFixture<WeedTally>;

  beforeEach(async () => {
    db = freshStationDb();
    await cacheTicket(db, plainTicket(1, { S: 2, M: 3 }));
    TestBed.configureTestingModule({
      imports: [WeedTally],
      providers: [
        ...screenTestProviders(),
        { provide: STATION_DB, useValue: db },
        { provide: Session, useValue: operatorSession() },
        { provide: SyncService, useValue: { nudge: jest.fn() } },
      ],
    });
    fixture = TestBed.createComponent(WeedTally);
    fixture.componentRef.setInput('bag', '1');
    await until(async () => {
      await fixture.whenStable();
      return tiles().length === 2;
    });
  });

  afterEach(() => db.delete());

  const root = () => fixture.nativeElement as HTMLElement;
  const tiles = () => [...root().querySelectorAll<HTMLButtonElement>('[data-testid="weed-tile"]')];
  const progress = () => root().querySelector('[data-testid="weed-progress"]')?.textContent?.trim();
  const settle = async (check: () => boolean) => until(async () => {
    await fixture.whenStable();
    return check();
  });

  it('marks a piece done on a tap: the outbox holds the event and the tile and bag count show it', async () => {
    tiles()[1]!.click();
    await settle(() => progress() === '1 of 5 weeded');

    expect(tiles()[1]!.textContent).toContain('1 of 3');
    const rows = await db.outbox.toArray();
    expect(rows).toHaveLength(1);
    expect(rows[0]).toMatchObject({ kind: 'weed_done', bagId: 1, quantity: 1, state: 'pending', size: 'M' });
    expect(rows[0]!.holdUntil).toBeGreaterThan(Date.now());
  });

  it('takes a tap back with Undo while its window is open', async () => {
    tiles()[0]!.click();
    await settle(() => !!root().querySelector('[data-testid="weed-undo"]'));

    root().querySelector<HTMLButtonElement>('[data-testid="weed-undo"]')!.click();
    await settle(() => progress() === '0 of 5 weeded');

    expect(await db.outbox.count()).toBe(0);
    expect(tiles()[0]!.textContent).toContain('0 of 2');
  });

  it('sends one event with the remaining quantity for "all remaining done"', async () => {
    tiles()[0]!.click();
    await settle(() => progress() === '1 of 5 weeded');
    const all = root().querySelector<HTMLButtonElement>('[data-testid="weed-all-done"]')!;
    expect(all.textContent).toContain('All 4 remaining done');

    all.click();
    await settle(() => progress() === '5 of 5 weeded');

    const rows = await db.outbox.orderBy('seq').toArray();
    expect(rows.map((row) => [row.kind, row.quantity])).toEqual([['weed_done', 1], ['weed_done', 4]]);
    expect(tiles().every((tile) => tile.classList.contains('done'))).toBe(true);
  });
});
