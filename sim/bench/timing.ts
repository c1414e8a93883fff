/**
 * Wall-clock timing of a function after warm-up runs, ms (performance.now, in-process). The median is the figure
 * the targets are stated in; the best of the same runs is printed beside it because this machine is shared with
 * other builds: the median moves with their load, the best run is close to what the code costs on a quiet core.
 */
export interface Timing {
  median: number;
  best: number;
  repeats: number;
}

export function timeMs(run: () => void, options: { warmup: number; repeats: number }): Timing {
  for (let i = 0; i < options.warmup; i++) run();
  const samples: number[] = [];
  for (let i = 0; i < options.repeats; i++) {
    const start = performance.now();
    run();
    samples.push(performance.now() - start);
  }
  samples.sort((a, b) => a - b);
  const mid = Math.floor(samples.length / 2);
  const median = samples.length % 2 ? samples[mid] : (samples[mid - 1] + samples[mid]) / 2;
  return { median, best: samples[0], repeats: samples.length };
}

/** Median wall-clock time of a function after warm-up runs, ms. */
export function medianMs(run: () => void, options: { warmup: number; repeats: number }): number {
  return timeMs(run, options).median;
}
