/**
 * Our own SVG chart of a closed tank heating up: pressure against liquid temperature with the
 * design-pressure and relief-setting lines, and liquid percent against temperature with the
 * 100 % line. Today's state and the forecast peak are marked and labelled in words, and lines
 * differ by dash pattern as well as colour, so nothing depends on colour alone.
 *
 * It only draws: the series comes in as a property (see chart-data.ts), the axes are in the
 * user's units through `DisplayUnits`.
 *
 * data-testid: `chart`, `chart-pressure`, `chart-liquid`.
 */
import { LitElement, html, svg, css, nothing, type SVGTemplateResult } from 'lit';
import { baseStyles } from './styles.js';
import { DisplayUnits } from './display.js';
import { DEFAULT_SETTINGS } from './types.js';
import type { HeatingCurve } from './chart-data.js';

const W = 360;
const H = 220;
const M = { left: 52, right: 14, top: 26, bottom: 38 };

interface Axis {
  min: number;
  max: number;
  ticks: number[];
}

/** Round tick values covering [lo, hi]. */
export function niceAxis(lo: number, hi: number, count = 5): Axis {
  if (!Number.isFinite(lo) || !Number.isFinite(hi)) return { min: 0, max: 1, ticks: [0, 1] };
  if (hi - lo < 1e-9) {
    lo -= 1;
    hi += 1;
  }
  const raw = (hi - lo) / count;
  const mag = 10 ** Math.floor(Math.log10(raw));
  const step = [1, 2, 2.5, 5, 10].map((s) => s * mag).find((s) => s >= raw) ?? 10 * mag;
  const min = Math.floor(lo / step) * step;
  const max = Math.ceil(hi / step) * step;
  const ticks: number[] = [];
  for (let v = min; v <= max + step / 2; v += step) ticks.push(Number(v.toPrecision(12)));
  return { min, max, ticks };
}

export class CheckChart extends LitElement {
  static override properties = {
    curve: { attribute: false },
    display: { attribute: false },
    designPressureGauge: { type: Number, attribute: 'design-pressure' },
    reliefPressureGauge: { type: Number, attribute: 'relief-pressure' },
    nowTemperature: { type: Number, attribute: 'now-temperature' },
    peakTemperature: { type: Number, attribute: 'peak-temperature' },
  };

  /** The closed-tank series, SI, or null (nothing drawn). */
  declare curve: HeatingCurve | null;
  /** The user's display units. */
  declare display: DisplayUnits;
  /** Design pressure / MAWP, Pa gauge. */
  declare designPressureGauge: number;
  /** Relief set pressure, Pa gauge. */
  declare reliefPressureGauge: number;
  /** Today's liquid temperature, K. */
  declare nowTemperature: number;
  /** Forecast peak liquid temperature, K. */
  declare peakTemperature: number;

  constructor() {
    super();
    this.curve = null;
    this.display = DisplayUnits.fromSettings(DEFAULT_SETTINGS);
    this.designPressureGauge = Number.NaN;
    this.reliefPressureGauge = Number.NaN;
    this.nowTemperature = Number.NaN;
    this.peakTemperature = Number.NaN;
  }

  static override styles = [
    baseStyles,
    css`
      figure {
        margin: 0 0 1rem;
      }
      svg {
        width: 100%;
        height: auto;
        display: block;
        background: var(--paper);
        border: var(--border-width) solid var(--line);
        border-radius: 0.4rem;
      }
      figcaption {
        font-size: 0.92em;
        margin-top: 0.25rem;
      }
      .axis {
        stroke: var(--ink);
        stroke-width: 1.5;
      }
      .grid {
        stroke: var(--line);
        stroke-width: 0.75;
      }
      .tick {
        fill: var(--ink);
        font-size: 12px;
      }
      .title {
        fill: var(--ink);
        font-size: 13px;
        font-weight: 700;
      }
      .curve {
        fill: none;
        stroke: var(--accent);
        stroke-width: 3;
      }
      .design {
        stroke: var(--warning);
        stroke-width: 2.5;
        stroke-dasharray: 10 5;
      }
      .relief {
        stroke: var(--danger);
        stroke-width: 2.5;
        stroke-dasharray: 3 4;
      }
      .full {
        stroke: var(--danger);
        stroke-width: 2.5;
        stroke-dasharray: 3 4;
      }
      .label {
        font-size: 12px;
        font-weight: 700;
        fill: var(--ink);
        paint-order: stroke;
        stroke: var(--paper);
        stroke-width: 3px;
      }
      .now {
        fill: var(--ink);
      }
      .peak {
        fill: var(--paper);
        stroke: var(--ink);
        stroke-width: 2.5;
      }
    `,
  ];

