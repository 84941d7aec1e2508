/**
 * The app shell: routes, storage, settings, the demo site, backup and the update notices. The
 * screens are components (components/); this element only loads and saves their data and
 * reacts to their events.
 *
 * Data flow: IndexedDB (pwa/storage.ts) → this element's state → screens as properties;
 * screen events → storage → state. A half-filled check is kept as a draft per tank, so a
 * reload, a crash or an accepted update never loses it.
 *
 * data-testid: `app`, `nav-tanks`, `nav-settings`, `nav-data`, `app-error`, `not-found`.
 */
import { LitElement, html, css, nothing } from 'lit';
import { baseStyles } from '../components/styles.js';
import { DisplayUnits } from '../components/display.js';
import '../components/tank-list.js';
import '../components/tank-form.js';
import '../components/settings-form.js';
import '../components/backup-panel.js';
import '../components/app-notice.js';
import { blankTank, type TankSaveDetail } from '../components/tank-form.js';
import type { TankIdDetail } from '../components/tank-list.js';
import type { CheckSaveDetail } from '../components/check-screen.js';
import type { ReadingsChange } from '../components/check-form.js';
import type { SettingsChange } from '../components/settings-form.js';
import type { BackupImportDetail } from '../components/backup-panel.js';
import type { NoticeDetail } from '../components/app-notice.js';
import {
  DEFAULT_SETTINGS,
  newId,
  type CheckRecord,
  type Readings,
  type Settings,
  type TankRecord,
} from '../components/types.js';
import { DB_NAME, Store, requestPersistentStorage, type Meta } from './storage.js';
import { parseRoute, href, type Route } from './router.js';
import { buildDemo } from './demo.js';
import { openingReadings, type LastReadings } from '../components/reopen.js';
import { BACKUP_MAX_BYTES, makeBackup, parseBackup } from './backup.js';
import { checksToCsv } from './csv.js';
import { claimByCheck, savedByUser } from './demo-own.js';
import { lastCheckByTank } from './lookups.js';
import '../components/confirm-bar.js';
import { FillController } from './fill-route.js';
import type { FillDraft, FillRecord } from '../components/fill-types.js';
import { fillsToCsv } from './fill-csv.js';
import { syncAddOns } from './sync/shell-hooks.js';
import { syncHub } from './sync/hub.js';

/** How long an undo offer stays, ms. */
const UNDO_MS = 12_000;
/** How long the one-time "works offline now" note stays, ms. */
const OFFLINE_NOTE_MS = 15_000;
/** Wait after the last keystroke before a draft is written, ms. */
const DRAFT_DELAY_MS = 400;

interface Undo {
  text: string;
  restore: () => Promise<void>;
}

/** A question asked before something is removed. */
interface Confirm {
  text: string;
  yes: string;
  run: () => Promise<void>;
}

export class TanksideApp extends LitElement {
  static override properties = {
    dbName: { type: String, attribute: 'db-name' },
    _route: { state: true },
    _ready: { state: true },
    _fatal: { state: true },
    _settings: { state: true },
    _tanks: { state: true },
    _checks: { state: true },
    _draft: { state: true },
    _undo: { state: true },
    _confirm: { state: true },
    _update: { state: true },
    _offlineNote: { state: true },
    _info: { state: true },
    _dataMessage: { state: true },
    _dataMessageKind: { state: true },
    _persisted: { state: true },
    _checkScreenReady: { state: true },
    _siteScreenReady: { state: true },
  };

  /** IndexedDB database name (tests use their own). */
  declare dbName: string;
  declare _route: Route;
  declare _ready: boolean;
  declare _fatal: string;
  declare _settings: Settings;
  declare _tanks: TankRecord[];
  declare _checks: CheckRecord[];
  /** Readings to open the current check screen with (loaded per tank). */
  declare _draft: { tankId: string; readings: Readings; last: LastReadings | null } | null;
  declare _undo: Undo | null;
  declare _confirm: Confirm | null;
  declare _update: (() => void) | null;
  declare _offlineNote: boolean;
  declare _info: string;
  declare _dataMessage: string;
  declare _dataMessageKind: 'ok' | 'error';
  declare _persisted: boolean | null;
  /** The check screen (with the check engine) is loaded; it comes in its own chunk. */
  declare _checkScreenReady: boolean;
  /** The walkdown screens (pwa/walkdown-screen.ts, with the engine) are loaded. */
  declare _siteScreenReady: boolean;

