/** Templates of <check-screen> kept apart so the element's file stays short. */
import { html, nothing, type TemplateResult } from 'lit';
import type { TankCheckResult } from '../thermo/check/types.js';
import type { HeatingCurve } from './chart-data.js';
import { curveLater } from './curve-later.js';
import { summarize, type CheckOutcome } from './check-input.js';
import type { DisplayUnits } from './display.js';
import { productLabel } from './products.js';
import { newId, type CheckRecord, type Readings, type TankRecord } from './types.js';

/** The tank's name and nameplate line, with "Edit tank". */
export function headPart(t: TankRecord, d: DisplayUnits, edit: () => void): TemplateResult {
  const np = t.nameplate;
  return html`<div class="head">
    <h2 data-testid="tank-heading">${t.name}${t.demo ? ' (demo, invented)' : ''}</h2>
    <button class="quiet no-print" @click=${edit}>Edit tank</button>
    <p class="plate">
      ${t.site ? html`${t.site} · ` : nothing}${productLabel(t.productId)} · W.C.
      ${d.format('volume', np.waterCapacity)} · MAWP
      ${d.format('gaugePressure', np.designPressureGauge)} ·
      ${
        np.reliefSetPressureGauge === undefined
          ? html`<span data-testid="relief-assumed"
              >relief not entered (assumed at the design pressure)</span
            >`
          : html`relief ${d.format('gaugePressure', np.reliefSetPressureGauge)}`
      }
    </p>
    <p class="print-only">Printed ${printedText()} from the readings below.</p>
  </div>`;
}

/** The time the head's "Printed …" line gives, to the minute (one call to the locale a minute). */
let printed = { minute: NaN, text: '' };
export function printedText(): string {
  const minute = Math.floor(Date.now() / 60_000);
  if (minute !== printed.minute) printed = { minute, text: new Date().toLocaleString() };
  return printed.text;
}

/** The heating chart's series and the liquid and peak temperatures it was asked for, K. */
export interface ShownCurve {
  curve: HeatingCurve;
  now: number;
  peak: number;
}

/**
 * Asks for the heating chart of a check's outcome a moment later (curve-later.ts); `show` gets
 * it with the temperatures it was asked for, so the chart's markers move with its series, not on
 * the keystroke. No result: no chart, at once. Returns the cancel.
 */
export function chartLater(
  productId: string,
  outcome: CheckOutcome,
  show: (c: ShownCurve | null) => void,
): () => void {
  if (!outcome.result || !outcome.input) {
    show(null);
    return () => {};
  }
  const now = outcome.input.liquidTemperature;
  const peak = outcome.result.peak.temperature;
  return curveLater(productId, outcome, (c) => show(c ? { curve: c, now, peak } : null));
}

/**
 * The heating chart with its heading. Its markers come with its series: a keystroke leaves the
 * chart alone until the new series arrives (the chart is drawn again once, not twice).
 */
export function chartPart(t: TankRecord, d: DisplayUnits, c: ShownCurve): TemplateResult {
  const np = t.nameplate;
  return html`<h3>Heating</h3>
    <check-chart
      .curve=${c.curve}
      .display=${d}
      .designPressureGauge=${np.designPressureGauge}
      .reliefPressureGauge=${np.reliefSetPressureGauge ?? np.designPressureGauge}
      .nowTemperature=${c.now}
      .peakTemperature=${c.peak}
    ></check-chart>`;
}

/** What the key bar shows, and whether a check is under way. */
export interface BarPart {
  result: TankCheckResult | null;
  display: DisplayUnits;
  outcome: CheckOutcome | null;
  error: string;
  stale: string;
  updating: boolean;
}

/**
 * The key bar: figures, or what is missing or wrong, and the standing caution in short; while a
 * check takes longer than a frame, the figures of the previous readings with "updating…".
 */
export function barPart(b: BarPart): TemplateResult {
  const o = b.outcome;
  const message = b.error
    ? 'No figures: fix the reading marked below.'
    : o?.missing.length
      ? `Enter ${o.missing.join(' and ')}: the stop-at percent and the room left show here.`
      : 'No figures yet.';
  return html`<div class="keybar" aria-busy=${b.updating ? 'true' : 'false'}>
    <key-bar
      .result=${b.result}
      .display=${b.display}
      .message=${message}
      .stale=${b.stale}
    ></key-bar>
    ${b.updating ? html`<p class="updating" data-testid="check-updating">updating…</p>` : nothing}
  </div>`;
}

/** The note on readings taken long ago ("2 Dec 2026, 14:05, 4 days old"), or nothing. */
export function stalePart(stale: string): TemplateResult | typeof nothing {
  if (!stale) return nothing;
  return html`<p class="stale" data-testid="readings-age" role="note">
    These readings were taken ${stale}. The figures are for then, not now: type today’s readings.
  </p>`;
}

/** The buttons under the results and the status line. */
export interface ActionsPart {
  /** Figures are on screen. */
  ready: boolean;
  fillStart: TemplateResult;
  save: () => void;
  share: () => void;
  print: () => void;
  clear: () => void;
  status: string;
  shareText: string;
}

export function actionsPart(a: ActionsPart): TemplateResult {
  return html`<div class="actions">
      <button class="primary" data-testid="check-save" ?disabled=${!a.ready} @click=${a.save}>
        Save check
      </button>
      ${a.fillStart}
      <button data-testid="check-share" ?disabled=${!a.ready} @click=${a.share}>
        Share summary
      </button>
      <button data-testid="check-print" ?disabled=${!a.ready} @click=${a.print}>Print</button>
      <button class="quiet" data-testid="readings-clear" @click=${a.clear}>Clear readings</button>
    </div>
    <p class="status" role="status" data-testid="check-status">${a.status}</p>
    ${
      a.shareText
        ? html`<label for="share-text">Summary</label
            ><textarea id="share-text" readonly .value=${a.shareText}></textarea>`
        : nothing
    }`;
}

/** A saved check: the readings on screen with the key figures of their result. */
export function checkRecordOf(
  tank: TankRecord,
  readings: Readings,
  result: TankCheckResult,
  display: DisplayUnits,
): CheckRecord {
  return {
    id: newId(),
    tankId: tank.id,
    at: new Date().toISOString(),
    readings,
    productLabel: result.product.label,
    summary: summarize(result, display),
    demo: tank.demo,
  };
}
