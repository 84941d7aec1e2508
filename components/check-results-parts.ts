/**
 * The figures of `<check-results>` as templates: the key cards, the cautions, the sections and
 * the gauge diagnosis. They render inside the element's shadow root, so every data-testid and
 * heading id is the element's own.
 */
import { allowanceText } from './peak-words.js';
import { html, nothing, type TemplateResult } from 'lit';
import { formatPercent, type DisplayUnits, type Quantity, type Rounding } from './display.js';
import type { Caution, TankCheckResult } from '../thermo/check/types.js';
import { stopPlace } from './fill-words.js';
import { causeText, cautionText } from './messages.js';
import { baseLabel, keyFigures } from './key-figures.js';
import { base60, fillLimitDetail } from './results-limit.js';
import { phaseWords } from './phase-words.js';
import { T_CHECK_MAX_K } from '../thermo/limits.js';

/** The result's figures in the user's units, with the thermometer tolerance shown beside temperatures. */
export class ResultView {
  constructor(
    readonly display: DisplayUnits,
    /** Thermometer tolerance, K (±); 0 hides it. */
    readonly thermometerTolerance: number,
    /** No forecast was entered: the peak figures are for today's liquid temperature. */
    readonly peakEstimated: boolean,
  ) {}

  fig(
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

  tempWithTolerance(testid: string, K: number | null, none: string): TemplateResult {
    const tol = this.thermometerTolerance;
    return html`${this.fig(testid, 'temperature', K, 'down', none)}${
      K !== null && tol > 0
        ? html`<span class="muted note">
            ± ${this.display.format('temperatureDifference', tol, 'up')}</span
          >`
        : nothing
    }`;
  }

  cautions(list: Caution[]): TemplateResult {
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

  headroom(testid: string, pa: number): TemplateResult {
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
  roomLeft(r: TankCheckResult): TemplateResult {
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
    ${baseLabel(d)} (${this.fig('room-left', 'mass', k.roomLeftMass, 'down')})`;
  }

  /** The three key cards: fill limit, peak day, liquid-full. */
  keyCards(r: TankCheckResult): TemplateResult {
    const d = this.display;
    const f = r.fillLimit;
    // An assumed relief setting is never shown as if read from the nameplate.
    const assumed = r.cautions.some((c) => c.code === 'relief-assumed');
    const p = r.peak;
    return html`
      <div class="key">
        <div class="card">
          <h3>Fill limit</h3>
          <div class="big">${this.fig('fill-limit', 'mass', f.maxMass, 'down')}</div>
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
          <p>${this.roomLeft(r)}</p>
        </div>
        <div class="card">
          <h3>Peak day${this.peakEstimated ? ' (no forecast entered)' : ''}</h3>
          <div class="big">${this.fig('peak-pressure', 'gaugePressure', p.pGauge, 'up')}</div>
          <p>
            at a liquid temperature of ${this.fig('peak-temperature', 'temperature', p.temperature)}
          </p>
          <p class="note">
            Up to
            <strong
              >${this.fig('peak-pressure-upper', 'gaugePressure', p.pGaugeUpper, 'up')}</strong
            >
            allowing for the model's uncertainty (${allowanceText(p.allowance, p.phase)}): both
            headrooms are measured from this figure.
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
            <dd>${this.headroom('peak-headroom-relief', p.headroomToRelief)}</dd>
            <dt>Headroom to design pressure</dt>
            <dd>${this.headroom('peak-headroom-design', p.headroomToDesign)}</dd>
          </dl>
        </div>
        <div class="card">
          <h3>Liquid-full at</h3>
          <div class="big">
            ${this.tempWithTolerance('liquid-full-temperature', r.liquidFullTemperature, 'Not reached')}
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
    `;
  }

  /** Cautions, the state now, contents, the fill limit's detail, heating and the gauge diagnosis. */
  sections(r: TankCheckResult): TemplateResult {
    const d = this.display;
    const c = r.contents;
    return html`
      <section aria-labelledby="h-cautions" id="cautions">
        <h3 id="h-cautions">Cautions</h3>
        ${this.cautions(r.cautions)}
      </section>

      <section aria-labelledby="h-now">
        <h3 id="h-now">Now</h3>
        <dl>
          <dt>Phase</dt>
          <dd data-testid="result-phase" data-si=${r.phase}>${phaseWords(r.phase, r.full)}</dd>
          <dt>Expected pressure</dt>
          <dd>
            ${this.fig('result-pressure', 'gaugePressure', r.pGauge, 'up')}
            <span class="muted">(${d.format('pressure', r.pAbs, 'up')})</span>
          </dd>
          <dt>Barometric pressure used</dt>
          <dd>${d.format('pressure', r.barometricPressureAbs)}</dd>
        </dl>
      </section>

      <section aria-labelledby="h-contents">
        <h3 id="h-contents">Contents</h3>
        <dl>
          <dt>Product</dt>
          <dd>${r.product.label}</dd>
          <dt>Total product</dt>
          <dd>${this.fig('result-total-mass', 'mass', c.totalMass)}</dd>
          <dt>Liquid volume</dt>
          <dd>${this.fig('result-liquid-volume', 'volume', c.liquidVolume)}</dd>
          <dt>Liquid volume at ${base60(d)}</dt>
          <dd>${this.fig('result-volume-60f', 'volume', c.liquidVolumeAt60F)}</dd>
          <dt>Liquid and vapour mass</dt>
          <dd>${d.format('mass', c.liquidMass)} + ${d.format('mass', c.vapourMass)}</dd>
          <dt>Filling density (of water capacity)</dt>
          <dd>${this.fig('result-filling-density', 'fraction', c.fillingDensity)}</dd>
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

      ${fillLimitDetail(r, d)} ${this.heating(r)} ${r.diagnosis ? this.diagnosis(r) : nothing}
    `;
  }

  heating(r: TankCheckResult): TemplateResult {
    const d = this.display;
    // An assumed relief setting is never shown as if read from the nameplate.
    const assumed = r.cautions.some((c) => c.code === 'relief-assumed');
    const p = r.peak;
    return html`
      <section aria-labelledby="h-heat">
        <h3 id="h-heat">Heating</h3>
        <dl>
          <dt>Phase at the peak</dt>
          <dd>${phaseWords(p.phase, p.full)}</dd>
          <dt>Peak pressure, absolute</dt>
          <dd>${d.format('pressure', p.pAbs, 'up')}</dd>
          <dt>
            Relief setting${assumed ? ' (assumed)' : ''} reached at (with the model's allowance)
          </dt>
          <dd>
            ${
              r.cautions.some((c) => c.code === 'relief-now')
                ? html`<span
                    data-testid="relief-temperature"
                    data-si=${String(r.reliefTemperature ?? '')}
                    class="over"
                    >Now: the pressure is already at or near the setting</span
                  >`
                : this.tempWithTolerance(
                    'relief-temperature',
                    r.reliefTemperature,
                    `Not below ${d.format('temperature', T_CHECK_MAX_K)}`,
                  )
            }
          </dd>
        </dl>
      </section>
    `;
  }

  diagnosis(r: TankCheckResult): TemplateResult {
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
}