  /** The blank tank of the "add a tank" screen, made once per visit so a re-render keeps the typing. */
  private _newTank: TankRecord = blankTank(newId());
  private readonly _fill = new FillController(this);
  private _store: Store | null = null;
  private _meta: Meta | null = null;
  private _undoTimer: ReturnType<typeof setTimeout> | undefined;
  private _draftTimer: ReturnType<typeof setTimeout> | undefined;
  private _pendingDraft: { tankId: string; readings: Readings } | null = null;
  private readonly _onHash = () => void this._go(parseRoute(location.hash));

  constructor() {
    super();
    this.dbName = DB_NAME;
    this._route = parseRoute(typeof location === 'undefined' ? '' : location.hash);
    this._ready = false;
    this._fatal = '';
    this._settings = DEFAULT_SETTINGS;
    this._tanks = [];
    this._checks = [];
    this._draft = null;
    this._undo = null;
    this._confirm = null;
    this._update = null;
    this._offlineNote = false;
    this._info = '';
    this._dataMessage = '';
    this._dataMessageKind = 'ok';
    this._persisted = null;
    this._checkScreenReady = false;
    this._siteScreenReady = false;
  }

  static override styles = [
    baseStyles,
    css`
      :host {
        display: block;
        min-height: 100vh;
      }
      header {
        background: var(--ink);
        color: var(--paper);
        padding: 0.25rem 0.5rem 0.4rem;
        display: flex;
        flex-wrap: wrap;
        align-items: center;
        gap: 0.25rem 0.75rem;
      }
      header .brand {
        margin: 0;
        font-weight: 800;
        font-size: 1.05rem;
        flex: 1 1 auto;
      }
      nav {
        display: grid;
        grid-template-columns: repeat(3, minmax(0, 1fr));
        gap: 0.25rem;
        flex: 1 1 18rem;
      }
      nav a.button {
        color: var(--paper);
        border-color: var(--paper);
        background: transparent;
        padding: 0.5rem 0.3rem;
      }
      nav a.button[aria-current='page'] {
        background: var(--paper);
        color: var(--ink);
      }
      main {
        padding: 0.75rem;
        max-width: 72rem;
        margin: 0 auto;
        outline: none;
      }
      .notices {
        position: sticky;
        bottom: 0;
        padding: 0.5rem;
        display: grid;
        gap: 0.5rem;
        max-width: 72rem;
        margin: 0 auto;
        z-index: 10;
      }
      @media print {
        header,
        .notices {
          display: none;
        }
        main {
          padding: 0;
        }
      }
    `,
  ];

  override connectedCallback(): void {
    super.connectedCallback();
    window.addEventListener('hashchange', this._onHash);
    window.addEventListener('pagehide', this._flushDraft);
    void this._start();
  }

  override disconnectedCallback(): void {
    super.disconnectedCallback();
    window.removeEventListener('hashchange', this._onHash);
    window.removeEventListener('pagehide', this._flushDraft);
    clearTimeout(this._undoTimer);
    this._flushDraft();
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
    await this._reload();
    this._ready = true;
    void syncHub.start(store, this.dbName, () => void this._reload());
    await this._go(this._route);
    void this._askPersistence();
  }

  private async _askPersistence(): Promise<void> {
    const granted = await requestPersistentStorage();
    this._persisted = granted;
    if (this._store && this._meta) {
      this._meta = { ...this._meta, persisted: granted };
      await this._store.putMeta(this._meta);
    }
  }

