/**
 * The Data screen's work: the backup file out and in (validated whole before anything is
 * written), the CSV exports and clearing the device, with the message the screen shows.
 */
import type { ReactiveController, ReactiveControllerHost } from 'lit';
import { DisplayUnits } from '../components/display.js';
import type { CheckRecord, Settings, TankRecord } from '../components/types.js';
import type { FillRecord } from '../components/fill-types.js';
import { checksToCsv } from './csv.js';
import { fillsToCsv } from './fill-csv.js';
import { download, stamp } from './download.js';
import type { Store } from './storage.js';

/** What the controller reads from and tells the shell. */
export interface DataSource {
  store(): Store | null;
  /** The records and settings as they are now. */
  current(): {
    settings: Settings;
    tanks: TankRecord[];
    checks: CheckRecord[];
    fills: FillRecord[];
  };
  /** Settings came with an imported backup. */
  importedSettings(settings: Settings): void;
  /** Stored records changed: read them again. */
  reload(): Promise<void>;
}

export class DataController implements ReactiveController {
  message = '';
  kind: 'ok' | 'error' = 'ok';

  constructor(
    private readonly host: ReactiveControllerHost,
    private readonly app: DataSource,
  ) {
    host.addController(this);
  }

  hostConnected(): void {}

  /** A new screen starts without the last screen's message. */
  clearMessage(): void {
    this.message = '';
  }

  private _say(message: string, kind: 'ok' | 'error'): void {
    this.message = message;
    this.kind = kind;
    this.host.requestUpdate();
  }

  readonly exportBackup = async (): Promise<void> => {
    const store = this.app.store();
    if (!store) return;
    // The backup module validates fills with the engine: loaded on use, not with the app shell.
    const { makeBackup } = await import('./backup.js');
    const backup = makeBackup(await store.exportAll());
    download(
      `tankside-backup-${stamp()}.json`,
      'application/json',
      JSON.stringify(backup, null, 1),
    );
    this._say(`Exported ${backup.tanks.length} tanks and ${backup.checks.length} checks.`, 'ok');
  };

  readonly importFile = async (file: File): Promise<void> => {
    const store = this.app.store();
    if (!store) return;
    const { BACKUP_MAX_BYTES, parseBackup } = await import('./backup.js');
    if (file.size > BACKUP_MAX_BYTES) {
      this._say(
        'This file is too large to be a backup from this app. Nothing was changed.',
        'error',
      );
      return;
    }
    let text: string;
    try {
      text = await file.text();
    } catch {
      this._say('The file could not be read. Nothing was changed.', 'error');
      return;
    }
    const parsed = parseBackup(text);
    if (!parsed.ok) {
      this._say(parsed.reason, 'error');
      return;
    }
    try {
      await store.importAll(parsed.data);
    } catch (err) {
      this._say(
        `The import failed and nothing was changed (${err instanceof Error ? err.message : String(err)}).`,
        'error',
      );
      return;
    }
    if (parsed.data.settings) this.app.importedSettings(parsed.data.settings);
    await this.app.reload();
    this._say(
      `Imported ${parsed.data.tanks.length} tanks, ${parsed.data.checks.length} checks and ${parsed.data.fills?.length ?? 0} fills.`,
      'ok',
    );
  };

  readonly checksCsv = (): void => {
    const { tanks, checks, settings } = this.app.current();
    const d = DisplayUnits.fromSettings(settings);
    download(`tankside-checks-${stamp()}.csv`, 'text/csv', checksToCsv(tanks, checks, d));
    this._say(`Exported ${checks.length} checks as CSV.`, 'ok');
  };

  readonly fillsCsv = (): void => {
    const { tanks, fills, settings } = this.app.current();
    const d = DisplayUnits.fromSettings(settings);
    download(`tankside-fills-${stamp()}.csv`, 'text/csv', fillsToCsv(tanks, fills, d));
    this._say(`Exported ${fills.length} fills as CSV.`, 'ok');
  };

  readonly clearAll = async (): Promise<void> => {
    const store = this.app.store();
    if (!store) return;
    await store.clearAll();
    await this.app.reload();
    this._say('All tanks and checks were deleted from this device.', 'ok');
  };
}
