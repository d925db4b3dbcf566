/** Median wall time in milliseconds of `runs` runs of a task: one slow run on a noisy machine does not move it. */
export function medianMs(task: () => void, runs: number): number {
  const times: number[] = [];
  for (let i = 0; i < runs; i++) {
    const start = performance.now();
    task();
    times.push(performance.now() - start);
  }
  times.sort((a, b) => a - b);
  return times[Math.floor(times.length / 2)]!;
}
