/**
 * The last readings of a reopened tank, dated, with one tap to reuse them. Shown above blank
 * readings; its figures are those of then, said so, never shown as current.
 *
 * @fires readings-reuse - `CustomEvent<{ readings: Readings }>` when the user taps reuse.
 *
 * data-testid: `last-check` (with `data-at`, the ISO time), `last-check-reuse`.
 */
import { LitElement, html, css, nothing } from 'lit';
import { baseStyles } from './styles.js';
import { DisplayUnits, formatPercent } from './display.js';
import { DEFAULT_SETTINGS, type Readings } from './types.js';
import { ageText, whenText, type LastReadings } from './reopen.js';

/** The measured readings in one short line, in the user's units. */
export function readingsShort(r: Readings, d: DisplayUnits): string {
  const parts: string[] = [];
  if (r.liquidTemperature !== null) parts.push(d.format('temperature', r.liquidTemperature));
  if (r.contentsMode === 'gaugePercent' && r.gaugePercent !== null)
    parts.push(`float gauge ${formatPercent(r.gaugePercent)}`);
  if (r.contentsMode === 'levelHeight' && r.levelHeight !== null)
    parts.push(`level ${d.format('length', r.levelHeight)}`);
  if (r.contentsMode === 'netMass' && r.netMass !== null)
    parts.push(`scale ${d.format('mass', r.netMass)}`);
  if (r.pressureReadingGauge !== null)
    parts.push(`gauge ${d.format('gaugePressure', r.pressureReadingGauge)}`);
  return parts.join(' · ');
}

export class LastCheck extends LitElement {
  static override properties = {
    last: { attribute: false },
    display: { attribute: false },
  };

  declare last: LastReadings | null;
  declare display: DisplayUnits;

  constructor() {
    super();
    this.last = null;
    this.display = DisplayUnits.fromSettings(DEFAULT_SETTINGS);
  }

  static override styles = [
    baseStyles,
    css`
      .card {
        border: var(--border-width) dashed var(--ink);
        border-radius: 0.5rem;
        padding: 0.5rem 0.75rem;
        margin: 0 0 0.75rem;
        background: var(--paper-2);
      }
      p {
        margin: 0 0 0.4rem;
        overflow-wrap: anywhere;
      }
      button {
        width: 100%;
      }
    `,
  ];

  private _reuse(): void {
    if (!this.last) return;
    this.dispatchEvent(
      new CustomEvent<{ readings: Readings }>('readings-reuse', {
        detail: { readings: this.last.readings },
        bubbles: true,
        composed: true,
      }),
    );
  }

  override render() {
    const l = this.last;
    if (!l) return nothing;
    const d = this.display;
    const s = l.summary;
    return html`<div class="card" data-testid="last-check" data-at=${l.at}>
      <p>
        <strong>Last check, ${whenText(l.at)}</strong> (${ageText(l.at)} ago):
        ${readingsShort(l.readings, d) || 'no readings'}.
      </p>
      ${
        s
          ? html`<p class="muted">
              Then: stop at or below ${formatPercent(s.stopAtGaugePercent, 'down')} on the float
              gauge;
              ${
                s.roomLeftMass < 0
                  ? `over the limit by ${d.format('mass', -s.roomLeftMass, 'up')}`
                  : `room left ${d.format('mass', s.roomLeftMass, 'down')}`
              }.
            </p>`
          : nothing
      }
      <p>The readings below start blank: type today’s readings.</p>
      <button data-testid="last-check-reuse" @click=${this._reuse}>
        Use the last readings again
      </button>
    </div>`;
  }
}

customElements.define('last-check', LastCheck);

declare global {
  interface HTMLElementTagNameMap {
    'last-check': LastCheck;
  }
}
