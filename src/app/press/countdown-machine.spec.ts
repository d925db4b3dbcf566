import {
  cancelCountdown,
  countdownSteps,
  readyCountdown,
  secondsLeft,
  stepProgress,
  tapCountdown,
  tickCountdown,
  type CountdownChange,
  type CountdownState,
} from './countdown-machine';

// A two-layer card: 5 s pre-press, a 3 s tack for the under-layer, 15 s dwell for the top one.
const TWO_LAYERS = {
  prePressS: 5,
  steps: [
    { filmId: 1, seconds: 3, kind: 'tack' as const },
    { filmId: 2, seconds: 15, kind: 'dwell' as const },
  ],
  secondPressS: null,
};

function run(state: CountdownState, ...moves: ((s: CountdownState) => CountdownChange)[]): { state: CountdownState; signals: string[] } {
  const signals: string[] = [];
  for (const move of moves) {
    const change = move(state);
    state = change.state;
    signals.push(...change.signals);
  }
  return { state, signals };
}

describe('the press countdown', () => {
  it('lists pre-press, then a tack per under-layer, then the dwell, with the card\'s seconds', () => {
    const steps = countdownSteps(TWO_LAYERS);

    expect(steps.map((s) => [s.kind, s.seconds])).toEqual([
      ['pre_press', 5],
      ['tack', 3],
      ['dwell', 15],
    ]);
  });

  it('adds a second press after peel when the card has one, and leaves out a zero pre-press', () => {
    const steps = countdownSteps({ prePressS: 0, steps: [{ filmId: 1, seconds: 10, kind: 'dwell' }], secondPressS: 5 });

    expect(steps.map((s) => s.kind)).toEqual(['dwell', 'second_press']);
  });

  it('runs pre-press, waits for a tap, runs the tack, waits, runs the dwell and only then finishes the piece', () => {
    let state = readyCountdown(countdownSteps(TWO_LAYERS));
    const t0 = 1_000_000;

    let step = run(state, (s) => tapCountdown(s, t0), (s) => tickCountdown(s, t0 + 4_999));
    expect(step.state.phase).toBe('running');
    expect(step.state.index).toBe(0);
    expect(step.signals).toEqual(['step_started']);

    step = run(step.state, (s) => tickCountdown(s, t0 + 5_000));
    expect(step.state.phase).toBe('waiting');
    expect(step.state.index).toBe(1);
    expect(step.signals).toEqual(['step_ended']);

    // Hands are on the garment: time passing does not start the tack.
    step = run(step.state, (s) => tickCountdown(s, t0 + 60_000));
    expect(step.state.phase).toBe('waiting');
    expect(step.signals).toEqual([]);

    step = run(step.state, (s) => tapCountdown(s, t0 + 60_000), (s) => tickCountdown(s, t0 + 63_000));
    expect(step.state.phase).toBe('waiting');
    expect(step.state.index).toBe(2);
    expect(step.signals).toEqual(['step_started', 'step_ended']);

    step = run(step.state, (s) => tapCountdown(s, t0 + 70_000), (s) => tickCountdown(s, t0 + 84_999));
    expect(step.signals).not.toContain('finished');

    step = run(step.state, (s) => tickCountdown(s, t0 + 85_000));
    expect(step.state.phase).toBe('finished');
    expect(step.signals).toEqual(['step_ended', 'finished']);
    state = step.state;
    expect(state.startedAt).toBeNull();
  });

  it('never finishes a cancelled piece, and the next tap starts again from pre-press', () => {
    const t0 = 0;
    const cancelled = run(
      readyCountdown(countdownSteps(TWO_LAYERS)),
      (s) => tapCountdown(s, t0),
      (s) => tickCountdown(s, 5_000),
      (s) => tapCountdown(s, 6_000),
      (s) => cancelCountdown(s),
      (s) => tickCountdown(s, 100_000),
    );

    expect(cancelled.state.phase).toBe('cancelled');
    expect(cancelled.signals).not.toContain('finished');

    const again = tapCountdown(cancelled.state, 200_000);
    expect(again.state.phase).toBe('running');
    expect(again.state.index).toBe(0);
  });

  it('ignores a second tap while a step runs, so a bounce of the foot switch does not restart it', () => {
    const started = tapCountdown(readyCountdown(countdownSteps(TWO_LAYERS)), 0).state;

    const bounced = tapCountdown(started, 400);

    expect(bounced.state.startedAt).toBe(0);
    expect(bounced.signals).toEqual([]);
  });

  it('shows whole seconds left rounded up and the share of the step done', () => {
    const started = tapCountdown(readyCountdown(countdownSteps(TWO_LAYERS)), 0).state;

    expect(secondsLeft(started, 0)).toBe(5);
    expect(secondsLeft(started, 100)).toBe(5);
    expect(secondsLeft(started, 4_001)).toBe(1);
    expect(stepProgress(started, 2_500)).toBeCloseTo(0.5);
  });

  it('starts the next piece at once with a tap after a finished one', () => {
    const one = countdownSteps({ prePressS: 0, steps: [{ filmId: 1, seconds: 2, kind: 'dwell' }], secondPressS: null });
    const finished = run(readyCountdown(one), (s) => tapCountdown(s, 0), (s) => tickCountdown(s, 2_000));
    expect(finished.state.phase).toBe('finished');

    const next = tapCountdown(finished.state, 3_000);

    expect(next.state.phase).toBe('running');
    expect(next.state.index).toBe(0);
  });
});
