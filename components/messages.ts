/**
 * Everything the check says in words, written in the user's units: cautions and diagnosis
 * causes from their engine codes and parameters (never the engine's English default, which
 * carries psig and °F first), and engine refusals without engine field names or kelvin. Every
 * number goes through `DisplayUnits` (thermo/units.ts) with the rounding the engine asked for.
 */
import type { DisplayUnits } from './display.js';
import type { Caution } from '../thermo/check/types.js';
import type { FillFinding, FillParam } from '../thermo/fill/types.js';
import { formatPercent } from './display.js';
import { CAUSE_TEXT } from '../thermo/check/caution-text.js';
import type {
  CautionCode,
  CauseCode,
  MessageNumber,
  MessageParams,
} from '../thermo/check/codes.js';

type Fmt = (name: string) => string;
type Entry = (f: Fmt, p: MessageParams) => string;

const word = (p: MessageParams, k: string) => (typeof p[k] === 'string' ? (p[k] as string) : '');

/**
 * Diagnosis causes in the user's words: they carry no figures and no units, so the engine's own
 * wording serves the app as it is (one text per cause, thermo/check/caution-text.ts).
 */
export const CAUSE_WORDS: Readonly<Record<CauseCode, string>> = CAUSE_TEXT;

const CONTAINER_WORDS: Record<string, string> = {
  storage: 'storage',
  cylinder: 'cylinder',
  cargo: 'cargo tank',
  portable: 'portable tank',
};

