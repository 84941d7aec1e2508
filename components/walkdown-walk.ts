/**
 * The walk: one tank at a time in the walk's order, starting from each tank's latest readings so
 * only what changed is typed; "Next tank" records the tank and moves on without taking the focus
 * out of the fields (the phone keyboard stays up); "Could not reach" with a reason; finish with
 * who checked. Every step fires `walk-change` with the new record, which the host saves at once,
 * so a reload or a flat battery resumes here.
 *
 * @fires walk-change - `CustomEvent<{ walk: WalkdownRecord }>`
 * @fires walk-finish - `CustomEvent<{ walk: WalkdownRecord }>` (finished record)
 *
 * data-testid: `walkdown-progress`, `walkdown-tank`, `walkdown-liquid-temperature`,
 * `walkdown-gauge-percent`, `walkdown-level-height`, `walkdown-net-mass`, `walkdown-pressure`,
 * `walkdown-note`, `walkdown-next`, `walkdown-back`, `walkdown-skip-reason`, `walkdown-skip`,
 * `walkdown-checked-by`, `walkdown-finish`, `walkdown-stop` (with `data-index`, `data-tank-id`,
 * `data-status`).
 */
import { LitElement, html, css, nothing } from 'lit';
import { baseStyles, levelStyles } from './styles.js';
import { DisplayUnits } from './display.js';
import './number-field.js';
import type { NumberField, NumberFieldChange } from './number-field.js';
import { DEFAULT_SETTINGS, type Readings, type Settings, type TankRecord } from './types.js';
import { READING_RANGES } from './check-form.js';
import { T_RANGE_K } from './check-input.js';
import { TEXT_LIMITS } from './limits.js';
import { progress, type WalkdownRecord } from './walkdown-types.js';
import { checkEntry, editEntry, finishWalk, goTo, nextIndex, skipEntry } from './walkdown-ops.js';
import { STANDING_WALK, cautionText, resultLines, statusText } from './walkdown-words.js';

const CONTENTS = {
  gaugePercent: { label: 'Float gauge', testid: 'walkdown-gauge-percent', unit: '%' },
  levelHeight: { label: 'Liquid level', testid: 'walkdown-level-height', unit: '' },
  netMass: { label: 'Net mass on scale', testid: 'walkdown-net-mass', unit: '' },
} as const;

export class WalkdownWalk extends LitElement {
  static override properties = {
    walk: { attribute: false },
    tanks: { attribute: false },
    settings: { attribute: false },
    display: { attribute: false },
    checkedBy: { type: String, attribute: 'checked-by' },
    _reason: { state: true },
    _invalid: { state: true },
  };

  declare walk: WalkdownRecord | null;
  declare tanks: TankRecord[];
  declare settings: Settings;
  declare display: DisplayUnits;
  /** Who checked, remembered from the last walk. */
  declare checkedBy: string;
  declare _reason: string;
  /** Fields whose typed text is not a valid value now. */
  declare _invalid: string[];

  constructor() {
    super();
    this.walk = null;
    this.tanks = [];
    this.settings = DEFAULT_SETTINGS;
    this.display = DisplayUnits.fromSettings(DEFAULT_SETTINGS);
    this.checkedBy = '';
    this._reason = '';
    this._invalid = [];
  }

  static override styles = [
    baseStyles,
    levelStyles,
    css`
      .bar h2 {
        margin: 0;
        font-size: 1.1em;
        overflow-wrap: anywhere;
      }
      .bar p {
        margin: 0.2rem 0 0.5rem;
        font-weight: 800;
      }
      .go {
        display: grid;
        grid-template-columns: 1fr 2fr;
        gap: 0.5rem;
        margin: 0.5rem 0;
      }
      textarea,
      input[type='text'] {
        font: inherit;
        width: 100%;
        min-height: 48px;
        padding: 0.5rem;
        border: var(--border-width) solid var(--ink);
        border-radius: 0.5rem;
      }
      fieldset {
        border: var(--border-width) solid var(--line);
        border-radius: 0.6rem;
        margin: 0 0 0.75rem;
      }
      ol {
        padding-left: 1.5rem;
      }
      .stops button {
        width: 100%;
        justify-content: flex-start;
        text-align: left;
        font-weight: 400;
      }
      .line {
        display: block;
        overflow-wrap: anywhere;
      }
      .standing {
        font-size: 0.92em;
      }
    `,
  ];

