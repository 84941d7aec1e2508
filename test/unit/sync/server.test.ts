/**
 * The embedded team server with a team set up by scripts/sync/team-setup.mjs: members may
 * write, others may not, and a record is refused exactly when the backup import refuses it
 * (the validate_doc_update is built from the import's validators, pwa/backup.ts).
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
// @ts-expect-error -- plain ES module script without types
import { startSyncServer } from '../../../scripts/sync/server.mjs';
// @ts-expect-error -- plain ES module script without types
import { setupTeam } from '../../../scripts/sync/team-setup.mjs';
import { parseBackup } from '../../../pwa/backup.js';
import { tank } from './records.js';
import { oldTank } from '../../pwa/fixtures/old-names.js';
import { NAMED_TANK } from '../../pwa/fixtures/named-records.js';
import { PouchDB, memoryPouch } from './memory.js';

let server: { url: string; close: () => Promise<void> };
let dbUrl = '';

async function login(name: string, password: string): Promise<string> {
  const res = await fetch(`${server.url}/_session`, {
    method: 'POST',
    headers: { 'content-type': 'application/json' },
    body: JSON.stringify({ name, password }),
  });
  expect(res.status).toBe(200);
  return (res.headers.get('set-cookie') ?? '').split(';')[0]!;
}

async function put(cookie: string, doc: { _id: string }) {
  const res = await fetch(`${dbUrl}/${encodeURIComponent(doc._id)}`, {
    method: 'PUT',
    headers: { 'content-type': 'application/json', cookie },
    body: JSON.stringify(doc),
  });
  return { status: res.status, body: (await res.json()) as { reason?: string } };
}

const importRefusal = (t: unknown) =>
  parseBackup(
    JSON.stringify({
      format: 'tankside-backup',
      version: 3,
      exportedAt: '2026-06-01T00:00:00Z',
      tanks: [t],
      checks: [],
      settings: null,
    }),
  );

beforeAll(async () => {
  server = await startSyncServer({ port: 0, admin: 'boss:boss-pass' });
  dbUrl = await setupTeam({
    url: server.url,
    admin: 'boss:boss-pass',
    team: 'invented-co',
    users: ['ann:ann-pass', 'bob:bob-pass'],
  });
  // A user of the server who is not a member of this team.
  await setupTeam({
    url: server.url,
    admin: 'boss:boss-pass',
    team: 'other-co',
    users: ['eve:eve-pass'],
  });
}, 120_000);
afterAll(() => server?.close());

describe('team server', () => {
  it('takes a valid record from a member', async () => {
    const r = await put(await login('ann', 'ann-pass'), {
      _id: 'tank:t1',
      v: 1,
      kind: 'tank',
      record: tank('t1'),
    } as never);
    expect(r.status).toBe(201);
  });

  it('refuses a malformed record with the reason the backup import gives', async () => {
    const bad = tank('t2', { nameplate: { waterCapacity: 1.9, designPressureGauge: 5 } });
    const verdict = importRefusal(bad);
    expect(verdict.ok).toBe(false);
    const r = await put(await login('ann', 'ann-pass'), {
      _id: 'tank:t2',
      v: 1,
      kind: 'tank',
      record: bad,
    } as never);
    expect(r.status).toBe(403);
    expect(r.body.reason).toContain(
      '“designPressureGauge” must be a number from 10000 to 100000000',
    );
    expect(verdict.ok ? '' : verdict.reason).toContain(
      '“designPressureGauge” must be a number from 10000 to 100000000',
    );
  });

  it('takes a record under the old pressure names from a teammate whose app is older', async () => {
    const r = await put(await login('bob', 'bob-pass'), {
      _id: `tank:${NAMED_TANK.id}`,
      v: 1,
      kind: 'tank',
      record: oldTank(NAMED_TANK),
    } as never);
    expect(r.status).toBe(201);
  });

  it('refuses a document whose id does not match its record', async () => {
    const r = await put(await login('bob', 'bob-pass'), {
      _id: 'tank:other',
      v: 1,
      kind: 'tank',
      record: tank('t3'),
    } as never);
    expect(r.status).toBe(403);
  });

  it('refuses a user who is not a member, and anyone not signed in', async () => {
    const eve = await put(await login('eve', 'eve-pass'), {
      _id: 'tank:t4',
      v: 1,
      kind: 'tank',
      record: tank('t4'),
    } as never);
    expect([401, 403]).toContain(eve.status);
    const anon = await put('', { _id: 'tank:t5', v: 1, kind: 'tank', record: tank('t5') } as never);
    expect([401, 403]).toContain(anon.status);
    // Replication writes through _bulk_docs: refused for a non-member too.
    const bulk = await fetch(`${dbUrl}/_bulk_docs`, {
      method: 'POST',
      headers: { 'content-type': 'application/json', cookie: await login('eve', 'eve-pass') },
      body: JSON.stringify({ docs: [{ _id: 'tank:t6', v: 1, kind: 'tank', record: tank('t6') }] }),
    });
    const written = bulk.status < 300 ? ((await bulk.json()) as { ok?: boolean }[]) : [];
    expect(written.filter((r) => r.ok)).toEqual([]);
    const res = await fetch(`${dbUrl}/_all_docs`);
    expect([401, 403]).toContain(res.status);
  });

  it('takes an edit replicated from a phone, with its revision history', async () => {
    const replica = memoryPouch();
    const remote = new PouchDB(dbUrl, {
      auth: { username: 'ann', password: 'ann-pass' },
      skip_setup: true,
    });
    const first = await replica.put({ _id: 'tank:t7', v: 1, kind: 'tank', record: tank('t7') });
    await replica.replicate.to(remote);
    await replica.put({
      _id: 'tank:t7',
      _rev: first.rev,
      v: 1,
      kind: 'tank',
      record: tank('t7', { name: 'Edited' }),
    });
    await replica.replicate.to(remote);
    const onServer = (await (
      await fetch(`${dbUrl}/tank%3At7`, { headers: { cookie: await login('ann', 'ann-pass') } })
    ).json()) as { _rev: string; record: { name: string } };
    expect(onServer._rev.startsWith('2-')).toBe(true);
    expect(onServer.record.name).toBe('Edited');
  });
});
