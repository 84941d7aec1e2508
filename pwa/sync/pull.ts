/**
 * Pull: the replica's changes into the phone's store (see pwa/sync/bridge.ts for the whole
 * design), and the choices a person makes on a conflicting tank.
 */
import { docIdOf, parseDocId, upgradeSyncRecord, validateSyncDoc } from './record-schema.js';
import type { SyncDoc, SyncKind } from './record-schema.js';
import type { LocalSide, PouchChange, PouchLike, SyncBook, SyncMarks } from './bridge.js';

const PULL_BATCH = 500;

interface Batch {
  puts: { kind: SyncKind; record: unknown }[];
  dels: { kind: SyncKind; key: string }[];
  /** Tank ids present after this batch (those put by it). */
  tanks: Set<string>;
  /** Tanks found kept after a deletion elsewhere, in this batch. */
  kept: Set<string>;
  waiting: Set<string>;
  repush: string[];
  resolutions: Partial<SyncDoc>[];
  marks: SyncMarks & { seenDeletes?: string[] };
  /** Ids of the batch with a local change not flushed yet. */
  pending: Set<string>;
  /** Tanks present in the store before the batch, among those the batch's records name. */
  stored: Set<string>;
  /** The store's own copy of the batch's deleted checks and fills (for their tank). */
  mine: Map<string, { tankId?: string }>;
}

/** Applies the replica's changes since the saved sequence; returns how many were read. */
export async function pull(book: SyncBook, local: LocalSide, pouch: PouchLike): Promise<number> {
  let total = 0;
  for (;;) {
    const since = await book.getPullSeq();
    const res = await pouch.changes({
      since,
      include_docs: true,
      conflicts: true,
      style: 'all_docs',
      limit: PULL_BATCH,
    });
    if (res.results.length === 0) {
      await retryWaiting(book, local, pouch);
      return total;
    }
    await applyBatch(book, local, pouch, res.results);
    await book.setPullSeq(res.last_seq);
    total += res.results.length;
  }
}

async function applyBatch(
  book: SyncBook,
  local: LocalSide,
  pouch: PouchLike,
  changes: PouchChange[],
): Promise<void> {
  const b: Batch = {
    puts: [],
    dels: [],
    tanks: new Set(),
    kept: new Set(),
    waiting: new Set(await book.getWaiting()),
    repush: [],
    resolutions: [],
    marks: await book.getMarks(),
    pending: await book.outboxHas(changes.map((c) => c.id)),
    stored: new Set(),
    mine: new Map(),
  };
  const parsed = changes
    .map((c) => ({ c, p: parseDocId(c.id) }))
    .filter((x): x is { c: PouchChange; p: { kind: SyncKind; key: string } } => x.p !== null);
  await lookUp(b, local, parsed);
  // Tanks first, so a check in the same batch finds its tank.
  for (const { c, p } of parsed) if (p.kind === 'tank') onTank(b, c, p.key);
  for (const { c, p } of parsed) if (p.kind !== 'tank') await onOther(b, pouch, c, p);
  for (const tankId of b.kept) b.repush.push(...(await childrenOf(local, tankId)));
  await local.applyShared(b.puts, b.dels);
  if (b.repush.length) await book.addOutbox(b.repush);
  if (b.resolutions.length) await pouch.bulkDocs(b.resolutions);
  await book.setWaiting([...b.waiting]);
  await book.setMarks(b.marks);
}

function setMark(list: string[], id: string, on: boolean): string[] {
  const has = list.includes(id);
  if (on && !has) return [...list, id];
  if (!on && has) return list.filter((x) => x !== id);
  return list;
}

/** Reads, in a few requests, what the batch needs from the store. */
async function lookUp(
  b: Batch,
  local: LocalSide,
  parsed: { c: PouchChange; p: { kind: SyncKind; key: string } }[],
): Promise<void> {
  const tankIds = new Set<string>();
  for (const { c, p } of parsed) {
    const tankId = (c.doc?.record as { tankId?: unknown } | undefined)?.tankId;
    if ((p.kind === 'check' || p.kind === 'fill') && typeof tankId === 'string')
      tankIds.add(tankId);
  }
  const ids = [...tankIds];
  const tanks = await local.getSharedMany('tank', ids);
  ids.forEach((id, i) => tanks[i] !== undefined && b.stored.add(id));
  for (const kind of ['check', 'fill'] as const) {
    const gone = parsed.filter(({ c, p }) => p.kind === kind && (c.deleted || !c.doc));
    const recs = await local.getSharedMany(
      kind,
      gone.map(({ p }) => p.key),
    );
    gone.forEach(
      ({ c }, i) => recs[i] !== undefined && b.mine.set(c.id, recs[i] as { tankId?: string }),
    );
  }
}

function onTank(b: Batch, c: PouchChange, key: string): void {
  const m = b.marks;
  if (c.deleted || !c.doc) {
    m.conflicts = setMark(m.conflicts, key, false);
    m.keptAfterDelete = setMark(m.keptAfterDelete, key, false);
    if (!b.pending.has(c.id)) b.dels.push({ kind: 'tank', key });
    return;
  }
  if (validateSyncDoc(c.doc) !== null) return;
  const losers = c.doc._conflicts ?? [];
  m.conflicts = setMark(m.conflicts, key, losers.length > 0);
  const deletedLeaves = c.changes.length - 1 - losers.length;
  if (deletedLeaves > 0) {
    const seen = `${key}:${deletedLeaves}`;
    const seenDeletes = m.seenDeletes ?? [];
    if (!seenDeletes.includes(seen)) {
      m.seenDeletes = [...seenDeletes, seen];
      m.keptAfterDelete = setMark(m.keptAfterDelete, key, true);
      b.kept.add(key);
    }
  }
  b.tanks.add(key);
  // A local edit not pushed yet is newer: the flush writes it over this revision.
  if (!b.pending.has(c.id))
    b.puts.push({ kind: 'tank', record: upgradeSyncRecord('tank', c.doc.record) });
}

