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
import { LitElement, html, nothing, type PropertyValues, type TemplateResult } from 'lit';
import { checkResultsStyles } from './check-results-styles.js';
import { baseStyles, levelStyles } from './styles.js';
import { DisplayUnits, formatPercent, type Quantity, type Rounding } from './display.js';
import { DEFAULT_SETTINGS } from './types.js';
import { T_CHECK_MAX_K } from '../thermo/limits.js';
import type { Caution, FullKind, TankCheckResult, TankPhase } from '../thermo/check/types.js';
import { stopPlace } from './fill-words.js';
import { causeText, cautionText } from './messages.js';
import { baseLabel, keyFigures } from './key-figures.js';
import { base60, fillLimitDetail } from './results-limit.js';

/** The standing caution shown when no result exists yet (the engine's own text is used when one does). */
export const STANDING_FALLBACK =
  'These figures come from a model and the entered readings. They support, and never replace, the site ' +
  'procedures, the applicable code and the judgement of a licensed, trained person.';

export const PHASE_WORDS: Record<TankPhase, string> = {
  'two-phase': 'Liquid and vapour',
  'liquid-full': 'Liquid-full: no vapour space',
  'vapour-only': 'Vapour only: no liquid',
  supercritical: 'Above the critical temperature: no liquid level',
};

