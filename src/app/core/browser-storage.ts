import { InjectionToken } from '@angular/core';
import { MemoryStorage } from './memory-storage';

/** The Storage this app keeps small settings in: localStorage, or memory where the browser refuses it. */
export const BROWSER_STORAGE = new InjectionToken<Storage>('BROWSER_STORAGE', {
  providedIn: 'root',
  factory: () => {
    try {
      return globalThis.localStorage ?? new MemoryStorage();
    } catch {
      // Some browsers throw on access when storage is blocked by policy.
      return new MemoryStorage();
    }
  },
});
