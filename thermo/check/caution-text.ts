/**
 * The engine's default English wording of each caution and diagnosis cause, from its code and
 * parameters (US trade units first, SI in brackets, rounded as each parameter says). An app
 * writes the same codes in its user's units with its own catalogue instead.
 */
import { formatQuantity } from '../units.js';
import { fmtAbs, fmtDiff, fmtGauge, fmtMass, fmtPct, fmtT } from './format.js';
import type { CautionCode, CauseCode, MessageNumber, MessageParams } from './codes.js';
import { STANDING_CAUTION } from './standing.js';

/** CO2 triple point: 216.592 K at 517.96 kPa absolute (Span & Wagner 1996, J. Phys. Chem. Ref. Data 25, 1509). */
export const CO2_TRIPLE_POINT_PA = 517_960;

export const CAUSE_TEXT: Record<CauseCode, string> = {
  'liquid-full-high':
    'The tank is liquid-full: with no vapour space the pressure climbs steeply with temperature.',
  'non-condensable':
    'Air or another non-condensable gas in the vapour space (for example a new or opened tank that was not purged).',
  'lighter-components':
    'Lighter components than the product entered (for example ethane or propane in butane).',
  'different-product': 'A different product from the one entered.',
  'liquid-warmer':
    'The liquid is warmer than the thermometer shows (sun on the shell, or a thermometer reading the air).',
  'gauge-error-high': 'Gauge error: a zero offset, a damaged gauge or one of the wrong range.',
  'liquid-full-uncertain':
    'The tank is liquid-full: its pressure then depends steeply on the exact fill and temperature, so the expected figure is uncertain.',
  'no-liquid-left':
    'There may be no liquid left: a tank holding vapour only shows less than the vapour pressure.',
  'liquid-colder':
    'The liquid is colder than the thermometer shows (a recent withdrawal or venting chills the liquid).',
  'heavier-components':
    'Heavier components than the product entered (for example butane in propane).',
  'vapour-draw':
    'Vapour being drawn off faster than the liquid boils, pulling the pressure down for a while.',
  'gauge-error-low': 'Gauge error: a zero offset, a blocked or damaged gauge.',
  'composition-shift-high':
    'This blend glides between its bubble and dew points: contents richer in its volatile components than the nominal blend (recovered vapour, or product taken from another cylinder’s vapour side) read higher.',
  'composition-shift-low':
    'This blend glides between its bubble and dew points: a vapour-only withdrawal or a vapour leak takes more of its volatile components and leaves a liquid whose pressure is lower than the nominal blend’s.',
};

type Fmt = (name: string) => string;

