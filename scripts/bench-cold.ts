/**
 * `npx tsx scripts/bench-cold.ts [thermo-dir]`: the first tank check of a 4-component LP-gas blend
 * (the HD-5 limit preset) in this fresh process — nothing solved yet, the code not yet compiled by
 * the JIT — in ms, printed alone on one line. Module loading is not counted. Run by
 * scripts/bench/cold.ts in fresh processes (`npm run bench`); given another copy of thermo/ it
 * times that one (before and after).
 */
import { performance } from 'node:perf_hooks';
import { resolve } from 'node:path';
import { pathToFileURL } from 'node:url';

const root = process.argv[2] ? resolve(process.argv[2]) : resolve(import.meta.dirname, '../thermo');
const at = (p: string) => pathToFileURL(`${root}/${p}`).href;
const { checkTank } = (await import(
  at('check/checkTank.ts')
)) as typeof import('../thermo/check/checkTank.js');
const { LPG_PRESETS } = (await import(
  at('rules/presets.ts')
)) as typeof import('../thermo/rules/presets.js');

const PSI = 6894.757293168;
const input = {
  tank: {
    waterCapacity: 3.785411784,
    designPressureGauge: 250 * PSI,
    reliefSetPressureGauge: 220 * PSI,
  },
  product: LPG_PRESETS.find((p) => p.id === 'hd5-limit')!.product,
  liquidTemperature: 294.15,
  contents: { gaugePercent: 62 },
  peakTemperature: 313.15,
};
const t0 = performance.now();
checkTank(input);
console.log((performance.now() - t0).toFixed(2));
