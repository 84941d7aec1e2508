/**
 * `node --import tsx scripts/bench-cold.ts [thermo-dir] [--cpu]` (or `npx tsx …`, which runs it
 * beside a relay process and reads a few ms higher): the first tank check of a 4-component
 * LP-gas blend (the HD-5 limit preset) in this fresh process — nothing solved yet, the code not
 * yet compiled by the JIT — in ms, printed alone on one line. Module loading is not counted. Run
 * by scripts/bench/cold.ts in fresh processes (`npm run bench`); given another copy of thermo/ it
 * times that one (before and after). `--cpu` prints the process's CPU time for the check instead
 * of the wall time (all its threads, the JIT's included): on a machine shared with other jobs,
 * the wall time mostly measures how long the process waited for a core.
 */
import { performance } from 'node:perf_hooks';
import { hd5Blend, loadEngine } from './bench/engine-copy.js';

const e = await loadEngine();
const PSI = 6894.757293168;
const input = {
  tank: {
    waterCapacity: 3.785411784,
    designPressureGauge: 250 * PSI,
    reliefSetPressureGauge: 220 * PSI,
  },
  product: hd5Blend(e),
  liquidTemperature: 294.15,
  contents: { gaugePercent: 62 },
  peakTemperature: 313.15,
};
const cpu0 = process.cpuUsage();
const t0 = performance.now();
e.checkTank(input);
const wall = performance.now() - t0;
const cpu = process.cpuUsage(cpu0);
console.log((process.argv.includes('--cpu') ? (cpu.user + cpu.system) / 1000 : wall).toFixed(2));
