/**
 * The team sync's engine, in a chunk of its own (it carries PouchDB): signs in with a CouchDB
 * cookie session, keeps a local PouchDB replica in step with the team database (PouchDB's own
 * live replication, with its checkpoints), and bridges the replica with the app's store
 * (pwa/sync/bridge.ts, pwa/sync/pull.ts). Loaded only when a team is set up.
 */
import PouchDB from 'pouchdb-browser';
import type { Store } from '../storage.js';
import { flush, noteAll, type PouchLike, type SyncMarks } from './bridge.js';
import { pull, resolveTank, tankVersions } from './pull.js';
import type { SyncState, TeamConfig } from './state.js';
import type { SyncStatus } from './hub.js';
import type { SyncDoc } from './record-schema.js';

interface Hooks {
  status(s: Partial<SyncStatus>): void;
  marks(m: SyncMarks): void;
  pulled(): void;
}

interface HttpError {
  status?: number;
  name?: string;
  reason?: string;
  message?: string;
}

const FLUSH_DELAY_MS = 150;
const MAX_BACKOFF_MS = 30_000;

function withCookies(url: string | Request, opts?: RequestInit): Promise<Response> {
  return PouchDB.fetch(String(url), { ...opts, credentials: 'include' });
}

function reasonOf(e: unknown): string {
  const err = (e ?? {}) as HttpError & { doc?: HttpError; error?: unknown };
  const inner = err.doc ?? {};
  return (
    err.reason ||
    inner.reason ||
    err.message ||
    inner.message ||
    (typeof err.error === 'string' ? err.error : '') ||
    err.name ||
    'no reason given'
  );
}

export class Engine {
  private readonly replica: PouchDB.Database;
  private readonly remote: PouchDB.Database;
  private live: PouchDB.ReplicationHandle | null = null;
  private feed: PouchDB.ChangesHandle | null = null;
  private queue: Promise<unknown> = Promise.resolve();
  private timer: ReturnType<typeof setTimeout> | undefined;
  private stopped = false;
  private denied = '';
  private readonly onOnline = () => this.restartLive();
  private readonly onOffline = () =>
    this.hooks.status({
      state: 'paused',
      words: 'Waiting for signal: changes stay on this phone and go when it is back.',
    });

  constructor(
    private readonly store: Store,
    private readonly state: SyncState,
    private readonly team: TeamConfig,
    private readonly hooks: Hooks,
    replicaName = 'tankside-team',
  ) {
    this.replica = new PouchDB(replicaName, { auto_compaction: true });
    this.remote = new PouchDB(team.url, { skip_setup: true, fetch: withCookies });
  }

  private get pouch(): PouchLike {
    return this.replica as unknown as PouchLike;
  }

  /** Signs in (with a password) or checks the kept session, then syncs. */
  async start(password: string | null): Promise<void> {
    try {
      const signedIn = await this.session(password);
      if (!signedIn) {
        this.hooks.status({
          state: 'error',
          needsSignIn: true,
          words:
            password === null
              ? "The team server ended this phone's session: type the password again to go on syncing. Your records stay on this phone meanwhile."
              : 'The team server refused the user name or password.',
        });
        return;
      }
    } catch (e) {
      this.hooks.status({
        state: navigator.onLine ? 'error' : 'paused',
        words: navigator.onLine
          ? `The team server could not be reached (${reasonOf(e)}). Check the address; your records stay on this phone.`
          : 'Waiting for signal: changes stay on this phone and go when it is back.',
      });
      if (!navigator.onLine) this.goLive();
      return;
    }
    await this.firstSync();
    this.goLive();
  }

  /** True when signed in as the team's user (a password signs in; null checks the cookie). */
  private async session(password: string | null): Promise<boolean> {
    const at = new URL('_session', this.team.url).href;
    const res =
      password === null
        ? await withCookies(at, { headers: { accept: 'application/json' } })
        : await withCookies(at, {
            method: 'POST',
            headers: { 'content-type': 'application/json', accept: 'application/json' },
            body: JSON.stringify({ name: this.team.user, password }),
          });
    if (res.status === 401) return false;
    if (!res.ok) throw new Error(`HTTP ${res.status}`);
    const body = (await res.json()) as { name?: string; userCtx?: { name?: string | null } };
    return (body.name ?? body.userCtx?.name) === this.team.user;
  }

