// Placeholder entry point (infrastructure) until the app shell lands. It only wires the
// service-worker messages so the build, offline and update paths can be tested end to end.
import { registerServiceWorker } from './sw-register.js';

const status = document.getElementById('sw-status');

registerServiceWorker({
  onOfflineReady() {
    if (status) status.textContent = 'Ready to work offline.';
  },
  onUpdateReady(applyUpdate) {
    if (!status) return;
    const button = document.createElement('button');
    button.type = 'button';
    button.textContent = 'New version ready — reload';
    button.addEventListener('click', applyUpdate, { once: true });
    status.replaceChildren(button);
  },
});