  private async _reload(): Promise<void> {
    if (!this._store) return;
    const [tanks, checks] = await Promise.all([
      this._store.listTanks(),
      this._store.listChecks(),
      this._fill.reload(this._store),
    ]);
    this._tanks = tanks;
    this._checks = checks;
  }

  private _applyTheme(): void {
    document.documentElement.dataset.theme = this._settings.theme;
  }

  // ── service worker hooks (called from main.ts) ──────────────────────────────────────────
  /** A new version is waiting: offer the reload, never do it unasked. */
  offerUpdate(applyUpdate: () => void): void {
    this._update = applyUpdate;
  }

  /** The first install finished: say once that the app works offline. */
  async offlineReady(): Promise<void> {
    if (this._meta?.offlineNoteShown) return;
    this._offlineNote = true;
    setTimeout(() => (this._offlineNote = false), OFFLINE_NOTE_MS);
    if (this._store && this._meta) {
      this._meta = { ...this._meta, offlineNoteShown: true };
      await this._store.putMeta(this._meta);
    }
  }

  // ── routing ────────────────────────────────────────────────────────────────────────────
  private _navigate(route: Route): void {
    const target = href(route);
    if (location.hash !== target) location.hash = target;
    else void this._go(route);
  }

  private async _go(route: Route): Promise<void> {
    this._flushDraft();
    if (route.name === 'new' && this._route.name !== 'new') this._newTank = blankTank(newId());
    this._route = route;
    this._dataMessage = '';
    if (route.name === 'fill' && this._store) await this._fill.open(this._store, route.id);
    if (route.name === 'check' && this._store) {
      const id = route.id;
      const [draft] = await Promise.all([this._store.getDraft(id), this._loadCheckScreen()]);
      // A later route change may have happened meanwhile; keep only the current one.
      // Readings typed during this visit come back as they were; older ones are offered as the
      // last check above blank readings (components/reopen.ts).
      if (this._route === route)
        this._draft = { tankId: id, ...openingReadings(draft, this._settings.sunAllowance) };
    }
    if (route.name === 'site' || route.name === 'walk' || route.name === 'walkdown')
      await this._loadSiteScreen();
    await this.updateComplete;
    // A new screen starts at its top, and a screen reader starts reading there.
    window.scrollTo(0, 0);
    this.renderRoot.querySelector<HTMLElement>('main')?.focus({ preventScroll: true });
  }

  /** Loads the check screen and the engine on first use (a separate chunk, precached for offline use). */
  private async _loadCheckScreen(): Promise<void> {
    if (this._checkScreenReady) return;
    try {
      await import('../components/check-screen.js');
      this._checkScreenReady = true;
    } catch (e) {
      this._fatal = `The check screen could not be loaded (${e instanceof Error ? e.message : String(e)}). Reload the app.`;
    }
  }

  /** Loads the walkdown screens on first use (their own chunk, precached for offline use). */
  private async _loadSiteScreen(): Promise<void> {
    if (this._siteScreenReady) return;
    try {
      await import('./walkdown-screen.js');
      this._siteScreenReady = true;
    } catch (e) {
      this._fatal = `The walkdown screens could not be loaded (${e instanceof Error ? e.message : String(e)}). Reload the app.`;
    }
  }

  // ── tanks ──────────────────────────────────────────────────────────────────────────────
  private _tank(id: string): TankRecord | undefined {
    return this._tanks.find((t) => t.id === id);
  }

  private async _saveTank(e: CustomEvent<TankSaveDetail>): Promise<void> {
    if (!this._store) return;
    const now = new Date().toISOString();
    const tank = savedByUser(e.detail.tank, now);
    await this._store.putTank(tank);
    await this._reload();
    this._navigate({ name: 'check', id: tank.id });
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
    this._navigate({ name: 'edit', id: copy.id });
  }

