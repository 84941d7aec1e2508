/**
 * The site board's projections off the page's main thread: every tank of a site through
 * `projectTank` (the check engine), posted back in batches so the board fills in while the page
 * stays responsive. A newer job cancels an older one between tanks.
 *
 * In:  `BoardJob`; out: `BoardBatch` messages, the last with `finished: true`.
 */
import {
  projectTank,
  type BoardRow,
  type LatestReadings,
  type SiteForecast,
} from '../components/walkdown-board.js';
import type { Settings, TankRecord } from '../components/types.js';

export interface BoardJob {
  job: number;
  tanks: TankRecord[];
  latest: [string, LatestReadings | null][];
  forecast: SiteForecast;
  settings: Settings;
  /** ms since the epoch: "now" for the age of readings. */
  now: number;
  staleDays: number;
}

export interface BoardBatch {
  job: number;
  rows: BoardRow[];
  finished: boolean;
}

/** Longest stretch between two posts, ms. */
const BATCH_MS = 30;

let current = 0;

async function run(j: BoardJob): Promise<void> {
  current = j.job;
  const latest = new Map(j.latest);
  const now = new Date(j.now);
  let batch: BoardRow[] = [];
  let start = performance.now();
  let first = true;
  for (const t of j.tanks) {
    batch.push(projectTank(t, latest.get(t.id) ?? null, j.forecast, j.settings, now, j.staleDays));
    // The first tank goes out alone, so the top row fills in as soon as it can.
    if (first || performance.now() - start > BATCH_MS) {
      first = false;
      postMessage({ job: j.job, rows: batch, finished: false } satisfies BoardBatch);
      batch = [];
      // Let a newer job's message in; stop if one came.
      await new Promise((r) => setTimeout(r, 0));
      if (current !== j.job) return;
      start = performance.now();
    }
  }
  postMessage({ job: j.job, rows: batch, finished: true } satisfies BoardBatch);
}

addEventListener('message', (e: MessageEvent<BoardJob>) => {
  void run(e.data);
});
