/**
 * The team sync's own bookkeeping, in its own IndexedDB database (`<app database>-sync`), apart
 * from the app's schema: the team set up (URL, user — never the password), the outbox, the
 * pulled sequence, records waiting for their tank, and the conflict marks.
 */
import { openDB, type IDBPDatabase } from 'idb';
import type { OutboxEntry, SyncBook, SyncMarks } from './bridge.js';

export interface TeamConfig {
  /** The team database's URL, e.g. https://couch.example.com/tankside-acme. */
  url: string;
  user: string;
  /** When this phone joined (ISO); the first push of its register is done once. */
  joinedAt: string;
  /** The first push of this phone's register was noted. */
  firstPushNoted: boolean;
}

type Db = IDBPDatabase<{
  outbox: { key: string; value: OutboxEntry };
  meta: { key: string; value: unknown };
}>;

let counter = 0;

export class SyncState implements SyncBook {
  private constructor(private readonly db: Db) {}

  static async open(appDbName: string): Promise<SyncState> {
    const db = (await openDB(`${appDbName}-sync`, 1, {
      upgrade(d) {
        d.createObjectStore('outbox', { keyPath: 'id' });
        d.createObjectStore('meta');
      },
    })) as unknown as Db;
    return new SyncState(db);
  }

  close(): void {
    this.db.close();
  }

  private async meta<T>(key: string, fallback: T): Promise<T> {
    return ((await this.db.get('meta', key)) as T | undefined) ?? fallback;
  }

  getTeam(): Promise<TeamConfig | null> {
    return this.meta<TeamConfig | null>('team', null);
  }
  async setTeam(team: TeamConfig | null): Promise<void> {
    await this.db.put('meta', team, 'team');
  }

  async addOutbox(ids: string[]): Promise<void> {
    if (ids.length === 0) return;
    const tx = this.db.transaction('outbox', 'readwrite');
    for (const id of ids) void tx.store.put({ id, seq: Date.now() * 1000 + (counter++ % 1000) });
    await tx.done;
  }
  async listOutbox(limit: number): Promise<OutboxEntry[]> {
    return this.db.getAll('outbox', undefined, limit);
  }
  async countOutbox(): Promise<number> {
    return this.db.count('outbox');
  }
  async removeOutbox(entries: OutboxEntry[]): Promise<void> {
    if (entries.length === 0) return;
    const tx = this.db.transaction('outbox', 'readwrite');
    for (const e of entries) {
      const now = await tx.store.get(e.id);
      if (now && now.seq === e.seq) await tx.store.delete(e.id);
    }
    await tx.done;
  }
  async hasOutbox(id: string): Promise<boolean> {
    return (await this.db.count('outbox', id)) > 0;
  }

  async outboxHas(ids: string[]): Promise<Set<string>> {
    const out = new Set<string>();
    if (ids.length === 0 || (await this.db.count('outbox')) === 0) return out;
    const tx = this.db.transaction('outbox', 'readonly');
    const counts = await Promise.all(ids.map((id) => tx.store.count(id)));
    await tx.done;
    ids.forEach((id, i) => counts[i]! > 0 && out.add(id));
    return out;
  }

  getPullSeq(): Promise<number | string> {
    return this.meta<number | string>('pullSeq', 0);
  }
  async setPullSeq(seq: number | string): Promise<void> {
    await this.db.put('meta', seq, 'pullSeq');
  }
  getWaiting(): Promise<string[]> {
    return this.meta<string[]>('waiting', []);
  }
  async setWaiting(ids: string[]): Promise<void> {
    await this.db.put('meta', ids, 'waiting');
  }
  getMarks(): Promise<SyncMarks> {
    return this.meta<SyncMarks>('marks', { conflicts: [], keptAfterDelete: [] });
  }
  async setMarks(marks: SyncMarks): Promise<void> {
    await this.db.put('meta', marks, 'marks');
  }

  /** Forgets the team and everything of the sync (the app's own data stays). */
  async clear(): Promise<void> {
    const tx = this.db.transaction(['outbox', 'meta'], 'readwrite');
    await Promise.all([tx.objectStore('outbox').clear(), tx.objectStore('meta').clear()]);
    await tx.done;
  }
}