  private async _deleteTank(e: CustomEvent<TankIdDetail>): Promise<void> {
    if (!this._store) return;
    const store = this._store;
    const removed = await store.deleteTank(e.detail.id);
    if (!removed) return;
    await this._reload();
    this._offerUndo(
      `Deleted “${removed.tank.name}” with ${removed.checks.length} saved check${removed.checks.length === 1 ? '' : 's'}.`,
      async () => {
        await store.restoreTank(removed);
        await this._reload();
      },
    );
    if (this._route.name !== 'tanks') this._navigate({ name: 'tanks' });
  }

  /** Asks once; then clears the demo tanks the user has not made their own, with an undo. */
  private _clearDemo(): void {
    const store = this._store;
    if (!store) return;
    this._confirm = {
      text: 'Remove the invented demo tanks? Demo tanks you edited or saved a check on are yours and stay.',
      yes: 'Remove the demo tanks',
      run: async () => {
        const removed = await store.clearDemo();
        await this._reload();
        const n = removed.tanks.length;
        if (n === 0) {
          this._info = 'No demo tanks to remove: the ones left are yours.';
          return;
        }
        this._offerUndo(`Removed ${n} demo tank${n === 1 ? '' : 's'}.`, async () => {
          await store.restoreRecords(removed);
          await this._reload();
        });
      },
    };
  }

  private async _confirmed(yes: boolean): Promise<void> {
    const c = this._confirm;
    this._confirm = null;
    if (yes && c) await c.run();
  }

  // ── checks and drafts ──────────────────────────────────────────────────────────────────
  private _onReadings(e: CustomEvent<ReadingsChange>): void {
    if (this._route.name !== 'check') return;
    this._pendingDraft = { tankId: this._route.id, readings: e.detail.readings };
    clearTimeout(this._draftTimer);
    this._draftTimer = setTimeout(this._flushDraft, DRAFT_DELAY_MS);
  }

  private readonly _flushDraft = (): void => {
    clearTimeout(this._draftTimer);
    const p = this._pendingDraft;
    this._pendingDraft = null;
    if (p && this._store)
      void this._store.putDraft({
        tankId: p.tankId,
        readings: p.readings,
        updatedAt: new Date().toISOString(),
      });
  };

  private async _saveCheck(e: CustomEvent<CheckSaveDetail>): Promise<void> {
    if (!this._store) return;
    const now = new Date().toISOString();
    const claim = claimByCheck(this._tank(e.detail.check.tankId), e.detail.check, now);
    if (claim.tank) await this._store.putTank(claim.tank);
    await this._store.putCheck(claim.check);
    this._flushDraft();
    await this._reload();
  }

  // ── fills ──────────────────────────────────────────────────────────────────────────────
  private async _startFill(e: CustomEvent<{ draft: FillDraft }>): Promise<void> {
    if (!this._store) return;
    await this._fill.start(this._store, e.detail.draft);
    this._navigate({ name: 'fill', id: e.detail.draft.tankId });
  }

  private async _saveFill(e: CustomEvent<{ record: FillRecord }>): Promise<void> {
    if (!this._store) return;
    await this._fill.save(this._store, e.detail.record, this._tank(e.detail.record.tankId));
    await this._reload();
    this._navigate({ name: 'check', id: e.detail.record.tankId });
  }

  private async _discardFill(e: CustomEvent<{ tankId: string }>): Promise<void> {
    if (!this._store) return;
    const store = this._store;
    const old = await this._fill.discard(store, e.detail.tankId);
    this._navigate({ name: 'check', id: e.detail.tankId });
    if (old)
      this._offerUndo('Discarded the fill under way.', async () => {
        await store.putFillDraft(old);
        this._navigate({ name: 'fill', id: old.tankId });
      });
  }

  private async _deleteCheck(e: CustomEvent<{ id: string }>): Promise<void> {
    if (!this._store) return;
    const store = this._store;
    const check = this._checks.find((c) => c.id === e.detail.id);
    if (!check) return;
    await store.deleteCheck(check.id);
    await this._reload();
    this._offerUndo('Deleted a saved check.', async () => {
      await store.putCheck(check);
      await this._reload();
    });
  }

