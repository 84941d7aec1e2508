/**
 * Puts off an element's re-render while it is far below (or above) the screen.
 *
 * While the readings are typed on a phone, the detailed results sit a screen or more below the
 * field: their cards are skipped in layout and paint (`content-visibility: auto`), yet lit would
 * still work through every figure of them on each keystroke. An element that uses this
 * controller asks it in `shouldUpdate`: while the element is more than `margin` away from the
 * viewport, its update is held and done when the page is next idle (within `maxWaitMs`), as soon
 * as the element comes within the margin, or before printing, whichever comes first. The
 * properties that changed in between reach `updated()` together, with their oldest values.
 *
 * What is on screen is never held: the first render, and every render while the element is
 * within the margin of the viewport, happen at once. The element's `getUpdateComplete` should
 * also wait for `pending`, so that whoever awaits `updateComplete` sees the current figures.
 */
import type { PropertyValues, ReactiveController, ReactiveElement } from 'lit';
import { whenIdle } from './idle.js';

type Host = ReactiveElement;

export class OffscreenHold implements ReactiveController {
  /** The element is within the margin of the viewport (or not yet measured). */
  private _near = true;
  private observer: IntersectionObserver | null = null;
  /** Properties whose update is held, with their values before the first held change. */
  private held = new Map<PropertyKey, unknown>();
  /** The next update goes ahead whatever the element's place (a release under way). */
  private force = false;
  private done: (() => void) | null = null;
  /** Settles when the held update has been done; null while nothing is held. */
  pending: Promise<void> | null = null;

  constructor(
    private readonly host: Host,
    private readonly margin = '50%',
    private readonly maxWaitMs = 500,
  ) {
    host.addController(this);
  }

  hostConnected(): void {
    if (typeof IntersectionObserver === 'function') {
      this.observer = new IntersectionObserver(
        (entries) => {
          const last = entries[entries.length - 1];
          if (last) this.placed(last.isIntersecting);
        },
        { rootMargin: `${this.margin} 0px` },
      );
      this.observer.observe(this.host);
    }
    addEventListener('beforeprint', this.release);
  }

  hostDisconnected(): void {
    this.observer?.disconnect();
    this.observer = null;
    this._near = true;
    removeEventListener('beforeprint', this.release);
    this.release();
  }

  /**
   * Where the element now is, as the IntersectionObserver reports it: within the margin of the
   * viewport or not. Coming near does what is held at once.
   */
  placed(near: boolean): void {
    this._near = near;
    if (near) this.release();
  }

  /** The element is within the margin of the viewport (true until first measured). */
  get near(): boolean {
    return this._near;
  }

  /** For the host's `shouldUpdate`: true to update now, false when the update is held. */
  allow(changed: PropertyValues): boolean {
    if (this.force) {
      this.force = false;
      return true;
    }
    if (this._near || !this.host.hasUpdated) return true;
    for (const [key, old] of changed) if (!this.held.has(key)) this.held.set(key, old);
    if (!this.pending) {
      this.pending = new Promise((resolve) => (this.done = resolve));
      whenIdle(this.release, this.maxWaitMs);
    }
    return false;
  }

  /** Does the held update now (idle, near the viewport, printing or disconnected). */
  readonly release = (): void => {
    if (!this.pending) return;
    const held = this.held;
    const done = this.done;
    this.held = new Map();
    this.pending = null;
    this.done = null;
    this.force = true;
    for (const [key, old] of held) this.host.requestUpdate(key, old);
    // Back to the values already drawn: nothing to update.
    if (!this.host.isUpdatePending) this.force = false;
    done?.();
  };
}
