/**
 * The bridge between the phone's own store (IndexedDB, what the screens read and write) and the
 * team's replica (a local PouchDB database that PouchDB replicates with the team server).
 *
 * - Push: every write to a shared store is noted in a persisted outbox before it is made
 *   (pwa/storage.ts `StoreWatcher`). `flush` makes each noted document equal to the stored
 *   record — create, update or delete — and only then removes the note. It is idempotent: a
 *   note whose record did not change (a crash before the write, a repeat) is a no-op, so a
 *   crash anywhere loses nothing and duplicates nothing (documents are keyed by record id).
 * - Pull: `pull` reads the replica's changes feed from a persisted sequence, writes the batch to
 *   the store in one transaction, then saves the sequence. A crash before the save repeats the
 *   batch, which writes the same records again.
 * - Conflicts: checks, fills and walkdowns are only added (new ids), so they never conflict; a
 *   conflicting site forecast keeps the latest entered; a tank edited on two phones keeps both
 *   versions until someone chooses (`resolveTank`); a tank deleted on one phone and edited on
 *   another keeps the edit (CouchDB's rule: a live revision wins over a deleted one), is noted
 *   so the app can say so, and its checks and fills are put back.
 */
import { docIdOf, parseDocId, SYNC_DOC_VERSION } from './record-schema.js';
import type { SyncDoc, SyncKind } from './record-schema.js';

export interface PouchRow {
  key: string;
  value?: { rev: string; deleted?: boolean };
  doc?: SyncDoc | null;
  error?: string;
}
export interface PouchChange {
  id: string;
  seq: number | string;
  deleted?: boolean;
  changes: { rev: string }[];
  doc?: SyncDoc;
}
export interface BulkResult {
  id?: string;
  ok?: boolean;
  error?: string | boolean;
  status?: number;
}
/** The part of a PouchDB database the bridge uses. */
export interface PouchLike {
  get(id: string, opts?: { rev?: string; conflicts?: boolean }): Promise<SyncDoc>;
  bulkDocs(docs: Partial<SyncDoc>[]): Promise<BulkResult[]>;
  allDocs(opts: { keys: string[]; include_docs: boolean }): Promise<{ rows: PouchRow[] }>;
  changes(opts: {
    since: number | string;
    include_docs: boolean;
    conflicts: boolean;
    style: 'all_docs';
    limit: number;
  }): Promise<{ results: PouchChange[]; last_seq: number | string }>;
}

/** The phone's store, as the bridge sees it (pwa/storage.ts implements it). */
export interface LocalSide {
  getShared(kind: SyncKind, key: string): Promise<unknown>;
  /** Several records of one kind in one read (undefined where absent). */
  getSharedMany(kind: SyncKind, keys: string[]): Promise<unknown[]>;
  listShared(kind: SyncKind): Promise<unknown[]>;
  applyShared(
    puts: { kind: SyncKind; record: unknown }[],
    dels: { kind: SyncKind; key: string }[],
  ): Promise<void>;
}

export interface OutboxEntry {
  id: string;
  seq: number;
}
/** The persisted bookkeeping (pwa/sync/state.ts keeps it in IndexedDB). */
export interface SyncBook {
  addOutbox(ids: string[]): Promise<void>;
  listOutbox(limit: number): Promise<OutboxEntry[]>;
  /** Removes the entries whose seq is unchanged (a newer note of the same id stays). */
  removeOutbox(entries: OutboxEntry[]): Promise<void>;
  hasOutbox(id: string): Promise<boolean>;
  /** Which of these ids have a note in the outbox (one read). */
  outboxHas(ids: string[]): Promise<Set<string>>;
  getPullSeq(): Promise<number | string>;
  setPullSeq(seq: number | string): Promise<void>;
  /** Checks and fills that arrived before their tank. */
  getWaiting(): Promise<string[]>;
  setWaiting(ids: string[]): Promise<void>;
  /** Tanks with a conflict to choose, and tanks kept although deleted elsewhere. */
  getMarks(): Promise<SyncMarks>;
  setMarks(marks: SyncMarks): Promise<void>;
}
export interface SyncMarks {
  conflicts: string[];
  keptAfterDelete: string[];
}

