import type { PressCard } from '../../shared/press/press-contract';

/** One timed stretch of a press cycle, in the order the operator works it. */
export interface CountdownStep {
  kind: 'pre_press' | 'tack' | 'dwell' | 'second_press';
  /** What the screen calls it, in the trade's words. */
  name: string;
  /** What the operator does before tapping to start this step. */
  before: string;
  seconds: number;
}

/**
 * Where a press cycle is. Rule: every step starts with a tap, never by itself, because between
 * steps the operator's hands are on the garment (laying film, peeling a carrier).
 */
export type CountdownPhase = 'ready' | 'running' | 'waiting' | 'finished' | 'cancelled';

/** The whole state of one press cycle; plain data, so it can be tested without a clock. */
export interface CountdownState {
  steps: readonly CountdownStep[];
  phase: CountdownPhase;
  /** The step running, or the one a tap starts next. */
  index: number;
  /** Clock time (ms) the running step started; null unless running. */
  startedAt: number | null;
}

/** What a tick or a tap made happen, for the sound, the flash and the piece count. */
export type CountdownSignal = 'step_started' | 'step_ended' | 'finished';

/** A new state with what happened on the way to it. */
export interface CountdownChange {
  state: CountdownState;
  signals: CountdownSignal[];
}

const ORDINALS = ['First', 'Second', 'Third', 'Fourth', 'Fifth', 'Sixth', 'Seventh', 'Eighth'];

/** The steps of one piece from a press card: pre-press, a tack per under-layer, the dwell, a second press after peel. */
export function countdownSteps(card: Pick<PressCard, 'prePressS' | 'steps' | 'secondPressS'>): CountdownStep[] {
  const steps: CountdownStep[] = [];
  if (card.prePressS > 0) {
    steps.push({ kind: 'pre_press', name: 'Pre-press', before: 'Garment on the platen, nothing on it yet.', seconds: card.prePressS });
  }
  card.steps.forEach((step, i) => {
    const layer = `${ORDINALS[i] ?? `Layer ${i + 1}`} layer`;
    steps.push(
      step.kind === 'tack'
        ? { kind: 'tack', name: `Tack: ${layer.toLowerCase()}`, before: `Lay the ${layer.toLowerCase()}, carrier up.`, seconds: step.seconds }
        : { kind: 'dwell', name: card.steps.length > 1 ? `Dwell: ${layer.toLowerCase()}` : 'Dwell', before: card.steps.length > 1 ? `Peel the carrier, lay the ${layer.toLowerCase()}.` : 'Lay the film, carrier up.', seconds: step.seconds },
    );
  });
  if (card.secondPressS !== null && card.secondPressS > 0) {
    steps.push({ kind: 'second_press', name: 'Second press', before: 'Peel the carrier, cover with a sheet.', seconds: card.secondPressS });
  }
  return steps;
}

/** A cycle waiting for its first tap. */
export function readyCountdown(steps: readonly CountdownStep[]): CountdownState {
  return { steps, phase: 'ready', index: 0, startedAt: null };
}

/** The one tap: starts the step that is next; after a finished or cancelled piece, starts a new piece. */
export function tapCountdown(state: CountdownState, now: number): CountdownChange {
  if (state.steps.length === 0 || state.phase === 'running') return { state, signals: [] };
  const index = state.phase === 'finished' || state.phase === 'cancelled' ? 0 : state.index;
  return { state: { ...state, phase: 'running', index, startedAt: now }, signals: ['step_started'] };
}

/** Moves the clock on: ends the running step when its seconds are up; the last one finishes the piece. */
export function tickCountdown(state: CountdownState, now: number): CountdownChange {
  if (state.phase !== 'running' || state.startedAt === null) return { state, signals: [] };
  const step = state.steps[state.index];
  if (now - state.startedAt < step.seconds * 1000) return { state, signals: [] };
  const last = state.index === state.steps.length - 1;
  return last
    ? { state: { ...state, phase: 'finished', startedAt: null }, signals: ['step_ended', 'finished'] }
    : { state: { ...state, phase: 'waiting', index: state.index + 1, startedAt: null }, signals: ['step_ended'] };
}

/** Stops the piece: nothing is counted, and the next tap starts a new piece from the first step. */
export function cancelCountdown(state: CountdownState): CountdownChange {
  if (state.phase !== 'running' && state.phase !== 'waiting') return { state, signals: [] };
  return { state: { ...state, phase: 'cancelled', startedAt: null }, signals: [] };
}

/** Whole seconds left in the running step (rounded up, so 0 shows only at the end); the full step when not running. */
export function secondsLeft(state: CountdownState, now: number): number {
  const step = state.steps[state.index];
  if (!step) return 0;
  if (state.phase !== 'running' || state.startedAt === null) return step.seconds;
  return Math.max(0, Math.ceil((step.seconds * 1000 - (now - state.startedAt)) / 1000));
}

/** How far through the running step, from 0 to 1. */
export function stepProgress(state: CountdownState, now: number): number {
  const step = state.steps[state.index];
  if (!step || state.phase !== 'running' || state.startedAt === null) return state.phase === 'finished' ? 1 : 0;
  return Math.min(1, Math.max(0, (now - state.startedAt) / (step.seconds * 1000)));
}