/** English default text of each caution code. */
const TEXT: Record<CautionCode, (f: Fmt, p: MessageParams) => string> = {
  'liquid-full-now': (f) =>
    `The figures show the tank liquid-full now at ${f('temperature')}: there is no vapour space, and the pressure rises steeply with any warming. The contents are ${f('fillingDensity')} of the water weight capacity.`,
  'dense-fluid-now': (f) =>
    `The tank is full of dense fluid now: at ${f('temperature')}, above the critical temperature ${f('criticalTemperature')}, the contents (${f('fillingDensity')} of the water weight capacity) are denser than the critical density. There is no vapour space, and the pressure rises as steeply with warming as in a liquid-full tank.`,
  'relief-now': (f) =>
    `The expected pressure now, ${f('pressure')} (up to ${f('upper')} with the model allowance), is at or near the relief set pressure ${f('relief')}: the relief valve may be discharging.`,
  'supercritical-now': (f) =>
    `The liquid temperature ${f('temperature')} is above the critical temperature ${f('criticalTemperature')}: there is no liquid surface, so a level or float gauge means nothing; only the weight tells the contents.`,
  'co2-below-triple-point': (f) =>
    `Pressure below the CO2 triple-point pressure ${f('tripleAbsolute')} = ${f('threshold')} here: liquid CO2 cannot exist below it, and dry ice (solid CO2) can form and block lines and valves. Do not vent or withdraw liquid; follow the supplier's procedure.`,
  vacuum: (f, p) =>
    `The tank is under vacuum (${f('pressure')}${p['source'] === 'reading' ? ', gauge reading' : `, expected at ${f('temperature')}`}): no vapour will flow to appliances, and air can be drawn in through a leak or an open valve.`,
  'below-mdmt': (f) =>
    `The liquid at ${f('temperature')} is colder than the minimum design metal temperature ${f('mdmt')}: the shell may be brittle; avoid shocks and pressure changes and follow the site procedure.`,
  'autorefrigeration-below-mdmt': (f, p) =>
    p['forms'] === 'dry ice'
      ? `If the tank is vented or emptied fast, the liquid turns to dry ice and gas and can chill toward ${f('boiling')} (dry ice at atmospheric pressure), which is below the minimum design metal temperature ${f('mdmt')}.`
      : `If the tank is vented or emptied fast, the liquid can chill toward its boiling point at atmospheric pressure, ${f('boiling')}, which is below the minimum design metal temperature ${f('mdmt')}.`,
  'over-fill-limit': (f, p) =>
    `The contents, ${f('contents')}, are above the fill limit of ${f('limit')} by ${f('over')}${typeof p['description'] === 'string' ? ` (${p['description']}; ${String(p['citation'])})` : ''}.`,
  'no-filling-rule': (f, p) =>
    `No filling-density table in this tool covers this product in a ${String(p['containerClass'])} container${p['specificGravity'] ? ` (specific gravity ${f('specificGravity')})` : ''}. The limit shown is ${p['shown'] === 'not-full' ? 'only the not-liquid-full limit' : 'the present contents (no limit could be computed)'}; the applicable code decides the real limit.`,
  'reference-above-critical': (f) =>
    `At ${f('reference')} the product is above its critical temperature ${f('criticalTemperature')}: the limit keeps the contents below the density at which the tank would be full of dense fluid.`,
  'liquid-full-at-peak': (f, p) =>
    `At the forecast peak ${f('peak')} the figures show the tank liquid-full${p['from'] ? ` (from about ${f('from')})` : ''}: the pressure would then be limited only by the relief valve.`,
  'dense-fluid-at-peak': (f, p) =>
    `At the forecast peak ${f('peak')}, above the critical temperature ${f('criticalTemperature')}, the tank would be full of dense fluid${p['from'] ? ` (no vapour space from about ${f('from')})` : ''}: the contents are denser than the critical density, so the pressure climbs as steeply as in a liquid-full tank and would be limited only by the relief valve.`,
  'liquid-full-near-peak': (f) =>
    `The tank would become liquid-full at ${f('full')}, less than ${f('margin')} above the forecast peak ${f('peak')}.`,
  'liquid-full-beyond-model': (f) =>
    `No liquid-full temperature is given: for this blend it lies above ${f('top')}, beyond the range the check searches.`,
  'design-at-peak': (f) =>
    `At the forecast peak ${f('peak')} the expected pressure ${f('pressure')} (with the model allowance of ${f('allowance')}) is above the design pressure ${f('design')} by ${f('over')}.`,
  'relief-at-peak': (f, p) =>
    `The relief valve may open: at the forecast peak ${f('peak')} the expected pressure ${f('pressure')} (with the model allowance) reaches the relief set pressure ${f('relief')}${p['from'] ? `, from about ${f('from')}` : ''}.`,
  'relief-near-at-peak': (f) =>
    `Little headroom at the forecast peak ${f('peak')}: ${f('headroom')} below the relief set pressure ${f('relief')}.`,
  'supercritical-at-peak': (f) =>
    `At the forecast peak ${f('peak')} the product is above its critical temperature ${f('criticalTemperature')}: no liquid level; the pressure depends on the fill.`,
  'small-vapour-space-at-peak': (f) =>
    `At the forecast peak the liquid would fill ${f('liquidFraction')} of the tank.`,
  'gauge-at-end': (f) =>
    `The float gauge reads ${f('reading')}: at the end of its scale the gauge may be stuck or the tank empty or liquid-full; check another way (weight, fixed level gauge).`,
  empty: () => 'The scale shows no product in the tank.',
  'pressure-high': (f, p) => pressureText(f, p, 'higher'),
  'pressure-low': (f, p) => pressureText(f, p, 'lower'),
  'shape-capacity-mismatch': (f) =>
    `The tank dimensions give ${f('excess')} more volume than the water capacity entered; check the dimensions (inside, tangent to tangent) and the nameplate.`,
  'relief-assumed': (f) =>
    `Relief set pressure not entered: taken as the design pressure ${f('design')}. On many containers the relief valve may start to discharge lower (29 CFR 1910.110 Table H-26: 88–100 % of design for ASME 1950 and later).`,
  'relief-above-design': (f) =>
    `The relief set pressure ${f('relief')} is above the design pressure ${f('design')}; check the valve marking against the nameplate.`,
  'sg-differs': (f) =>
    `The entered specific gravity ${f('entered')} differs by more than 2 % from the model's ${f('model')} for this product; check the product.`,
  'peak-below-now': (f) =>
    `The forecast peak ${f('peak')} is colder than the liquid now ${f('temperature')}: the peak figures describe a cooler tank.`,
  'blend-bubble-point': (f) =>
    `For a blend the two-phase pressure is taken as the bubble-point pressure of the whole contents (${f('pressure')} now), slightly above the real pressure.`,
  'site-rule-binds': (f, p) =>
    `Limited by this site's own rule: ${f('figure')} ${p['form'] === 'percent' ? 'by volume' : 'of the water weight capacity'}, below the rule set's limits. Stop at or below ${f('stop')} on the float gauge (${f('limit')}).`,
  standing: () => STANDING_CAUTION,
};

