/**
 * The answer first: a bar that stays at the top of the check screen while the readings are
 * typed (so it stays in view with the on-screen keyboard up) and shows the float-gauge percent
 * to stop at or below, the room left as liquid at the base temperature (60 °F, or 15 °C in °C)
 * and as mass, and the peak-day pressure with its headroom to the relief setting. Old readings
 * are marked with their age; an over-full tank reads "over the limit by …".
 *
 * data-testid: `key-bar`, `key-stop-percent`, `key-site-rule` (when the site's own rule sets the stop), `key-room-left-volume`, `key-room-left-mass`,
 * `key-peak`, `key-level`, `key-stale`, `key-empty`. Figures carry their SI value in `data-si`
 * (the room left is negative when over the limit).
 */
import { LitElement, html, css, nothing, type TemplateResult } from 'lit';
import { baseStyles, levelStyles } from './styles.js';
import { DisplayUnits, formatPercent } from './display.js';
import { DEFAULT_SETTINGS } from './types.js';
import { upperDiffers } from './peak-words.js';
import { baseLabel, keyFigures, keyWords } from './key-figures.js';
import type { TankCheckResult } from '../thermo/check/types.js';

export class KeyBar extends LitElement {
  static override properties = {
    result: { attribute: false },
    display: { attribute: false },
    message: { type: String },
    stale: { type: String },
  };

  /** The current result, or null. */
  declare result: TankCheckResult | null;
  declare display: DisplayUnits;
  /** Shown instead of figures when there is no result (what is missing, or what to fix). */
  declare message: string;
  /** When the readings are old: "2 Dec 2026, 14:05, 4 days old". Empty for current readings. */
  declare stale: string;

  constructor() {
    super();
    this.result = null;
    this.display = DisplayUnits.fromSettings(DEFAULT_SETTINGS);
    this.message = '';
    this.stale = '';
  }

  static override styles = [
    baseStyles,
    levelStyles,
    css`
      .bar {
        background: var(--ink);
        color: var(--paper);
        padding: 0.35rem 0.75rem 0.4rem;
        line-height: 1.25;
      }
      .bar.stale {
        background: var(--paper-2);
        color: var(--ink);
        border: 3px dashed var(--ink);
      }
      .figs {
        display: grid;
        grid-template-columns: auto minmax(0, 1fr);
        gap: 0 1rem;
        margin: 0;
      }
      .label {
        font-size: 0.75em;
        font-weight: 600;
      }
      .big {
        display: block;
        font-size: 1.25em;
        font-weight: 800;
        line-height: 1.15;
        font-variant-numeric: tabular-nums;
        overflow-wrap: anywhere;
      }
      .sub {
        font-size: 0.75em;
      }
      @media (max-width: 22.5rem) {
        /* Keeps "1234.5 US gal" on one line on a 320 px phone. */
        .big {
          font-size: 1.1em;
        }
      }
      .peak {
        font-size: 0.8em;
        font-weight: 600;
        margin-top: 0.15rem;
        overflow-wrap: anywhere;
      }
      .standing {
        font-size: 0.75em;
        margin-top: 0.15rem;
      }
      .stale-note {
        font-weight: 800;
        margin: 0 0 0.2rem;
      }
      .level {
        font-size: 0.8em;
        margin-left: 0.2rem;
      }
      p {
        margin: 0;
      }
    `,
  ];

  private _figures(r: TankCheckResult): TemplateResult {
    const d = this.display;
    const k = keyFigures(r, d);
    const words = keyWords(k, d);
    const top = r.cautions.find((c) => c.code !== 'standing');
    const relief =
      k.headroomToRelief < 0
        ? html`<strong
            >${d.format('pressureDifference', -k.headroomToRelief, 'up')} over
            relief${k.reliefAssumed ? ' (assumed)' : ''}</strong
          >`
        : html`${d.format('pressureDifference', k.headroomToRelief, 'down')} to
          relief${k.reliefAssumed ? ' (assumed)' : ''}`;
    const round = k.over ? 'up' : 'down';
    return html`
      <div class="figs" role="group" aria-label="Key figures">
        <div>
          <div class="label">Stop at or below</div>
          <span class="big" data-testid="key-stop-percent" data-si=${String(k.stopAtPercent)}
            >${formatPercent(k.stopAtPercent, 'down')}</span
          >
          <div class="sub">
            float
            gauge${k.siteRule ? html`, <span data-testid="key-site-rule">site’s own rule</span>` : nothing}
          </div>
        </div>
        <div>
          <div class="label">${k.over ? 'Over the limit by' : 'Room left'}</div>
          <span class="big" data-testid="key-room-left-volume" data-si=${String(k.roomLeftVolume)}
            >${d.format('volume', Math.abs(k.roomLeftVolume), round)}</span
          >
          <div class="sub">
            liquid at ${baseLabel(d)} ·
            <span data-testid="key-room-left-mass" data-si=${String(k.roomLeftMass)}
              >${d.format('mass', Math.abs(k.roomLeftMass), round)}</span
            >
          </div>
        </div>
      </div>
      <p class="peak" data-testid="key-peak" data-si=${String(k.headroomToRelief)}>
        Peak
        ${
          upperDiffers(k.peakUpper, d)
            ? html`${d.number('gaugePressure', k.peakGauge, 'up')}, up to
                <span data-testid="key-peak-upper" data-si=${String(k.peakUpper.upper)}
                  >${d.format('gaugePressure', k.peakUpper.upper!, 'up')}</span
                >`
            : d.format('gaugePressure', k.peakGauge, 'up')
        }
        · ${relief}
        ${
          top
            ? html`<span class="level ${top.level}" data-testid="key-level">${top.level}</span
                ><span class="visually-hidden">: see the cautions below the readings</span>`
            : nothing
        }
      </p>
      <p class="visually-hidden">${words.stop}. ${words.room}. ${words.peak}.</p>
    `;
  }

  override render() {
    const r = this.result;
    return html`<div class="bar ${this.stale ? 'stale' : ''}" data-testid="key-bar">
      ${this.stale ? html`<p class="stale-note" data-testid="key-stale">Old readings (${this.stale}): figures for then, not now.</p>` : nothing}
      ${r ? this._figures(r) : html`<p data-testid="key-empty">${this.message || 'No figures yet.'}</p>`}
      <p class="standing">Model figures: site procedures and the code come first.</p>
    </div>`;
  }
}

customElements.define('key-bar', KeyBar);

declare global {
  interface HTMLElementTagNameMap {
    'key-bar': KeyBar;
  }
}
