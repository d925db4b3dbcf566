import { TestBed } from '@angular/core/testing';
import { provideHttpClient } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { provideZonelessChangeDetection } from '@angular/core';
import { BROWSER_STORAGE } from '../core/browser-storage';
import { MemoryStorage } from '../core/memory-storage';
import { DEVICE_TOKEN_KEY, DevicePairing } from './device-pairing';

describe('DevicePairing', () => {
  let storage: MemoryStorage;
  let http: HttpTestingController;

  function setUp(): DevicePairing {
    TestBed.configureTestingModule({
      providers: [
        provideZonelessChangeDetection(),
        provideHttpClient(),
        provideHttpClientTesting(),
        { provide: BROWSER_STORAGE, useValue: storage },
      ],
    });
    http = TestBed.inject(HttpTestingController);
    return TestBed.inject(DevicePairing);
  }

  beforeEach(() => {
    storage = new MemoryStorage();
  });

  afterEach(() => http.verify());

  it('stores the token the hub issues under dwell.deviceToken in the injected storage', async () => {
    const pairing = setUp();

    const paired = pairing.pairThisTablet(7);
    const request = http.expectOne('/api/stations/7/pair');
    expect(request.request.method).toBe('POST');
    request.flush({ deviceToken: 'tok-abc', station: { id: 7, name: 'Press 2', kind: 'press' } });

    await expect(paired).resolves.toEqual({ id: 7, name: 'Press 2', kind: 'press' });
    expect(storage.getItem('dwell.deviceToken')).toBe('tok-abc');
    expect(pairing.deviceToken()).toBe('tok-abc');
    expect(pairing.station()?.name).toBe('Press 2');
  });

  it('reads a token already in storage when the app starts', () => {
    storage.setItem(DEVICE_TOKEN_KEY, 'tok-earlier');

    expect(setUp().paired()).toBe(true);
  });

  it('keeps no token when the hub refuses to pair', async () => {
    const pairing = setUp();

    const paired = pairing.pairThisTablet(7);
    http.expectOne('/api/stations/7/pair').flush({ error: 'Only a lead can pair.' }, { status: 403, statusText: 'Forbidden' });

    await expect(paired).rejects.toBeTruthy();
    expect(storage.getItem(DEVICE_TOKEN_KEY)).toBeNull();
    expect(pairing.paired()).toBe(false);
  });

  it('forgets the token from storage and from its state', () => {
    storage.setItem(DEVICE_TOKEN_KEY, 'tok-earlier');
    const pairing = setUp();

    pairing.forget();

    expect(storage.getItem(DEVICE_TOKEN_KEY)).toBeNull();
    expect(pairing.paired()).toBe(false);
  });

  it('unpairs the station on the hub before forgetting the token', async () => {
    const pairing = setUp();
    const paired = pairing.pairThisTablet(7);
    http.expectOne('/api/stations/7/pair').flush({ deviceToken: 'tok-abc', station: { id: 7, name: 'Press 2', kind: 'press' } });
    await paired;

    const unpaired = pairing.unpairThisTablet();
    http.expectOne({ method: 'DELETE', url: '/api/stations/7/pair' }).flush(null, { status: 204, statusText: 'No Content' });
    await unpaired;

    expect(storage.getItem(DEVICE_TOKEN_KEY)).toBeNull();
    expect(pairing.paired()).toBe(false);
  });

  it('keeps the token when the hub refuses to unpair, so the tablet still works', async () => {
    const pairing = setUp();
    const paired = pairing.pairThisTablet(7);
    http.expectOne('/api/stations/7/pair').flush({ deviceToken: 'tok-abc', station: { id: 7, name: 'Press 2', kind: 'press' } });
    await paired;

    const unpaired = pairing.unpairThisTablet();
    http.expectOne('/api/stations/7/pair').flush({ error: 'Sign in first.' }, { status: 401, statusText: 'Unauthorized' });

    await expect(unpaired).rejects.toBeTruthy();
    expect(storage.getItem(DEVICE_TOKEN_KEY)).toBe('tok-abc');
  });
});
