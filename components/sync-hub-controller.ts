/**
 * Listens to the team sync's `change` events (`syncHub`, pwa/sync/hub.ts) while its element is
 * on the page: added when the element connects, removed when it disconnects, so an element
 * taken off the page is not kept alive or updated by the hub.
 */
import type { ReactiveController, ReactiveControllerHost } from 'lit';
import { syncHub } from '../pwa/sync/hub.js';

export interface SyncHubOptions {
  /** Also run `onChange` each time the element connects (to read the hub's state then). */
  atConnect?: boolean;
}

export class SyncHubController implements ReactiveController {
  private readonly _listener = () => this.onChange();

  constructor(
    host: ReactiveControllerHost,
    private readonly onChange: () => void,
    private readonly options: SyncHubOptions = {},
  ) {
    host.addController(this);
  }

  hostConnected(): void {
    syncHub.addEventListener('change', this._listener);
    if (this.options.atConnect) this.onChange();
  }

  hostDisconnected(): void {
    syncHub.removeEventListener('change', this._listener);
  }
}
