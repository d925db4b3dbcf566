import 'fake-indexeddb/auto';
import { ComponentFixture, TestBed } from '@angular/core/testing';
import { HttpTestingController } from '@angular/common/http/testing';
import { Session } from '../auth/session';
import type { SpoilReason } from '../../shared/events-contract';
import { STATION_DB, type StationDb } from '../sync/station-db';
import { SyncService } from '../sync/sync-service';
import { cacheTicket, freshStationDb, operatorSession, plainTicket, until } from '../sync/station-testing';
import { SpoilReport } from './spoil-report';
import { screenTestProviders } from '../core/screen-testing';

const REASONS: SpoilReason[] = [
  { id: 5, label: 'Film lifted after peel', position: 1, active: true },
  { id: 6, label: 'Crooked placement', position: 2, active: true },
];

describe('SpoilReport', () => {
  let db: StationDb;
  let fixture: ComponentFixture<SpoilReport>;
  let http: HttpTestingController;

  beforeEach(async () => {
    db = freshStationDb();
    await cacheTicket(db, plainTicket(2, { L: 6 }));
    // The reasons were kept from an earlier visit; this time the hub does not answer.
    await db.meta.put({ name: 'spoilReasons', value: REASONS });
    TestBed.configureTestingModule({
      imports: [SpoilReport],
      providers: [
        ...screenTestProviders(),
        { provide: STATION_DB, useValue: db },
        { provide: Session, useValue: operatorSession() },
        { provide: SyncService, useValue: { nudge: jest.fn() } },
      ],
    });
    http = TestBed.inject(HttpTestingController);
    fixture = TestBed.createComponent(SpoilReport);
    fixture.componentRef.setInput('bag', '2');
    await settle(() => reasons().length === 2);
    for (const request of http.match('/api/spoil-reasons')) request.error(new ProgressEvent('error'), { status: 0, statusText: 'Unknown Error' });
  });

  afterEach(() => db.delete());

  const root = () => fixture.nativeElement as HTMLElement;
  const reasons = () => [...root().querySelectorAll<HTMLButtonElement>('[data-testid="spoil-reason"]')];
  const save = () => root().querySelector<HTMLButtonElement>('[data-testid="spoil-save"]')!;
  const button = (id: string) => root().querySelector<HTMLButtonElement>(`[data-testid="${id}"]`)!;
  async function settle(check: () => boolean): Promise<void> {
    await until(async () => {
      await fixture.whenStable();
      return check();
    });
  }

  it('keeps Log spoil disabled until both a quantity and a reason are chosen', async () => {
    expect(save().disabled).toBe(true);

    button('spoil-plus').click();
    await settle(() => button('spoil-quantity').textContent?.trim() === '1');
    expect(save().disabled).toBe(true);

    button('spoil-minus').click();
    reasons()[1]!.click();
    await settle(() => reasons()[1]!.getAttribute('aria-pressed') === 'true');
    expect(save().disabled).toBe(true);

    button('spoil-plus').click();
    await settle(() => !save().disabled);
  });

  it('saves with no network: the spoil, the bag\'s remake count and the photo are all in Dexie', async () => {
    button('spoil-plus').click();
    button('spoil-plus').click();
    reasons()[0]!.click();
    // jsdom has no object URLs; the preview only needs one to show.
    globalThis.URL.createObjectURL ??= () => 'blob:preview';
    globalThis.URL.revokeObjectURL ??= () => undefined;
    const photo = new File([new Uint8Array([0xff, 0xd8, 0xff, 0xd9])], 'spoil.jpg', { type: 'image/jpeg' });
    const input = button('spoil-photo-input') as unknown as HTMLInputElement;
    Object.defineProperty(input, 'files', { value: [photo], configurable: true });
    input.dispatchEvent(new Event('change'));
    await settle(() => !save().disabled);

    save().click();
    await settle(() => !!root().querySelector('[data-testid="spoil-confirmation"]'));

    const [event] = await db.outbox.toArray();
    expect(event).toMatchObject({ kind: 'spoil', bagId: 2, quantity: 2, state: 'pending', payload: { stage: 'weed', reasonId: 5, note: '', hasPhoto: true } });
    expect((await db.tickets.get(2))!.ticket.bag.remakeCount).toBe(2);
    const stored = await db.photos.get(event!.id);
    expect(stored).toMatchObject({ state: 'waiting', attempts: 0 });
    expect(stored!.blob).toBe(photo);
    expect(root().querySelector('[data-testid="spoil-confirmation"]')!.textContent).toContain('2 pieces, film lifted after peel');
    // Nothing went to the hub: saving never waits for the network.
    http.expectNone((request) => request.method === 'POST');
  });

  it('refuses a file that is not a photo with a sentence and keeps the form as it was', async () => {
    const input = button('spoil-photo-input') as unknown as HTMLInputElement;
    Object.defineProperty(input, 'files', { value: [new File(['a,b'], 'list.csv', { type: 'text/csv' })], configurable: true });
    input.dispatchEvent(new Event('change'));
    await settle(() => !!root().querySelector('[data-testid="spoil-problem"]'));
    expect(root().querySelector('[data-testid="spoil-problem"]')!.textContent).toContain('not a photo');
    expect(root().querySelector('[data-testid="spoil-photo-preview"]')).toBeNull();
  });
});
