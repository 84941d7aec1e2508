/**
 * Entry point loaded by index.html: starts the app shell and registers the service worker.
 * A new version never reloads by itself: the shell shows "A new version is ready — reload when
 * you're done" and reloads only on the user's tap. The first install is announced once.
 */
import './tankside-app.js';
import { registerServiceWorker } from './sw-register.js';

const app = document.querySelector('tankside-app');

registerServiceWorker({
  onUpdateReady(applyUpdate) {
    app?.offerUpdate(applyUpdate);
  },
  onOfflineReady() {
    void app?.offlineReady();
  },
});