  private _emit(walk: WalkdownRecord): void {
    this.walk = walk;
    this.dispatchEvent(
      new CustomEvent('walk-change', { detail: { walk }, bubbles: true, composed: true }),
    );
  }

  private _field(key: keyof Readings) {
    return (e: CustomEvent<NumberFieldChange>) => {
      const w = this.walk;
      if (!w) return;
      const rest = this._invalid.filter((k) => k !== key);
      this._invalid = e.detail.valid ? rest : [...rest, key];
      if (!e.detail.valid) return;
      const e0 = w.entries[w.current]!;
      this._emit(editEntry(w, w.current, { readings: { ...e0.readings, [key]: e.detail.value } }));
    };
  }

  private _next(): void {
    const w = this.walk;
    if (!w || this._invalid.length) return;
    const done = checkEntry(w, w.current, this._tank(w.entries[w.current]!.tankId), this.settings);
    this._moveTo(done, nextIndex(done));
  }

  private _moveTo(w: WalkdownRecord, i: number): void {
    this._invalid = [];
    this._reason = '';
    this._emit(goTo(w, i));
    // The same input stays in the page for the next tank: the focus and the keyboard stay up.
    this.renderRoot.querySelector<NumberField>('number-field')?.focus();
  }

  private _skip(): void {
    const w = this.walk;
    if (!w) return;
    const skipped = skipEntry(w, w.current, this._reason);
    this._moveTo(skipped, nextIndex(skipped));
  }

  private _finish(): void {
    const w = this.walk;
    if (!w) return;
    const who = this.renderRoot.querySelector<HTMLInputElement>('#who')?.value ?? this.checkedBy;
    const done = finishWalk(w, who);
    this.walk = done;
    this.dispatchEvent(
      new CustomEvent('walk-finish', { detail: { walk: done }, bubbles: true, composed: true }),
    );
  }

  private _tank(id: string): TankRecord | undefined {
    return this.tanks.find((t) => t.id === id);
  }

  private _fields(r: Readings, tank: TankRecord | undefined) {
    const d = this.display;
    const c = CONTENTS[r.contentsMode];
    const mode = r.contentsMode;
    const q = mode === 'levelHeight' ? 'length' : mode === 'netMass' ? 'mass' : null;
    return html`<number-field
        label="Liquid temperature"
        name="liquidTemperature"
        quantity="temperature"
        testid="walkdown-liquid-temperature"
        required
        .display=${d}
        .value=${r.liquidTemperature}
        .min=${T_RANGE_K.min}
        .max=${T_RANGE_K.max}
        @value-change=${this._field('liquidTemperature')}
      ></number-field>
      <number-field
        label=${c.label}
        name=${mode}
        .quantity=${q}
        unit-text=${c.unit}
        testid=${c.testid}
        required
        .decimals=${mode === 'gaugePercent' ? 1 : undefined}
        .display=${d}
        .value=${r[mode]}
        .min=${READING_RANGES[mode].min}
        .max=${READING_RANGES[mode].max}
        @value-change=${this._field(mode)}
      ></number-field>
      <number-field
        label="Pressure gauge (optional)"
        name="pressureReadingGauge"
        quantity="gaugePressure"
        testid="walkdown-pressure"
        .display=${d}
        .value=${r.pressureReadingGauge}
        .min=${-d.barometricPressureAbs}
        .max=${READING_RANGES.pressureReadingGaugeMax}
        @value-change=${this._field('pressureReadingGauge')}
      ></number-field>
      ${tank ? nothing : html`<p class="error">This tank was deleted; it can only be skipped.</p>`}`;
  }

