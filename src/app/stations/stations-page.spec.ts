import { ComponentFixture, TestBed } from '@angular/core/testing';
import { HttpTestingController } from '@angular/common/http/testing';
import { BROWSER_STORAGE } from '../core/browser-storage';
import { MemoryStorage } from '../core/memory-storage';
import { DEVICE_TOKEN_KEY } from '../auth/device-pairing';
import { StationsPage } from './stations-page';
import { screenTestProviders } from '../core/screen-testing';

const STATIONS = [
  { id: 1, name: 'Cutter A', kind: 'cut', paired: true, pairedAt: '2025-03-03T08:00:00Z', lastSeenAt: null },
  { id: 2, name: 'Press 1', kind: 'press', paired: false, pairedAt: null, lastSeenAt: null },
];

describe('StationsPage', () => {
  let fixture: ComponentFixture<StationsPage>;
  let http: HttpTestingController;
  let storage: MemoryStorage;

  function element(): HTMLElement {
    return fixture.nativeElement as HTMLElement;
  }

  async function settle(): Promise<void> {
    await new Promise((resolve) => setTimeout(resolve));
    await fixture.whenStable();
  }

  beforeEach(async () => {
    storage = new MemoryStorage();
    TestBed.configureTestingModule({
      imports: [StationsPage],
      providers: [
        ...screenTestProviders(),
        { provide: BROWSER_STORAGE, useValue: storage },
      ],
    });
    http = TestBed.inject(HttpTestingController);
    fixture = TestBed.createComponent(StationsPage);
    fixture.detectChanges();
    http.expectOne({ method: 'GET', url: '/api/stations' }).flush(STATIONS);
    http.expectOne({ method: 'GET', url: '/api/displays' }).flush([]);
    await settle();
  });

  afterEach(() => http.verify());

  it('lists each station with its paired state', () => {
    const cards = Array.from(element().querySelectorAll('[data-testid=station-card]'), (card) => card.textContent ?? '');

    expect(cards).toHaveLength(2);
    expect(cards[0]).toContain('Cutter A');
    expect(cards[0]).toContain('Paired');
    expect(cards[1]).toContain('Not paired');
  });

  it('pairs this tablet and confirms it in a sentence', async () => {
    const pressCard = element().querySelectorAll('[data-testid=station-card]')[1];
    pressCard.querySelector<HTMLButtonElement>('button')!.click();
    http.expectOne({ method: 'POST', url: '/api/stations/2/pair' }).flush({
      deviceToken: 'tok-press',
      station: { id: 2, name: 'Press 1', kind: 'press' },
    });
    await settle();
    http.expectOne({ method: 'GET', url: '/api/stations' }).flush(STATIONS.map((s) => (s.id === 2 ? { ...s, paired: true } : s)));
    await settle();

    expect(element().querySelector('[data-testid=pairing-confirmation]')?.textContent?.trim()).toBe(
      'This tablet is now the Press 1 station. Operators sign in here with their PIN.',
    );
    expect(storage.getItem(DEVICE_TOKEN_KEY)).toBe('tok-press');
    expect(element().textContent).toContain('Unpair this tablet');
  });

  it('unpairs this tablet on the hub and forgets its token', async () => {
    element().querySelectorAll('[data-testid=station-card]')[1].querySelector<HTMLButtonElement>('button')!.click();
    http.expectOne('/api/stations/2/pair').flush({ deviceToken: 'tok-press', station: { id: 2, name: 'Press 1', kind: 'press' } });
    await settle();
    http.expectOne({ method: 'GET', url: '/api/stations' }).flush(STATIONS);
    await settle();

    Array.from(element().querySelectorAll('button'))
      .find((button) => button.textContent?.includes('Unpair this tablet'))!
      .click();
    http.expectOne({ method: 'DELETE', url: '/api/stations/2/pair' }).flush(null, { status: 204, statusText: 'No Content' });
    await settle();
    http.expectOne({ method: 'GET', url: '/api/stations' }).flush(STATIONS);
    await settle();

    expect(storage.getItem(DEVICE_TOKEN_KEY)).toBeNull();
    expect(element().textContent).not.toContain('Unpair this tablet');
  });
});
