/**
 * The findings of a fill's reconciliation in the user's units: each engine code with its SI
 * params gets our sentence here; a code without an entry (or with a param missing) falls back
 * to the engine's English default, which is never wrong, only in US units first.
 * Sentences say what the figures show and what to verify; never permission to fill.
 */
import { formatPercent, type DisplayUnits } from './display.js';
import type { FillFinding, FillParam } from '../thermo/fill/index.js';

type Params = Record<string, FillParam>;
type Entry = (p: (k: string) => number, d: DisplayUnits) => string;

const pts = (x: number, round: 'nearest' | 'up' | 'down' = 'nearest') =>
  `${formatPercent(x, round).replace(' %', '')} percentage points`;

function seen(p: (k: string) => number): string {
  return `the gauge reads ${formatPercent(p('reading'))}; the contents before and the metered delivery put it at ${formatPercent(p('expected'))} (agreement band ±${pts(p('band'), 'down')})`;
}

export const FILL_MESSAGES: Record<string, Entry> = {
  'fill-over-limit': (p, d) =>
    `Over the fill limit after the delivery by ${d.format('mass', p('overMass'), 'up')} (about ${d.format('volume', p('overVolume'), 'up')} of liquid). The limit is ${d.format('mass', p('maxMass'), 'down')}; the gauge reading stands for ${d.format('mass', p('gaugeMass'))} and the contents before plus the metered delivery come to ${d.format('mass', p('expectedMass'))}. A tank over its limit can become liquid-full as it warms. Follow the site’s procedure for an overfilled tank.`,
  'fill-gauge-low': (p, d) =>
    `The gauge reads low: ${seen(p)}. The tank holds about ${d.format('mass', -p('differenceMass'), 'up')} (${d.format('volume', -p('differenceVolume'), 'up')} of liquid) more than the gauge shows. A gauge that reads low leads to overfilling: do not rely on it for the next fill until it is verified. Check for a sticking float or a loose dial, confirm the contents by weight or with the fixed maximum-level gauge, and follow the site’s procedures.`,
  'fill-gauge-high': (p, d) =>
    `The gauge reads high: ${seen(p)}. The tank holds about ${d.format('mass', p('differenceMass'), 'down')} less than the gauge shows. Check the meter ticket (the volume, and whether it is temperature-compensated), the temperatures and the gauge.`,
  'fill-consistent': (p) => `The gauge agrees with the meter within the band: ${seen(p)}.`,
  'fill-pressure-off-curve': (p, d) =>
    `The pressure after the delivery, ${d.format('gaugePressure', p('reading'))}, is ${p('difference') > 0 ? 'above' : 'below'} the product’s expected ${d.format('gaugePressure', p('expected'), 'up')} by ${d.format('pressureDifference', Math.abs(p('difference')), 'up')}, more than the ${d.format('pressureDifference', p('tolerance'))} the gauge and the model allow. A different product may have been delivered, the temperature may not have settled, or the pressure gauge may be faulty. Check the delivery ticket’s product and follow the site’s procedures.`,
  'fill-stop-at-moved': (p) =>
    `At the after temperature the stop-at gauge percent is ${formatPercent(p('stopAt'), 'down')} (it was ${formatPercent(p('stopAtBefore'), 'down')} before).`,
};

/** One finding's sentence in the user's units. */
export function fillFindingText(f: Pick<FillFinding, 'code' | 'message' | 'params'>, d: DisplayUnits): string {
  const entry = FILL_MESSAGES[f.code];
  if (!entry) return f.message;
  const params: Params = f.params;
  const get = (k: string): number => {
    const v = params[k]?.value;
    if (typeof v !== 'number' || !Number.isFinite(v)) throw new Error(`missing ${k}`);
    return v;
  };
  try {
    return entry(get, d);
  } catch {
    return f.message;
  }
}
