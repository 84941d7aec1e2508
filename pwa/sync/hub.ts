/**
 * The team sync as the app sees it: its status, the conflict marks, and connect / disconnect.
 * Light on purpose — PouchDB (pwa/sync/engine.ts) is loaded as a chunk of its own only when a
 * team is set up, so a phone without a team loads none of it and contacts no other origin.
 *
 * Events (on `syncHub`): `change` whenever the status or the marks change.
 */
import type { SharedRecord, Store, StoreWatcher } from '../storage.js';
import type { SyncMarks } from './bridge.js';
import { docIdOf } from './ids.js';
import type { SyncDoc } from './record-schema.js';
import { SyncState, type TeamConfig } from './state.js';
import type { Engine } from './engine.js';

export type SyncStateName = 'off' | 'connecting' | 'active' | 'paused' | 'error';

export interface SyncStatus {
  state: SyncStateName;
  /** Where sync stands, in words. */
  words: string;
  team: { url: string; user: string } | null;
  /** The server ended the session: the password is asked again. */
  needsSignIn: boolean;
}

const OFF: SyncStatus = {
  state: 'off',
  words: 'Team sync is off: this phone keeps its own register.',
  team: null,
  needsSignIn: false,
};

/** A team database URL a phone may use: HTTPS, or plain HTTP to this machine (embedded server). */
export function checkTeamUrl(text: string): string | null {
  let u: URL;
  try {
    u = new URL(text.trim());
  } catch {
    return 'Team database URL: type the whole address, e.g. https://couch.example.com/tankside-team.';
  }
  const loopback = u.hostname === '127.0.0.1' || u.hostname === 'localhost';
  if (u.protocol !== 'https:' && !(u.protocol === 'http:' && loopback))
    return 'Team database URL: it must start with https:// (plain http only for 127.0.0.1, the embedded test server).';
  if (u.pathname.replace(/\/+$/, '') === '')
    return 'Team database URL: it must end with the team database, e.g. …/tankside-team.';
  return null;
}

class SyncHub extends EventTarget {
  status: SyncStatus = OFF;
  marks: SyncMarks = { conflicts: [], keptAfterDelete: [] };
  private store: Store | null = null;
  private state: SyncState | null = null;
  private engine: Engine | null = null;
  private onPulled: () => void = () => undefined;
  private appDbName = 'tankside';

  private readonly watcher: StoreWatcher = {
    note: async (records: SharedRecord[]) => {
      await this.state?.addOutbox(records.map((r) => docIdOf(r.kind, r.key)));
    },
    wrote: () => this.engine?.schedule(),
  };

  setStatus(s: Partial<SyncStatus>): void {
    this.status = { ...this.status, ...s };
    this.dispatchEvent(new Event('change'));
  }

  setMarks(m: SyncMarks): void {
    this.marks = m;
    this.dispatchEvent(new Event('change'));
  }

  /** At start-up: resumes the team set up on this phone, if any (no request otherwise). */
  async start(store: Store, appDbName: string, onPulled: () => void): Promise<void> {
    this.store = store;
    this.onPulled = onPulled;
    this.appDbName = appDbName;
    this.state = await SyncState.open(appDbName);
    const team = await this.state.getTeam();
    if (!team) return;
    store.watcher = this.watcher;
    this.setMarks(await this.state.getMarks());
    await this.run(team, null);
  }

  private async run(team: TeamConfig, password: string | null): Promise<void> {
    this.setStatus({
      state: 'connecting',
      words: 'Connecting to the team server…',
      team: { url: team.url, user: team.user },
      needsSignIn: false,
    });
    tellWorker(new URL(team.url).origin);
    const { Engine } = await import('./engine.js');
    if (!this.store || !this.state) return;
    this.engine?.stop();
    this.engine = new Engine(
      this.store,
      this.state,
      team,
      {
        status: (s) => this.setStatus(s),
        marks: (m) => this.setMarks(m),
        pulled: () => this.onPulled(),
      },
      `${this.appDbName}-team`,
    );
    await this.engine.start(password);
  }

  /** Signs in and starts syncing; the password is sent once and never kept. */
  async connect(url: string, user: string, password: string): Promise<string | null> {
    if (!this.store || !this.state) return 'The app is still starting: try again in a moment.';
    const bad = checkTeamUrl(url);
    if (bad) return bad;
    if (user.trim() === '') return 'User name: type the name your team gave you.';
    if (password === '') return 'Password: type the password your team gave you.';
    const old = await this.state.getTeam();
    const same = old && old.url === url.trim() && old.user === user.trim();
    const team: TeamConfig = same
      ? old
      : {
          url: url.trim(),
          user: user.trim(),
          joinedAt: new Date().toISOString(),
          firstPushNoted: false,
        };
    if (!same) {
      // Another team (or user): its replica and bookkeeping go; the phone's records stay.
      this.engine?.stop();
      this.engine = null;
      if (old) await (await import('./engine.js')).Engine.destroyReplica(`${this.appDbName}-team`);
      await this.state.clear();
    }
    await this.state.setTeam(team);
    this.store.watcher = this.watcher;
    await this.run(team, password);
    return this.status.state === 'error' ? this.status.words : null;
  }

  /** Stops syncing and forgets the team; every record stays on the phone. */
  async disconnect(): Promise<void> {
    if (this.store) this.store.watcher = null;
    await this.engine?.forget();
    this.engine = null;
    await this.state?.clear();
    tellWorker(null);
    this.setMarks({ conflicts: [], keptAfterDelete: [] });
    this.setStatus(OFF);
  }

  async versions(tankId: string): Promise<SyncDoc[]> {
    return this.engine ? this.engine.versions(tankId) : [];
  }

  async choose(tankId: string, rev: string): Promise<void> {
    await this.engine?.choose(tankId, rev);
  }

  async dismissKept(tankId: string): Promise<void> {
    if (!this.state) return;
    const m = await this.state.getMarks();
    const next = { ...m, keptAfterDelete: m.keptAfterDelete.filter((t) => t !== tankId) };
    await this.state.setMarks(next);
    this.setMarks(next);
  }
}

function tellWorker(origin: string | null): void {
  try {
    navigator.serviceWorker?.controller?.postMessage({ type: 'TEAM_ORIGIN', origin });
  } catch {
    // No worker (first load, tests): nothing to tell.
  }
}

export const syncHub = new SyncHub();
