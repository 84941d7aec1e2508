/**
 * A half-filled check is kept as a draft per tank, so a reload, a crash or an accepted update
 * never loses it: typing is written a moment after the last keystroke, and at once when the
 * screen changes, the page is hidden or the app goes away.
 */
import type { ReactiveController, ReactiveControllerHost } from 'lit';
import type { DraftRecord, Readings } from '../components/types.js';
import { openingReadings, type LastReadings } from '../components/reopen.js';
import type { Store } from './storage.js';
import type { SiteRules } from '../components/site-rules.js';

/** Wait after the last keystroke before a draft is written, ms. */
const DRAFT_DELAY_MS = 400;

/** Readings to open a tank's check screen with. */
export interface OpenDraft {
  tankId: string;
  readings: Readings;
  last: LastReadings | null;
  /** The site's rule set and own stricter rule, as stored (the engine chunk checks them). */
  rules: SiteRules;
}

export class DraftController implements ReactiveController {
  /** Readings to open the current check screen with (loaded per tank). */
  current: OpenDraft | null = null;
  private _timer: ReturnType<typeof setTimeout> | undefined;
  private _pending: { tankId: string; readings: Readings } | null = null;

  constructor(
    private readonly host: ReactiveControllerHost,
    private readonly store: () => Store | null,
  ) {
    host.addController(this);
  }

  hostConnected(): void {
    window.addEventListener('pagehide', this.flush);
  }

  hostDisconnected(): void {
    window.removeEventListener('pagehide', this.flush);
    this.flush();
  }

  /**
   * Sets the readings the check screen opens with, from the tank's stored draft: readings typed
   * during this visit come back as they were; older ones are offered as the last check above
   * blank readings (components/reopen.ts).
   */
  open(
    tankId: string,
    draft: DraftRecord | undefined,
    sunAllowance: number,
    rules: SiteRules = {},
  ): void {
    this.current = { tankId, ...openingReadings(draft, sunAllowance), rules };
    this.host.requestUpdate();
  }

  /** Readings changed on the check screen of `tankId`: write them shortly. */
  change(tankId: string, readings: Readings): void {
    this._pending = { tankId, readings };
    clearTimeout(this._timer);
    this._timer = setTimeout(this.flush, DRAFT_DELAY_MS);
  }

  /** Writes the pending draft now. */
  readonly flush = (): void => {
    clearTimeout(this._timer);
    const p = this._pending;
    this._pending = null;
    const store = this.store();
    if (p && store)
      void store.putDraft({
        tankId: p.tankId,
        readings: p.readings,
        updatedAt: new Date().toISOString(),
      });
  };
}
