/**
 * Web Worker that computes the heating chart's series (chart-data.ts) off the main thread: a
 * blend's closed-tank sweep costs tens of milliseconds on a phone, and a key typed while it ran
 * on the main thread would wait for it. Messages: { id, product, result, Tnow } in,
 * { id, curve } out (curve null when the core refuses the whole span).
 */
import { heatingCurve, type CurveRequest } from './chart-data.js';

const scope = self as unknown as {
  onmessage: ((e: MessageEvent<CurveRequest & { id: number }>) => void) | null;
  postMessage(message: unknown): void;
};

scope.onmessage = (e) => {
  const { id, product, result, Tnow } = e.data;
  let curve = null;
  try {
    curve = heatingCurve(product, result, Tnow);
  } catch {
    // A product the core refuses outright: no chart, as on the main thread.
  }
  scope.postMessage({ id, curve });
};
