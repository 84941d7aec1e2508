/**
 * The screens of the shell, one template per route. They render into the shell's own shadow
 * root (the e2e tests find `check-screen` there) and only lay out what the shell hands them:
 * the data in `ScreenContext`, the handlers in `ScreenHandlers`.
 */
import { html, type TemplateResult } from 'lit';
import { DisplayUnits } from '../components/display.js';
import type { TankSaveDetail } from '../components/tank-form.js';
import type { TankIdDetail } from '../components/tank-list.js';
import type { CheckSaveDetail } from '../components/check-screen.js';
import type { ReadingsChange } from '../components/check-form.js';
import type { SettingsChange } from '../components/settings-form.js';
import type { BackupImportDetail } from '../components/backup-panel.js';
import type { FillDraft, FillRecord } from '../components/fill-types.js';
import type { CheckBrief, CheckRecord, Settings, TankRecord } from '../components/types.js';
import type { Route } from './router.js';
import type { Store } from './storage.js';
import type { OpenDraft } from './drafts.js';
import type { FillController } from './fill-route.js';
import type { DataController } from './data-controller.js';
import type { RegisterHead } from './register-load.js';
import { tanksScreen } from './tanks-screen.js';
import '../components/tank-form.js';
import '../components/settings-form.js';
import '../components/backup-panel.js';

/** The shell's handlers of screen events (called with the shell as `this`, as lit does). */
export interface ScreenHandlers {
  duplicate(e: CustomEvent<TankIdDetail>): void;
  deleteTank(e: CustomEvent<TankIdDetail>): void;
  clearDemo(): void;
  saveTank(e: CustomEvent<TankSaveDetail>): void;
  readings(e: CustomEvent<ReadingsChange>): void;
  saveCheck(e: CustomEvent<CheckSaveDetail>): void;
  deleteCheck(e: CustomEvent<{ id: string }>): void;
  startFill(e: CustomEvent<{ draft: FillDraft }>): void;
  fillDraftChange(e: CustomEvent<{ draft: FillDraft }>): void;
  saveFill(e: CustomEvent<{ record: FillRecord }>): void;
  discardFill(e: CustomEvent<{ tankId: string }>): void;
  saveSettings(e: CustomEvent<SettingsChange>): void;
  importFile(e: CustomEvent<BackupImportDetail>): void;
}

export interface ScreenContext {
  route: Route;
  store: Store | null;
  settings: Settings;
  tanks: TankRecord[];
  checks: CheckRecord[];
  /** Newest check per tank, for the list. */
  lastChecks: Record<string, CheckBrief | undefined>;
  /** The list's first screen while the whole register is still being read (start-up), else null. */
  first: RegisterHead | null;
  /** The blank tank of the "add a tank" screen. */
  newTank: TankRecord;
  draft: OpenDraft | null;
  fill: FillController;
  data: DataController;
  persisted: boolean | null;
  checkScreenReady: boolean;
  siteScreenReady: boolean;
  navigate(route: Route): void;
  on: ScreenHandlers;
}

const loading = () => html`<p>Loading…</p>`;

export function renderScreen(c: ScreenContext): TemplateResult {
  const r = c.route;
  const tank = (id: string) => c.tanks.find((t) => t.id === id);
  // Until the whole register is read, only the list (its first screen) can be shown.
  if (c.first && r.name !== 'tanks') return loading();
  switch (r.name) {
    case 'tanks':
      return tanksScreen(c);
    case 'site':
    case 'walk':
    case 'walkdown':
      return siteScreen(c, r);
    case 'new':
      return tankForm(c, 'Add a tank', c.newTank, { name: 'tanks' });
    case 'edit': {
      const t = tank(r.id);
      return t ? tankForm(c, 'Edit tank', t, { name: 'check', id: t.id }) : missingTank();
    }
    case 'check': {
      const t = tank(r.id);
      return t ? checkScreen(c, t) : missingTank();
    }
    case 'fill': {
      const t = tank(r.id);
      return t ? fillScreen(c, t) : missingTank();
    }
    case 'settings':
      return html`<settings-form
        .settings=${c.settings}
        @settings-change=${c.on.saveSettings}
      ></settings-form>`;
    case 'data':
      return dataScreen(c);
    case 'not-found':
      return html`<div data-testid="not-found">
        <h2>Nothing here</h2>
        <p>This address is not a screen of the app.</p>
        <a class="button" href="#/">Go to the tanks</a>
      </div>`;
  }
}

