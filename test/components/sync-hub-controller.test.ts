/**
 * The team sync's change events reach an element only while it is on the page
 * (components/sync-hub-controller.ts), and the two elements that use it follow the hub:
 * <team-panel>'s status line and <sync-conflict>'s kept-after-delete note. Kind: behaviour; the
 * hub's status and marks are set directly, no team server, no physics.
 */
import { LitElement } from 'lit';
import { expect, fixture, html, waitUntil } from '@open-wc/testing';
import { SyncHubController } from '../../components/sync-hub-controller.js';
import '../../components/team-panel.js';
import '../../components/sync-conflict.js';
import type { TeamPanel } from '../../components/team-panel.js';
import type { SyncConflict } from '../../components/sync-conflict.js';
import { syncHub } from '../../pwa/sync/hub.js';
import { byTestId, deep } from './dom.js';

class HubProbe extends LitElement {
  calls = 0;
  constructor() {
    super();
    new SyncHubController(this, () => this.calls++);
  }
}
customElements.define('hub-probe', HubProbe);

class HubProbeNow extends LitElement {
  calls = 0;
  constructor() {
    super();
    new SyncHubController(this, () => this.calls++, { atConnect: true });
  }
}
customElements.define('hub-probe-now', HubProbeNow);

const OFF = { ...syncHub.status };
const change = () => syncHub.dispatchEvent(new Event('change'));

afterEach(() => {
  syncHub.setStatus(OFF);
  syncHub.setMarks({ conflicts: [], keptAfterDelete: [] });
});

describe('SyncHubController', () => {
  it('runs the callback on each change while connected, never after the element is removed', async () => {
    const el = await fixture<HubProbe>(html`<hub-probe></hub-probe>`);
    expect(el.calls).to.equal(0);
    change();
    change();
    expect(el.calls).to.equal(2);
    el.remove();
    change();
    expect(el.calls).to.equal(2);
    document.body.append(el);
    change();
    expect(el.calls).to.equal(3);
    el.remove();
  });

  it('with atConnect, also runs it each time the element connects', async () => {
    const el = await fixture<HubProbeNow>(html`<hub-probe-now></hub-probe-now>`);
    expect(el.calls).to.equal(1);
    el.remove();
    document.body.append(el);
    expect(el.calls).to.equal(2);
    change();
    expect(el.calls).to.equal(3);
    el.remove();
    change();
    expect(el.calls).to.equal(3);
  });
});

describe('elements that follow the sync hub', () => {
  it('<team-panel> shows the hub’s status, read again when it is put back on the page', async () => {
    const el = await fixture<TeamPanel>(html`<team-panel></team-panel>`);
    expect(byTestId(el, 'sync-status').dataset.state).to.equal('off');
    syncHub.setStatus({ state: 'error', words: 'Invented failure' });
    await waitUntil(() => byTestId(el, 'sync-status').dataset.state === 'error');
    expect(byTestId(el, 'sync-status').textContent).to.contain('Invented failure');
    el.remove();
    syncHub.setStatus({ state: 'paused', words: 'Up to date' });
    document.body.append(el);
    await waitUntil(() => byTestId(el, 'sync-status').dataset.state === 'paused');
    el.remove();
  });

  it('<sync-conflict> shows the kept-after-delete note when the hub marks its tank', async () => {
    const el = await fixture<SyncConflict>(html`<sync-conflict tank-id="t1"></sync-conflict>`);
    expect(deep(el, '[data-testid="sync-kept"]')).to.equal(null);
    syncHub.setMarks({ conflicts: [], keptAfterDelete: ['t1'] });
    await waitUntil(() => deep(el, '[data-testid="sync-kept"]') !== null);
    syncHub.setMarks({ conflicts: [], keptAfterDelete: [] });
    await waitUntil(() => deep(el, '[data-testid="sync-kept"]') === null);
  });
});
