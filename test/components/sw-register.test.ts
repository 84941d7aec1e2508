import { expect } from '@open-wc/testing';
import { registerServiceWorker, type WorkboxLike } from '../../pwa/sw-register.js';

const FIXTURE = new URL('./fixtures/sw-fixture.js', import.meta.url).pathname;
const FIXTURE_DIR = FIXTURE.slice(0, FIXTURE.lastIndexOf('/') + 1);

/** Rejects after `ms` with a message that says what never happened. */
function within<T>(ms: number, what: string, promise: Promise<T>): Promise<T> {
  return Promise.race([
    promise,
    new Promise<never>((_, reject) =>
      setTimeout(() => reject(new Error(`timed out after ${ms} ms waiting for ${what}`)), ms),
    ),
  ]);
}

function uniqueScope(): string {
  return `${FIXTURE_DIR}s-${Math.random().toString(36).slice(2)}/`;
}

async function unregister(scope: string): Promise<void> {
  const reg = await navigator.serviceWorker.getRegistration(scope);
  await reg?.unregister();
}

/** A frame at a URL inside `scope`; the fixture worker answers it, which makes it a client. */
async function controlledFrame(scope: string): Promise<HTMLIFrameElement> {
  const frame = document.createElement('iframe');
  frame.src = `${scope}client.html`;
  const loaded = new Promise((resolve) => frame.addEventListener('load', resolve, { once: true }));
  document.body.append(frame);
  await within(5000, 'the client frame to load', loaded);
  return frame;
}

describe('registerServiceWorker with a real worker', () => {
  const scopes: string[] = [];
  afterEach(async () => {
    document.querySelectorAll('iframe').forEach((f) => f.remove());
    await Promise.all(scopes.splice(0).map(unregister));
  });

  it('registerServiceWorker reports offline-ready once after the first install and offers no update', async () => {
    const scope = uniqueScope();
    scopes.push(scope);
    let offline = 0;
    let updates = 0;
    const ready = new Promise<void>((resolve) => {
      registerServiceWorker(
        {
          onOfflineReady() {
            offline++;
            resolve();
          },
          onUpdateReady() {
            updates++;
          },
        },
        { url: `${FIXTURE}?v=1`, scope },
      );
    });
    await within(5000, 'onOfflineReady', ready);
    const reg = await navigator.serviceWorker.getRegistration(scope);
    expect(reg?.active?.state, 'the worker is active').to.equal('activated');
    await new Promise((r) => setTimeout(r, 300)); // let any stray second event arrive
    expect(offline, 'onOfflineReady calls').to.equal(1);
    expect(updates, 'onUpdateReady calls').to.equal(0);
  });

  it('registerServiceWorker holds a new version until applyUpdate, then reloads once it controls the client', async () => {
    const scope = uniqueScope();
    scopes.push(scope);
    await within(
      5000,
      'the first version to activate',
      new Promise<void>((resolve) =>
        registerServiceWorker(
          { onOfflineReady: resolve, onUpdateReady: () => undefined },
          { url: `${FIXTURE}?v=1`, scope },
        ),
      ),
    );
    const frame = await controlledFrame(scope);
    const frameWindow = frame.contentWindow as Window & typeof globalThis;
    const frameContainer = frameWindow.navigator.serviceWorker;
    expect(frameContainer.controller?.scriptURL, 'v1 controls the client').to.match(/\?v=1$/);

    let reloads = 0;
    const applyUpdate = await within(
      5000,
      'onUpdateReady for v2',
      new Promise<() => void>((resolve) =>
        registerServiceWorker(
          { onOfflineReady: () => undefined, onUpdateReady: resolve },
          {
            url: `${FIXTURE}?v=2`,
            scope,
            container: frameContainer,
            reload: () => reloads++,
          },
        ),
      ),
    );

    // Waiting, not applied: the client keeps the old version and nothing reloads on its own.
    await new Promise((r) => setTimeout(r, 300));
    const reg = await navigator.serviceWorker.getRegistration(scope);
    expect(reg?.waiting?.scriptURL, 'v2 is waiting').to.match(/\?v=2$/);
    expect(frameContainer.controller?.scriptURL, 'v1 still controls').to.match(/\?v=1$/);
    expect(reloads, 'reloads before consent').to.equal(0);

    const changed = new Promise((resolve) =>
      frameContainer.addEventListener('controllerchange', resolve, { once: true }),
    );
    applyUpdate();
    await within(5000, 'v2 to take control', changed);
    await new Promise((r) => setTimeout(r, 0));
    expect(frameContainer.controller?.scriptURL, 'v2 controls').to.match(/\?v=2$/);
    expect(reloads, 'reloads after consent').to.equal(1);
  });
});

/** A stand-in for workbox-window that lets a test fire lifecycle events by hand. */
class FakeWorkbox implements WorkboxLike {
  listeners = new Map<string, Array<(e: { isUpdate?: boolean; isExternal?: boolean }) => void>>();
  skipWaitingMessages = 0;
  addEventListener(
    type: 'waiting' | 'activated',
    listener: (e: { isUpdate?: boolean; isExternal?: boolean }) => void,
  ): void {
    this.listeners.set(type, [...(this.listeners.get(type) ?? []), listener]);
  }
  fire(type: 'waiting' | 'activated', e: { isUpdate?: boolean; isExternal?: boolean } = {}): void {
    for (const l of this.listeners.get(type) ?? []) l(e);
  }
  messageSkipWaiting(): void {
    this.skipWaitingMessages++;
  }
  register(): Promise<unknown> {
    return Promise.resolve(undefined);
  }
}

describe('registerServiceWorker event rules', () => {
  it('registerServiceWorker does not report offline-ready for an update or an external worker', () => {
    const wb = new FakeWorkbox();
    let offline = 0;
    registerServiceWorker(
      { onOfflineReady: () => offline++, onUpdateReady: () => undefined },
      { createWorkbox: () => wb, container: new EventTarget() as ServiceWorkerContainer },
    );
    wb.fire('activated', { isUpdate: true });
    wb.fire('activated', { isExternal: true });
    expect(offline).to.equal(0);
    wb.fire('activated', {});
    wb.fire('activated', {});
    expect(offline, 'reported once').to.equal(1);
  });

  it('registerServiceWorker sends SKIP_WAITING only from applyUpdate and reloads only on controllerchange', () => {
    const wb = new FakeWorkbox();
    const container = new EventTarget();
    let reloads = 0;
    const offered: Array<() => void> = [];
    registerServiceWorker(
      { onOfflineReady: () => undefined, onUpdateReady: (apply) => offered.push(apply) },
      {
        createWorkbox: () => wb,
        container: container as ServiceWorkerContainer,
        reload: () => reloads++,
      },
    );
    wb.fire('waiting');
    wb.fire('waiting');
    expect(offered.length, 'offered once').to.equal(1);
    expect(wb.skipWaitingMessages, 'no skip before consent').to.equal(0);
    offered[0]!();
    expect(wb.skipWaitingMessages).to.equal(1);
    expect(reloads, 'no reload before the new worker controls').to.equal(0);
    container.dispatchEvent(new Event('controllerchange'));
    container.dispatchEvent(new Event('controllerchange'));
    expect(reloads, 'one reload').to.equal(1);
  });
});