/** One entry per caution code the engine can emit (`CAUTION_CODES`). */
export const CAUTION_WORDS: Record<CautionCode, Entry> = {
  'liquid-full-now': (f) =>
    `The tank is liquid-full now at ${f('temperature')}: there is no vapour space, and the pressure rises steeply with any warming. The contents are ${f('fillingDensity')} of the water weight capacity.`,
  'dense-fluid-now': (f) =>
    `The tank is full of dense fluid now. At ${f('temperature')} the product is above its critical temperature (${f('criticalTemperature')}), and the contents (${f('fillingDensity')} of the water weight capacity) are too dense to leave any vapour space: the pressure rises as steeply with warming as in a liquid-full tank.`,
  'relief-now': (f, p) =>
    `The expected pressure now, ${f('pressure')}${p['upper'] ? ` (up to ${f('upper')} allowing for the model's uncertainty)` : ''}, is at or near the relief valve setting ${f('relief')}: the relief valve may be discharging.`,
  'supercritical-now': (f) =>
    `At ${f('temperature')} the product is above its critical temperature (${f('criticalTemperature')}): there is no liquid surface, so a level or float gauge means nothing; only the weight tells the contents.`,
  'co2-below-triple-point': (f) =>
    `Pressure below ${f('threshold')} here (the CO2 triple point, ${f('tripleAbsolute')}): liquid CO2 cannot exist below it, and dry ice can form and block lines and valves. Do not vent or withdraw liquid; follow the supplier's procedure.`,
  vacuum: (f, p) =>
    `The tank is under vacuum (${f('pressure')}${word(p, 'source') === 'reading' ? ' on the gauge' : ` expected at ${f('temperature')}`}): no vapour will flow to appliances, and air can be drawn in through a leak or an open valve.`,
  'below-mdmt': (f) =>
    `The liquid at ${f('temperature')} is colder than the minimum design metal temperature ${f('mdmt')}: the shell may be brittle; avoid shocks and pressure changes and follow the site procedure.`,
  'autorefrigeration-below-mdmt': (f, p) =>
    p['forms'] === 'dry ice'
      ? `If the tank is vented or emptied fast, the liquid turns to dry ice and gas and can chill toward ${f('boiling')} (dry ice at atmospheric pressure), which is below the minimum design metal temperature ${f('mdmt')}.`
      : `If the tank is vented or emptied fast, the liquid can chill toward its boiling point at atmospheric pressure, ${f('boiling')}, which is below the minimum design metal temperature ${f('mdmt')}.`,
  'over-fill-limit': (f) =>
    `The contents, ${f('contents')}, are above the fill limit of ${f('limit')} by ${f('over')} (the limit that applies is shown with the fill limit).`,
  'no-filling-rule': (f, p) =>
    `No filling-density table in this app covers this product in a ${CONTAINER_WORDS[word(p, 'containerClass')] ?? 'container of this kind'}${p['specificGravity'] ? ` (specific gravity ${f('specificGravity')})` : ''}. The limit shown is ${word(p, 'shown') === 'not-full' ? 'only the one that keeps the tank from becoming full' : 'the present contents (no limit could be worked out)'}; the applicable code decides the real limit.`,
  'reference-above-critical': (f) =>
    `At ${f('reference')} the product is above its critical temperature (${f('criticalTemperature')}): the limit keeps the contents thin enough that the tank cannot fill with dense fluid.`,
  'liquid-full-at-peak': (f, p) =>
    `At the forecast peak ${f('peak')} the tank would be liquid-full${p['from'] ? ` (from about ${f('from')})` : ''}: the pressure would then be limited only by the relief valve.`,
  'dense-fluid-at-peak': (f, p) =>
    `At the forecast peak ${f('peak')}, above the critical temperature (${f('criticalTemperature')}), the tank would be full of dense fluid${p['from'] ? ` (no vapour space from about ${f('from')})` : ''}: the pressure climbs as steeply as in a liquid-full tank and would be limited only by the relief valve.`,
  'liquid-full-near-peak': (f) =>
    `The tank would become liquid-full at ${f('full')}, less than ${f('margin')} above the forecast peak ${f('peak')}.`,
  'liquid-full-beyond-model': (f) =>
    `No liquid-full temperature is given: for this blend it lies above ${f('top')}, beyond the range the check looks at.`,
  'design-at-peak': (f) =>
    `At the forecast peak ${f('peak')} the expected pressure ${f('pressure')} (with the model allowance of ${f('allowance')}) is above the design pressure ${f('design')} by ${f('over')}.`,
  'relief-at-peak': (f, p) =>
    `The relief valve may open: at the forecast peak ${f('peak')} the expected pressure ${f('pressure')} (with the model allowance) reaches the relief valve setting ${f('relief')}${p['from'] ? `, from about ${f('from')}` : ''}.`,
  'relief-near-at-peak': (f) =>
    `Little headroom at the forecast peak ${f('peak')}: ${f('headroom')} below the relief valve setting ${f('relief')}.`,
  'supercritical-at-peak': (f) =>
    `At the forecast peak ${f('peak')} the product is above its critical temperature (${f('criticalTemperature')}): no liquid level; the pressure depends on the fill.`,
  'small-vapour-space-at-peak': (f) =>
    `At the forecast peak the liquid would fill ${f('liquidFraction')} of the tank.`,
  'gauge-at-end': (f) =>
    `The float gauge reads ${f('reading')}: at the end of its scale the gauge may be stuck or the tank empty or full; check another way (weight, fixed level gauge).`,
  empty: () => 'The scale shows no product in the tank.',
  'pressure-high': (f, p) => pressureWords(f, p, 'higher'),
  'pressure-low': (f, p) => pressureWords(f, p, 'lower'),
  'shape-capacity-mismatch': (f) =>
    `The tank dimensions give ${f('shapeVolume')}, ${f('excess')} more than the water capacity ${f('waterCapacity')}; check the dimensions (inside, tangent to tangent) and the nameplate.`,
  'relief-assumed': (f) =>
    `Relief valve setting not entered: the check assumes the design pressure, ${f('design')}. On many containers the relief valve starts to discharge lower (29 CFR 1910.110 Table H-26: 88–100 % of design for ASME 1950 and later); enter the setting from the valve.`,
  'relief-above-design': (f) =>
    `The relief valve setting ${f('relief')} is above the design pressure ${f('design')}; check the valve marking against the nameplate.`,
  'sg-differs': (f) =>
    `The entered specific gravity ${f('entered')} differs by more than 2 % from ${f('model')} for this product; check the product.`,
  'peak-below-now': (f) =>
    `The forecast peak ${f('peak')} is colder than the liquid now (${f('temperature')}): the peak figures describe a cooler tank.`,
  'blend-bubble-point': (f) =>
    `For a blend the pressure with liquid and vapour present is taken as the bubble-point pressure of the whole contents (${f('pressure')} now), slightly above the real pressure.`,
  'site-rule-binds': (f, p) =>
    `Limited by this site’s own rule: ${f('figure')} ${word(p, 'form') === 'percent' ? 'by volume' : 'of the water weight capacity'}, below the rule set’s limits. Stop at or below ${f('stop')} on the float gauge (${f('limit')}).`,
  standing: () => '',
};

function pressureWords(f: Fmt, p: MessageParams, dir: string): string {
  const cause = CAUSE_WORDS[word(p, 'cause') as CauseCode] ?? '';
  const split = p['propaneFraction']
    ? ` The reading fits a propane/butane mix of about ${f('propaneFraction')} propane.`
    : '';
  return `The gauge reads ${f('reading')}, ${f('differenceAbs')} ${dir} than the ${f('expected')} expected for this product at ${f('temperature')} (allowed ± ${f('tolerance')}).${cause ? ` Likely: ${cause}` : ''}${split}`;
}

/** One parameter in the user's units. */
function formatParam(d: DisplayUnits, x: MessageNumber, name: string): string {
  const round = x.round ?? 'nearest';
  if (x.quantity === null) return x.value.toFixed(name === 'model' ? 4 : 3);
  const value = name === 'differenceAbs' ? Math.abs(x.value) : x.value;
  if (name === 'propaneFraction') return `${Math.round(value * 100)} %`;
  return d.format(x.quantity, value, round);
}

/** A caution in the user's words and units. */
export function cautionText(c: Caution, d: DisplayUnits): string {
  if (c.code === 'standing') return c.message;
  const entry = CAUTION_WORDS[c.code];
  const p = c.params ?? {};
  if (!entry) return c.message;
  const f: Fmt = (name) => {
    const x = p[name === 'differenceAbs' ? 'difference' : name];
    if (x === undefined) return '';
    return typeof x === 'string' ? x : formatParam(d, x, name);
  };
  return entry(f, p);
}

/** A diagnosis cause in the user's words. */
export function causeText(code: CauseCode): string {
  return CAUSE_WORDS[code];
}

/**
 * A refusal without a numeric range, in the app's words: the field by its form label (or the
 * product and readings together), never the engine's field name, message or SI units.
 */
export function refusalWords(field: string, label: string | undefined): string {
  if (label) return `${label} has a value the check cannot use`;
  if (field === 'product' || field.startsWith('product.'))
    return 'The model cannot work out this product with these readings; check the product, the temperatures and the contents';
  if (field.startsWith('tank')) return 'A figure of the tank’s nameplate cannot be used';
  return 'The check cannot use these readings together';
}

// ── fill findings (thermo/fill/findings.ts): the same code + SI params shape ─────────────────

/** The codes a fill's reconciliation can give (thermo/fill/findings.ts). */
export const FILL_CODES = [
  'fill-over-limit',
  'fill-gauge-low',
  'fill-gauge-high',
  'fill-consistent',
  'fill-pressure-off-curve',
  'fill-interrupted',
  'fill-nothing-delivered',
  'fill-from-empty',
  'fill-same-gauge',
  'fill-stop-at-moved',
] as const;
export type FillCode = (typeof FILL_CODES)[number];

/** A fill parameter in the user's units; `round` toward safety where the entry asks. */
type FillFmt = (name: string, round?: 'nearest' | 'up' | 'down', negate?: boolean) => string;

const seen = (f: FillFmt) =>
  `the gauge reads ${f('reading')}; the contents before and the metered delivery put it at ${f('expected')} (agreement band ±${f('band', 'down')})`;

/** One entry per fill code: what the figures show and what to verify; never permission. */
export const FILL_WORDS: Record<FillCode, (f: FillFmt, v: (name: string) => number) => string> = {
  'fill-over-limit': (f) =>
    `Over the fill limit after the delivery by ${f('overMass', 'up')} (about ${f('overVolume', 'up')} of liquid). The limit is ${f('maxMass', 'down')}; the gauge reading stands for ${f('gaugeMass')} and the contents before plus the metered delivery come to ${f('expectedMass')}. A tank over its limit can become liquid-full as it warms. Follow the site’s procedure for an overfilled tank.`,
  'fill-gauge-low': (f) =>
    `The gauge reads low: ${seen(f)}. The tank holds about ${f('differenceMass', 'up', true)} (${f('differenceVolume', 'up', true)} of liquid) more than the gauge shows. A gauge that reads low leads to overfilling: do not rely on it for the next fill until it is verified. Check for a sticking float or a loose dial, confirm the contents by weight or with the fixed maximum-level gauge, and follow the site’s procedures.`,
  'fill-gauge-high': (f) =>
    `The gauge reads high: ${seen(f)}. The tank holds about ${f('differenceMass', 'down')} less than the gauge shows. Check the meter ticket (the volume, and whether it is temperature-compensated), the temperatures and the gauge.`,
  'fill-consistent': (f) => `The gauge agrees with the meter within the band: ${seen(f)}.`,
  'fill-pressure-off-curve': (f, v) =>
    `The pressure after the delivery, ${f('reading')}, is ${v('difference') < 0 ? 'below' : 'above'} the product’s expected ${f('expected', 'up')} by ${f('difference', 'up', v('difference') < 0)}, more than the ${f('tolerance')} the gauge and the model allow. A different product may have been delivered, the temperature may not have settled, or the pressure gauge may be faulty. Check the delivery ticket’s product and follow the site’s procedures.`,
  'fill-interrupted': () =>
    'The delivery was stopped before the intended amount: the comparison uses the volume the meter shows, not the amount ordered.',
  'fill-nothing-delivered': () =>
    'The meter shows nothing delivered: the comparison is of the gauge with the contents before, at the after temperature.',
  'fill-from-empty': () =>
    'The tank held vapour only before the delivery: the expected level comes from the meter alone, so a gauge that reads low by a fixed amount shows here.',
  'fill-same-gauge': (f) =>
    `The contents before were read on the same gauge (${f('beforeReading')}): a gauge off by a fixed amount is off both times and does not show here; a sticking or slipping gauge does. Weighing, or a delivery into an empty tank, shows a fixed error too.`,
  'fill-stop-at-moved': (f) =>
    `At the after temperature the stop-at gauge percent is ${f('stopAt', 'down')} (it was ${f('stopAtBefore', 'down')} before).`,
};

function formatFillParam(d: DisplayUnits, x: FillParam, round: 'nearest' | 'up' | 'down'): string {
  if (x.quantity === 'gaugePercent') return formatPercent(x.value, round);
  if (x.quantity === 'gaugePoints')
    return `${formatPercent(x.value, round).replace(' %', '')} percentage points`;
  return d.format(x.quantity, x.value, round);
}

/**
 * A finding of a fill in the user's words and units. The standing caution, and any code
 * without an entry or with a parameter missing, keep the engine's own sentence.
 */
export function fillFindingText(
  c: Pick<FillFinding, 'code' | 'message' | 'params'>,
  d: DisplayUnits,
): string {
  const entry = (FILL_WORDS as Partial<Record<string, (typeof FILL_WORDS)[FillCode]>>)[c.code];
  if (!entry) return c.message;
  let missing = false;
  const f: FillFmt = (name, round = 'nearest', negate = false) => {
    const x = c.params[name];
    if (!x || !Number.isFinite(x.value)) {
      missing = true;
      return '';
    }
    return formatFillParam(d, negate ? { ...x, value: -x.value } : x, round);
  };
  const v = (name: string) => c.params[name]?.value ?? Number.NaN;
  const text = entry(f, v);
  return missing ? c.message : text;
}
