/**
 * Tankside service worker.
 *
 * - Precaches every built asset (the list is injected at build time as `self.__WB_MANIFEST`).
 * - The precache has a versioned name derived from that list, so each release installs into a
 *   fresh cache; on activate every older `tankside-*` cache is deleted.
 * - Navigations fall back to the precached index.html, so deep links open offline.
 * - Requests to any other origin are refused: the app is meant to make none, and the worker
 *   makes sure a stray one cannot leave the phone. The one exception is the team server this
 *   phone was set up with (team sync, sw/team-origin.ts).
 * - A new version waits until the page asks for it (`{ type: 'SKIP_WAITING' }`), which the page
 *   only sends after the user agrees to reload: a half-filled check is never thrown away.
 * - On activate the worker claims open pages, so the very first install already controls the page
 *   that installed it (without this the first visit would stay uncontrolled until a reload).
 *
 * Workbox is bundled into this file at build time; nothing is fetched from elsewhere.
 */
import { cacheNames, setCacheNameDetails } from 'workbox-core';
import { setTeamOrigin, teamOrigin } from './team-origin.js';
import {
  cleanupOutdatedCaches,
  createHandlerBoundToURL,
  precacheAndRoute,
} from 'workbox-precaching';
import type { PrecacheEntry } from 'workbox-precaching';
import { NavigationRoute, registerRoute } from 'workbox-routing';

declare let self: ServiceWorkerGlobalScope & {
  __WB_MANIFEST: Array<PrecacheEntry | string>;
};

/** Every cache this app creates starts with this prefix; others on the origin are left alone. */
const CACHE_PREFIX = 'tankside';

const manifest = self.__WB_MANIFEST;

/**
 * FNV-1a (32 bit) over the precache list. The list carries a revision hash for every asset, so
 * the version changes exactly when some asset changes, and stays the same for a rebuild of
 * identical files (no needless re-download).
 */
function manifestVersion(entries: ReadonlyArray<PrecacheEntry | string>): string {
  const text = entries
    .map((e) => (typeof e === 'string' ? e : `${e.url}#${e.revision ?? ''}`))
    .sort()
    .join('\n');
  let h = 0x811c9dc5;
  for (let i = 0; i < text.length; i++) {
    h ^= text.charCodeAt(i);
    h = Math.imul(h, 0x01000193);
  }
  return (h >>> 0).toString(16).padStart(8, '0');
}

setCacheNameDetails({
  prefix: CACHE_PREFIX,
  precache: 'precache',
  suffix: `v${manifestVersion(manifest)}`,
});

// Removes caches left by older Workbox releases (different naming scheme).
cleanupOutdatedCaches();
precacheAndRoute(manifest);

registerRoute(new NavigationRoute(createHandlerBoundToURL('index.html')));

// Anything aimed at another origin fails here instead of going out on the network — except
// the team server this phone was set up with (sw/team-origin.ts).
registerRoute(
  ({ url }) => url.origin !== self.location.origin,
  async ({ request, url }) =>
    url.origin === (await teamOrigin()) ? fetch(request) : Response.error(),
);

self.addEventListener('message', (event: ExtendableMessageEvent) => {
  const data: unknown = event.data;
  if (
    typeof data === 'object' &&
    data !== null &&
    (data as { type?: unknown }).type === 'SKIP_WAITING'
  ) {
    void self.skipWaiting();
  }
  if (
    typeof data === 'object' &&
    data !== null &&
    (data as { type?: unknown }).type === 'TEAM_ORIGIN'
  ) {
    const origin = (data as { origin?: unknown }).origin;
    setTeamOrigin(typeof origin === 'string' ? origin : null);
  }
});

async function deleteOldCaches(): Promise<void> {
  const current = cacheNames.precache;
  const names = await caches.keys();
  await Promise.all(
    names
      .filter((name) => name.startsWith(`${CACHE_PREFIX}-`) && name !== current)
      .map((name) => caches.delete(name)),
  );
}

self.addEventListener('activate', (event: ExtendableEvent) => {
  // Old caches go first, so a page never sees the new worker next to a stale cache; the claim
  // runs even if the clean-up fails, because control of the page matters more.
  event.waitUntil(
    (async () => {
      try {
        await deleteOldCaches();
      } finally {
        await self.clients.claim();
      }
    })(),
  );
});
