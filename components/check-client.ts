/**
 * The tank check for the check screen: a blend's off the main thread (check-worker.ts) in the
 * built app.
 * Each request carries a sequence number and only the answer to the latest request is kept:
 * the caller gets `null` for one that a newer request has overtaken (a stale answer is dropped,
 * never shown). Where no worker can start (an old browser, Node, the component tests, which run
 * the sources without the bundler) or the worker fails to load, the check runs here on the main
 * thread, synchronously, as it did before.
 */
import { runCheck, type CheckOutcome } from './check-input.js';
import type { CheckRequest } from './check-worker.js';
import type { Readings, Settings, TankRecord } from './types.js';
import type { SiteRules } from './site-rules.js';
import { productFor } from './products.js';
import { refrigerantBlendById } from '../thermo/data/blends.js';

/**
 * Where checks run: `auto` = a blend's check in a worker in the built app, everything else here
 * (a pure fluid's check takes well under a millisecond even on a slow phone, less than the trip
 * to a worker and back); or forced either way.
 */
export type CheckThread = 'auto' | 'main' | 'worker';

let thread: CheckThread = 'auto';
let worker: Worker | null | undefined;
let latest = 0;
const waiting = new Map<number, { req: CheckRequest; done: (o: CheckOutcome | null) => void }>();

/** Chooses where checks run (tests force the worker or the main thread). */
export function setCheckThread(t: CheckThread): void {
  thread = t;
}

function builtApp(): boolean {
  // Vite replaces import.meta.env at build time; under web-test-runner it is absent.
  const env = (import.meta as ImportMeta & { env?: { PROD?: boolean } }).env;
  return env?.PROD === true;
}

function answer(seq: number, outcome: CheckOutcome): void {
  const job = waiting.get(seq);
  waiting.delete(seq);
  job?.done(seq === latest ? outcome : null);
}

function start(): Worker | null {
  try {
    const w = new Worker(new URL('./check-worker.ts', import.meta.url), { type: 'module' });
    w.onmessage = (e: MessageEvent<{ seq: number; outcome: CheckOutcome }>) =>
      answer(e.data.seq, e.data.outcome);
    w.onerror = () => {
      // The worker did not load: answer what is waiting here, and from now on.
      worker = null;
      for (const [seq, job] of waiting) {
        const { tank, readings, settings, rules } = job.req;
        answer(seq, runCheck(tank, readings, settings, rules));
      }
    };
    return w;
  } catch {
    return null;
  }
}

/** The tank holds a blend (an LP-gas preset or a refrigerant blend): its check can take long. */
function holdsBlend(tank: TankRecord): boolean {
  const p = productFor(tank.productId);
  if (typeof p === 'string') return refrigerantBlendById(p) !== undefined;
  return p !== undefined && 'components' in p && p.components.length > 1;
}

/**
 * Blend products whose check has run on this thread (their caches are warm here). A warm blend
 * check takes under a millisecond, less than a round trip to the worker and back, so in `auto`
 * only a blend's cold first checks go to the worker; the main thread warms itself meanwhile,
 * when the page is idle (`warmLater`).
 */
const warmHere = new Set<string>();
const warming = new Set<string>();

function warmLater(req: CheckRequest): void {
  const id = req.tank.productId;
  if (warmHere.has(id) || warming.has(id)) return;
  warming.add(id);
  const idle: (cb: () => void) => void =
    typeof requestIdleCallback === 'function'
      ? (cb) => requestIdleCallback(cb, { timeout: 2000 })
      : (cb) => setTimeout(cb, 200);
  idle(() => {
    runCheck(req.tank, req.readings, req.settings, req.rules);
    warming.delete(id);
    warmHere.add(id);
    if (typeof requestIdleCallback === 'function') warmAround(req);
  });
}

/**
 * Tanks whose check has been run again in idle moments around its readings (`warmAround`).
 */
const warmedAround = new Set<string>();

/** Liquid temperatures tried around a pure fluid's reading, K: the likeliest next values first. */
const AROUND_K = [1, -1, 2, -2, 3, -3, 0.5, -0.5, 1.5, -1.5, 2.5, -2.5, 4, -4, 5, -5];
/**
 * A blend's: the reading itself, again. A blend's check at a new temperature solves new bubble
 * points (several ms, more on a slow phone) and a keystroke arriving meanwhile would wait for
 * it; at the reading, every state is remembered and a run takes a fraction of a millisecond.
 */
const AT_READING_K = AROUND_K.map(() => 0);

/**
 * After a tank's first check on this thread, the check runs again in idle moments: for a pure
 * fluid on liquid temperatures a few kelvin either side of the reading, for a blend on the
 * reading itself (`AT_READING_K`). The first keystrokes otherwise run the engine in the
 * browser's slower, not yet compiled tiers (at 4× CPU throttling the screen's check of a blend
 * took 4–21 ms on the first eight keys against about 2 ms later). Nothing it computes is shown
 * or kept but the engine's own caches (exact, as every solve). Each idle slice runs one check
 * and goes on only while the browser reports time to spare, so a keystroke waits at most for
 * one check. Once per tank per page load (after `warmLater` for a blend).
 */
function warmAround(req: CheckRequest): void {
  const T = req.readings.liquidTemperature;
  const key = `${req.tank.id}\u0000${req.tank.productId}`;
  if (T === null || warmedAround.has(key)) return;
  warmedAround.add(key);
  const steps = holdsBlend(req.tank) ? AT_READING_K : AROUND_K;
  let i = 0;
  const slice = (deadline: IdleDeadline): void => {
    do {
      const readings = { ...req.readings, liquidTemperature: T + steps[i++]! };
      runCheck(req.tank, readings, req.settings, req.rules);
    } while (i < steps.length && deadline.timeRemaining() > 8);
    if (i < steps.length) requestIdleCallback(slice, { timeout: 2000 });
  };
  requestIdleCallback(slice, { timeout: 2000 });
}

function workerFor(tank: TankRecord): Worker | null {
  if (thread === 'main' || typeof Worker === 'undefined') return null;
  if (thread === 'auto' && (!builtApp() || !holdsBlend(tank) || warmHere.has(tank.productId)))
    return null;
  if (worker === undefined) worker = start();
  return worker;
}

/**
 * Runs the check: the outcome at once where it runs on the main thread, else a promise of it
 * (null if a newer request overtook this one).
 */
export function requestCheck(
  tank: TankRecord,
  readings: Readings,
  settings: Settings,
  rules: SiteRules = {},
): CheckOutcome | Promise<CheckOutcome | null> {
  const seq = ++latest;
  const w = workerFor(tank);
  const req: CheckRequest = { seq, tank, readings, settings, rules };
  if (!w) {
    const outcome = runCheck(tank, readings, settings, rules);
    if (thread === 'auto' && builtApp() && typeof requestIdleCallback === 'function')
      warmAround(req);
    return outcome;
  }
  if (thread === 'auto') warmLater(req);
  return new Promise((done) => {
    waiting.set(seq, { req, done });
    w.postMessage(req);
  });
}
