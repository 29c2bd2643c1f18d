/** One benchmark figure: a median over repeated runs unless the name says otherwise. */
export interface Figure {
  name: string;
  value: number;
  unit: string;
  /** Target; lower is better unless lowerIsBetter is false. */
  target?: number;
  lowerIsBetter?: boolean;
  digits?: number;
}

/** Median of repeated timings of fn (ms), after `warmup` untimed runs. */
export async function medianMs(fn: () => unknown | Promise<unknown>, repeats = 15, warmup = 2): Promise<number> {
  for (let i = 0; i < warmup; i++) await fn();
  const times: number[] = [];
  for (let i = 0; i < repeats; i++) {
    const t0 = performance.now();
    await fn();
    times.push(performance.now() - t0);
  }
  times.sort((a, b) => a - b);
  const mid = Math.floor(times.length / 2);
  return times.length % 2 ? times[mid]! : (times[mid - 1]! + times[mid]!) / 2;
}
