/**
 * The invented records shared by the sync tests and scripts/sync-first-time.mjs
 * (scripts/sync/records.mjs) must stay records the app would store: the team server's check
 * (validateSyncDoc, the backup import's validators) accepts them, so a field renamed in the
 * stored format without them fails here rather than as a refused seeding in the timing script.
 */
import { describe, expect, it } from 'vitest';
import { validateSyncDoc } from '../../../pwa/sync/record-schema.js';
import { check, tank } from '../../../scripts/sync/records.mjs';

describe('invented sync records', () => {
  it('a tank and its check pass the server’s record check', () => {
    const t = tank('t1');
    expect(validateSyncDoc({ _id: 'tank:t1', v: 1, kind: 'tank', record: t })).toBeNull();
    const c = check('c1', 't1');
    expect(c.tankId).toBe('t1');
    expect(validateSyncDoc({ _id: 'check:c1', v: 1, kind: 'check', record: c })).toBeNull();
  });

  it('the fields given replace the invented ones, and each call builds a new record', () => {
    const t = tank('t2', { site: 'Invented site 3', name: 'Invented tank 2' });
    expect(t).toMatchObject({ id: 't2', site: 'Invented site 3', name: 'Invented tank 2' });
    expect(validateSyncDoc({ _id: 'tank:t2', v: 1, kind: 'tank', record: t })).toBeNull();
    expect(tank('t2')).not.toBe(tank('t2'));
    expect(check('c2', 't2', '2026-06-03T10:00:00.000Z').at).toBe('2026-06-03T10:00:00.000Z');
  });

  it('a record the import refuses is refused here too (the check is not vacuous)', () => {
    const bad = tank('t3', { nameplate: { waterCapacity: 1.9, designPressureGauge: 5 } });
    expect(validateSyncDoc({ _id: 'tank:t3', v: 1, kind: 'tank', record: bad })).toMatch(
      /designPressureGauge|pressure/i,
    );
  });
});
