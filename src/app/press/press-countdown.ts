import { ChangeDetectionStrategy, Component, DestroyRef, computed, inject, input, linkedSignal, output, signal } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MatIconModule } from '@angular/material/icon';
import type { PressCard as PressCardData } from '../../shared/press/press-contract';
import { BROWSER_STORAGE } from '../core/browser-storage';
import {
  cancelCountdown,
  countdownSteps,
  readyCountdown,
  secondsLeft,
  stepProgress,
  tapCountdown,
  tickCountdown,
  type CountdownChange,
  type CountdownStep,
} from './countdown-machine';
import { PRESS_CLOCK, PRESS_MUTE_KEY, PRESS_SOUND, PRESS_START_KEYS } from './press-signals';

const RING_RADIUS = 88;
const RING_LENGTH = 2 * Math.PI * RING_RADIUS;
const TICK_MS = 100;

/** The press timer: one big tap (or the foot switch) starts each step; a finished last step counts a piece. */
@Component({
  selector: 'dw-press-countdown',
  imports: [MatButtonModule, MatIconModule],
  templateUrl: './press-countdown.html',
  styleUrl: './press-countdown.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
  host: { '(document:keydown)': 'startFromKey($event)' },
})
export class PressCountdown {
  private readonly clock = inject(PRESS_CLOCK);
  private readonly sound = inject(PRESS_SOUND);
  private readonly storage = inject(BROWSER_STORAGE);
  private readonly startKeys = inject(PRESS_START_KEYS);
  private stopTicking: (() => void) | null = null;

  /** The card whose seconds the countdown runs. */
  readonly card = input.required<PressCardData>();
  /** True while the page cannot count (no bag, say); the start button is off. */
  readonly disabled = input(false);
  /** The last step of a piece ran to its end: one piece is pressed. */
  readonly piecePressed = output<void>();

  // The cached ticket is re-read after every event, so the same card arrives as a new object: only
  // different seconds or steps may reset a piece in progress.
  private readonly steps = computed(() => countdownSteps(this.card()), { equal: (a, b) => JSON.stringify(a) === JSON.stringify(b) });
  protected readonly state = linkedSignal(() => readyCountdown(this.steps()));
  protected readonly now = signal(0);
  protected readonly muted = signal(this.storage.getItem(PRESS_MUTE_KEY) === 'true');
  protected readonly ringLength = RING_LENGTH;
  protected readonly ringRadius = RING_RADIUS;

  protected readonly phase = computed(() => this.state().phase);
  protected readonly step = computed<CountdownStep | null>(() => this.state().steps[this.state().index] ?? null);
  protected readonly stepNumber = computed(() => `Step ${this.state().index + 1} of ${this.state().steps.length}`);
  protected readonly left = computed(() => secondsLeft(this.state(), this.now()));
  protected readonly ringOffset = computed(() => RING_LENGTH * (1 - stepProgress(this.state(), this.now())));
  protected readonly startLabel = computed(() => {
    const state = this.state();
    if (state.phase === 'finished' || state.phase === 'cancelled') return 'Start next piece';
    const step = this.step();
    return step ? `Start ${step.name.toLowerCase()}` : 'Start';
  });
  protected readonly nextBefore = computed(() => {
    const state = this.state();
    const first = state.steps[0];
    return state.phase === 'finished' || state.phase === 'cancelled' ? first?.before : this.step()?.before;
  });

  constructor() {
    inject(DestroyRef).onDestroy(() => this.stopTicker());
  }

  /** The one tap: starts the next step of the piece. */
  protected startStep(): void {
    if (this.disabled()) return;
    this.apply(tapCountdown(this.state(), this.clock.now()));
  }

  /** Stops this piece without counting it. */
  protected cancelPiece(): void {
    this.apply(cancelCountdown(this.state()));
  }

  /** Turns the beeps off or on, and remembers it on this tablet. */
  protected toggleMute(): void {
    this.muted.update((muted) => !muted);
    this.storage.setItem(PRESS_MUTE_KEY, String(this.muted()));
  }

  /** The space bar, Enter, Page Down or a foot switch typing one of them starts the next step. */
  protected startFromKey(event: KeyboardEvent): void {
    if (!this.startKeys.includes(event.code) && !this.startKeys.includes(event.key)) return;
    const target = event.target as HTMLElement | null;
    // Typing a bag code, or pressing Enter on another button, is not a start.
    if (target?.closest?.('input, textarea, select, [contenteditable="true"], button:not(.start)')) return;
    event.preventDefault();
    if (this.state().phase !== 'running') this.startStep();
  }

  private apply(change: CountdownChange): void {
    this.state.set(change.state);
    this.now.set(this.clock.now());
    for (const signal of change.signals) {
      if (signal === 'step_started') this.startTicker();
      if (signal === 'step_ended' && !change.signals.includes('finished') && !this.muted()) this.sound.beep('step');
      if (signal === 'finished') {
        if (!this.muted()) this.sound.beep('end');
        this.piecePressed.emit();
      }
    }
    if (change.state.phase !== 'running') this.stopTicker();
  }

  private startTicker(): void {
    this.stopTicker();
    this.stopTicking = this.clock.every(TICK_MS, () => this.apply(tickCountdown(this.state(), this.clock.now())));
  }

  private stopTicker(): void {
    this.stopTicking?.();
    this.stopTicking = null;
  }
}
