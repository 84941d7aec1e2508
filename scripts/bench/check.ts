/**
 * Benchmark of a full tank check (contents, fill limit, peak, liquid-full and relief
 * temperatures, diagnosis, cautions): a pure fluid (target ≤ 1 ms median), a 4-component
 * blend and an R-410A recovery cylinder (target ≤ 5 ms median each). Inputs vary a little from call to call so no per-temperature
 * result is reused; product constants (liquid density at 60 °F) are memoised by design, as in
 * the app, and are warmed up before timing.
 */
import { checkTank } from '../../thermo/check/checkTank.js';
import type { TankCheckInput } from '../../thermo/check/types.js';
import { LPG_PRESETS } from '../../thermo/rules/presets.js';
import { toSI } from '../../thermo/units.js';

function median(xs: number[]): number {
  const s = xs.slice().sort((a, b) => a - b);
  const m = s.length >> 1;
  return s.length % 2 ? s[m]! : 0.5 * (s[m - 1]! + s[m]!);
}

function timeIt(make: (i: number) => TankCheckInput, runs: number, warm: number): number {
  for (let i = 0; i < warm; i++) checkTank(make(i));
  const times: number[] = [];
  for (let i = 0; i < runs; i++) {
    const input = make(warm + i);
    const t0 = performance.now();
    checkTank(input);
    times.push(performance.now() - t0);
  }
  return median(times) * 1000;
}

function tankInput(product: TankCheckInput['product'], i: number): TankCheckInput {
  // Temperatures step by a few mK per call: every call solves its own states.
  const dT = (i % 997) * 0.003;
  return {
    tank: {
      waterCapacity: toSI('volume', 1000, 'usgal'),
      designPressureGauge: toSI('gaugePressure', 250, 'psig'),
      reliefSetPressureGauge: toSI('gaugePressure', 220, 'psig'),
      minDesignMetalTemperature: toSI('temperature', -20, 'F'),
    },
    product,
    liquidTemperature: toSI('temperature', 70, 'F') + dT,
    contents: { gaugePercent: 62 },
    pressureReadingGauge: toSI('gaugePressure', 115, 'psig'),
    peakTemperature: toSI('temperature', 105, 'F') + dT,
  };
}

/** An R-410A recovery cylinder (50 lb water capacity) in a warm van; gauge reading given. */
function cylinderInput(i: number): TankCheckInput {
  const dT = (i % 997) * 0.003;
  return {
    tank: {
      waterCapacity: toSI('volume', 6, 'usgal'),
      designPressureGauge: toSI('gaugePressure', 400, 'psig'),
      containerClass: 'cylinder',
      recovery: {},
    },
    product: 'r410a',
    liquidTemperature: toSI('temperature', 85, 'F') + dT,
    contents: { netMass: toSI('mass', 36, 'lb') },
    pressureReadingGauge: toSI('gaugePressure', 270, 'psig'),
    peakTemperature: toSI('temperature', 140, 'F') + dT,
  };
}

export function benchCheck(): { name: string; medianMicros: number; target: string }[] {
  const blend = LPG_PRESETS.find((p) => p.id === 'hd5-limit')!.product;
  return [
    {
      name: 'checkTank, pure propane, full check',
      medianMicros: timeIt((i) => tankInput('propane', i), 400, 100),
      target: '≤ 1000 µs',
    },
    {
      name: 'checkTank, 4-component LP-gas blend, full check',
      medianMicros: timeIt((i) => tankInput(blend, i), 60, 15),
      target: '≤ 5000 µs',
    },
    {
      name: 'checkTank, R-410A recovery cylinder, full check',
      medianMicros: timeIt(cylinderInput, 60, 15),
      target: '≤ 5000 µs',
    },
  ];
}

// Run directly: `npx tsx scripts/bench/check.ts`
if (import.meta.url === `file://${process.argv[1]}`) {
  for (const r of benchCheck())
    console.log(`${r.name}: ${r.medianMicros.toFixed(0)} µs (target ${r.target})`);
}
