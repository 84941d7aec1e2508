/**
 * Team sync set-up on the Data screen: the team database URL, user name and password,
 * "Connect"; a status line that always says where sync stands; "Disconnect", which keeps every
 * record on this phone. The password goes to the server once, to open a session, and is never
 * kept. Talks to `syncHub` (pwa/sync/hub.ts); PouchDB loads only once a team is set up.
 *
 * data-testid: `sync-url`, `sync-user`, `sync-password`, `sync-connect`, `sync-disconnect`,
 * `sync-status` (`data-state`: off | connecting | active | paused | error), `sync-message`.
 */
import { LitElement, html, css, nothing } from 'lit';
import { baseStyles } from './styles.js';
import { syncHub, type SyncStatus } from '../pwa/sync/hub.js';
import { SyncHubController } from './sync-hub-controller.js';

const SHAPE: Record<SyncStatus['state'], string> = {
  off: '○',
  connecting: '…',
  active: '⇅',
  paused: '●',
  error: '▲',
};

export class TeamPanel extends LitElement {
  static override properties = {
    _status: { state: true },
    _busy: { state: true },
    _message: { state: true },
  };

  declare _status: SyncStatus;
  declare _busy: boolean;
  declare _message: string;

  constructor() {
    super();
    this._status = syncHub.status;
    this._busy = false;
    this._message = '';
    new SyncHubController(this, () => (this._status = syncHub.status), { atConnect: true });
  }

  static override styles = [
    baseStyles,
    css`
      .status {
        border: var(--border-width) solid var(--ink);
        border-radius: 0.4rem;
        padding: 0.6rem;
        font-weight: 600;
        overflow-wrap: anywhere;
      }
      .status[data-state='error'] {
        border-color: var(--danger);
        color: var(--danger);
      }
      .field {
        display: grid;
        gap: 0.25rem;
        margin-bottom: 0.75rem;
      }
      .team {
        overflow-wrap: anywhere;
      }
      .buttons {
        display: grid;
        grid-template-columns: repeat(auto-fit, minmax(10rem, 1fr));
        gap: 0.5rem;
      }
    `,
  ];

  private _value(id: string): string {
    return (this.renderRoot.querySelector<HTMLInputElement>(`#${id}`)?.value ?? '').trim();
  }

  private async _connect(e: Event): Promise<void> {
    e.preventDefault();
    const password = this.renderRoot.querySelector<HTMLInputElement>('#sync-password');
    const url =
      this._status.team && this._status.needsSignIn
        ? this._status.team.url
        : this._value('sync-url');
    const user =
      this._status.team && this._status.needsSignIn
        ? this._status.team.user
        : this._value('sync-user');
    this._busy = true;
    this._message = '';
    try {
      this._message = (await syncHub.connect(url, user, password?.value ?? '')) ?? '';
    } finally {
      if (password) password.value = '';
      this._busy = false;
    }
  }

  private async _disconnect(): Promise<void> {
    this._busy = true;
    try {
      await syncHub.disconnect();
      this._message = 'Disconnected. Every tank and check stays on this phone.';
    } finally {
      this._busy = false;
    }
  }

  private _form(signInOnly: boolean) {
    return html`<form @submit=${this._connect} novalidate>
      ${
        signInOnly
          ? nothing
          : html`<div class="field">
                <label for="sync-url">Team database URL</label>
                <input
                  id="sync-url"
                  data-testid="sync-url"
                  type="url"
                  inputmode="url"
                  autocomplete="url"
                  spellcheck="false"
                  placeholder="https://couch.example.com/tankside-team"
                />
              </div>
              <div class="field">
                <label for="sync-user">User name</label>
                <input
                  id="sync-user"
                  data-testid="sync-user"
                  type="text"
                  autocomplete="username"
                  autocapitalize="none"
                  spellcheck="false"
                />
              </div>`
      }
      <div class="field">
        <label for="sync-password">Password</label>
        <input
          id="sync-password"
          data-testid="sync-password"
          type="password"
          autocomplete="current-password"
        />
        <span class="muted">Sent once to sign in; this phone keeps only the server's session.</span>
      </div>
      <button class="primary" type="submit" data-testid="sync-connect" ?disabled=${this._busy}>
        ${signInOnly ? 'Sign in again' : 'Connect'}
      </button>
    </form>`;
  }

  override render() {
    const s = this._status;
    return html`
      <h3>Team</h3>
      <p class="muted">
        Share the tanks, checks, fills and walkdowns with your team's phones. Each phone keeps
        working without signal and catches up when it has one. Units and theme stay per phone.
      </p>
      <p
        class="status"
        role="status"
        aria-live="polite"
        data-testid="sync-status"
        data-state=${s.state}
      >
        <span aria-hidden="true">${SHAPE[s.state]}</span> ${s.words}
      </p>
      ${
        this._message
          ? html`<p class="${s.state === 'error' ? 'error' : 'muted'}" data-testid="sync-message">
              ${this._message}
            </p>`
          : nothing
      }
      ${
        s.team
          ? html`<p class="team">
                Team database <strong>${s.team.url}</strong>, signed in as
                <strong>${s.team.user}</strong>.
              </p>
              ${s.needsSignIn ? this._form(true) : nothing}
              <div class="buttons">
                <button
                  type="button"
                  data-testid="sync-disconnect"
                  ?disabled=${this._busy}
                  @click=${this._disconnect}
                >
                  Disconnect
                </button>
              </div>`
          : this._form(false)
      }
    `;
  }
}

customElements.define('team-panel', TeamPanel);

declare global {
  interface HTMLElementTagNameMap {
    'team-panel': TeamPanel;
  }
}
