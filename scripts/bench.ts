/**
 * `npm run bench`: medians of the core and the tank check on this machine. Reported figures,
 * not tests; see README.md for the last measured values.
 */
import { readdirSync } from 'node:fs';
import type { BenchRow } from './bench/timing.js';

const dir = new URL('./bench/', import.meta.url);
const rows: BenchRow[] = [];
for (const file of readdirSync(dir)
  .filter((f) => f.endsWith('.ts') && f !== 'timing.ts')
  .sort()) {
  const mod = (await import(new URL(file, dir).href)) as Record<string, unknown>;
  for (const fn of Object.values(mod)) {
    if (typeof fn === 'function' && fn.name.startsWith('bench'))
      rows.push(...(fn as () => BenchRow[])());
  }
}
const width = Math.max(...rows.map((r) => r.name.length));
console.log(`${'benchmark'.padEnd(width)}  median        target`);
for (const r of rows) {
  const shown =
    r.medianMicros >= 1000
      ? `${(r.medianMicros / 1000).toFixed(2)} ms`
      : `${r.medianMicros.toFixed(1)} µs`;
  console.log(`${r.name.padEnd(width)}  ${shown.padEnd(12)}  ${r.target}`);
}
console.log(`\nNode ${process.version}, ${process.arch}; one run, medians of repeated calls.`);
