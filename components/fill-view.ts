/**
 * The read-only parts of the fill screen as template functions: the before-readings kept at the
 * start, and the verdict with the figures behind it, all in the user's units.
 */
import { html, nothing } from 'lit';
import { formatPercent, type DisplayUnits } from './display.js';
import { fillFindingText } from './messages.js';
import { formatDate } from './format-date.js';
import type { FillDraft } from './fill-types.js';
import type { FillOutcome } from './fill-run.js';
import type { FillVerdict } from '../thermo/fill/index.js';

/** The verdict's heading, in plain words; never permission. */
const HEADINGS: Record<FillVerdict, string> = {
  consistent: 'The gauge agrees with the meter within the band',
  'gauge-low': 'The gauge reads low: the tank holds more than it shows',
  'gauge-high': 'The gauge reads high: the tank holds less than it shows',
  'over-limit': 'Over the fill limit after the delivery',
};

const pts = (x: number, round: 'nearest' | 'down' = 'nearest') =>
  `${formatPercent(x, round).replace(' %', '')} points`;

export function renderBefore(f: FillDraft, d: DisplayUnits) {
  const b = f.start.before;
  const us = d.units.temperature === 'F';
  return html`<section class="box" data-testid="fill-before">
    <h3>Before the delivery</h3>
    <p class="muted">Kept from the check of ${formatDate(f.start.startedAt)}.</p>
    <dl>
      <dt>Liquid temperature</dt>
      <dd>${d.format('temperature', b.liquidTemperature)}</dd>
      <dt>${b.gaugePercent === null ? 'Contents read by' : 'Float gauge'}</dt>
      <dd>
        ${
          b.gaugePercent === null
            ? b.contentsSource === 'netMass'
              ? 'weight'
              : 'level'
            : formatPercent(b.gaugePercent)
        }
      </dd>
      <dt>Contents</dt>
      <dd>${d.format('mass', b.totalMass)}</dd>
      <dt>Fill limit (rounded down)</dt>
      <dd>${d.format('mass', b.maxMass, 'down')}</dd>
      <dt>Stop at, on the float gauge</dt>
      <dd>${formatPercent(b.stopAtGaugePercent, 'down')}</dd>
      <dt>Room left (rounded down)</dt>
      <dd>${d.format('mass', b.roomLeftMass, 'down')}</dd>
      <dt>${us ? 'Room left as a 60 °F meter reads it' : 'Room left as liquid now'}</dt>
      <dd>${d.format('volume', us ? b.roomLeftVolumeAt60F : b.roomLeftVolume, 'down')}</dd>
    </dl>
  </section>`;
}

export function renderVerdict(o: FillOutcome | null, d: DisplayUnits, invalid: boolean) {
  if (invalid)
    return html`<p class="box" data-testid="fill-missing">
      A figure above is not valid: fix the marked field to see the reconciliation.
    </p>`;
  if (!o || o.refusal) return nothing;
  const r = o.result;
  if (!r)
    return html`<p class="box" data-testid="fill-missing">
      To compare the gauge with the meter, enter ${o.missing.join(' and ')}.
    </p>`;
  return html`<section
    class="box verdict ${r.level}"
    data-testid="fill-verdict"
    data-verdict=${r.verdict}
    data-expected-percent=${String(r.expectedGaugePercent)}
    aria-live="polite"
  >
    <h3><span class="level ${r.level}">${r.level}</span> ${HEADINGS[r.verdict]}</h3>
    <ul>
      ${r.findings
        .filter((x) => x.code !== 'standing')
        .map(
          (x) =>
            html`<li>
              <span class="level ${x.level}">${x.level}</span> ${fillFindingText(x, d)}
            </li>`,
        )}
    </ul>
    <dl>
      <dt>Float gauge after, as read</dt>
      <dd>${formatPercent(r.gaugePercent)}</dd>
      <dt>Expected from the meter</dt>
      <dd>${formatPercent(r.expectedGaugePercent)}</dd>
      <dt>Reading minus expected</dt>
      <dd>${r.difference >= 0.05 ? '+' : ''}${pts(r.difference)}</dd>
      <dt>Agreement band</dt>
      <dd>±${pts(r.band.halfWidth, 'down')}</dd>
      <dt>Delivered (by the meter)</dt>
      <dd>${d.format('mass', r.deliveredMass)}</dd>
      <dt>Contents expected after</dt>
      <dd>${d.format('mass', r.expectedMass)}</dd>
      <dt>Fill limit after (rounded down)</dt>
      <dd>${d.format('mass', r.maxMass, 'down')}</dd>
      <dt>Stop at, at the after temperature</dt>
      <dd>${formatPercent(r.stopAtGaugePercent, 'down')}</dd>
      ${
        r.overMass > 0
          ? html`<dt>Over the limit by (rounded up)</dt>
              <dd>${d.format('mass', r.overMass, 'up')}</dd>`
          : nothing
      }
      <dt>Liquid temperature after</dt>
      <dd>${d.format('temperature', r.afterTemperature)}</dd>
    </dl>
  </section>`;
}
