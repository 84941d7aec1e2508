/**
 * The shell's notices: the question asked before something is removed (`<confirm-bar>`), the
 * undo offer, the waiting update, the one-time "works offline" note and a plain info line.
 * Shown in the sticky area at the bottom of every screen.
 */
import { html, nothing, type ReactiveController, type ReactiveControllerHost } from 'lit';
import type { NoticeDetail } from '../components/app-notice.js';
import '../components/app-notice.js';
import '../components/confirm-bar.js';

/** How long an undo offer stays, ms. */
const UNDO_MS = 12_000;
/** How long the one-time "works offline now" note stays, ms. */
const OFFLINE_NOTE_MS = 15_000;

export interface Undo {
  text: string;
  restore: () => Promise<void>;
}

/** A question asked before something is removed. */
export interface Confirm {
  text: string;
  yes: string;
  run: () => Promise<void>;
}

export class NoticesController implements ReactiveController {
  undo: Undo | null = null;
  confirm: Confirm | null = null;
  /** Applies the waiting new version (set by the service worker's hook). */
  update: (() => void) | null = null;
  offlineNote = false;
  info = '';
  private _undoTimer: ReturnType<typeof setTimeout> | undefined;

  /** `beforeUpdate` runs before a new version takes over (writes the pending draft). */
  constructor(
    private readonly host: ReactiveControllerHost,
    private readonly beforeUpdate: () => void,
  ) {
    host.addController(this);
  }

  hostDisconnected(): void {
    clearTimeout(this._undoTimer);
  }

  private _changed(): void {
    this.host.requestUpdate();
  }

  offerUndo(text: string, restore: () => Promise<void>): void {
    clearTimeout(this._undoTimer);
    this.undo = { text, restore };
    this._undoTimer = setTimeout(() => {
      this.undo = null;
      this._changed();
    }, UNDO_MS);
    this._changed();
  }

  ask(confirm: Confirm): void {
    this.confirm = confirm;
    this._changed();
  }

  showInfo(text: string): void {
    this.info = text;
    this._changed();
  }

  offerUpdate(applyUpdate: () => void): void {
    this.update = applyUpdate;
    this._changed();
  }

  showOfflineNote(): void {
    this.offlineNote = true;
    setTimeout(() => {
      this.offlineNote = false;
      this._changed();
    }, OFFLINE_NOTE_MS);
    this._changed();
  }

  private async _confirmed(yes: boolean): Promise<void> {
    const c = this.confirm;
    this.confirm = null;
    this._changed();
    if (yes && c) await c.run();
  }

  private readonly _action = async (e: CustomEvent<NoticeDetail>): Promise<void> => {
    if (e.detail.kind === 'update' && this.update) {
      this.beforeUpdate();
      this.update();
    } else if (e.detail.kind === 'undo' && this.undo) {
      const u = this.undo;
      this.undo = null;
      clearTimeout(this._undoTimer);
      this._changed();
      await u.restore();
    }
  };

  private readonly _dismiss = (e: CustomEvent<NoticeDetail>): void => {
    const k = e.detail.kind;
    if (k === 'update') this.update = null;
    else if (k === 'offline-ready') this.offlineNote = false;
    else if (k === 'undo') this.undo = null;
    else this.info = '';
    this._changed();
  };

  render() {
    return html`<div
      class="notices"
      @notice-action=${this._action}
      @notice-dismiss=${this._dismiss}
    >
      ${
        this.confirm
          ? html`<confirm-bar
              .text=${this.confirm.text}
              .yes=${this.confirm.yes}
              no="Keep them"
              @confirm-yes=${() => this._confirmed(true)}
              @confirm-no=${() => this._confirmed(false)}
            ></confirm-bar>`
          : nothing
      }
      ${
        this.undo
          ? html`<app-notice kind="undo" .text=${this.undo.text} action="Undo"></app-notice>`
          : nothing
      }
      ${
        this.update
          ? html`<app-notice
              kind="update"
              text="A new version is ready — reload when you’re done."
              action="Reload now"
            ></app-notice>`
          : nothing
      }
      ${
        this.offlineNote
          ? html`<app-notice
              kind="offline-ready"
              text="The app now works offline: checks need no signal."
            ></app-notice>`
          : nothing
      }
      ${this.info ? html`<app-notice kind="info" .text=${this.info}></app-notice>` : nothing}
    </div>`;
  }
}