  private _offerUndo(text: string, restore: () => Promise<void>): void {
    clearTimeout(this._undoTimer);
    this._undo = { text, restore };
    this._undoTimer = setTimeout(() => (this._undo = null), UNDO_MS);
  }

  // ── settings ───────────────────────────────────────────────────────────────────────────
  private async _saveSettings(e: CustomEvent<SettingsChange>): Promise<void> {
    this._settings = e.detail.settings;
    this._applyTheme();
    await this._store?.putSettings(this._settings);
  }

  // ── data ───────────────────────────────────────────────────────────────────────────────
  private async _export(): Promise<void> {
    if (!this._store) return;
    const backup = makeBackup(await this._store.exportAll());
    download(
      `tankside-backup-${stamp()}.json`,
      'application/json',
      JSON.stringify(backup, null, 1),
    );
    this._setData(
      `Exported ${backup.tanks.length} tanks and ${backup.checks.length} checks.`,
      'ok',
    );
  }

  private async _import(e: CustomEvent<BackupImportDetail>): Promise<void> {
    if (!this._store) return;
    const file = e.detail.file;
    if (file.size > BACKUP_MAX_BYTES) {
      this._setData(
        'This file is too large to be a backup from this app. Nothing was changed.',
        'error',
      );
      return;
    }
    let text: string;
    try {
      text = await file.text();
    } catch {
      this._setData('The file could not be read. Nothing was changed.', 'error');
      return;
    }
    const parsed = parseBackup(text);
    if (!parsed.ok) {
      this._setData(parsed.reason, 'error');
      return;
    }
    try {
      await this._store.importAll(parsed.data);
    } catch (err) {
      this._setData(
        `The import failed and nothing was changed (${err instanceof Error ? err.message : String(err)}).`,
        'error',
      );
      return;
    }
    if (parsed.data.settings) {
      this._settings = parsed.data.settings;
      this._applyTheme();
    }
    await this._reload();
    this._setData(
      `Imported ${parsed.data.tanks.length} tanks, ${parsed.data.checks.length} checks and ${parsed.data.fills?.length ?? 0} fills.`,
      'ok',
    );
  }

  private _csv(): void {
    const d = DisplayUnits.fromSettings(this._settings);
    download(
      `tankside-checks-${stamp()}.csv`,
      'text/csv',
      checksToCsv(this._tanks, this._checks, d),
    );
    this._setData(`Exported ${this._checks.length} checks as CSV.`, 'ok');
  }

  private _fillCsv(): void {
    const d = DisplayUnits.fromSettings(this._settings);
    const fills = this._fill.fills;
    download(`tankside-fills-${stamp()}.csv`, 'text/csv', fillsToCsv(this._tanks, fills, d));
    this._setData(`Exported ${fills.length} fills as CSV.`, 'ok');
  }

  private async _clearAll(): Promise<void> {
    if (!this._store) return;
    await this._store.clearAll();
    await this._reload();
    this._setData('All tanks and checks were deleted from this device.', 'ok');
  }

  private _setData(message: string, kind: 'ok' | 'error'): void {
    this._dataMessage = message;
    this._dataMessageKind = kind;
  }

  // ── notices ────────────────────────────────────────────────────────────────────────────
  private async _noticeAction(e: CustomEvent<NoticeDetail>): Promise<void> {
    if (e.detail.kind === 'update' && this._update) {
      this._flushDraft();
      this._update();
    } else if (e.detail.kind === 'undo' && this._undo) {
      const u = this._undo;
      this._undo = null;
      clearTimeout(this._undoTimer);
      await u.restore();
    }
  }

  private _noticeDismiss(e: CustomEvent<NoticeDetail>): void {
    const k = e.detail.kind;
    if (k === 'update') this._update = null;
    else if (k === 'offline-ready') this._offlineNote = false;
    else if (k === 'undo') this._undo = null;
    else this._info = '';
  }