function pressureText(f: Fmt, p: MessageParams, word: string): string {
  const cause = typeof p['cause'] === 'string' ? CAUSE_TEXT[p['cause'] as CauseCode] : '';
  const split = p['propaneFraction']
    ? ` The reading fits a propane/n-butane mix of about ${f('propaneFraction')} propane (mole).`
    : '';
  return `The gauge reads ${f('reading')}, ${f('differenceAbs')} ${word} than the ${f('expected')} expected for this product at ${f('temperature')} (band ±${f('tolerance')}). Likely: ${cause}${split}`;
}

/**
 * One parameter in the engine's default units (US first, SI in brackets), rounded as its
 * `round` says (to the nearest when it says nothing).
 */
export function formatParam(x: MessageNumber, name: string, baro: number): string {
  const r = x.round;
  switch (x.quantity) {
    case 'gaugePressure':
      return fmtGauge(x.value, r, baro);
    case 'pressure':
      return fmtAbs(x.value, r);
    case 'pressureDifference':
      return fmtDiff(name === 'differenceAbs' ? Math.abs(x.value) : x.value, r);
    case 'temperature':
      return fmtT(x.value, r);
    case 'temperatureDifference':
      return `${formatQuantity('temperatureDifference', x.value, 'F', { decimals: 0, round: r })} (${formatQuantity('temperatureDifference', x.value, 'C', { decimals: 0, round: r })})`;
    case 'mass':
      return fmtMass(x.value, r);
    case 'fraction':
      return name === 'propaneFraction' ? `${Math.round(x.value * 100)} %` : fmtPct(x.value, r);
    case 'volume':
      return `${formatQuantity('volume', x.value, 'usgal', { decimals: 0, round: r })} (${formatQuantity('volume', x.value, 'm3', { decimals: 3, round: r })})`;
    default:
      return x.value.toFixed(name === 'model' || name === 'specificGravity' ? 4 : 3);
  }
}

/** The default English message of a caution. */
export function cautionMessage(code: CautionCode, p: MessageParams, baro: number): string {
  const f: Fmt = (name) => {
    const key = name === 'differenceAbs' ? 'difference' : name;
    const x = p[key];
    if (x === undefined) return '';
    return typeof x === 'string' ? x : formatParam(x, name, baro);
  };
  return TEXT[code](f, p);
}
