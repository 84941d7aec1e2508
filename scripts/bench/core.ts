/** Benchmarks of the EOS core (medians over repeated calls with varying inputs). */
import { closedTank, saturation, type Product } from '../../thermo/index.js';
import { median, type BenchRow } from './timing.js';

const BLEND4: Product = {
  components: [
    { id: 'propane', moleFraction: 0.9 },
    { id: 'ethane', moleFraction: 0.03 },
    { id: 'isobutane', moleFraction: 0.04 },
    { id: 'n-butane', moleFraction: 0.03 },
  ],
};

export function benchCore(): BenchRow[] {
  const rows: BenchRow[] = [];
  // Pure saturation: propane from −40 °C to +50 °C.
  rows.push({
    name: 'saturation, pure fluid (propane)',
    medianMicros: median(2000, (i) => saturation('propane', 233.15 + (i % 90))),
    target: '≤ 20 µs',
  });
  // Pure closed tank, two-phase and liquid-full states alike.
  rows.push({
    name: 'closedTank, pure fluid (propane)',
    medianMicros: median(2000, (i) =>
      closedTank('propane', 233.15 + (i % 110), 200 + (i % 7) * 50),
    ),
    target: '≤ 30 µs',
  });
  // Four-component blend, two-phase.
  rows.push({
    name: 'closedTank, 4-component blend',
    medianMicros: median(300, (i) => closedTank(BLEND4, 253.15 + (i % 60), 250 + (i % 5) * 40)),
    target: '≤ 300 µs',
  });
  // A 100-point heating sweep of the blend at fixed overall density (a peak-day curve).
  rows.push({
    name: '100-point heating sweep, 4-component blend',
    medianMicros: median(15, (i) => {
      for (let k = 0; k < 100; k++) closedTank(BLEND4, 273.15 + 0.6 * k, 230 + i);
    }),
    target: '≤ 30 ms (30 000 µs)',
  });
  return rows;
}
