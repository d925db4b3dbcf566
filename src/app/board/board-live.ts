import { DestroyRef, Injectable, inject, signal } from '@angular/core';
import { HttpClient, HttpErrorResponse } from '@angular/common/http';
import { apiErrorSentence } from '../core/api-error';
import type { BoardReply } from '../../shared/board-contract';
import { BOARD_SOCKET, type BoardSocket } from './board-socket';
import { BOARD_TIMING } from './board-timing';

/** Whether the board hears the hub's news as it happens. */
export type BoardLink = 'connecting' | 'live' | 'lost';

/**
 * The floor board's data: fetched from the hub, fetched again on every `board:update` or
 * `station:seen` and every 30 s. Bursts are coalesced: one request at a time, and one more after
 * it when news arrived meanwhile. Provided by the screen that shows the board, so it stops with it.
 */
@Injectable()
export class BoardLive {
  private readonly http = inject(HttpClient);
  private readonly makeSocket = inject(BOARD_SOCKET);
  private readonly timing = inject(BOARD_TIMING);

  private readonly current = signal<BoardReply | null>(null);
  private readonly link = signal<BoardLink>('connecting');
  private readonly updatedAt = signal<Date | null>(null);
  private readonly problem = signal<string | null>(null);
  private readonly refused = signal(false);

  private socket: BoardSocket | null = null;
  private timer: ReturnType<typeof setInterval> | null = null;
  private inFlight = false;
  private again = false;

  /** The last board the hub sent; kept while the hub cannot be reached. */
  readonly board = this.current.asReadonly();
  /** Whether news arrives as it happens. */
  readonly connection = this.link.asReadonly();
  /** When the board on screen arrived. */
  readonly lastUpdatedAt = this.updatedAt.asReadonly();
  /** Why the last refresh failed, as a sentence; null when it worked. */
  readonly error = this.problem.asReadonly();
  /** The hub no longer knows this session (HTTP 401 or a refused socket): sign in again, then `restart()`. */
  readonly signedOut = this.refused.asReadonly();

  constructor() {
    inject(DestroyRef).onDestroy(() => this.stop());
  }

  /** Fetches the board and listens for news; safe to call more than once. */
  start(): void {
    if (this.socket) return;
    this.refused.set(false);
    this.link.set('connecting');
    const socket = this.makeSocket();
    this.socket = socket;
    // A reconnect may have missed news while away: fetch at once.
    socket.on('connect', () => {
      this.link.set('live');
      this.refresh();
    });
    socket.on('disconnect', () => this.link.set('lost'));
    socket.on('connect_error', () => {
      this.link.set('lost');
      // socket.io retries by itself unless the hub's middleware refused the session ("Sign in first.").
      if (!socket.active) this.refused.set(true);
    });
    socket.on('board:update', () => this.refresh());
    socket.on('station:seen', () => this.refresh());
    socket.connect();
    this.refresh();
    this.timer = setInterval(() => this.refresh(), this.timing.refreshMs);
  }

  /** Closes the connection and stops refreshing; the last board stays. */
  stop(): void {
    this.socket?.disconnect();
    this.socket = null;
    if (this.timer !== null) clearInterval(this.timer);
    this.timer = null;
  }

  /** Starts over with a fresh connection, after the session was renewed. */
  restart(): void {
    this.stop();
    this.start();
  }

  /** Fetches the board now, or right after the request already on its way. */
  refresh(): void {
    if (this.inFlight) {
      this.again = true;
      return;
    }
    this.inFlight = true;
    this.again = false;
    this.http.get<BoardReply>('/api/board').subscribe({
      next: (reply) => {
        this.current.set(reply);
        this.updatedAt.set(new Date());
        this.problem.set(null);
        this.settle();
      },
      error: (error: unknown) => {
        if (error instanceof HttpErrorResponse && error.status === 401) this.refused.set(true);
        this.problem.set(apiErrorSentence(error, 'The board could not be refreshed. It tries again by itself.'));
        this.settle();
      },
    });
  }

  private settle(): void {
    this.inFlight = false;
    if (this.again && this.socket) this.refresh();
  }
}