  private _current(w: WalkdownRecord) {
    const e = w.entries[w.current]!;
    const tank = this._tank(e.tankId);
    const d = this.display;
    return html`<fieldset data-testid="walkdown-tank" data-tank-id=${e.tankId}>
      <legend>Tank ${w.current + 1} of ${w.entries.length}: ${e.tankName}</legend>
      <p class="line">${statusText(e)}</p>
      ${
        e.result
          ? html`${resultLines(e.result, d).map((l) => html`<span class="line">${l}</span>`)}
              <ul>
                ${e.result.cautions
                  .filter((c) => c.code !== 'standing')
                  .map(
                    (c) =>
                      html`<li>
                        <span class="level ${c.level}">${c.level}</span> ${cautionText(c, d)}
                      </li>`,
                  )}
              </ul>`
          : nothing
      }
      ${this._fields(e.readings, tank)}
      <label for="note">Note (optional)</label>
      <textarea
        id="note"
        data-testid="walkdown-note"
        maxlength=${TEXT_LIMITS.notes}
        .value=${e.note}
        @change=${(ev: Event) =>
          this._emit(editEntry(w, w.current, { note: (ev.target as HTMLTextAreaElement).value }))}
      ></textarea>
      <div class="go">
        <button
          data-testid="walkdown-back"
          ?disabled=${w.current === 0}
          @mousedown=${(ev: Event) => ev.preventDefault()}
          @click=${() => this._moveTo(w, w.current - 1)}
        >
          Back
        </button>
        <button
          class="primary"
          data-testid="walkdown-next"
          ?disabled=${!tank || this._invalid.length > 0}
          @mousedown=${(ev: Event) => ev.preventDefault()}
          @click=${this._next}
        >
          Next tank
        </button>
      </div>
      <details>
        <summary>Could not reach this tank</summary>
        <label for="reason">Why</label>
        <input
          id="reason"
          type="text"
          data-testid="walkdown-skip-reason"
          maxlength=${TEXT_LIMITS.notes}
          .value=${this._reason}
          @input=${(ev: Event) => (this._reason = (ev.target as HTMLInputElement).value)}
        />
        <button data-testid="walkdown-skip" @click=${this._skip}>Mark as not reached</button>
      </details>
    </fieldset>`;
  }

  override render() {
    const w = this.walk;
    if (!w || !w.entries.length) return html`<p>No tanks to walk at this site.</p>`;
    const p = progress(w);
    return html`
      <div class="bar">
        <h2>Walkdown: ${w.site}</h2>
        <p role="status" data-testid="walkdown-progress" data-done=${p.done} data-total=${p.total}>
          ${p.done} of ${p.total} checked
        </p>
      </div>
      ${this._current(w)}
      <fieldset>
        <legend>Finish</legend>
        <label for="who">Checked by</label>
        <input
          id="who"
          type="text"
          data-testid="walkdown-checked-by"
          maxlength=${TEXT_LIMITS.name}
          .value=${w.checkedBy || this.checkedBy}
          @change=${(ev: Event) => this._emit({ ...w, checkedBy: (ev.target as HTMLInputElement).value })}
        />
        <p>
          ${p.total - p.done ? `${p.total - p.done} not visited yet: they are recorded as such.` : 'Every tank is done.'}
        </p>
        <button class="primary" data-testid="walkdown-finish" @click=${this._finish}>
          Finish and save the record
        </button>
      </fieldset>
      <ol class="stops" aria-label="Tanks on this walk">
        ${w.entries.map(
          (e, i) =>
            html`<li>
              <button
                class="quiet"
                data-testid="walkdown-stop"
                data-index=${i}
                data-tank-id=${e.tankId}
                data-status=${e.status}
                aria-current=${i === w.current ? 'step' : nothing}
                @click=${() => this._moveTo(w, i)}
              >
                ${e.tankName} — ${statusText(e)}
              </button>
            </li>`,
        )}
      </ol>
      <p class="standing" role="note">${STANDING_WALK}</p>
    `;
  }
}

customElements.define('walkdown-walk', WalkdownWalk);

declare global {
  interface HTMLElementTagNameMap {
    'walkdown-walk': WalkdownWalk;
  }
}
