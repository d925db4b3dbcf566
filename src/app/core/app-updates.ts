import { Injectable, InjectionToken, inject, signal } from '@angular/core';
import { takeUntilDestroyed } from '@angular/core/rxjs-interop';
import { SwUpdate, type VersionReadyEvent } from '@angular/service-worker';
import { filter } from 'rxjs';

/** Reloads the page; a token so specs can watch instead of reloading. */
export const RELOAD_PAGE = new InjectionToken<() => void>('RELOAD_PAGE', {
  providedIn: 'root',
  factory: () => () => globalThis.location.reload(),
});

/**
 * Offers a new version of Dwell once the service worker has it ready. It never swaps by itself:
 * the person chooses the moment, so nobody loses their place in a bag.
 */
@Injectable({ providedIn: 'root' })
export class AppUpdates {
  private readonly reloadPage = inject(RELOAD_PAGE);
  private readonly ready = signal(false);

  /** True when a new version is downloaded and waits for a reload. */
  readonly updateReady = this.ready.asReadonly();

  constructor() {
    // Absent where the app runs without a service worker at all (unit tests, some embedded browsers).
    const updates = inject(SwUpdate, { optional: true });
    if (!updates?.isEnabled) return;
    updates.versionUpdates
      .pipe(
        filter((event): event is VersionReadyEvent => event.type === 'VERSION_READY'),
        takeUntilDestroyed(),
      )
      .subscribe(() => this.ready.set(true));
  }

  /** Switches to the new version now. */
  useNewVersion(): void {
    this.reloadPage();
  }
}
