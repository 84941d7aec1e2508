// `npm start` (after `npm run build`): serves dist/ on 127.0.0.1 only, with vite's preview server.
//   PORT=5000 npm start    to use another port (default 4173)
//   TEAM_ORIGIN=https://couch.example.com npm start   narrows the pages' network connections to
//       this origin and the team server's (the page's own meta policy allows any HTTPS server,
//       since it cannot know the team in advance; a header policy adds to it, both apply).
import { existsSync } from 'node:fs';
import { preview } from 'vite';

if (!existsSync('dist/index.html')) {
  console.error('dist/ is missing: run `npm run build` first (npm start does).');
  process.exit(1);
}
const port = Number(process.env.PORT ?? 4173);
const team = process.env.TEAM_ORIGIN ? new URL(process.env.TEAM_ORIGIN).origin : null;
/** Headers a <meta> policy cannot give: framing, and the team server named at serve time. */
const headers = {
  'Content-Security-Policy': `frame-ancestors 'none'${team ? `; connect-src 'self' ${team}` : ''}`,
  'X-Content-Type-Options': 'nosniff',
  'Referrer-Policy': 'no-referrer',
};
const server = await preview({
  configFile: false,
  logLevel: 'warn',
  build: { outDir: 'dist' },
  preview: { host: '127.0.0.1', port, strictPort: true, open: false, headers },
});
const url = server.resolvedUrls?.local[0] ?? `http://127.0.0.1:${port}/`;
console.log(`Tankside is served at ${url}  (Ctrl+C to stop)`);

const stop = () => server.close().then(() => process.exit(0));
process.on('SIGINT', stop);
process.on('SIGTERM', stop);
