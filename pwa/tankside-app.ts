/**
 * The app shell: composes the router (pwa/route-controller.ts), the drafts (pwa/drafts.ts), the
 * notices with undo (pwa/notices.ts), the Data screen's work (pwa/data-controller.ts) and the
 * fills (pwa/fill-route.ts) around the screens (pwa/screens.ts). It opens storage, seeds the
 * demo site once, holds the tanks, checks and settings, and turns screen events into writes.
 *
 * Data flow: IndexedDB (pwa/storage.ts) → this element's state → screens as properties;
 * screen events → storage → state. A half-filled check is kept as a draft per tank, so a
 * reload, a crash or an accepted update never loses it.
 *
 * data-testid: `app`, `nav-tanks`, `nav-settings`, `nav-data`, `app-error`, `not-found`.
 */
import { LitElement, html, nothing } from 'lit';
import { blankTank } from '../components/blank-tank.js';
import type { TankSaveDetail } from '../components/tank-form.js';
import type { TankIdDetail } from '../components/tank-list.js';
import type { CheckSaveDetail } from '../components/check-screen.js';
import type { ReadingsChange } from '../components/check-form.js';
import type { SettingsChange } from '../components/settings-form.js';
import type { BackupImportDetail } from '../components/backup-panel.js';
import { DEFAULT_SETTINGS, newId, type Settings, type TankRecord } from '../components/types.js';
import type { FillDraft, FillRecord } from '../components/fill-types.js';
import { DB_NAME, Store, requestPersistentStorage, type Meta } from './storage.js';
import type { Route } from './router.js';
import { buildDemo } from './demo.js';
import { claimByCheck, savedByUser } from './demo-own.js';
import { FillController } from './fill-route.js';
import { appStyles } from './app-styles.js';
import { NoticesController } from './notices.js';
import { DraftController } from './drafts.js';
import { DataController } from './data-controller.js';
import { RouteController } from './route-controller.js';
import { renderScreen, type ScreenHandlers } from './screens.js';
import { appHeader } from './app-header.js';
import { siteRulesOf } from '../components/site-rules.js';
import { loadRegister } from './register-load.js';
import { RegisterState } from './register-state.js';
import { syncAddOns } from './sync/shell-hooks.js';
import { syncHub } from './sync/hub.js';

export class TanksideApp extends LitElement {
  static override properties = {
    dbName: { type: String, attribute: 'db-name' },
    _ready: { state: true },
    _fatal: { state: true },
    _settings: { state: true },
    _persisted: { state: true },
  };

  static override styles = appStyles;
  /** IndexedDB database name (tests use their own). */
  declare dbName: string;
  declare _ready: boolean;
  declare _fatal: string;
  declare _settings: Settings;
  /** The tanks, their newest checks in brief, every check (pwa/register-state.ts). */
  private readonly _reg = new RegisterState(this);
  declare _persisted: boolean | null;

  /** The blank tank of the "add a tank" screen, made once per visit so a re-render keeps the typing. */
  private _newTank: TankRecord = blankTank(newId());
  private _store: Store | null = null;
  private _meta: Meta | null = null;
  private readonly _fill = new FillController(this);
  private readonly _drafts = new DraftController(this, () => this._store);
  private readonly _notices = new NoticesController(this, () => this._drafts.flush());
  private readonly _router = new RouteController(this, {
    leave: (from, to) => {
      this._drafts.flush();
      if (to.name === 'new' && from.name !== 'new') this._newTank = blankTank(newId());
      this._data.clearMessage();
    },
    enter: (route) => this._enter(route),
    failed: (message) => (this._fatal = message),
  });
  private readonly _data = new DataController(this, {
    store: () => this._store,
    current: () => ({
      settings: this._settings,
      tanks: this._reg.tanks,
      checks: this._reg.checks,
      fills: this._fill.fills,
    }),
    importedSettings: (s) => this._applySettings(s),
    reload: () => this._reload(),
  });

  constructor() {
    super();
    this.dbName = DB_NAME;
    this._ready = false;
    this._fatal = '';
    this._settings = DEFAULT_SETTINGS;
    this._persisted = null;
  }

  override connectedCallback(): void {
    super.connectedCallback();
    void this._start();
  }

  override disconnectedCallback(): void {
    super.disconnectedCallback();
    this._store?.close();
  }

  // ── start-up ─────────────────────────────────────────────────────────────────────────
  private async _start(): Promise<void> {
    try {
      this._store = await Store.open(this.dbName);
    } catch (e) {
      this._fatal = `This browser would not open its storage, so nothing can be saved (${e instanceof Error ? e.message : String(e)}). Private browsing can cause this.`;
      this._ready = true;
      return;
    }
    const store = this._store;
    this._settings = { ...DEFAULT_SETTINGS, ...(await store.getSettings()) };
    this._applyTheme();
    this._meta = await store.getMeta();
    if (!this._meta.demoSeeded) {
      // First start: the invented demo site, once. After the user clears it, it stays cleared.
      if ((await store.listTanks()).length === 0) {
        const demo = buildDemo(this._settings);
        await store.importAll({ tanks: demo.tanks, checks: demo.checks, settings: null });
        for (const d of demo.drafts) await store.putDraft(d);
      }
      this._meta = { ...this._meta, demoSeeded: true };
      await store.putMeta(this._meta);
    }
    await this._reload(true);
    this._ready = true;
    void syncHub.start(store, this.dbName, () => void this._reload());
    await this._router.go(this._router.route);
    void this._askPersistence();
  }

