import { InjectionToken } from '@angular/core';

/**
 * Keys that start the countdown's next step. A foot switch is a one-key keyboard: set it to type
 * one of these. Matched against `KeyboardEvent.code` and `KeyboardEvent.key`.
 */
export const PRESS_START_KEYS = new InjectionToken<readonly string[]>('PRESS_START_KEYS', {
  providedIn: 'root',
  factory: () => ['Space', ' ', 'Enter', 'NumpadEnter', 'PageDown'],
});

/** The time source the countdown reads and ticks with; specs replace it with a hand-turned clock. */
export interface PressClock {
  now(): number;
  /** Calls `tick` every `ms`; returns the function that stops it. */
  every(ms: number, tick: () => void): () => void;
}

/** The browser's clock. */
export const PRESS_CLOCK = new InjectionToken<PressClock>('PRESS_CLOCK', {
  providedIn: 'root',
  factory: () => ({
    now: () => Date.now(),
    every: (ms, tick) => {
      const id = setInterval(tick, ms);
      return () => clearInterval(id);
    },
  }),
});

/** Sounds the countdown makes: a short beep when a step ends, a longer call when the piece is done. */
export interface PressSound {
  beep(kind: 'step' | 'end'): void;
}

/** Beeps made with Web Audio (no sound files to load); silent where the browser has no audio. */
export const PRESS_SOUND = new InjectionToken<PressSound>('PRESS_SOUND', {
  providedIn: 'root',
  factory: () => webAudioSound(),
});

function webAudioSound(): PressSound {
  let context: AudioContext | null = null;
  const tone = (audio: AudioContext, startS: number, hz: number, lengthS: number) => {
    const oscillator = audio.createOscillator();
    const gain = audio.createGain();
    oscillator.type = 'square';
    oscillator.frequency.value = hz;
    // A short ramp in and out avoids clicks; square waves carry over a noisy floor better than sines.
    gain.gain.setValueAtTime(0.0001, startS);
    gain.gain.exponentialRampToValueAtTime(0.4, startS + 0.02);
    gain.gain.exponentialRampToValueAtTime(0.0001, startS + lengthS);
    oscillator.connect(gain).connect(audio.destination);
    oscillator.start(startS);
    oscillator.stop(startS + lengthS + 0.05);
  };
  return {
    beep(kind) {
      try {
        context ??= new AudioContext();
        void context.resume();
        const at = context.currentTime;
        if (kind === 'step') {
          tone(context, at, 880, 0.25);
        } else {
          [0, 0.35, 0.7].forEach((offset) => tone(context!, at + offset, 1175, 0.28));
        }
      } catch {
        // No audio here (or blocked): the flash and the numbers on screen still tell the operator.
      }
    },
  };
}

/** Storage key of the countdown's mute switch. */
export const PRESS_MUTE_KEY = 'dwell.press.muted';
