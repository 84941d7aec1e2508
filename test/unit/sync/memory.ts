/**
 * Test doubles of the bridge's two sides: a phone store in Maps (the same semantics as
 * pwa/storage.ts's shared-store methods) and the sync bookkeeping in memory, with real PouchDB
 * databases in memory for the replicas and the team server.
 */
import PouchDB from 'pouchdb-core';
import memory from 'pouchdb-adapter-memory';
import replication from 'pouchdb-replication';
import http from 'pouchdb-adapter-http';
import type {
  LocalSide,
  OutboxEntry,
  PouchLike,
  SyncBook,
  SyncMarks,
} from '../../../pwa/sync/bridge.js';
import type { SyncKind } from '../../../pwa/sync/record-schema.js';

// The embedded server (imported by some tests) registers the same plugins on the same module.
for (const plugin of [memory, replication, http]) {
  try {
    PouchDB.plugin(plugin);
  } catch {
    // already registered
  }
}

export { PouchDB };

let n = 0;
export function memoryPouch(): PouchDB.Database & PouchLike {
  return new PouchDB(`mem-${process.pid}-${n++}`, { adapter: 'memory' }) as never;
}

export async function replicateBothWays(a: PouchDB.Database, b: PouchDB.Database): Promise<void> {
  await a.replicate.to(b);
  await a.replicate.from(b);
}

export class MapLocal implements LocalSide {
  readonly stores = new Map<SyncKind, Map<string, unknown>>();
  /** Writes made by the screens (the shell's Store calls), noted in the outbox first. */
  constructor(private readonly book?: MemoryBook) {}
  private store(kind: SyncKind): Map<string, unknown> {
    let s = this.stores.get(kind);
    if (!s) this.stores.set(kind, (s = new Map()));
    return s;
  }
  async getShared(kind: SyncKind, key: string): Promise<unknown> {
    return structuredClone(this.store(kind).get(key));
  }
  async getSharedMany(kind: SyncKind, keys: string[]): Promise<unknown[]> {
    return keys.map((k) => structuredClone(this.store(kind).get(k)));
  }
  async listShared(kind: SyncKind): Promise<unknown[]> {
    return [...this.store(kind).values()].map((x) => structuredClone(x));
  }
  async applyShared(
    puts: { kind: SyncKind; record: unknown }[],
    dels: { kind: SyncKind; key: string }[],
  ): Promise<void> {
    for (const p of puts) {
      const r = p.record as { id?: string; site?: string };
      this.store(p.kind).set((p.kind === 'site' ? r.site : r.id)!, structuredClone(p.record));
    }
    for (const d of dels) this.store(d.kind).delete(d.key);
  }
  /** A screen's write: noted first, as pwa/storage.ts does. */
  async userPut(kind: SyncKind, record: { id: string }): Promise<void> {
    await this.book?.addOutbox([`${kind}:${record.id}`]);
    this.store(kind).set(record.id, structuredClone(record));
  }
  async userDelete(kind: SyncKind, id: string): Promise<void> {
    await this.book?.addOutbox([`${kind}:${id}`]);
    this.store(kind).delete(id);
  }
}

export class MemoryBook implements SyncBook {
  outbox = new Map<string, number>();
  seq: number | string = 0;
  waiting: string[] = [];
  marks: SyncMarks = { conflicts: [], keptAfterDelete: [] };
  private counter = 0;
  async addOutbox(ids: string[]): Promise<void> {
    for (const id of ids) this.outbox.set(id, ++this.counter);
  }
  async listOutbox(limit: number): Promise<OutboxEntry[]> {
    return [...this.outbox].slice(0, limit).map(([id, seq]) => ({ id, seq }));
  }
  async removeOutbox(entries: OutboxEntry[]): Promise<void> {
    for (const e of entries) if (this.outbox.get(e.id) === e.seq) this.outbox.delete(e.id);
  }
  async hasOutbox(id: string): Promise<boolean> {
    return this.outbox.has(id);
  }
  async outboxHas(ids: string[]): Promise<Set<string>> {
    return new Set(ids.filter((id) => this.outbox.has(id)));
  }
  async getPullSeq() {
    return this.seq;
  }
  async setPullSeq(s: number | string) {
    this.seq = s;
  }
  async getWaiting() {
    return [...this.waiting];
  }
  async setWaiting(ids: string[]) {
    this.waiting = [...ids];
  }
  async getMarks() {
    return structuredClone(this.marks);
  }
  async setMarks(m: SyncMarks) {
    this.marks = structuredClone(m);
  }
}
