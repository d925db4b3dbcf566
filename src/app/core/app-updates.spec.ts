import { TestBed } from '@angular/core/testing';
import { provideZonelessChangeDetection } from '@angular/core';
import { SwUpdate, type VersionEvent } from '@angular/service-worker';
import { Subject } from 'rxjs';
import { AppUpdates, RELOAD_PAGE } from './app-updates';

describe('AppUpdates', () => {
  let events: Subject<VersionEvent>;
  let reload: jest.Mock;

  function setUp(enabled = true): AppUpdates {
    events = new Subject<VersionEvent>();
    reload = jest.fn();
    TestBed.configureTestingModule({
      providers: [
        provideZonelessChangeDetection(),
        { provide: SwUpdate, useValue: { isEnabled: enabled, versionUpdates: events.asObservable() } },
        { provide: RELOAD_PAGE, useValue: reload },
      ],
    });
    return TestBed.inject(AppUpdates);
  }

  const ready: VersionEvent = {
    type: 'VERSION_READY',
    currentVersion: { hash: 'old' },
    latestVersion: { hash: 'new' },
  };

  it('offers a new version once it is ready, without reloading by itself', () => {
    const updates = setUp();
    events.next({ type: 'VERSION_DETECTED', version: { hash: 'new' } });
    expect(updates.updateReady()).toBe(false);

    events.next(ready);

    expect(updates.updateReady()).toBe(true);
    expect(reload).not.toHaveBeenCalled();
  });

  it('reloads only when the person chooses the new version', () => {
    const updates = setUp();
    events.next(ready);

    updates.useNewVersion();

    expect(reload).toHaveBeenCalledTimes(1);
  });

  it('stays quiet where the service worker is off', () => {
    const updates = setUp(false);
    expect(updates.updateReady()).toBe(false);
  });
});
