/** Median wall time in ms of `runs` calls of `fn` (after `warmup` unmeasured calls). */
export async function medianMs(fn: () => unknown, runs = 41, warmup = 5): Promise<number> {
  for (let i = 0; i < warmup; i++) await fn();
  const times: number[] = [];
  for (let i = 0; i < runs; i++) {
    const start = performance.now();
    await fn();
    times.push(performance.now() - start);
  }
  times.sort((a, b) => a - b);
  return times[Math.floor(times.length / 2)]!;
}
