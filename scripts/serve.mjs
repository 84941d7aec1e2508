// `npm start` (after `npm run build`): serves dist/ on 127.0.0.1 only, with vite's preview server.
//   PORT=5000 npm start    to use another port (default 4173)
import { existsSync } from 'node:fs';
import { preview } from 'vite';

if (!existsSync('dist/index.html')) {
  console.error('dist/ is missing: run `npm run build` first (npm start does).');
  process.exit(1);
}
const port = Number(process.env.PORT ?? 4173);
const server = await preview({
  configFile: false,
  logLevel: 'warn',
  build: { outDir: 'dist' },
  preview: { host: '127.0.0.1', port, strictPort: true, open: false },
});
const url = server.resolvedUrls?.local[0] ?? `http://127.0.0.1:${port}/`;
console.log(`Tankside is served at ${url}  (Ctrl+C to stop)`);

const stop = () => server.close().then(() => process.exit(0));
process.on('SIGINT', stop);
process.on('SIGTERM', stop);
