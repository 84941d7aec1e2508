/**
 * Service-worker registration for the app shell.
 *
 * Update policy: a new version installs in the background and then waits. The page is told through
 * `onUpdateReady` and decides when to call `applyUpdate` (after the user agrees to reload), so a
 * half-filled check is never thrown away. `onOfflineReady` fires once, when the first install has
 * finished and the app works without signal.
 */
import { Workbox } from 'workbox-window';

export interface ServiceWorkerHandlers {
  /** A new version is installed and waiting. Call `applyUpdate` once the user agrees to reload. */
  onUpdateReady(applyUpdate: () => void): void;
  /** The first install finished: the app now works offline. Fires once per install, never on updates. */
  onOfflineReady(): void;
}

/** The part of workbox-window's `Workbox` used here (lets tests pass a stand-in). */
export interface WorkboxLike {
  addEventListener(
    type: 'waiting' | 'activated',
    listener: (event: { isUpdate?: boolean; isExternal?: boolean }) => void,
  ): void;
  messageSkipWaiting(): void;
  register(): Promise<unknown>;
}

export interface RegisterOptions {
  /** Worker script URL; default `sw.js` under the app's base URL. */
  url?: string;
  /** Registration scope; default the app's base URL. */
  scope?: string;
  /** Builds the Workbox instance; tests substitute their own. */
  createWorkbox?: (url: string, scope: string) => WorkboxLike;
  /** Reloads the page once the new worker controls it; tests substitute their own. */
  reload?: () => void;
  /** The service-worker container; default `navigator.serviceWorker`. */
  container?: Pick<ServiceWorkerContainer, 'addEventListener' | 'removeEventListener'>;
}

function baseUrl(): string {
  // Vite replaces import.meta.env at build time; under other tools (web-test-runner) it is absent.
  const env = (import.meta as ImportMeta & { env?: { BASE_URL?: string } }).env;
  return env?.BASE_URL ?? '/';
}

/**
 * Registers `sw.js` and reports the two moments the user should hear about. Does nothing where
 * service workers are unavailable (an old browser, or a page that is not a secure context).
 */
export function registerServiceWorker(
  handlers: ServiceWorkerHandlers,
  options: RegisterOptions = {},
): void {
  const container =
    options.container ?? (typeof navigator !== 'undefined' ? navigator.serviceWorker : undefined);
  if (!container && !options.createWorkbox) return;

  const base = baseUrl();
  const url = options.url ?? `${base}sw.js`;
  const scope = options.scope ?? base;
  const wb = options.createWorkbox
    ? options.createWorkbox(url, scope)
    : new Workbox(url, { scope });
  const reload = options.reload ?? (() => window.location.reload());

  let offlineReadySent = false;
  wb.addEventListener('activated', (event) => {
    if (event.isUpdate || event.isExternal || offlineReadySent) return;
    offlineReadySent = true;
    handlers.onOfflineReady();
  });

  let updateOffered = false;
  wb.addEventListener('waiting', () => {
    if (updateOffered) return;
    updateOffered = true;
    handlers.onUpdateReady(() => {
      // Reload only when the new worker has taken over, so the page loads the new assets.
      const onControllerChange = () => {
        container?.removeEventListener('controllerchange', onControllerChange);
        reload();
      };
      container?.addEventListener('controllerchange', onControllerChange);
      wb.messageSkipWaiting();
    });
  });

  wb.register().catch((error: unknown) => {
    // The app still works online without a worker; say why in the console for whoever debugs it.
    console.warn('Service worker registration failed:', error);
  });
}