  // ── render ─────────────────────────────────────────────────────────────────────────────
  private _screen() {
    const r = this._route;
    const display = DisplayUnits.fromSettings(this._settings);
    const sites = [...new Set(this._tanks.map((t) => t.site).filter(Boolean))].sort();
    switch (r.name) {
      case 'tanks': {
        const last = lastCheckByTank(this._checks);
        return html`<tank-list
          .tanks=${this._tanks}
          .lastChecks=${last}
          .display=${display}
          @tank-open=${(e: CustomEvent<TankIdDetail>) => this._navigate({ name: 'check', id: e.detail.id })}
          @tank-edit=${(e: CustomEvent<TankIdDetail>) => this._navigate({ name: 'edit', id: e.detail.id })}
          @tank-add=${() => this._navigate({ name: 'new' })}
          @tank-duplicate=${this._duplicate}
          @tank-delete=${this._deleteTank}
          @demo-clear=${this._clearDemo}
          @site-walk=${(e: CustomEvent<{ site: string }>) => this._navigate({ name: 'site', site: e.detail.site })}
        ></tank-list>`;
      }
      case 'site':
      case 'walk':
      case 'walkdown':
        if (!this._siteScreenReady) return html`<p>Loading…</p>`;
        return html`<site-screen
          .store=${this._store}
          view=${r.name === 'site' ? 'board' : r.name === 'walk' ? 'walk' : 'report'}
          site=${r.name === 'site' ? r.site : ''}
          walk-id=${r.name === 'site' ? '' : r.id}
          .settings=${this._settings}
          .tanks=${this._tanks}
          .checks=${this._checks}
        ></site-screen>`;
      case 'new':
        return html`<tank-form
          heading="Add a tank"
          .tank=${this._newTank}
          .display=${display}
          .sites=${sites}
          @tank-save=${this._saveTank}
          @tank-cancel=${() => this._navigate({ name: 'tanks' })}
        ></tank-form>`;
      case 'edit': {
        const t = this._tank(r.id);
        if (!t) return this._missingTank();
        return html`<tank-form
          heading="Edit tank"
          .tank=${t}
          .display=${display}
          .sites=${sites}
          @tank-save=${this._saveTank}
          @tank-cancel=${() => this._navigate({ name: 'check', id: t.id })}
        ></tank-form>`;
      }
      case 'check': {
        const t = this._tank(r.id);
        if (!t) return this._missingTank();
        if (!this._checkScreenReady || !this._draft || this._draft.tankId !== t.id)
          return html`<p>Loading…</p>`;
        return html`<check-screen
          .tank=${t}
          .settings=${this._settings}
          .readings=${this._draft.readings}
          .last=${this._draft.last}
          .checks=${this._checks.filter((c) => c.tankId === t.id)}
          .fills=${this._fill.fillsOf(t.id)}
          @fill-start=${this._startFill}
          @readings-change=${this._onReadings}
          @check-save=${this._saveCheck}
          @check-delete=${this._deleteCheck}
          @tank-edit=${() => this._navigate({ name: 'edit', id: t.id })}
        ></check-screen>`;
      }
      case 'fill': {
        const t = this._tank(r.id);
        if (!t) return this._missingTank();
        if (this._fill.error) return html`<p class="error">${this._fill.error}</p>`;
        if (!this._fill.ready || this._fill.draft === undefined) return html`<p>Loading…</p>`;
        return html`<fill-screen
          .tank=${t}
          .settings=${this._settings}
          .draft=${this._fill.draft}
          .fills=${this._fill.fillsOf(t.id)}
          @fill-draft-change=${(e: CustomEvent<{ draft: FillDraft }>) =>
            this._store && void this._fill.change(this._store, e.detail.draft)}
          @fill-save=${this._saveFill}
          @fill-discard=${this._discardFill}
        ></fill-screen>`;
      }
      case 'settings':
        return html`<settings-form
          .settings=${this._settings}
          @settings-change=${this._saveSettings}
        ></settings-form>`;
      case 'data':
        return html`<backup-panel
          tank-count=${this._tanks.length}
          check-count=${this._checks.length}
          demo-count=${this._tanks.filter((t) => t.demo).length}
          .persisted=${this._persisted}
          .message=${this._dataMessage}
          message-kind=${this._dataMessageKind}
          @backup-export=${this._export}
          @backup-import=${this._import}
          @csv-export=${this._csv}
          @fill-csv-export=${this._fillCsv}
          @demo-clear=${this._clearDemo}
          @data-clear=${this._clearAll}
        ></backup-panel>`;
      case 'not-found':
        return html`<div data-testid="not-found">
          <h2>Nothing here</h2>
          <p>This address is not a screen of the app.</p>
          <a class="button" href="#/">Go to the tanks</a>
        </div>`;
    }
  }

