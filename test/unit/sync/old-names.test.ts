/**
 * A teammate whose app is older than the pressure names that say gauge or absolute writes its
 * records under the old names (`designPressure`, `gaugePressure`, `pressure`, …). Such a record
 * must reach this phone's store under today's names with the same figures, never be dropped.
 * The old records are written out by hand (test/pwa/fixtures/old-names.ts), independently of
 * pwa/legacy-names.ts; the expected records are the fixtures in today's names.
 */
import { describe, expect, it } from 'vitest';
import { pull, tankVersions } from '../../../pwa/sync/pull.js';
import { validateSyncDoc, type SyncKind } from '../../../pwa/sync/record-schema.js';
import { MapLocal, MemoryBook, memoryPouch } from './memory.js';
import { oldCheck, oldFill, oldTank, oldWalkdown } from '../../pwa/fixtures/old-names.js';
import {
  NAMED_CHECK,
  NAMED_FILL,
  NAMED_TANK,
  NAMED_TANK_NO_RELIEF,
  NAMED_WALKDOWN,
} from '../../pwa/fixtures/named-records.js';

const doc = (kind: SyncKind, key: string, record: unknown) => ({
  _id: `${kind}:${key}`,
  v: 1,
  kind,
  record,
});

describe('team records under the old pressure names', () => {
  it('are accepted by the record check (the server’s validate_doc_update) as they are', () => {
    expect(validateSyncDoc(doc('tank', NAMED_TANK.id, oldTank(NAMED_TANK)))).toBe(null);
    expect(validateSyncDoc(doc('check', NAMED_CHECK.id, oldCheck(NAMED_CHECK)))).toBe(null);
    expect(validateSyncDoc(doc('fill', NAMED_FILL.id, oldFill(NAMED_FILL)))).toBe(null);
    expect(validateSyncDoc(doc('walkdown', NAMED_WALKDOWN.id, oldWalkdown(NAMED_WALKDOWN)))).toBe(
      null,
    );
  });

  it('an old-named figure out of range is refused, naming the field as it is now called', () => {
    const bad = oldTank({
      ...NAMED_TANK,
      nameplate: { waterCapacity: 1, designPressureGauge: 5 },
    });
    expect(validateSyncDoc(doc('tank', NAMED_TANK.id, bad))).toContain(
      '“designPressureGauge” must be a number from 10000 to 100000000',
    );
  });

  it('reach the phone’s store under today’s names with the same figures', async () => {
    const book = new MemoryBook();
    const local = new MapLocal(book);
    const replica = memoryPouch();
    await replica.bulkDocs([
      doc('tank', NAMED_TANK.id, oldTank(NAMED_TANK)),
      doc('tank', NAMED_TANK_NO_RELIEF.id, oldTank(NAMED_TANK_NO_RELIEF)),
      doc('check', NAMED_CHECK.id, oldCheck(NAMED_CHECK)),
      doc('fill', NAMED_FILL.id, oldFill(NAMED_FILL)),
      doc('walkdown', NAMED_WALKDOWN.id, oldWalkdown(NAMED_WALKDOWN)),
    ]);
    await pull(book, local, replica);
    expect(await local.getShared('tank', NAMED_TANK.id)).toEqual(NAMED_TANK);
    expect(await local.getShared('tank', NAMED_TANK_NO_RELIEF.id)).toEqual(NAMED_TANK_NO_RELIEF);
    expect(await local.getShared('check', NAMED_CHECK.id)).toEqual(NAMED_CHECK);
    expect(await local.getShared('fill', NAMED_FILL.id)).toEqual(NAMED_FILL);
    expect(await local.getShared('walkdown', NAMED_WALKDOWN.id)).toEqual(NAMED_WALKDOWN);
    // The two versions of a tank in conflict are shown under today's names too.
    const versions = await tankVersions(replica, NAMED_TANK.id);
    expect(versions.map((v) => v.record)).toEqual([NAMED_TANK]);
  });
});
