// `npm run sync-server`: the embedded team server, for trying team sync and for tests only —
// a real team runs Apache CouchDB 3 (README, "Team sync"). Listens on 127.0.0.1 only.
//   SYNC_PORT   port (default 5984)
//   SYNC_ADMIN  the server admin as user:pass (default admin:<random>, printed)
//   SYNC_DIR    keep the databases in this folder (default: in memory, gone when it stops)
import { randomBytes } from 'node:crypto';
import { startSyncServer } from './sync/server.mjs';

const port = Number(process.env.SYNC_PORT ?? 5984);
if (!Number.isInteger(port) || port < 0 || port > 65535) {
  console.error(
    `SYNC_PORT must be a port number from 0 to 65535 (got “${process.env.SYNC_PORT}”).`,
  );
  process.exit(2);
}
const admin = process.env.SYNC_ADMIN ?? `admin:${randomBytes(9).toString('base64url')}`;
const dir = process.env.SYNC_DIR || null;
try {
  const server = await startSyncServer({ port, admin, dir });
  console.log(`Team sync server (embedded, for development and tests) at ${server.url}`);
  console.log(`  admin: ${process.env.SYNC_ADMIN ? admin.split(':')[0] + ':…' : admin}`);
  console.log(`  data: ${dir ? `folder ${dir}` : 'in memory (lost when it stops)'}`);
  console.log(
    `  next: npm run team:setup -- --url ${server.url} --admin USER:PASS --team NAME --user USER:PASS`,
  );
  const stop = () => server.close().then(() => process.exit(0));
  process.on('SIGINT', stop);
  process.on('SIGTERM', stop);
} catch (e) {
  console.error(`The sync server did not start: ${e instanceof Error ? e.message : String(e)}`);
  process.exit(1);
}
