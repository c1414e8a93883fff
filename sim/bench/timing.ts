/** Median wall-clock time of a function after warm-up runs, ms (performance.now, in-process). */
export function medianMs(run: () => void, options: { warmup: number; repeats: number }): number {
  for (let i = 0; i < options.warmup; i++) run();
  const samples: number[] = [];
  for (let i = 0; i < options.repeats; i++) {
    const start = performance.now();
    run();
    samples.push(performance.now() - start);
  }
  samples.sort((a, b) => a - b);
  const mid = Math.floor(samples.length / 2);
  return samples.length % 2 ? samples[mid] : (samples[mid - 1] + samples[mid]) / 2;
}
