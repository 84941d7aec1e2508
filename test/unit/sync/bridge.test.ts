/**
 * The team-sync bridge between a phone's store and its PouchDB replica, with real PouchDB
 * databases in memory as two phones' replicas and the team server. What is checked is the
 * design's promise (pwa/sync/bridge.ts), against CouchDB's documented replication rules
 * (CouchDB 3 docs, "Replication and conflict model": a conflict keeps every leaf revision and
 * picks a deterministic winner; a live leaf wins over a deleted one), not against the code's
 * own output: nothing lost, nothing duplicated, conflicts shown, delete-vs-edit keeps the edit.
 */
import { describe, expect, it } from 'vitest';
import { flush, noteAll } from '../../../pwa/sync/bridge.js';
import { pull, resolveTank, tankVersions } from '../../../pwa/sync/pull.js';
import { MapLocal, MemoryBook, memoryPouch, replicateBothWays } from './memory.js';
import { check, tank } from './records.js';

function phone() {
  const book = new MemoryBook();
  const local = new MapLocal(book);
  const pouch = memoryPouch();
  const sync = async () => {
    await flush(book, local, pouch);
    await pull(book, local, pouch);
  };
  return { book, local, pouch, sync };
}

/** Both phones push, the server passes everything along, both pull. */
async function roundTrip(
  server: ReturnType<typeof memoryPouch>,
  ...phones: ReturnType<typeof phone>[]
) {
  for (const p of phones) await p.sync();
  for (const p of phones) await replicateBothWays(p.pouch, server);
  for (const p of phones) await replicateBothWays(p.pouch, server);
  for (const p of phones) await p.sync();
}

describe('team sync bridge', () => {
  it('a tank and a check added on one phone appear once on the other', async () => {
    const server = memoryPouch();
    const a = phone();
    const b = phone();
    await a.local.userPut('tank', tank('t1'));
    await a.local.userPut('check', check('c1', 't1'));
    await roundTrip(server, a, b);
    await roundTrip(server, a, b); // again: nothing new, nothing doubled
    expect(await b.local.getShared('tank', 't1')).toEqual(tank('t1'));
    expect(await b.local.getShared('check', 'c1')).toEqual(check('c1', 't1'));
    const info = await server.info();
    expect(info.doc_count).toBe(2);
    expect(a.book.outbox.size).toBe(0);
  });

  it('a note whose write never happened (a crash) changes nothing and is cleared', async () => {
    const a = phone();
    await a.book.addOutbox(['tank:ghost']);
    expect(await flush(a.book, a.local, a.pouch)).toBe(0);
    expect(a.book.outbox.size).toBe(0);
    expect((await a.pouch.info()).doc_count).toBe(0);
  });

  it('a pull batch repeated after a crash before its sequence was saved writes the same', async () => {
    const server = memoryPouch();
    const a = phone();
    const b = phone();
    await a.local.userPut('tank', tank('t1'));
    await roundTrip(server, a, b);
    b.book.seq = 0; // the saved sequence was lost: the whole feed is read again
    await pull(b.book, b.local, b.pouch);
    expect([...(b.local.stores.get('tank')?.keys() ?? [])]).toEqual(['t1']);
  });

  it('checks saved offline on one phone reach the other after it reconnects', async () => {
    const server = memoryPouch();
    const a = phone();
    const b = phone();
    await a.local.userPut('tank', tank('t1'));
    await roundTrip(server, a, b);
    // a is offline: its replica takes the checks, the server does not.
    for (let i = 0; i < 5; i++) await a.local.userPut('check', check(`c${i}`, 't1'));
    await a.sync();
    expect((await server.info()).doc_count).toBe(1);
    await roundTrip(server, a, b);
    expect(b.local.stores.get('check')?.size).toBe(5);
  });

  it('demo records stay on the phone', async () => {
    const a = phone();
    await a.local.userPut('tank', tank('d1', { demo: true }));
    await a.sync();
    expect((await a.pouch.info()).doc_count).toBe(0);
  });

  it('a tank edited on two phones keeps both versions until one is chosen', async () => {
    const server = memoryPouch();
    const a = phone();
    const b = phone();
    await a.local.userPut('tank', tank('t1'));
    await roundTrip(server, a, b);
    await a.local.userPut('tank', tank('t1', { name: 'Edited on A' }));
    await b.local.userPut('tank', tank('t1', { name: 'Edited on B' }));
    await roundTrip(server, a, b);
    expect(a.book.marks.conflicts).toEqual(['t1']);
    expect(b.book.marks.conflicts).toEqual(['t1']);
    const versions = await tankVersions(a.pouch, 't1');
    const names = versions.map((v) => (v.record as { name: string }).name).sort();
    expect(names).toEqual(['Edited on A', 'Edited on B']);
    // Both phones show the same current version (CouchDB's winner is deterministic).
    expect(await a.local.getShared('tank', 't1')).toEqual(await b.local.getShared('tank', 't1'));
    const keepB = versions.find((v) => (v.record as { name: string }).name === 'Edited on B')!;
    await resolveTank(a.pouch, 't1', keepB._rev!);
    await roundTrip(server, a, b);
    for (const p of [a, b]) {
      expect(p.book.marks.conflicts).toEqual([]);
      expect(((await p.local.getShared('tank', 't1')) as { name: string }).name).toBe(
        'Edited on B',
      );
    }
  });

  it('a deletion on one phone and an edit on the other keep the edit and its checks, and say so', async () => {
    const server = memoryPouch();
    const a = phone();
    const b = phone();
    await a.local.userPut('tank', tank('t1'));
    await a.local.userPut('check', check('c1', 't1'));
    await roundTrip(server, a, b);
    await a.local.userDelete('tank', 't1');
    await a.local.userDelete('check', 'c1');
    await b.local.userPut('tank', tank('t1', { name: 'Still here' }));
    await roundTrip(server, a, b);
    await roundTrip(server, a, b);
    for (const p of [a, b]) {
      expect(((await p.local.getShared('tank', 't1')) as { name: string }).name).toBe('Still here');
      expect(await p.local.getShared('check', 'c1')).toEqual(check('c1', 't1'));
    }
    expect(b.book.marks.keptAfterDelete).toEqual(['t1']);
    expect(a.book.marks.keptAfterDelete).toEqual(['t1']);
  });

  it('a check that arrives before its tank waits for it', async () => {
    const a = phone();
    // The replica holds the check first (as a changes feed can order them after an edit).
    await a.pouch.put({ _id: 'check:c1', v: 1, kind: 'check', record: check('c1', 't1') });
    await pull(a.book, a.local, a.pouch);
    expect(await a.local.getShared('check', 'c1')).toBeUndefined();
    expect(a.book.waiting).toEqual(['check:c1']);
    await a.pouch.put({ _id: 'tank:t1', v: 1, kind: 'tank', record: tank('t1') });
    await pull(a.book, a.local, a.pouch);
    expect(await a.local.getShared('check', 'c1')).toEqual(check('c1', 't1'));
    expect(a.book.waiting).toEqual([]);
  });

  it('a phone joining a team pushes its register once, and again changes nothing', async () => {
    const a = phone();
    await a.local.applyShared(
      [
        { kind: 'tank', record: tank('t1') },
        { kind: 'tank', record: tank('t2') },
      ],
      [],
    );
    expect(await noteAll(a.book, a.local)).toBe(2);
    expect(await flush(a.book, a.local, a.pouch)).toBe(2);
    await noteAll(a.book, a.local);
    expect(await flush(a.book, a.local, a.pouch)).toBe(0);
  });
});
