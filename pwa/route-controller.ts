/**
 * The screen on show, kept in step with the address hash (pwa/router.ts): follows `hashchange`,
 * navigates by setting the hash, loads the chunks of the check and walkdown screens on first
 * use, and puts a new screen at its top with the focus on it.
 */
import type { LitElement, ReactiveController } from 'lit';
import { href, parseRoute, type Route } from './router.js';

/** What the shell does around a change of screen. */
export interface RouteHooks {
  /** Before the screen changes from `from` to `to` (write drafts, reset per-visit state). */
  leave(from: Route, to: Route): void;
  /** Loads the data the new screen needs. */
  enter(route: Route): Promise<void>;
  /** A screen's chunk could not be loaded. */
  failed(message: string): void;
}

export class RouteController implements ReactiveController {
  route: Route;
  /** The check screen (with the check engine) is loaded; it comes in its own chunk. */
  checkScreenReady = false;
  /** The walkdown screens (pwa/walkdown-screen.ts, with the engine) are loaded. */
  siteScreenReady = false;
  private readonly _onHash = () => void this.go(parseRoute(location.hash));

  constructor(
    private readonly host: LitElement,
    private readonly hooks: RouteHooks,
  ) {
    this.route = parseRoute(typeof location === 'undefined' ? '' : location.hash);
    host.addController(this);
  }

  hostConnected(): void {
    window.addEventListener('hashchange', this._onHash);
  }

  hostDisconnected(): void {
    window.removeEventListener('hashchange', this._onHash);
  }

  /** Shows `route` by way of the hash (so Back works); the same hash shows it again. */
  navigate(route: Route): void {
    const target = href(route);
    if (location.hash !== target) location.hash = target;
    else void this.go(route);
  }

  async go(route: Route): Promise<void> {
    this.hooks.leave(this.route, route);
    this.route = route;
    this.host.requestUpdate();
    await Promise.all([this.hooks.enter(route), this._loadChunk(route)]);
    await this.host.updateComplete;
    // A new screen starts at its top, and a screen reader starts reading there.
    window.scrollTo(0, 0);
    this.host.renderRoot.querySelector<HTMLElement>('main')?.focus({ preventScroll: true });
  }

  private _loadChunk(route: Route): Promise<void> {
    if (route.name === 'check') return this._loadCheckScreen();
    if (route.name === 'site' || route.name === 'walk' || route.name === 'walkdown')
      return this._loadSiteScreen();
    return Promise.resolve();
  }

  /** Loads the check screen and the engine on first use (a separate chunk, precached for offline use). */
  private async _loadCheckScreen(): Promise<void> {
    if (this.checkScreenReady) return;
    try {
      await import('../components/check-screen.js');
      this.checkScreenReady = true;
      this.host.requestUpdate();
    } catch (e) {
      this.hooks.failed(
        `The check screen could not be loaded (${e instanceof Error ? e.message : String(e)}). Reload the app.`,
      );
    }
  }

  /** Loads the walkdown screens on first use (their own chunk, precached for offline use). */
  private async _loadSiteScreen(): Promise<void> {
    if (this.siteScreenReady) return;
    try {
      await import('./walkdown-screen.js');
      this.siteScreenReady = true;
      this.host.requestUpdate();
    } catch (e) {
      this.hooks.failed(
        `The walkdown screens could not be loaded (${e instanceof Error ? e.message : String(e)}). Reload the app.`,
      );
    }
  }
}