/** The phase in words; a tank full of dense fluid is named as such (as hazardous as liquid-full). */
export function phaseWords(phase: TankPhase, full: FullKind | null | undefined): string {
  return full === 'dense-fluid'
    ? 'Full of dense fluid (above the critical temperature): no vapour space'
    : PHASE_WORDS[phase];
}

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

  private _fig(
    testid: string,
    q: Quantity,
    valueSI: number | null,
    round: Rounding = 'nearest',
    missing = '–',
  ): TemplateResult {
    const text = valueSI === null ? missing : this.display.format(q, valueSI, round);
    return html`<span data-testid=${testid} data-si=${valueSI === null ? '' : String(valueSI)}
      >${text}</span
    >`;
  }

  private _tempWithTolerance(testid: string, K: number | null, none: string): TemplateResult {
    const tol = this.thermometerTolerance;
    return html`${this._fig(testid, 'temperature', K, 'down', none)}${
      K !== null && tol > 0
        ? html`<span class="muted note">
            ± ${this.display.format('temperatureDifference', tol, 'up')}</span
          >`
        : nothing
    }`;
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

  private _cautions(list: Caution[]): TemplateResult {
    const ranked = list.filter((c) => c.code !== 'standing');
    if (ranked.length === 0)
      return html`<p class="muted">No further cautions from these figures.</p>`;
    return html`<ol class="cautions" aria-label="Cautions, most severe first">
      ${ranked.map(
        (c) =>
          html`<li data-testid="caution" data-level=${c.level} data-code=${c.code}>
            <span class="level ${c.level}">${c.level}</span>${cautionText(c, this.display)}
          </li>`,
      )}
    </ol>`;
  }

  private _headroom(testid: string, pa: number): TemplateResult {
    const d = this.display;
    if (pa < 0) {
      return html`<span data-testid=${testid} data-si=${String(pa)} class="over"
        >exceeded by ${d.format('pressureDifference', -pa, 'up')}</span
      >`;
    }
    return html`<span data-testid=${testid} data-si=${String(pa)}
      >${d.format('pressureDifference', pa, 'down')}</span
    >`;
  }

  /** Room left as liquid at the base temperature and as mass, or how far over the limit. */
  private _roomLeft(r: TankCheckResult): TemplateResult {
    const d = this.display;
    const k = keyFigures(r, d);
    if (k.over)
      return html`<strong class="over"
        >Over the limit by ${d.format('volume', -k.roomLeftVolume, 'up')} as liquid at
        ${baseLabel(d)} (<span data-testid="room-left" data-si=${String(k.roomLeftMass)}
          >${d.format('mass', -k.roomLeftMass, 'up')}</span
        >)</strong
      >`;
    return html`Room left ${d.format('volume', k.roomLeftVolume, 'down')} as liquid at
    ${baseLabel(d)} (${this._fig('room-left', 'mass', k.roomLeftMass, 'down')})`;
  }

  private _body(r: TankCheckResult): TemplateResult {
    const d = this.display;
    const f = r.fillLimit;
    // An assumed relief setting is never shown as if read from the nameplate.
    const assumed = r.cautions.some((c) => c.code === 'relief-assumed');
    const c = r.contents;
    const p = r.peak;
    return html`
      <div class="key">
        <div class="card">
          <h3>Fill limit</h3>
          <div class="big">${this._fig('fill-limit', 'mass', f.maxMass, 'down')}</div>
          <p>
            Stop at or below
            <strong
              ><span data-testid="fill-stop-percent" data-si=${String(f.stopAtGaugePercent)}
                >${formatPercent(f.stopAtGaugePercent, 'down')}</span
              ></strong
            >
            ${stopPlace(f)}: the figure to act on.
          </p>
          ${f.bindingNote ? html`<p class="why" data-testid="fill-stop-why">${f.bindingNote}</p>` : nothing}
          <p>${this._roomLeft(r)}</p>
        </div>
        <div class="card">
          <h3>Peak day${this.peakEstimated ? ' (no forecast entered)' : ''}</h3>
          <div class="big">${this._fig('peak-pressure', 'gaugePressure', p.pGauge, 'up')}</div>
          <p>
            at a liquid temperature of
            ${this._fig('peak-temperature', 'temperature', p.temperature)}
          </p>
          <dl>
            <dt>
              Headroom to relief
              setting${
                assumed
                  ? html` <span class="muted note"
                      >(not entered: assumed at the design pressure)</span
                    >`
                  : nothing
              }
            </dt>
            <dd>${this._headroom('peak-headroom-relief', p.headroomToRelief)}</dd>
            <dt>Headroom to design pressure</dt>
            <dd>${this._headroom('peak-headroom-design', p.headroomToDesign)}</dd>
          </dl>
        </div>
        <div class="card">
          <h3>Liquid-full at</h3>
          <div class="big">
            ${this._tempWithTolerance('liquid-full-temperature', r.liquidFullTemperature, 'Not reached')}
          </div>
          <p class="note">
            Liquid percent at the peak:
            <strong
              ><span data-testid="peak-liquid-percent" data-si=${String(p.liquidFraction)}
                >${d.format('fraction', p.liquidFraction, 'up')}</span
              ></strong
            >
          </p>
        </div>
      </div>

      <section aria-labelledby="h-cautions" id="cautions">
        <h3 id="h-cautions">Cautions</h3>
        ${this._cautions(r.cautions)}
      </section>

      <section aria-labelledby="h-now">
        <h3 id="h-now">Now</h3>
        <dl>
          <dt>Phase</dt>
          <dd data-testid="result-phase" data-si=${r.phase}>${phaseWords(r.phase, r.full)}</dd>
          <dt>Expected pressure</dt>
          <dd>
            ${this._fig('result-pressure', 'gaugePressure', r.pGauge, 'up')}
            <span class="muted">(${d.format('pressure', r.pAbs, 'up')})</span>
          </dd>
          <dt>Barometric pressure used</dt>
          <dd>${d.format('pressure', r.barometricPressure)}</dd>
        </dl>
      </section>

      <section aria-labelledby="h-contents">
        <h3 id="h-contents">Contents</h3>
        <dl>
          <dt>Product</dt>
          <dd>${r.product.label}</dd>
          <dt>Total product</dt>
          <dd>${this._fig('result-total-mass', 'mass', c.totalMass)}</dd>
          <dt>Liquid volume</dt>
          <dd>${this._fig('result-liquid-volume', 'volume', c.liquidVolume)}</dd>
          <dt>Liquid volume at ${base60(d)}</dt>
          <dd>${this._fig('result-volume-60f', 'volume', c.liquidVolumeAt60F)}</dd>
          <dt>Liquid and vapour mass</dt>
          <dd>${d.format('mass', c.liquidMass)} + ${d.format('mass', c.vapourMass)}</dd>
          <dt>Filling density (of water capacity)</dt>
          <dd>${this._fig('result-filling-density', 'fraction', c.fillingDensity)}</dd>
          <dt>Float gauge should read</dt>
          <dd>${formatPercent(c.liquidPercent)}</dd>
          ${
            c.levelHeight !== null
              ? html`<dt>Liquid level</dt>
                  <dd>${d.format('length', c.levelHeight)}</dd>`
              : nothing
          }
        </dl>
      </section>

      ${fillLimitDetail(r, d)}

      <section aria-labelledby="h-heat">
        <h3 id="h-heat">Heating</h3>
        <dl>
          <dt>Phase at the peak</dt>
          <dd>${phaseWords(p.phase, p.full)}</dd>
          <dt>Peak pressure, absolute</dt>
          <dd>${d.format('pressure', p.pAbs, 'up')}</dd>
          <dt>Relief setting${assumed ? ' (assumed)' : ''} reached at</dt>
          <dd>
            ${
              r.cautions.some((c) => c.code === 'relief-now')
                ? html`<span
                    data-testid="relief-temperature"
                    data-si=${String(r.reliefTemperature ?? '')}
                    class="over"
                    >Now: the pressure is already at or near the setting</span
                  >`
                : this._tempWithTolerance(
                    'relief-temperature',
                    r.reliefTemperature,
                    `Not below ${d.format('temperature', T_CHECK_MAX_K)}`,
                  )
            }
          </dd>
        </dl>
      </section>

      ${r.diagnosis ? this._diagnosis(r) : nothing}
    `;
  }

  private _diagnosis(r: TankCheckResult): TemplateResult {
    const g = r.diagnosis!;
    const d = this.display;
    const verdict =
      g.verdict === 'fits'
        ? 'fits the expected pressure'
        : g.verdict === 'high'
          ? 'reads HIGH'
          : 'reads LOW';
    return html`<section aria-labelledby="h-diag" data-testid="diagnosis" data-si=${g.verdict}>
      <h3 id="h-diag">Pressure gauge</h3>
      <p>
        The gauge ${verdict}: ${d.format('gaugePressure', g.readingGauge)} against
        ${d.format('gaugePressure', g.expectedGauge)} expected (difference
        ${d.format('pressureDifference', g.difference)}, allowed ±
        ${d.format('pressureDifference', g.tolerance, 'up')}).
      </p>
      ${
        g.causes.length
          ? html`<p>Likely causes, most likely first:</p>
              <ol>
                ${(g.causeCodes ?? []).map((c) => html`<li>${causeText(c)}</li>`)}
              </ol>`
          : nothing
      }
      ${
        g.temperatureForReading !== null
          ? html`<p class="note">
              The reading fits a liquid temperature of
              ${d.format('temperature', g.temperatureForReading)}.
            </p>`
          : nothing
      }
      ${
        g.propaneFraction !== null
          ? html`<p class="note">
              It fits a propane/butane mix of about
              ${d.format('fraction', g.propaneFraction, 'nearest', 0)} propane (by moles, estimate).
            </p>`
          : nothing
      }
    </section>`;
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
