/**
 * The figures of one tank check, laid out for a phone in the sun: the fill limit and the
 * peak-day figures first, then the cautions, contents, diagnosis and the rest. It only lays out
 * what `checkTank` returned; every number is formatted through `DisplayUnits` with the rounding
 * the engine applied carried on toward safety (limits and room left down, pressures up).
 *
 * The standing caution is shown on every state of the element: with a result, with an error
 * and with readings still missing. A short summary is announced politely to screen readers
 * (a hidden `aria-live="polite"` region) once typing pauses, so each keystroke is not read out.
 *
 * No result is worded as permission: the element says what the figures are, never "go".
 *
 * data-testid: `results`, `standing-caution`, `fill-limit`, `fill-stop-percent`, `fill-stop-why` (why the stop is where it is, when not simply the weight limit), `room-left`,
 * `room-left-volume`, `room-left-volume-60f`, `fill-binding`, `result-phase`, `result-pressure`,
 * `result-total-mass`, `result-liquid-volume`, `result-filling-density`, `result-volume-60f`,
 * `peak-temperature`, `peak-pressure`, `peak-headroom-design`, `peak-headroom-relief`,
 * `peak-liquid-percent`, `liquid-full-temperature`, `relief-temperature`, `diagnosis`,
 * `caution` (with `data-level` and `data-code`), `results-missing`, `results-error`,
 * `results-announcer`. Each figure carries its raw SI value in `data-si`.
 */
import { LitElement, html, type PropertyValues, type TemplateResult } from 'lit';
import { checkResultsStyles } from './check-results-styles.js';
import { baseStyles, levelStyles } from './styles.js';
import { DisplayUnits, formatPercent } from './display.js';
import { DEFAULT_SETTINGS } from './types.js';
import type { TankCheckResult } from '../thermo/check/types.js';
import { stopPlace } from './fill-words.js';
import { cautionText } from './messages.js';
import { ResultView } from './check-results-parts.js';
import { OffscreenHold } from './offscreen-hold.js';

/** The standing caution shown when no result exists yet (the engine's own text is used when one does). */
export const STANDING_FALLBACK =
  'These figures come from a model and the entered readings. They support, and never replace, the site ' +
  'procedures, the applicable code and the judgement of a licensed, trained person.';

/** Delay before the polite summary is updated, ms: long enough that typing is not read out. */
const ANNOUNCE_DELAY_MS = 1200;

export class CheckResults extends LitElement {
  static override properties = {
    result: { attribute: false },
    display: { attribute: false },
    missing: { attribute: false },
    error: { type: String },
    peakEstimated: { type: Boolean, attribute: 'peak-estimated' },
    thermometerTolerance: { type: Number, attribute: 'thermometer-tolerance' },
    _announce: { state: true },
  };

  /** The check result, or null while readings are missing or invalid. */
  declare result: TankCheckResult | null;
  /** The user's display units. */
  declare display: DisplayUnits;
  /** Names of the readings still needed (shown instead of figures). */
  declare missing: string[];
  /** An error message from the check (shown instead of figures). */
  declare error: string;
  /** True when no forecast was entered and the peak figures are for today's liquid temperature. */
  declare peakEstimated: boolean;
  /** Thermometer tolerance, K (±), shown beside the temperatures. 0 hides it. */
  declare thermometerTolerance: number;
  declare _announce: string;

  private _timer: ReturnType<typeof setTimeout> | undefined;
  /** While the figures are far off screen (a reading being typed above), they are redrawn when idle. */
  private readonly _hold = new OffscreenHold(this);

  constructor() {
    super();
    this.result = null;
    this.display = DisplayUnits.fromSettings(DEFAULT_SETTINGS);
    this.missing = [];
    this.error = '';
    this.peakEstimated = false;
    this.thermometerTolerance = 0;
    this._announce = '';
  }

  static override styles = [baseStyles, levelStyles, checkResultsStyles];

  protected override shouldUpdate(changed: PropertyValues<this>): boolean {
    return this._hold.allow(changed);
  }

  /** Also waits for figures held while off screen, so whoever awaits this sees the current ones. */
  protected override async getUpdateComplete(): Promise<boolean> {
    const done = await super.getUpdateComplete();
    const held = this._hold.pending;
    if (!held) return done;
    await held;
    return this.getUpdateComplete();
  }

  protected override updated(changed: PropertyValues<this>): void {
    if (changed.has('result') || changed.has('missing') || changed.has('error')) {
      clearTimeout(this._timer);
      this._timer = setTimeout(() => (this._announce = this._summaryText()), ANNOUNCE_DELAY_MS);
    }
  }

  override disconnectedCallback(): void {
    super.disconnectedCallback();
    clearTimeout(this._timer);
  }

  /** One or two sentences for the screen reader. */
  private _summaryText(): string {
    const r = this.result;
    if (this.error) return `Check not possible: ${this.error}`;
    if (!r)
      return this.missing.length ? `Enter ${this.missing.join(' and ')} to see the results.` : '';
    const d = this.display;
    const top = r.cautions.find((c) => c.code !== 'standing');
    return [
      `Fill limit ${d.format('mass', r.fillLimit.maxMass, 'down')}; stop at ${formatPercent(r.fillLimit.stopAtGaugePercent, 'down')} ${stopPlace(r.fillLimit)}.`,
      `Peak-day pressure ${d.format('gaugePressure', r.peak.pGauge, 'up')}.`,
      top ? `${capital(top.level)}: ${cautionText(top, d)}` : '',
    ]
      .filter(Boolean)
      .join(' ');
  }

  /** The standing caution in short, with the whole text one tap away. */
  private _standing(): TemplateResult {
    const text = this.result?.standingCaution ?? STANDING_FALLBACK;
    return html`<details class="standing" data-testid="standing-caution" role="note">
      <summary>
        <strong>Always:</strong> model figures only; site procedures, the code and licensed practice
        come first. <span class="more">Read the whole caution</span>
      </summary>
      <p>${text}</p>
    </details>`;
  }

  private _body(r: TankCheckResult): TemplateResult {
    const v = new ResultView(this.display, this.thermometerTolerance, this.peakEstimated);
    return html`${v.keyCards(r)} ${v.sections(r)}`;
  }

  override render() {
    let body: TemplateResult;
    if (this.error) {
      body = html`<p class="missing error" data-testid="results-error" role="alert">
        ${this.error}
      </p>`;
    } else if (!this.result) {
      body = html`<p class="missing" data-testid="results-missing">
        ${this.missing.length ? html`Enter ${this.missing.join(' and ')} to see the figures.` : 'No figures yet.'}
      </p>`;
    } else body = this._body(this.result);
    return html`
      <div data-testid="results">${this._standing()} ${body}</div>
      <p class="visually-hidden" aria-live="polite" data-testid="results-announcer">
        ${this._announce}
      </p>
    `;
  }
}

function capital(s: string): string {
  return s.charAt(0).toUpperCase() + s.slice(1);
}

customElements.define('check-results', CheckResults);

declare global {
  interface HTMLElementTagNameMap {
    'check-results': CheckResults;
  }
}
