/**
 * Benchmark of a blend's first (cold) tank check: scripts/bench-cold.ts in 5 fresh Node processes,
 * median (target ≤ 20 ms).
 */
import { execFileSync } from 'node:child_process';
import { fileURLToPath } from 'node:url';
import type { BenchRow } from './timing.js';

const script = fileURLToPath(new URL('../bench-cold.ts', import.meta.url));
const tsx = fileURLToPath(new URL('../../node_modules/.bin/tsx', import.meta.url));

export function benchColdBlend(): BenchRow[] {
  const ms = Array.from({ length: 5 }, () =>
    Number(execFileSync(tsx, [script], { encoding: 'utf8' }).trim()),
  ).sort((a, b) => a - b);
  return [
    {
      name: 'first tank check of a 4-component blend, fresh process',
      medianMicros: ms[2]! * 1000,
      target: '≤ 20 ms',
    },
  ];
}