function siteScreen(
  c: ScreenContext,
  r: Extract<Route, { name: 'site' | 'walk' | 'walkdown' }>,
): TemplateResult {
  if (!c.siteScreenReady) return loading();
  return html`<site-screen
    .store=${c.store}
    view=${r.name === 'site' ? 'board' : r.name === 'walk' ? 'walk' : 'report'}
    site=${r.name === 'site' ? r.site : ''}
    walk-id=${r.name === 'site' ? '' : r.id}
    .settings=${c.settings}
    .tanks=${c.tanks}
    .checks=${c.checks}
  ></site-screen>`;
}

function tankForm(
  c: ScreenContext,
  heading: string,
  tank: TankRecord,
  cancelTo: Route,
): TemplateResult {
  const sites = [...new Set(c.tanks.map((t) => t.site).filter(Boolean))].sort();
  return html`<tank-form
    heading=${heading}
    .tank=${tank}
    .display=${DisplayUnits.fromSettings(c.settings)}
    .sites=${sites}
    @tank-save=${c.on.saveTank}
    @tank-cancel=${() => c.navigate(cancelTo)}
  ></tank-form>`;
}

function checkScreen(c: ScreenContext, t: TankRecord): TemplateResult {
  if (!c.checkScreenReady || !c.draft || c.draft.tankId !== t.id) return loading();
  return html`<check-screen
    .tank=${t}
    .settings=${c.settings}
    .readings=${c.draft.readings}
    .last=${c.draft.last}
    .siteRules=${c.draft.rules}
    .checks=${c.checks.filter((k) => k.tankId === t.id)}
    .fills=${c.fill.fillsOf(t.id)}
    @fill-start=${c.on.startFill}
    @readings-change=${c.on.readings}
    @check-save=${c.on.saveCheck}
    @check-delete=${c.on.deleteCheck}
    @tank-edit=${() => c.navigate({ name: 'edit', id: t.id })}
  ></check-screen>`;
}

function fillScreen(c: ScreenContext, t: TankRecord): TemplateResult {
  if (c.fill.error) return html`<p class="error">${c.fill.error}</p>`;
  if (!c.fill.ready || c.fill.draft === undefined) return loading();
  return html`<fill-screen
    .tank=${t}
    .settings=${c.settings}
    .draft=${c.fill.draft}
    .fills=${c.fill.fillsOf(t.id)}
    @fill-draft-change=${c.on.fillDraftChange}
    @fill-save=${c.on.saveFill}
    @fill-discard=${c.on.discardFill}
  ></fill-screen>`;
}

function dataScreen(c: ScreenContext): TemplateResult {
  return html`<backup-panel
    tank-count=${c.tanks.length}
    check-count=${c.checks.length}
    demo-count=${c.tanks.filter((t) => t.demo).length}
    .persisted=${c.persisted}
    .message=${c.data.message}
    message-kind=${c.data.kind}
    @backup-export=${c.data.exportBackup}
    @backup-import=${c.on.importFile}
    @csv-export=${c.data.checksCsv}
    @fill-csv-export=${c.data.fillsCsv}
    @demo-clear=${c.on.clearDemo}
    @data-clear=${c.data.clearAll}
  ></backup-panel>`;
}

export function missingTank(): TemplateResult {
  return html`<div data-testid="not-found">
    <h2>Tank not found</h2>
    <p>It may have been deleted, or this link came from another device.</p>
    <a class="button" href="#/">Go to the tanks</a>
  </div>`;
}
