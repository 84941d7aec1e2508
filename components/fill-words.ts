/**
 * Words for where the fill stops, shared by the results and the text summary: which gauge the
 * stop-at percent is read on, given how the tank is filled and which limit binds.
 */
import type { FillLimitResult, FillMethod } from '../thermo/check/types.js';

/** How a tank is filled, in the trade's words (the tank form's choices). */
export const FILL_METHOD_WORDS: [FillMethod, string][] = [
  ['gauge', 'By float or variable gauge (rotary, slip-tube), read with the liquid temperature'],
  ['fixed-gauge', 'To the fixed maximum-level gauge (dip tube): stop when liquid appears at it'],
  ['weight', 'By weight on a scale'],
];

/** What follows "Stop at N %": where that percent is read. */
export function stopPlace(f: Pick<FillLimitResult, 'fillMethod' | 'stopAtFixedGauge'>): string {
  if (f.stopAtFixedGauge)
    return 'the fixed maximum-level gauge’s setting: stop when liquid first appears at it';
  if (f.fillMethod === 'weight')
    return 'on the float gauge at today’s liquid temperature (for reference: this tank is filled by weight, so the scale and the weight limit decide)';
  return 'on the float gauge at today’s liquid temperature';
}
