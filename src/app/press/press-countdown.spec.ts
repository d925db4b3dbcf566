import { importProvidersFrom, provideZonelessChangeDetection } from '@angular/core';
import { ComponentFixture, TestBed } from '@angular/core/testing';
import { MatIconTestingModule } from '@angular/material/icon/testing';
import type { PressCard as PressCardData } from '../../shared/press/press-contract';
import { BROWSER_STORAGE } from '../core/browser-storage';
import { MemoryStorage } from '../core/memory-storage';
import { PressCountdown } from './press-countdown';
import { PRESS_CLOCK, PRESS_MUTE_KEY, PRESS_SOUND, type PressClock } from './press-signals';

/** A clock the spec turns by hand. */
class HandClock implements PressClock {
  time = 0;
  private ticks: (() => void)[] = [];
  now = () => this.time;
  every(_ms: number, tick: () => void): () => void {
    this.ticks.push(tick);
    return () => (this.ticks = this.ticks.filter((t) => t !== tick));
  }
  advance(ms: number): void {
    this.time += ms;
    [...this.ticks].forEach((tick) => tick());
  }
}

// Pre-press 2 s, tack 1 s, dwell 3 s: the card's seconds decide the countdown.
const CARD = {
  steps: [
    { filmId: 11, seconds: 1, kind: 'tack' },
    { filmId: 12, seconds: 3, kind: 'dwell' },
  ],
  prePressS: 2,
  secondPressS: null,
} as unknown as PressCardData;

describe('PressCountdown', () => {
  let fixture: ComponentFixture<PressCountdown>;
  let clock: HandClock;
  let beeps: string[];
  let pressed: number;
  let storage: MemoryStorage;

  async function render(): Promise<void> {
    clock = new HandClock();
    beeps = [];
    pressed = 0;
    TestBed.configureTestingModule({
      imports: [PressCountdown],
      providers: [
        provideZonelessChangeDetection(),
        importProvidersFrom(MatIconTestingModule),
        { provide: PRESS_CLOCK, useValue: clock },
        { provide: PRESS_SOUND, useValue: { beep: (kind: string) => beeps.push(kind) } },
        { provide: BROWSER_STORAGE, useValue: storage },
      ],
    });
    fixture = TestBed.createComponent(PressCountdown);
    fixture.componentRef.setInput('card', CARD);
    fixture.componentInstance.piecePressed.subscribe(() => pressed++);
    await fixture.whenStable();
  }

  const root = () => fixture.nativeElement as HTMLElement;
  const startButton = () => root().querySelector<HTMLButtonElement>('[data-testid=countdown-start]');
  const stepName = () => root().querySelector('[data-testid=countdown-step]')?.textContent?.trim();
  const seconds = () => root().querySelector('[data-testid=countdown-seconds]')?.textContent?.trim();

  async function tap(): Promise<void> {
    startButton()!.click();
    await fixture.whenStable();
  }

  async function wait(ms: number): Promise<void> {
    clock.advance(ms);
    await fixture.whenStable();
  }

  function press(key: string, code: string, target: EventTarget = document.body): KeyboardEvent {
    const event = new KeyboardEvent('keydown', { key, code, bubbles: true, cancelable: true });
    target.dispatchEvent(event);
    return event;
  }

  beforeEach(() => {
    storage = new MemoryStorage();
  });

  it('runs pre-press, waits for a tap, runs the tack, waits, runs the dwell and counts one piece at its end', async () => {
    await render();

    await tap();
    expect(stepName()).toBe('Pre-press');
    expect(seconds()).toBe('2');

    await wait(2_000);
    expect(startButton()?.textContent).toContain('Start tack: first layer');
    await wait(10_000);
    expect(startButton()).not.toBeNull(); // still waiting for hands off the garment

    await tap();
    expect(stepName()).toBe('Tack: first layer');
    await wait(1_000);
    await tap();
    expect(stepName()).toBe('Dwell: second layer');
    await wait(2_900);
    expect(pressed).toBe(0);

    await wait(100);
    expect(pressed).toBe(1);
    expect(root().querySelector('[data-testid=countdown-finished]')).not.toBeNull();
    expect(beeps).toEqual(['step', 'step', 'end']);
  });

  it('keeps a piece running when the same card arrives again from the cache, and starts over when the seconds change', async () => {
    await render();
    await tap();

    fixture.componentRef.setInput('card', JSON.parse(JSON.stringify(CARD)));
    await wait(500);
    expect(stepName()).toBe('Pre-press');

    fixture.componentRef.setInput('card', { ...JSON.parse(JSON.stringify(CARD)), prePressS: 9 });
    await fixture.whenStable();
    expect(stepName()).toBeUndefined();
    expect(startButton()?.textContent).toContain('9 s');
  });

  it('does not count a piece that was cancelled', async () => {
    await render();

    await tap();
    await wait(2_000);
    await tap();
    root().querySelector<HTMLButtonElement>('.cancel')!.click();
    await wait(60_000);

    expect(pressed).toBe(0);
    expect(root().textContent).toContain('Cancelled: not counted.');
    expect(startButton()?.textContent).toContain('Start next piece');
  });

  it('starts on the space bar and on a foot switch that types Page Down', async () => {
    await render();

    const space = press(' ', 'Space');
    await fixture.whenStable();
    expect(space.defaultPrevented).toBe(true);
    expect(stepName()).toBe('Pre-press');

    await wait(2_000);
    press('PageDown', 'PageDown');
    await fixture.whenStable();
    expect(stepName()).toBe('Tack: first layer');
  });

  it('ignores the start keys while someone types in a field', async () => {
    await render();
    const field = document.createElement('input');
    document.body.appendChild(field);

    press('Enter', 'Enter', field);
    await fixture.whenStable();

    expect(stepName()).toBeUndefined();
    field.remove();
  });

  it('stays silent when muted and remembers the choice on this tablet', async () => {
    await render();
    root().querySelector<HTMLButtonElement>('.mute')!.click();
    await fixture.whenStable();

    await tap();
    await wait(2_000);

    expect(beeps).toEqual([]);
    expect(storage.getItem(PRESS_MUTE_KEY)).toBe('true');
  });
});
