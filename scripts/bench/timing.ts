/** Timing helpers for `npm run bench`: figures to report, never pass/fail tests. */
import { performance } from 'node:perf_hooks';

export interface BenchRow {
  name: string;
  medianMicros: number;
  target: string;
}

/** Median wall time in µs of `fn(i)` over `n` calls, after a warm-up of n/5 calls. */
export function median(n: number, fn: (i: number) => unknown): number {
  for (let i = 0; i < Math.max(10, n / 5); i++) fn(i);
  const t: number[] = [];
  for (let i = 0; i < n; i++) {
    const t0 = performance.now();
    fn(i);
    t.push((performance.now() - t0) * 1000);
  }
  t.sort((a, b) => a - b);
  return t[Math.floor(n / 2)]!;
}
