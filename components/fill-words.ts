/**
 * Words for where the fill stops, shared by the results and the text summary: which gauge the
 * stop-at percent is read on, given how the tank is filled and which limit binds.
 */
import type { FillLimitResult, FillMethod } from '../thermo/check/types.js';

/** How a tank is filled, in the trade's words (the tank form's choices). */
export const FILL_METHOD_WORDS: [FillMethod, string][] = [
  ['gauge', 'Float gauge'],
  ['fixed-gauge', 'Fixed max. level gauge'],
  ['weight', 'Scale (by weight)'],
];

/** What each way of filling means, shown under the choice (the options stay short at 320 px). */
export const FILL_METHOD_HINT =
  'Float gauge: a float or variable gauge (rotary, slip-tube), read with the liquid temperature. Fixed max. level gauge: the fixed maximum-level gauge (dip tube); the fill stops when liquid appears at it. Scale: filled by weight.';

/** What follows "Stop at N %": where that percent is read. */
export function stopPlace(f: Pick<FillLimitResult, 'fillMethod' | 'stopAtFixedGauge'>): string {
  if (f.stopAtFixedGauge)
    return 'the fixed maximum-level gauge’s setting: stop when liquid first appears at it';
  if (f.fillMethod === 'weight')
    return 'on the float gauge at today’s liquid temperature (for reference: this tank is filled by weight, so the scale and the weight limit decide)';
  return 'on the float gauge at today’s liquid temperature';
}