  private async _askPersistence(): Promise<void> {
    const granted = await requestPersistentStorage();
    this._persisted = granted;
    // Removed while the browser was asked: its store is closed (disconnectedCallback), and a
    // write now would throw from a closing database.
    if (this._store && this._meta && this.isConnected) {
      this._meta = { ...this._meta, persisted: granted };
      await this._store.putMeta(this._meta);
    }
  }

  /** Reads the register again, every check too (start-up: the list's first screen first, checks later). */
  private async _reload(startUp = false): Promise<void> {
    if (!this._store) return;
    await Promise.all([
      loadRegister(this._store, this._reg, startUp),
      this._fill.reload(this._store),
    ]);
  }

  private _applyTheme(): void {
    document.documentElement.dataset.theme = this._settings.theme;
  }

  private _applySettings(settings: Settings): void {
    this._settings = settings;
    this._applyTheme();
  }

  /** Loads what the new screen needs (the chunks are the router's). */
  private async _enter(route: Route): Promise<void> {
    if (!this._store) return;
    if (route.name === 'fill') await this._fill.open(this._store, route.id);
    if (route.name === 'check') {
      const site = this._tank(route.id)?.site;
      const [draft, siteRecord] = await Promise.all([
        this._store.getDraft(route.id),
        site !== undefined ? this._store.getSite(site) : undefined,
      ]);
      // A later route change may have happened meanwhile; keep only the current one.
      if (this._router.route === route)
        this._drafts.open(route.id, draft, this._settings.sunAllowance, siteRulesOf(siteRecord));
    }
  }

  // ── service worker hooks (called from main.ts) ──────────────────────────────────────────
  /** A new version is waiting: offer the reload, never do it unasked. */
  offerUpdate(applyUpdate: () => void): void {
    this._notices.offerUpdate(applyUpdate);
  }

  /** The first install finished: say once that the app works offline. */
  async offlineReady(): Promise<void> {
    if (this._meta?.offlineNoteShown) return;
    this._notices.showOfflineNote();
    if (this._store && this._meta) {
      this._meta = { ...this._meta, offlineNoteShown: true };
      await this._store.putMeta(this._meta);
    }
  }

  // ── tanks ──────────────────────────────────────────────────────────────────────────────
  private _tank(id: string): TankRecord | undefined {
    return this._reg.tank(id);
  }

  private async _saveTank(e: CustomEvent<TankSaveDetail>): Promise<void> {
    if (!this._store) return;
    const now = new Date().toISOString();
    const tank = savedByUser(e.detail.tank, now);
    await this._store.putTank(tank);
    await this._reload();
    this._router.navigate({ name: 'check', id: tank.id });
  }

  private async _duplicate(e: CustomEvent<TankIdDetail>): Promise<void> {
    const t = this._tank(e.detail.id);
    if (!t || !this._store) return;
    const now = new Date().toISOString();
    const copy: TankRecord = {
      ...structuredClone(t),
      id: newId(),
      name: `${t.name} (copy)`,
      demo: false,
      createdAt: now,
      updatedAt: now,
    };
    await this._store.putTank(copy);
    await this._reload();
    this._router.navigate({ name: 'edit', id: copy.id });
  }

  private async _deleteTank(e: CustomEvent<TankIdDetail>): Promise<void> {
    if (!this._store) return;
    const store = this._store;
    const removed = await store.deleteTank(e.detail.id);
    if (!removed) return;
    await this._reload();
    this._notices.offerUndo(
      `Deleted “${removed.tank.name}” with ${removed.checks.length} saved check${removed.checks.length === 1 ? '' : 's'}.`,
      async () => {
        await store.restoreTank(removed);
        await this._reload();
      },
    );
    if (this._router.route.name !== 'tanks') this._router.navigate({ name: 'tanks' });
  }

  /** Asks once; then clears the demo tanks the user has not made their own, with an undo. */
  private _clearDemo(): void {
    const store = this._store;
    if (!store) return;
    this._notices.ask({
      text: 'Remove the invented demo tanks? Demo tanks you edited or saved a check on are yours and stay.',
      yes: 'Remove the demo tanks',
      run: async () => {
        const removed = await store.clearDemo();
        await this._reload();
        const n = removed.tanks.length;
        if (n === 0) {
          this._notices.showInfo('No demo tanks to remove: the ones left are yours.');
          return;
        }
        this._notices.offerUndo(`Removed ${n} demo tank${n === 1 ? '' : 's'}.`, async () => {
          await store.restoreRecords(removed);
          await this._reload();
        });
      },
    });
  }

