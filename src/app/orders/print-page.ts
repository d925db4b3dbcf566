import { InjectionToken } from '@angular/core';

/** Opens the browser's print dialog; specs replace it. */
export const PRINT_PAGE = new InjectionToken<() => void>('PRINT_PAGE', {
  providedIn: 'root',
  factory: () => () => globalThis.print(),
});
