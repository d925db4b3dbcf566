import {
  ChangeDetectionStrategy,
  Component,
  DOCUMENT,
  DestroyRef,
  ElementRef,
  afterNextRender,
  afterRenderEffect,
  computed,
  effect,
  inject,
  signal,
  untracked,
  viewChild,
} from '@angular/core';
import { Location } from '@angular/common';
import { ActivatedRoute } from '@angular/router';
import { MatIconModule } from '@angular/material/icon';
import { hasStatus, apiErrorSentence } from '../core/api-error';
import { BROWSER_STORAGE } from '../core/browser-storage';
import { Session } from '../auth/session';
import { BoardConnection } from './board-connection';
import { BoardLive } from './board-live';
import { BOARD_TIMING } from './board-timing';
import { BoardView, type BoardPart } from './board-view';
import { contentHeight, nextWallScale } from './wall-fit';

/** Storage key of this screen's display token, so it signs in again after a reboot. */
export const DISPLAY_TOKEN_KEY = 'dwell.displayToken';

/** Screens at least this tall show the whole board at once; smaller ones turn between two views. */
const FITS_ALL_MIN_HEIGHT_PX = 1600;

const VIEWS: readonly { part: Exclude<BoardPart, 'all'>; label: string }[] = [
  { part: 'now', label: 'The floor now' },
  { part: 'trends', label: 'The shift so far' },
];

type WallState =
  | { status: 'signing-in' }
  | { status: 'showing' }
  | { status: 'no-link' }
  | { status: 'refused'; sentence: string }
  | { status: 'unreachable'; sentence: string };

const REFUSED_SENTENCE =
  'This display link is not valid any more. Ask the lead for a new display link (Stations, Wall displays) and open it on this screen.';

/**
 * The floor board on a wall screen: signs in with the token from its display link
 * (`/display#token=...`), keeps it for the next start, and shows the board dark, large and read-only.
 */
@Component({
  selector: 'dw-wall-display',
  imports: [MatIconModule, BoardConnection, BoardView],
  providers: [BoardLive],
  templateUrl: './wall-display.html',
  styleUrl: './wall-display.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
  host: { '(window:resize)': 'screenResized()', '[style.--dw-wall-scale]': 'scale()' },
})
export class WallDisplay {
  private readonly session = inject(Session);
  private readonly storage = inject(BROWSER_STORAGE);
  private readonly location = inject(Location);
  private readonly route = inject(ActivatedRoute);
  private readonly window = inject(DOCUMENT).defaultView;
  private readonly timing = inject(BOARD_TIMING);
  protected readonly live = inject(BoardLive);

  protected readonly state = signal<WallState>({ status: 'signing-in' });
  private readonly tall = signal(false);
  private readonly viewIndex = signal(0);
  private readonly boardBox = viewChild(BoardView, { read: ElementRef });
  private readonly resizes = signal(0);
  /** Type scale per view, 1 = as large as the screen allows; lowered only when a view would not fit. */
  private readonly scales = signal<Partial<Record<BoardPart, number>>>({});
  private retryTimer: ReturnType<typeof setTimeout> | null = null;

  protected readonly views = VIEWS;
  protected readonly cycling = computed(() => !this.tall());
  protected readonly view = computed(() => VIEWS[this.viewIndex() % VIEWS.length]!);
  protected readonly part = computed((): BoardPart => (this.cycling() ? this.view().part : 'all'));
  protected readonly scale = computed(() => this.scales()[this.part()] ?? 1);
  protected readonly displayName = computed(() => (this.session.role() === 'display' ? this.session.user()?.name ?? '' : ''));

  constructor() {
    this.screenResized();
    this.fitViews();
    const cycle = setInterval(() => {
      // Views turn only once the board shows, so it always opens on the first one.
      if (this.cycling() && this.state().status === 'showing') this.viewIndex.update((index) => (index + 1) % VIEWS.length);
    }, this.timing.cycleMs);
    // The hub forgot this screen's session (it expires after some hours): sign in again with the kept token.
    effect(() => {
      if (this.live.signedOut() && untracked(this.state).status === 'showing') untracked(() => this.renew());
    });
    inject(DestroyRef).onDestroy(() => {
      clearInterval(cycle);
      if (this.retryTimer !== null) clearTimeout(this.retryTimer);
    });
    this.begin();
  }

  /** Decides from the screen's height whether the whole board fits or the views take turns, and fits them again. */
  protected screenResized(): void {
    this.tall.set((this.window?.innerHeight ?? 0) >= FITS_ALL_MIN_HEIGHT_PX);
    this.resizes.update((count) => count + 1);
  }

  /**
   * A wall view never scrolls and is never cut: after each render with new numbers, a new view or a
   * new screen size, a view that runs past the bottom gets smaller type, and grows back when it has room.
   */
  private fitViews(): void {
    afterRenderEffect((onCleanup) => {
      const box = this.boardBox()?.nativeElement as HTMLElement | undefined;
      this.live.board();
      this.resizes();
      if (!box) return;
      const part = this.part();
      const scale = this.scale();
      const next = nextWallScale(scale, contentHeight(box), box.clientHeight);
      if (next === scale) return;
      // On the next turn of the event loop, not inside this render: a view that needs a second step
      // then gets a fresh render rather than a chain of re-renders Angular would stop as endless.
      const step = setTimeout(() => this.scales.update((scales) => ({ ...scales, [part]: next })));
      onCleanup(() => clearTimeout(step));
    });
  }

  private begin(): void {
    const fromLink = tokenFromFragment(this.route.snapshot.fragment);
    if (fromLink) {
      this.storage.setItem(DISPLAY_TOKEN_KEY, fromLink);
      // The token stays out of the address bar, the browser history and any photo of the screen.
      // After the first render: the router writes the address at the end of the navigation that made this page.
      afterNextRender(() => this.location.replaceState(this.location.path().split('#')[0]!));
      void this.signIn(fromLink);
      return;
    }
    const role = this.session.role();
    if (role === 'display' || role === 'lead' || role === 'owner') {
      this.show();
      return;
    }
    this.renew();
  }

  private renew(): void {
    const kept = this.storage.getItem(DISPLAY_TOKEN_KEY);
    if (kept) void this.signIn(kept);
    else this.state.set({ status: 'no-link' });
  }

  private async signIn(token: string): Promise<void> {
    this.state.set({ status: 'signing-in' });
    try {
      await this.session.signInAsDisplay(token);
      this.show();
    } catch (error) {
      if (hasStatus(error, 400, 401, 403)) {
        this.storage.removeItem(DISPLAY_TOKEN_KEY);
        this.live.stop();
        this.state.set({ status: 'refused', sentence: REFUSED_SENTENCE });
        return;
      }
      this.state.set({
        status: 'unreachable',
        sentence: `${apiErrorSentence(error, 'The hub did not answer.')} This screen tries again by itself.`,
      });
      this.retryTimer = setTimeout(() => {
        this.retryTimer = null;
        void this.signIn(token);
      }, this.timing.signInRetryMs);
    }
  }

  private show(): void {
    this.state.set({ status: 'showing' });
    this.live.restart();
  }
}

/** The token in a `token=...` fragment, or null. */
function tokenFromFragment(fragment: string | null): string | null {
  if (!fragment) return null;
  const token = new URLSearchParams(fragment).get('token');
  return token && token.trim() ? token.trim() : null;
}