  // ── checks ─────────────────────────────────────────────────────────────────────────────
  private async _saveCheck(e: CustomEvent<CheckSaveDetail>): Promise<void> {
    if (!this._store) return;
    const now = new Date().toISOString();
    const claim = claimByCheck(this._tank(e.detail.check.tankId), e.detail.check, now);
    if (claim.tank) await this._store.putTank(claim.tank);
    await this._store.putCheck(claim.check);
    this._drafts.flush();
    await this._reload();
  }

  private async _deleteCheck(e: CustomEvent<{ id: string }>): Promise<void> {
    if (!this._store) return;
    const store = this._store;
    const check = this._reg.checks.find((c) => c.id === e.detail.id);
    if (!check) return;
    await store.deleteCheck(check.id);
    await this._reload();
    this._notices.offerUndo('Deleted a saved check.', async () => {
      await store.putCheck(check);
      await this._reload();
    });
  }

  // ── fills ──────────────────────────────────────────────────────────────────────────────
  private async _startFill(e: CustomEvent<{ draft: FillDraft }>): Promise<void> {
    if (!this._store) return;
    await this._fill.start(this._store, e.detail.draft);
    this._router.navigate({ name: 'fill', id: e.detail.draft.tankId });
  }

  private async _saveFill(e: CustomEvent<{ record: FillRecord }>): Promise<void> {
    if (!this._store) return;
    await this._fill.save(this._store, e.detail.record, this._tank(e.detail.record.tankId));
    await this._reload();
    this._router.navigate({ name: 'check', id: e.detail.record.tankId });
  }

  private async _discardFill(e: CustomEvent<{ tankId: string }>): Promise<void> {
    if (!this._store) return;
    const store = this._store;
    const old = await this._fill.discard(store, e.detail.tankId);
    this._router.navigate({ name: 'check', id: e.detail.tankId });
    if (old)
      this._notices.offerUndo('Discarded the fill under way.', async () => {
        await store.putFillDraft(old);
        this._router.navigate({ name: 'fill', id: old.tankId });
      });
  }

  // ── render ─────────────────────────────────────────────────────────────────────────────
  /** Screen events, handled here (lit calls them with this element as `this`). */
  private readonly _on: ScreenHandlers = {
    duplicate: (e) => void this._duplicate(e),
    deleteTank: (e) => void this._deleteTank(e),
    clearDemo: () => this._clearDemo(),
    saveTank: (e) => void this._saveTank(e),
    readings: (e: CustomEvent<ReadingsChange>) => {
      const r = this._router.route;
      if (r.name === 'check') this._drafts.change(r.id, e.detail.readings);
    },
    saveCheck: (e) => void this._saveCheck(e),
    deleteCheck: (e) => void this._deleteCheck(e),
    startFill: (e) => void this._startFill(e),
    fillDraftChange: (e) => this._store && void this._fill.change(this._store, e.detail.draft),
    saveFill: (e) => void this._saveFill(e),
    discardFill: (e) => void this._discardFill(e),
    saveSettings: (e: CustomEvent<SettingsChange>) => {
      this._applySettings(e.detail.settings);
      void this._store?.putSettings(this._settings);
    },
    importFile: (e: CustomEvent<BackupImportDetail>) => void this._data.importFile(e.detail.file),
  };

  private _screen() {
    const router = this._router;
    return renderScreen({
      route: router.route,
      store: this._store,
      settings: this._settings,
      tanks: this._reg.tanks,
      checks: this._reg.checks,
      lastChecks: this._reg.last,
      first: this._reg.firstScreen,
      newTank: this._newTank,
      draft: this._drafts.current,
      fill: this._fill,
      data: this._data,
      persisted: this._persisted,
      checkScreenReady: router.checkScreenReady,
      siteScreenReady: router.siteScreenReady,
      navigate: (route) => router.navigate(route),
      on: this._on,
    });
  }

  override render() {
    return html`
      <div data-testid="app" data-ready=${this._ready ? 'true' : 'false'}>
        ${appHeader(this._router.route.name)}
        <main tabindex="-1">
          ${this._fatal ? html`<p class="error" role="alert" data-testid="app-error">${this._fatal}</p>` : nothing}
          ${this._ready ? syncAddOns(this._router.route, this._settings, 'before') : nothing}
          ${this._ready || this._reg.firstScreen ? this._screen() : html`<p>Loading…</p>`}
          ${this._ready ? syncAddOns(this._router.route, this._settings, 'after') : nothing}
        </main>
        ${this._notices.render()}
      </div>
    `;
  }
}

customElements.define('tankside-app', TanksideApp);

declare global {
  interface HTMLElementTagNameMap {
    'tankside-app': TanksideApp;
  }
}
