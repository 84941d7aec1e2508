/**
 * Benchmark of a blend's first (cold) tank check: scripts/bench-cold.ts in 11 fresh Node
 * processes, median and range (target ≤ 20 ms). Eleven, not five: one run's figure swings by a
 * third with what else the machine is doing, and five left the median to two or three of them.
 */
import { execFileSync } from 'node:child_process';
import { fileURLToPath } from 'node:url';
import type { BenchRow } from './timing.js';

const script = fileURLToPath(new URL('../bench-cold.ts', import.meta.url));
const loader = import.meta.resolve('tsx');

export function benchColdBlend(): BenchRow[] {
  const ms = Array.from({ length: 11 }, () =>
    // Node with tsx's loader, not the tsx command: the command keeps a relay process beside the
    // one timed, and every figure through it came out 4–5 ms higher, before and after alike.
    Number(
      execFileSync(process.execPath, ['--import', loader, script], { encoding: 'utf8' }).trim(),
    ),
  ).sort((a, b) => a - b);
  return [
    {
      name: `first tank check of a 4-component blend, fresh process (11 runs, ${ms[0]!.toFixed(1)}–${ms[10]!.toFixed(1)} ms)`,
      medianMicros: ms[5]! * 1000,
      target: '≤ 20 ms',
    },
  ];
}