/** Records the team does not share: the invented demo site. */
export function isShared(record: unknown): boolean {
  return !(typeof record === 'object' && record !== null && (record as { demo?: unknown }).demo);
}

/** JSON equality that ignores the order of keys. */
export function sameJson(a: unknown, b: unknown): boolean {
  return stable(a) === stable(b);
}
function stable(x: unknown): string {
  if (Array.isArray(x)) return `[${x.map(stable).join(',')}]`;
  if (x && typeof x === 'object') {
    const o = x as Record<string, unknown>;
    const keys = Object.keys(o)
      .filter((k) => o[k] !== undefined)
      .sort();
    return `{${keys.map((k) => `${JSON.stringify(k)}:${stable(o[k])}`).join(',')}}`;
  }
  return JSON.stringify(x) ?? 'null';
}

const FLUSH_BATCH = 500;

/** Pushes the outbox into the replica until it is empty; returns how many documents changed. */
export async function flush(book: SyncBook, local: LocalSide, pouch: PouchLike): Promise<number> {
  let changed = 0;
  for (;;) {
    const entries = await book.listOutbox(FLUSH_BATCH);
    if (entries.length === 0) return changed;
    const { rows } = await pouch.allDocs({ keys: entries.map((e) => e.id), include_docs: true });
    const docs: Partial<SyncDoc>[] = [];
    const done: OutboxEntry[] = [];
    const pending = new Map<string, OutboxEntry>();
    const records = await readRecords(local, entries);
    for (const [i, entry] of entries.entries()) {
      const doc = wantedDoc(entry.id, rows[i], records.get(entry.id));
      if (doc) {
        docs.push(doc);
        pending.set(entry.id, entry);
      } else done.push(entry);
    }
    const results = docs.length ? await pouch.bulkDocs(docs) : [];
    results.forEach((r, i) => {
      const entry = pending.get(docs[i]!._id!);
      // A conflict means the replica changed under us (a pull): the next pass retries.
      if (entry && (r.ok || !r.error)) done.push(entry);
    });
    changed += results.filter((r) => r.ok || !r.error).length;
    await book.removeOutbox(done);
    if (done.length === 0) return changed;
  }
}

/** The stored records of the entries, by document id, read kind by kind. */
async function readRecords(
  local: LocalSide,
  entries: OutboxEntry[],
): Promise<Map<string, unknown>> {
  const out = new Map<string, unknown>();
  const byKind = new Map<SyncKind, string[]>();
  for (const e of entries) {
    const p = parseDocId(e.id);
    if (p) byKind.set(p.kind, [...(byKind.get(p.kind) ?? []), p.key]);
  }
  for (const [kind, keys] of byKind) {
    const recs = await local.getSharedMany(kind, keys);
    keys.forEach((k, i) => out.set(docIdOf(kind, k), recs[i]));
  }
  return out;
}

/** The document that makes the replica match the store for this id, or null if it already does. */
function wantedDoc(
  id: string,
  row: PouchRow | undefined,
  record: unknown,
): Partial<SyncDoc> | null {
  const parsed = parseDocId(id);
  if (!parsed) return null;
  const rev = row?.value?.rev;
  const alive = rev !== undefined && !row?.value?.deleted;
  if (record === undefined || !isShared(record)) {
    return alive ? { _id: id, _rev: rev, _deleted: true } : null;
  }
  if (alive && row?.doc && sameJson(row.doc.record, record)) return null;
  const doc: Partial<SyncDoc> = { _id: id, v: SYNC_DOC_VERSION, kind: parsed.kind, record };
  if (rev !== undefined) doc._rev = rev; // on a deleted revision too: the record comes back
  return doc;
}

/** Notes every shared record of the store for the first push (a phone joining a team). */
export async function noteAll(book: SyncBook, local: LocalSide): Promise<number> {
  const ids: string[] = [];
  for (const kind of ['tank', 'site', 'check', 'fill', 'walkdown'] as const) {
    for (const r of await local.listShared(kind)) {
      const key = kind === 'site' ? (r as { site: string }).site : (r as { id: string }).id;
      if (isShared(r)) ids.push(docIdOf(kind, key));
    }
  }
  await book.addOutbox(ids);
  return ids.length;
}
