/**
 * Runs the site board's projections in a worker (pwa/board-worker.ts) and hands back the rows
 * batch by batch; a newer run supersedes an older one. Where a worker cannot start, the same work
 * runs on the page in short slices that yield between them, so input is never held up long.
 */
import { projectTank, type BoardRow } from '../components/walkdown-board.js';
import type { BoardBatch, BoardJob } from './board-worker.js';

export type BoardInput = Omit<BoardJob, 'job'>;
export type OnBatch = (rows: BoardRow[], finished: boolean) => void;

/** Longest stretch of work on the page between two yields, ms (fallback only). */
const SLICE_MS = 12;

export class BoardClient {
  private worker: Worker | null = null;
  private noWorker = false;
  private job = 0;
  private onBatch: OnBatch | null = null;
  private last: BoardInput | null = null;

  run(input: BoardInput, onBatch: OnBatch): void {
    const job = ++this.job;
    this.onBatch = onBatch;
    this.last = input;
    const w = this.start();
    if (w) w.postMessage({ ...input, job } satisfies BoardJob);
    else void this.onPage(input, job, onBatch);
  }

  /** Starts the worker ahead of the first run, so its engine loads while the page reads storage. */
  warm(): void {
    this.start();
  }

  close(): void {
    this.job++;
    this.worker?.terminate();
    this.worker = null;
  }

  private start(): Worker | null {
    if (this.worker || this.noWorker) return this.worker;
    try {
      const w = new Worker(new URL('./board-worker.ts', import.meta.url), { type: 'module' });
      w.addEventListener('message', (e: MessageEvent<BoardBatch>) => {
        if (e.data.job === this.job) this.onBatch?.(e.data.rows, e.data.finished);
      });
      w.addEventListener('error', () => {
        // The worker could not load: redo the current job on the page.
        this.noWorker = true;
        this.worker = null;
        w.terminate();
        if (this.last && this.onBatch) void this.onPage(this.last, this.job, this.onBatch);
      });
      this.worker = w;
    } catch {
      this.noWorker = true;
    }
    return this.worker;
  }

  private async onPage(input: BoardInput, job: number, onBatch: OnBatch): Promise<void> {
    const latest = new Map(input.latest);
    const now = new Date(input.now);
    let batch: BoardRow[] = [];
    let start = performance.now();
    for (const t of input.tanks) {
      const l = latest.get(t.id) ?? null;
      batch.push(projectTank(t, l, input.forecast, input.settings, now, input.staleDays));
      if (performance.now() - start > SLICE_MS) {
        onBatch(batch, false);
        batch = [];
        await new Promise((r) => setTimeout(r, 0));
        if (job !== this.job) return;
        start = performance.now();
      }
    }
    onBatch(batch, true);
  }
}
