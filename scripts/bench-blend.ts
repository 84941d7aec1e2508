/**
 * `npx tsx scripts/bench-blend.ts [thermo-dir]`: the 4-component LP-gas blend's tank check over a
 * spread of readings (liquid −20…40 °C, gauge 5…90 %, peak up to 50 °C), its first (cold) check
 * and the chart's 100-point heating sweep. Given another copy of thermo/ (e.g. an older commit
 * unpacked by `git archive <rev> thermo | tar -x -C /tmp/old`), it times that copy instead, so
 * before and after can be run back to back on one machine. Reported figures, not tests.
 */
import { performance } from 'node:perf_hooks';
import { engineRoot, hd5Blend, loadEngine } from './bench/engine-copy.js';
type Input = import('../thermo/check/types.js').TankCheckInput;

const root = engineRoot();
const engine = await loadEngine(root);
const { checkTank, closedTank, toSI } = engine;
const blend = hd5Blend(engine);

function input(liquidC: number, gauge: number, peakC: number): Input {
  return {
    tank: {
      waterCapacity: toSI('volume', 1000, 'usgal'),
      designPressureGauge: toSI('gaugePressure', 250, 'psig'),
      reliefSetPressureGauge: toSI('gaugePressure', 220, 'psig'),
    },
    product: blend,
    liquidTemperature: toSI('temperature', liquidC, 'C'),
    contents: { gaugePercent: gauge },
    peakTemperature: toSI('temperature', peakC, 'C'),
  };
}

const time = (f: () => unknown) => {
  const t0 = performance.now();
  f();
  return performance.now() - t0;
};
const q = (xs: number[], f: number) =>
  xs.slice().sort((a, b) => a - b)[Math.floor(f * (xs.length - 1))]!;

const first = time(() => checkTank(input(21, 62, 40)));
// The spread: 8 temperatures × 6 gauges × 3 peaks, each then typed through 0.1 °C steps as a
// keystroke would change it.
const times: number[] = [];
for (const T of [-20, -10, 0, 10, 15, 21, 30, 40])
  for (const g of [5, 20, 50, 62, 80, 90])
    for (const pk of [Math.max(T, 20), 45, 50])
      for (let k = 0; k < 3; k++) times.push(time(() => checkTank(input(T + 0.1 * k, g, pk))));
console.log(`thermo: ${root}`);
console.log(`first check (cold): ${first.toFixed(1)} ms`);
console.log(
  `spread of ${times.length} checks: median ${q(times, 0.5).toFixed(2)} ms, p90 ${q(times, 0.9).toFixed(2)} ms, max ${q(times, 1).toFixed(1)} ms`,
);

// The chart's heating sweep: 100 closed-tank states of one tank from 15 to 55 °C, for three
// fillings (a new density each time, as a new reading gives).
const sweeps: number[] = [];
for (const rho of [300, 420, 470])
  for (let k = 0; k < 3; k++)
    sweeps.push(
      time(() => {
        for (let i = 0; i < 100; i++) closedTank(blend, 288.15 + 0.4 * i + 0.01 * k, rho + k);
      }),
    );
console.log(
  `100-point heating sweep: median ${q(sweeps, 0.5).toFixed(1)} ms, max ${q(sweeps, 1).toFixed(1)} ms`,
);
