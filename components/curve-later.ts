/**
 * The heating chart's series for a check's outcome, asked for a moment after the figures (so
 * typing never waits for it) and computed in the chart worker (chart-client.ts).
 */
import type { HeatingCurve } from './chart-data.js';
import { curveFor } from './chart-client.js';
import type { CheckOutcome } from './check-input.js';
import { productFor } from './products.js';

/**
 * Wait after the last edit before the chart is redrawn, ms: a pause in typing (the gap between
 * keystrokes is typically 150–300 ms), so the chart's work never lands between two keys and
 * delays the second one's figures. The same pause as the draft's write (pwa/drafts.ts).
 */
export const CHART_DELAY_MS = 400;

/**
 * Calls `done` with the series of `outcome` (null: no chart) after CHART_DELAY_MS; the returned
 * function cancels it, an answer still on its way included.
 */
export function curveLater(
  productId: string,
  outcome: CheckOutcome,
  done: (curve: HeatingCurve | null) => void,
): () => void {
  let live = true;
  const timer = setTimeout(() => {
    const product = productFor(productId);
    if (product === undefined || !outcome.result || !outcome.input) return;
    const { peak, liquidFullTemperature, contents } = outcome.result;
    const req = { product, result: { peak, liquidFullTemperature, contents } };
    void curveFor({ ...req, Tnow: outcome.input.liquidTemperature }).then((curve) => {
      if (live) done(curve);
    });
  }, CHART_DELAY_MS);
  return () => {
    live = false;
    clearTimeout(timer);
  };
}
