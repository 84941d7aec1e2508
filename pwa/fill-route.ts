/**
 * The shell's side of fills, kept out of tankside-app.ts: loading the fill screen's chunk, the
 * fill under way of the tank on screen, saving and discarding, and every saved fill (for the
 * tank's history and the CSV). Each change of a fill under way is written at once, so a reload
 * never loses it.
 */
import type { ReactiveController, ReactiveControllerHost } from 'lit';
import type { Store } from './storage.js';
import type { FillDraft, FillRecord } from '../components/fill-types.js';
import type { TankRecord } from '../components/types.js';

export class FillController implements ReactiveController {
  /** Every saved fill, newest first. */
  fills: FillRecord[] = [];
  /** The fill under way of the tank on the fill screen (undefined while loading). */
  draft: FillDraft | null | undefined = undefined;
  /** The fill screen's chunk is loaded. */
  ready = false;
  error = '';

  constructor(private readonly host: ReactiveControllerHost) {
    host.addController(this);
  }

  hostConnected(): void {}

  fillsOf(tankId: string): FillRecord[] {
    return this.fills.filter((f) => f.tankId === tankId);
  }

  async reload(store: Store): Promise<void> {
    this.fills = await store.listFills();
    this.host.requestUpdate();
  }

  /** Loads the fill screen and the tank's fill under way. */
  async open(store: Store, tankId: string): Promise<void> {
    this.draft = undefined;
    const [draft] = await Promise.all([store.getFillDraft(tankId), this._load()]);
    this.draft = draft ?? null;
    this.host.requestUpdate();
  }

  private async _load(): Promise<void> {
    if (this.ready) return;
    try {
      await import('../components/fill-screen.js');
      this.ready = true;
    } catch (e) {
      this.error = `The fill screen could not be loaded (${e instanceof Error ? e.message : String(e)}). Reload the app.`;
    }
  }

  async start(store: Store, draft: FillDraft): Promise<void> {
    await store.putFillDraft(draft);
    this.draft = draft;
  }

  async change(store: Store, draft: FillDraft): Promise<void> {
    this.draft = draft;
    await store.putFillDraft(draft);
  }

  /** Saves the record (ending the fill under way); a demo tank with a fill is the user's own. */
  async save(store: Store, record: FillRecord, tank: TankRecord | undefined): Promise<void> {
    if (tank?.demo)
      await store.putTank({ ...tank, demo: false, updatedAt: new Date().toISOString() });
    await store.putFill(record);
    this.draft = null;
    await this.reload(store);
  }

  async discard(store: Store, tankId: string): Promise<FillDraft | null> {
    const old = (await store.getFillDraft(tankId)) ?? null;
    await store.deleteFillDraft(tankId);
    this.draft = null;
    this.host.requestUpdate();
    return old;
  }
}