  private _panel(
    testid: string,
    title: string,
    yLabel: string,
    pts: { x: number; y: number }[],
    lines: { y: number; cls: string; text: string }[],
    marks: { x: number; y: number; kind: 'now' | 'peak' }[],
  ): SVGTemplateResult {
    const xs = pts.map((p) => p.x);
    const ys = [...pts.map((p) => p.y), ...lines.map((l) => l.y)];
    const xa = niceAxis(Math.min(...xs), Math.max(...xs));
    const ya = niceAxis(Math.min(0, ...ys), Math.max(...ys) * 1.05);
    const sx = (x: number) => M.left + ((x - xa.min) / (xa.max - xa.min)) * (W - M.left - M.right);
    const sy = (y: number) =>
      H - M.bottom - ((y - ya.min) / (ya.max - ya.min)) * (H - M.top - M.bottom);
    const path = pts
      .map((p, i) => `${i === 0 ? 'M' : 'L'}${sx(p.x).toFixed(1)},${sy(p.y).toFixed(1)}`)
      .join(' ');
    const tUnit = this.display.label('temperature');
    return svg`<svg viewBox="0 0 ${W} ${H}" role="img" aria-label=${title} data-testid=${testid} preserveAspectRatio="xMidYMid meet">
      <title>${title}</title>
      ${ya.ticks.map(
        (t) => svg`<line class="grid" x1=${M.left} x2=${W - M.right} y1=${sy(t)} y2=${sy(t)}></line>
          <text class="tick" x=${M.left - 4} y=${sy(t) + 4} text-anchor="end">${fmtTick(t)}</text>`,
      )}
      ${xa.ticks.map(
        (t) =>
          svg`<text class="tick" x=${sx(t)} y=${H - M.bottom + 15} text-anchor="middle">${fmtTick(t)}</text>`,
      )}
      <line class="axis" x1=${M.left} x2=${W - M.right} y1=${H - M.bottom} y2=${H - M.bottom}></line>
      <line class="axis" x1=${M.left} x2=${M.left} y1=${M.top} y2=${H - M.bottom}></line>
      <text class="title" x=${(M.left + W - M.right) / 2} y=${H - 4} text-anchor="middle">Liquid temperature (${tUnit})</text>
      <text class="title" x="4" y="16">${yLabel}</text>
      ${lines.map((l) => svg`<line class=${l.cls} x1=${M.left} x2=${W - M.right} y1=${sy(l.y)} y2=${sy(l.y)}></line>`)}
      ${labelRows(lines.map((l) => ({ y: sy(l.y), text: l.text }))).map(
        (l) => svg`<text class="label" x=${M.left + 4} y=${l.y - 4}>${l.text}</text>`,
      )}
      <path class="curve" d=${path}></path>
      ${marks.map((m) =>
        m.kind === 'now'
          ? svg`<circle class="now" cx=${sx(m.x)} cy=${sy(m.y)} r="6"></circle>
              <text class="label" x=${sx(m.x) + 8} y=${sy(m.y) + 16}>now</text>`
          : svg`<rect class="peak" x=${sx(m.x) - 6} y=${sy(m.y) - 6} width="12" height="12"></rect>
              <text class="label" x=${sx(m.x) - 8} y=${sy(m.y) - 10} text-anchor="end">peak</text>`,
      )}
    </svg>`;
  }

  override render() {
    const c = this.curve;
    if (!c || c.points.length < 2) return nothing;
    const d = this.display;
    const x = (T: number) => d.fromSI('temperature', T);
    const pg = (pAbs: number) => d.gaugeFromAbsolute(pAbs);
    const pressurePts = c.points.map((p) => ({ x: x(p.T), y: pg(p.pAbs) }));
    const liquidPts = c.points.map((p) => ({
      x: x(p.T),
      y: d.fromSI('fraction', p.liquidFraction),
    }));
    const points = c.points;
    const at = (T: number) =>
      points.reduce((best, p) => (Math.abs(p.T - T) < Math.abs(best.T - T) ? p : best));
    const marks = (f: (p: (typeof points)[number]) => number) =>
      [
        Number.isFinite(this.nowTemperature)
          ? { x: x(this.nowTemperature), y: f(at(this.nowTemperature)), kind: 'now' as const }
          : null,
        Number.isFinite(this.peakTemperature)
          ? { x: x(this.peakTemperature), y: f(at(this.peakTemperature)), kind: 'peak' as const }
          : null,
      ].filter((m): m is { x: number; y: number; kind: 'now' | 'peak' } => m !== null);
    const pLines: { y: number; cls: string; text: string }[] = [];
    if (Number.isFinite(this.designPressureGauge))
      pLines.push({
        y: d.fromSI('gaugePressure', this.designPressureGauge),
        cls: 'design',
        text: 'design (MAWP)',
      });
    if (Number.isFinite(this.reliefPressureGauge))
      pLines.push({
        y: d.fromSI('gaugePressure', this.reliefPressureGauge),
        cls: 'relief',
        text: 'relief setting',
      });
    const pUnit = d.label('gaugePressure');
    return html`<div data-testid="chart">
      <figure>
        ${this._panel(
          'chart-pressure',
          `Pressure (${pUnit}) against liquid temperature, closed tank`,
          `Pressure (${pUnit})`,
          pressurePts,
          pLines,
          marks((p) => pg(p.pAbs)),
        )}
        <figcaption>
          Pressure of this tank as the liquid warms (same contents). Dashed: design pressure;
          dotted: relief setting.
        </figcaption>
      </figure>
      <figure>
        ${this._panel(
          'chart-liquid',
          'Liquid percent of the tank volume against liquid temperature',
          'Liquid (% of volume)',
          liquidPts,
          [{ y: d.fromSI('fraction', 1), cls: 'full', text: '100 % liquid-full' }],
          marks((p) => d.fromSI('fraction', p.liquidFraction)),
        )}
        <figcaption>
          How full of liquid the tank becomes as it warms. Dotted: 100 %, liquid-full.
        </figcaption>
      </figure>
    </div>`;
  }
}

/** Line labels in screen y; labels closer than a text line are merged ("design = relief setting"). */
export function labelRows(lines: { y: number; text: string }[]): { y: number; text: string }[] {
  const sorted = [...lines].sort((a, b) => a.y - b.y);
  const out: { y: number; text: string }[] = [];
  for (const l of sorted) {
    const last = out.at(-1);
    if (last && Math.abs(l.y - last.y) < 14) last.text = `${last.text} = ${l.text}`;
    else out.push({ ...l });
  }
  return out;
}

function fmtTick(v: number): string {
  return Math.abs(v) >= 1000 ? v.toFixed(0) : String(Number(v.toPrecision(4)));
}

customElements.define('check-chart', CheckChart);

declare global {
  interface HTMLElementTagNameMap {
    'check-chart': CheckChart;
  }
}
