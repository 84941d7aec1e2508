/**
 * The embedded team server for trying the team sync and for the tests: a CouchDB-compatible
 * HTTP server built on PouchDB's own server packages (express-pouchdb over pouchdb-core), on
 * 127.0.0.1 only. For development and tests — a real team runs Apache CouchDB 3 (README).
 *
 * `startSyncServer({ port, admin, dir })` returns `{ url, close }`; `port` 0 takes a free port.
 * `dir` keeps the databases in that folder (LevelDB); without it everything is in memory.
 */
import { createServer } from 'node:http';
import { mkdirSync } from 'node:fs';
import { join } from 'node:path';
import express from 'express';
import expressPouchDB from 'express-pouchdb';
import PouchDB from 'pouchdb-core';
import adapterHttp from 'pouchdb-adapter-http';
import adapterMemory from 'pouchdb-adapter-memory';
import adapterLevel from 'pouchdb-adapter-leveldb';
import mapreduce from 'pouchdb-mapreduce';
import replication from 'pouchdb-replication';

PouchDB.plugin(adapterHttp).plugin(adapterMemory).plugin(adapterLevel);
PouchDB.plugin(mapreduce).plugin(replication);

/** Browsers on the loopback may call it with cookies (the app is served from another port). */
function loopbackCors(req, res, next) {
  const origin = req.headers.origin;
  if (typeof origin === 'string' && /^https?:\/\/(127\.0\.0\.1|localhost)(:\d+)?$/.test(origin)) {
    res.setHeader('Access-Control-Allow-Origin', origin);
    res.setHeader('Access-Control-Allow-Credentials', 'true');
    res.setHeader('Vary', 'Origin');
    res.setHeader('Access-Control-Expose-Headers', 'Content-Type, ETag, Server, Cache-Control');
    if (req.method === 'OPTIONS') {
      res.setHeader('Access-Control-Allow-Methods', 'GET, PUT, POST, HEAD, DELETE, OPTIONS');
      res.setHeader(
        'Access-Control-Allow-Headers',
        'Accept, Authorization, Content-Type, Origin, Referer, X-Requested-With',
      );
      res.setHeader('Access-Control-Max-Age', '600');
      res.statusCode = 204;
      res.end();
      return;
    }
  }
  next();
}

/**
 * Creating or deleting a database takes the admin's basic auth (team:setup sends it). The
 * server packages answer anyone else with a crash instead of CouchDB's 401, so this says no
 * first.
 */
function adminOnlyDatabases(adminBasic) {
  return (req, res, next) => {
    const dbLevel = /^\/[^/_][^/]*\/?$/.test(req.path);
    if (dbLevel && (req.method === 'PUT' || req.method === 'DELETE')) {
      if (req.headers.authorization !== adminBasic) {
        res.status(401).json({
          error: 'unauthorized',
          reason: 'Only the server admin may create or delete a database.',
        });
        return;
      }
    }
    next();
  };
}

/**
 * Replication writes with `_bulk_docs` and `new_edits: false`, each document carrying its
 * revision history in `_revisions`. The validation package of the server packages overwrites
 * `_revisions` with the stored document's before the write, so an update from a replica would
 * be dropped without a word. Parsing the body here first and making `_revisions` ignore that
 * assignment keeps the replicated history intact (validation itself is unchanged).
 */
const keepRevisionHistory = [
  express.json({ limit: '64mb' }),
  (req, res, next) => {
    const docs = Array.isArray(req.body?.docs) ? req.body.docs : [];
    for (const doc of docs) {
      if (!doc || typeof doc !== 'object' || !doc._revisions) continue;
      const history = doc._revisions;
      Object.defineProperty(doc, '_revisions', {
        enumerable: true,
        configurable: true,
        get: () => history,
        set: () => {
          // the validation package's overwrite is ignored
        },
      });
    }
    next();
  },
];

/** Starts the server; resolves when it listens. */
export async function startSyncServer({ port = 5984, admin = 'admin:admin', dir = null } = {}) {
  const colon = admin.indexOf(':');
  if (colon < 1 || colon === admin.length - 1)
    throw new Error('SYNC_ADMIN must be user:pass (both non-empty)');
  const [adminName, adminPass] = [admin.slice(0, colon), admin.slice(colon + 1)];
  let Base;
  if (dir) {
    mkdirSync(dir, { recursive: true });
    Base = PouchDB.defaults({ prefix: join(dir, '/'), adapter: 'leveldb' });
  } else {
    Base = PouchDB.defaults({ adapter: 'memory' });
  }
  const pouchApp = expressPouchDB(Base, {
    inMemoryConfig: true,
    logPath: dir
      ? join(dir, 'log.txt')
      : join(process.env.TMPDIR ?? '/tmp', 'tankside-sync-log.txt'),
    overrideMode: { exclude: ['routes/fauxton', 'routes/http-log'] },
  });
  await new Promise((resolve) => {
    pouchApp.couchConfig.set('admins', adminName, adminPass, resolve);
  });
  // No anonymous server admin ("admin party"): every request needs a session or basic auth.
  await new Promise((resolve) =>
    pouchApp.couchConfig.set('couch_httpd_auth', 'timeout', '2592000', resolve),
  );
  const app = express();
  app.disable('x-powered-by');
  app.use(loopbackCors);
  app.post('/:db/_bulk_docs', ...keepRevisionHistory);
  app.use(adminOnlyDatabases(`Basic ${Buffer.from(admin).toString('base64')}`));
  app.use(pouchApp);
  const server = createServer(app);
  await new Promise((resolve, reject) => {
    server.once('error', reject);
    server.listen(port, '127.0.0.1', resolve);
  });
  const actual = server.address().port;
  return {
    url: `http://127.0.0.1:${actual}`,
    port: actual,
    close: () =>
      new Promise((resolve) => {
        server.closeAllConnections?.();
        server.close(() => resolve());
      }),
  };
}
