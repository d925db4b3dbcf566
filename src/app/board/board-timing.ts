import { InjectionToken } from '@angular/core';

/** How the board paces itself; specs shorten the waits. */
export interface BoardTiming {
  /** Refetch this often even without news: rolling-hour rates and online status age by themselves. */
  refreshMs: number;
  /** A wall display that cannot show everything at once turns to its next view this often. */
  cycleMs: number;
  /** A wall display whose sign-in failed for want of a network tries again after this long. */
  signInRetryMs: number;
}

/** The board's pacing: refetch every 30 s, turn wall views every 15 s, retry a display sign-in after 15 s. */
export const BOARD_TIMING = new InjectionToken<BoardTiming>('BOARD_TIMING', {
  providedIn: 'root',
  factory: () => ({ refreshMs: 30_000, cycleMs: 15_000, signInRetryMs: 15_000 }),
});