async function onOther(
  b: Batch,
  pouch: PouchLike,
  c: PouchChange,
  p: { kind: SyncKind; key: string },
): Promise<void> {
  if (b.pending.has(c.id)) return;
  if (c.deleted || !c.doc) {
    b.waiting.delete(c.id);
    const mine = b.mine.get(c.id);
    // The tank was kept (edited elsewhere while deleted here): its history comes back with it.
    if (mine?.tankId && (b.kept.has(mine.tankId) || b.marks.keptAfterDelete.includes(mine.tankId)))
      b.repush.push(c.id);
    else b.dels.push(p);
    return;
  }
  let doc = c.doc;
  if (doc._conflicts?.length) doc = await settle(b, pouch, doc);
  if (validateSyncDoc(doc) !== null) return;
  const tankId = (doc.record as { tankId?: unknown }).tankId;
  if ((p.kind === 'check' || p.kind === 'fill') && typeof tankId === 'string') {
    const present = b.tanks.has(tankId) || b.stored.has(tankId);
    if (!present) {
      b.waiting.add(c.id);
      return;
    }
  }
  b.waiting.delete(c.id);
  b.puts.push({ kind: p.kind, record: upgradeSyncRecord(p.kind, doc.record) });
}

/**
 * Settles a conflict of a record that is not a tank: a site forecast keeps the latest entered,
 * a walkdown the finished one (else the one further along), anything else the winner. The
 * losing revisions are deleted in the replica.
 */
async function settle(b: Batch, pouch: PouchLike, winner: SyncDoc): Promise<SyncDoc> {
  const all = [winner];
  for (const rev of winner._conflicts ?? []) all.push(await pouch.get(winner._id, { rev }));
  const score = (d: SyncDoc): string => {
    const r = d.record as Record<string, unknown>;
    if (d.kind === 'site') return String(r.enteredAt ?? '');
    if (d.kind === 'walkdown')
      return `${r.status === 'finished' ? 1 : 0}${String(r.current ?? 0).padStart(6, '0')}`;
    return '';
  };
  let best = winner;
  for (const d of all) if (score(d) > score(best)) best = d;
  const keep: Partial<SyncDoc> = { ...winner, record: best.record };
  delete keep._conflicts;
  if (best !== winner) b.resolutions.push(keep);
  for (const d of all)
    if (d !== winner) b.resolutions.push({ _id: d._id, _rev: d._rev, _deleted: true });
  return { ...winner, record: best.record };
}

async function childrenOf(local: LocalSide, tankId: string): Promise<string[]> {
  const ids: string[] = [];
  for (const kind of ['check', 'fill'] as const)
    for (const r of (await local.listShared(kind)) as { id: string; tankId: string }[])
      if (r.tankId === tankId) ids.push(docIdOf(kind, r.id));
  return ids;
}

/** Puts checks and fills whose tank has arrived since. */
async function retryWaiting(book: SyncBook, local: LocalSide, pouch: PouchLike): Promise<void> {
  const waiting = await book.getWaiting();
  if (waiting.length === 0) return;
  const { rows } = await pouch.allDocs({ keys: waiting, include_docs: true });
  const puts: { kind: SyncKind; record: unknown }[] = [];
  const still: string[] = [];
  for (const row of rows) {
    const doc = row.doc;
    if (!doc || row.value?.deleted) continue;
    const tankId = (doc.record as { tankId?: string }).tankId ?? '';
    if ((await local.getShared('tank', tankId)) !== undefined)
      puts.push({ kind: doc.kind, record: upgradeSyncRecord(doc.kind, doc.record) });
    else still.push(row.key);
  }
  if (puts.length) await local.applyShared(puts, []);
  await book.setWaiting(still);
}

/** The versions of a conflicting tank: the current one first, then the others. */
export async function tankVersions(pouch: PouchLike, tankId: string): Promise<SyncDoc[]> {
  const id = docIdOf('tank', tankId);
  const winner = await pouch.get(id, { conflicts: true });
  const out = [winner];
  for (const rev of winner._conflicts ?? []) out.push(await pouch.get(id, { rev }));
  return out.map((d) => ({ ...d, record: upgradeSyncRecord('tank', d.record) }));
}

/** Keeps the version `keepRev` of a conflicting tank and deletes the others. */
export async function resolveTank(
  pouch: PouchLike,
  tankId: string,
  keepRev: string,
): Promise<void> {
  const [winner, ...others] = await tankVersions(pouch, tankId);
  const chosen = [winner!, ...others].find((d) => d._rev === keepRev);
  if (!chosen) throw new Error('That version is no longer there: the tank changed meanwhile.');
  const docs: Partial<SyncDoc>[] = [];
  if (chosen !== winner) {
    const w: Partial<SyncDoc> = { ...winner!, record: chosen.record };
    delete w._conflicts;
    docs.push(w);
  }
  for (const d of others) docs.push({ _id: d._id, _rev: d._rev, _deleted: true });
  const results = await pouch.bulkDocs(docs);
  if (results.some((r) => r.error)) throw new Error('The choice was not saved: try again.');
}