  /** The team's records first, then this phone's own (so they land on the team's revisions). */
  private async firstSync(): Promise<void> {
    this.hooks.status({ state: 'active', words: 'Receiving the team register…' });
    await this.replica.replicate.from(this.remote, { batch_size: 500, batches_limit: 4 });
    if (!this.team.firstPushNoted) {
      await noteAll(this.state, this.store);
      this.team.firstPushNoted = true;
      await this.state.setTeam(this.team);
    }
    await this.bridge();
  }

  private goLive(): void {
    if (this.stopped || this.live) return;
    window.addEventListener('online', this.onOnline);
    window.addEventListener('offline', this.onOffline);
    this.feed = this.replica
      .changes({ since: 'now', live: true })
      .on('change', () => this.schedule());
    this.live = this.replica
      .sync(this.remote, {
        live: true,
        retry: true,
        batch_size: 200,
        back_off_function: (d: number) => (d === 0 ? 1000 : Math.min(d * 2, MAX_BACKOFF_MS)),
      })
      .on('active', () =>
        this.hooks.status({ state: 'active', words: 'Sending and receiving changes…' }),
      )
      .on('paused', (err) => this.onPaused(err))
      .on('denied', (err) => {
        this.denied = reasonOf(err);
        this.hooks.status({
          state: 'error',
          words: `The team server refused a record: ${this.denied}`,
        });
      })
      .on('error', (err) => this.onError(err));
  }

  private onPaused(err: unknown): void {
    if (err || !navigator.onLine) {
      if ((err as HttpError | undefined)?.status === 401) return this.onError(err);
      this.hooks.status({
        state: 'paused',
        words: 'Waiting for signal: changes stay on this phone and go when it is back.',
      });
      return;
    }
    const time = new Date().toLocaleTimeString([], { hour: '2-digit', minute: '2-digit' });
    this.hooks.status({
      state: 'paused',
      words: this.denied
        ? `Up to date at ${time}, except a record the team server refused: ${this.denied}`
        : `Up to date at ${time}.`,
    });
  }

  private onError(err: unknown): void {
    const status = (err as HttpError | undefined)?.status;
    if (status === 401 || status === 403) {
      this.stopLive();
      this.hooks.status({
        state: 'error',
        needsSignIn: true,
        words:
          "The team server no longer accepts this phone's session (signed out, or removed from the team): type the password again, or ask the team's admin.",
      });
      return;
    }
    this.hooks.status({
      state: 'error',
      words: `Sync stopped: ${reasonOf(err)}. It starts again with the app.`,
    });
  }

  private restartLive(): void {
    this.stopLive();
    this.goLive();
  }

  private stopLive(): void {
    window.removeEventListener('online', this.onOnline);
    window.removeEventListener('offline', this.onOffline);
    this.live?.cancel();
    this.feed?.cancel();
    this.live = null;
    this.feed = null;
  }

  /** A write was noted in the outbox, or the replica changed: bridge soon. */
  schedule(): void {
    clearTimeout(this.timer);
    this.timer = setTimeout(() => void this.bridge(), FLUSH_DELAY_MS);
  }

  /** Outbox into the replica, then the replica into the store; one run at a time. */
  private bridge(): Promise<unknown> {
    this.queue = this.queue
      .then(async () => {
        if (this.stopped) return;
        await flush(this.state, this.store, this.pouch);
        const read = await pull(this.state, this.store, this.pouch);
        this.hooks.marks(await this.state.getMarks());
        if (read > 0) this.hooks.pulled();
      })
      .catch((e: unknown) => {
        this.hooks.status({
          state: 'error',
          words: `This phone could not take the team's changes: ${reasonOf(e)}`,
        });
      });
    return this.queue;
  }

  versions(tankId: string): Promise<SyncDoc[]> {
    return tankVersions(this.pouch, tankId);
  }

  async choose(tankId: string, rev: string): Promise<void> {
    await resolveTank(this.pouch, tankId, rev);
    await this.bridge();
  }

  static async destroyReplica(name: string): Promise<void> {
    await new PouchDB(name).destroy().catch(() => undefined);
  }

  stop(): void {
    this.stopped = true;
    clearTimeout(this.timer);
    this.stopLive();
  }

  /** Stops and removes the replica (the app's store keeps every record); ends the session. */
  async forget(): Promise<void> {
    this.stop();
    await this.queue.catch(() => undefined);
    await withCookies(new URL('_session', this.team.url).href, { method: 'DELETE' }).catch(
      () => undefined,
    );
    await this.replica.destroy().catch(() => undefined);
  }
}
