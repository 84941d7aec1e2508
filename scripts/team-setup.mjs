// `npm run team:setup -- --url URL --admin USER:PASS --team NAME --user USER:PASS [--user …]`
// Creates (or updates) a team on a CouchDB 3 server or the embedded `npm run sync-server`:
// the database tankside-NAME, its members (_users and _security) and the validating design
// document. Prints the database URL to type into each phone's "Team" panel.
import { parseArgs } from 'node:util';
import { setupTeam } from './sync/team-setup.mjs';

let args;
try {
  args = parseArgs({
    options: {
      url: { type: 'string' },
      admin: { type: 'string' },
      team: { type: 'string' },
      user: { type: 'string', multiple: true },
    },
  }).values;
} catch (e) {
  console.error(e instanceof Error ? e.message : String(e));
  process.exit(2);
}
if (!args.url || !args.admin || !args.team || !args.user?.length) {
  console.error(
    'Usage: npm run team:setup -- --url URL --admin USER:PASS --team NAME --user USER:PASS [--user USER:PASS …]',
  );
  process.exit(2);
}
try {
  const dbUrl = await setupTeam({
    url: args.url,
    admin: args.admin,
    team: args.team,
    users: args.user,
  });
  console.log(`Team “${args.team}” is ready. On each phone: Data → Team, database URL ${dbUrl}`);
  console.log(`Members: ${args.user.map((u) => u.split(':')[0]).join(', ')}`);
} catch (e) {
  console.error(`Team setup failed: ${e instanceof Error ? e.message : String(e)}`);
  process.exit(1);
}