  private _missingTank() {
    return html`<div data-testid="not-found">
      <h2>Tank not found</h2>
      <p>It may have been deleted, or this link came from another device.</p>
      <a class="button" href="#/">Go to the tanks</a>
    </div>`;
  }

  override render() {
    const r = this._route.name;
    const current = (names: Route['name'][]) => (names.includes(r) ? 'page' : nothing);
    return html`
      <div data-testid="app" data-ready=${this._ready ? 'true' : 'false'}>
        <header>
          <h1 class="brand">Tankside</h1>
          <nav aria-label="Main">
            <a
              class="button"
              href="#/"
              data-testid="nav-tanks"
              aria-current=${current(['tanks', 'check', 'edit', 'new', 'fill', 'site', 'walk', 'walkdown'])}
              >Tanks</a
            >
            <a
              class="button"
              href="#/settings"
              data-testid="nav-settings"
              aria-current=${current(['settings'])}
              >Settings</a
            >
            <a class="button" href="#/data" data-testid="nav-data" aria-current=${current(['data'])}
              >Data</a
            >
          </nav>
        </header>
        <main tabindex="-1">
          ${this._fatal ? html`<p class="error" role="alert" data-testid="app-error">${this._fatal}</p>` : nothing}
          ${this._ready ? syncAddOns(this._route, this._settings, 'before') : nothing}
          ${this._ready ? this._screen() : html`<p>Loading…</p>`}
          ${this._ready ? syncAddOns(this._route, this._settings, 'after') : nothing}
        </main>
        <div
          class="notices"
          @notice-action=${this._noticeAction}
          @notice-dismiss=${this._noticeDismiss}
        >
          ${
            this._confirm
              ? html`<confirm-bar
                  .text=${this._confirm.text}
                  .yes=${this._confirm.yes}
                  no="Keep them"
                  @confirm-yes=${() => this._confirmed(true)}
                  @confirm-no=${() => this._confirmed(false)}
                ></confirm-bar>`
              : nothing
          }
          ${this._undo ? html`<app-notice kind="undo" .text=${this._undo.text} action="Undo"></app-notice>` : nothing}
          ${
            this._update
              ? html`<app-notice
                  kind="update"
                  text="A new version is ready — reload when you’re done."
                  action="Reload now"
                ></app-notice>`
              : nothing
          }
          ${
            this._offlineNote
              ? html`<app-notice
                  kind="offline-ready"
                  text="The app now works offline: checks need no signal."
                ></app-notice>`
              : nothing
          }
          ${this._info ? html`<app-notice kind="info" .text=${this._info}></app-notice>` : nothing}
        </div>
      </div>
    `;
  }
}

function stamp(d = new Date()): string {
  return d.toISOString().slice(0, 10);
}

/** Saves text as a file through a temporary link (no network involved). */
function download(name: string, type: string, text: string): void {
  const url = URL.createObjectURL(new Blob([text], { type }));
  const a = document.createElement('a');
  a.href = url;
  a.download = name;
  a.rel = 'noopener';
  document.body.append(a);
  a.click();
  a.remove();
  setTimeout(() => URL.revokeObjectURL(url), 10_000);
}

customElements.define('tankside-app', TanksideApp);

declare global {
  interface HTMLElementTagNameMap {
    'tankside-app': TanksideApp;
  }
}
