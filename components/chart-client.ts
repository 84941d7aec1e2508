/**
 * The heating chart's series from the chart worker (chart-worker.ts), so the sweep never holds
 * up typing. Where a worker cannot start (or fails to load), the series is computed here on
 * the main thread instead, as before. Requests are answered in order; only the caller decides
 * whether an answer is still wanted.
 */
import { heatingCurve, type CurveRequest, type HeatingCurve } from './chart-data.js';

let worker: Worker | null | undefined;
let next = 1;
const waiting = new Map<number, { req: CurveRequest; done: (c: HeatingCurve | null) => void }>();

function onMain(req: CurveRequest): HeatingCurve | null {
  try {
    return heatingCurve(req.product, req.result, req.Tnow);
  } catch {
    return null;
  }
}

function start(): Worker | null {
  try {
    const w = new Worker(new URL('./chart-worker.ts', import.meta.url), { type: 'module' });
    w.onmessage = (e: MessageEvent<{ id: number; curve: HeatingCurve | null }>) => {
      const job = waiting.get(e.data.id);
      waiting.delete(e.data.id);
      job?.done(e.data.curve);
    };
    w.onerror = () => {
      // The worker did not load: answer what is waiting here, and from now on.
      worker = null;
      for (const [id, job] of waiting) {
        waiting.delete(id);
        job.done(onMain(job.req));
      }
    };
    return w;
  } catch {
    return null;
  }
}

/** The heating chart's series for a check, computed off the main thread where possible. */
export function curveFor(req: CurveRequest): Promise<HeatingCurve | null> {
  if (worker === undefined) worker = typeof Worker === 'undefined' ? null : start();
  if (!worker) return Promise.resolve(onMain(req));
  const id = next++;
  return new Promise((done) => {
    waiting.set(id, { req, done });
    worker!.postMessage({ id, ...req });
  });
}
