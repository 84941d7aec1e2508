/**
 * Sets up a team on a CouchDB 3 server (or the embedded one): the team database, its members
 * as CouchDB users, the database's `_security` (members only) and the validating design
 * document. Safe to run again: existing users get the new password, the design document and
 * `_security` are replaced, nothing is deleted.
 */
import { designDoc, DESIGN_ID } from './design-doc.mjs';

/** A team's database name: lower case letters, digits and _$()+-/ starting with a letter. */
export function teamDbName(team) {
  const name = `tankside-${String(team).trim().toLowerCase()}`;
  if (!/^[a-z][a-z0-9_$()+/-]*$/.test(name) || name.length > 238)
    throw new Error(
      `--team must be letters, digits, - or _ (got “${team}”): it becomes the database “${name}”`,
    );
  return name;
}

function splitPair(pair, flag) {
  const i = String(pair ?? '').indexOf(':');
  if (i < 1 || i === pair.length - 1) throw new Error(`${flag} must be USER:PASS (both non-empty)`);
  return [pair.slice(0, i), pair.slice(i + 1)];
}

async function call(base, adminAuth, method, path, body) {
  const res = await fetch(new URL(path, base), {
    method,
    headers: {
      authorization: adminAuth,
      'content-type': 'application/json',
      accept: 'application/json',
    },
    body: body === undefined ? undefined : JSON.stringify(body),
  });
  const text = await res.text();
  let json = null;
  try {
    json = JSON.parse(text);
  } catch {
    json = { reason: text };
  }
  return { status: res.status, json };
}

function must(r, what) {
  if (r.status >= 400)
    throw new Error(
      `${what} failed: ${r.status} ${r.json?.error ?? ''} ${r.json?.reason ?? ''}`.trim(),
    );
  return r.json;
}

async function putUser(base, auth, name, password) {
  const path = `/_users/${encodeURIComponent(`org.couchdb.user:${name}`)}`;
  const old = await call(base, auth, 'GET', path);
  const doc = {
    ...(old.status === 200 ? old.json : {}),
    _id: `org.couchdb.user:${name}`,
    name,
    password,
    type: 'user',
  };
  doc.roles = Array.isArray(doc.roles) ? doc.roles : [];
  must(await call(base, auth, 'PUT', path, doc), `Creating user “${name}”`);
}

/** Runs the setup; returns the database URL the phones connect to. */
export async function setupTeam({ url, admin, team, users }) {
  const base = new URL(url.endsWith('/') ? url : `${url}/`);
  const [an, ap] = splitPair(admin, '--admin');
  const auth = `Basic ${Buffer.from(`${an}:${ap}`).toString('base64')}`;
  const db = teamDbName(team);
  const members = users.map((u) => splitPair(u, '--user'));
  if (members.length === 0) throw new Error('Give at least one --user USER:PASS');
  const root = must(await call(base, auth, 'GET', '/'), `Reaching ${base.href}`);
  void root;
  // CouchDB 3 has no _users database until it is set up; create it when absent.
  const users0 = await call(base, auth, 'PUT', '/_users');
  if (users0.status >= 400 && users0.status !== 412) must(users0, 'Creating _users');
  const made = await call(base, auth, 'PUT', `/${encodeURIComponent(db)}`);
  if (made.status >= 400 && made.status !== 412) must(made, `Creating the database ${db}`);
  for (const [name, pass] of members) await putUser(base, auth, name, pass);
  const security = {
    admins: { names: [], roles: [] },
    members: { names: members.map(([n]) => n), roles: [`${db}-member`] },
  };
  must(
    await call(base, auth, 'PUT', `/${encodeURIComponent(db)}/_security`, security),
    'Setting _security',
  );
  const ddoc = await designDoc();
  const old = await call(base, auth, 'GET', `/${encodeURIComponent(db)}/${DESIGN_ID}`);
  if (old.status === 200) ddoc._rev = old.json._rev;
  must(
    await call(base, auth, 'PUT', `/${encodeURIComponent(db)}/${DESIGN_ID}`, ddoc),
    'Writing the design document',
  );
  return new URL(`${encodeURIComponent(db)}`, base).href;
}
