/**
 * The one parser for every number the user types, and its inverse for echoing a value into a
 * field. Pure: no DOM, no units (units are applied by `display.ts` afterwards).
 *
 * A thousands separator, a decimal comma and a decimal point must never be confused, so the
 * parser follows the number format the user picked in Settings (default: the browser's locale):
 *
 * - With a decimal point, a comma, a space or an apostrophe groups digits (1,000 · 1 000 ·
 *   1'000 · en-IN 1,00,000). `1,5` is refused: the comma cannot be a decimal mark here.
 *   `1.000` is 1 (a point is the decimal mark); the result carries `alternative: 1000` so a
 *   field can ask "Did you mean 1,000?" when 1 is implausible.
 * - With a decimal comma, a point, a space (also the no-break spaces fr-FR uses) or an
 *   apostrophe groups digits (1.000 · 1 000,5). `1,000` is refused as ambiguous: it would be
 *   1 with a decimal comma but is also how one thousand is written elsewhere. `1.5` is refused.
 *
 * Refusals carry a message that says why and what to type; it names no field (the field adds
 * its own name).
 */

/** A number format the user can pick; `auto` follows the browser's locale. */
export type NumberFormatId = 'auto' | 'point' | 'point-space' | 'comma' | 'comma-space';

/** A resolved number format: the decimal mark and the digit-group separator shown. */
export interface NumberFormat {
  decimal: '.' | ',';
  group: ',' | '.' | '\u202f' | "'";
}

export const NUMBER_FORMATS: Record<Exclude<NumberFormatId, 'auto'>, NumberFormat> = {
  point: { decimal: '.', group: ',' },
  'point-space': { decimal: '.', group: '\u202f' },
  comma: { decimal: ',', group: '.' },
  'comma-space': { decimal: ',', group: '\u202f' },
};

/** Labels for the Settings choice (examples in the format itself). */
export const NUMBER_FORMAT_LABELS: Record<NumberFormatId, string> = {
  // Short, so a closed select shows the whole choice on a 320 px phone; the note under it explains.
  auto: 'Device language',
  point: '12,345.6',
  'point-space': '12 345.6',
  comma: '12.345,6',
  'comma-space': '12 345,6',
};

/** Formats found per locale tag (building an Intl formatter is slow on a phone). */
const localeFormats = new Map<string, NumberFormat>();

/** The decimal mark and group separator a locale uses (via Intl), as one of our formats. */
export function formatOfLocale(locale: string | undefined): NumberFormat {
  const key = locale ?? '';
  let fmt = localeFormats.get(key);
  if (fmt === undefined) localeFormats.set(key, (fmt = readLocaleFormat(locale)));
  return fmt;
}

function readLocaleFormat(locale: string | undefined): NumberFormat {
  let decimal = '.';
  let group = ',';
  try {
    const parts = new Intl.NumberFormat(locale).formatToParts(12345.6);
    decimal = parts.find((p) => p.type === 'decimal')?.value ?? '.';
    group = parts.find((p) => p.type === 'group')?.value ?? ',';
  } catch {
    // An unknown locale tag: fall back to the decimal point.
  }
  if (decimal === ',') return group === '.' ? NUMBER_FORMATS.comma : NUMBER_FORMATS['comma-space'];
  if (group === ',') return NUMBER_FORMATS.point;
  return /\s/.test(group) ? NUMBER_FORMATS['point-space'] : { decimal: '.', group: "'" };
}

/** Resolves a Settings choice; `auto` reads `locale` (default: the browser's language). */
export function resolveNumberFormat(id: NumberFormatId | undefined, locale?: string): NumberFormat {
  if (id && id !== 'auto' && Object.hasOwn(NUMBER_FORMATS, id)) return NUMBER_FORMATS[id];
  const lang = locale ?? (typeof navigator === 'undefined' ? 'en-US' : navigator.language);
  return formatOfLocale(lang);
}

export type ParsedNumber =
  { ok: true; value: number | null; alternative?: number } | { ok: false; message: string };

const SPACES = /[\s\u00a0\u202f\u2009\u2007]/g;
/** Full-width digits and signs (East Asian keyboards) and the true minus sign. */
function normalise(text: string): string {
  return text
    .replace(/[\uff10-\uff19]/g, (c) => String.fromCharCode(c.charCodeAt(0) - 0xfee0))
    .replace(/[\uff0b]/g, '+')
    .replace(/[\u2212\uff0d\u2013]/g, '-')
    .replace(/\uff0c/g, ',')
    .replace(/\uff0e/g, '.')
    .replace(/[’‘]/g, "'")
    .trim();
}

/** Digit groups valid as thousands groups: 1–3 digits, then 3s; or en-IN 1–2s then a last 3. */
function validGroups(groups: string[]): boolean {
  if (groups.length < 2 || !/^\d{1,3}$/.test(groups[0]!)) return false;
  const rest = groups.slice(1);
  if (rest.every((g) => /^\d{3}$/.test(g))) return true;
  const last = rest[rest.length - 1]!;
  return /^\d{3}$/.test(last) && rest.slice(0, -1).every((g) => /^\d{2}$/.test(g));
}

function plain(text: string): string {
  return text.replace(SPACES, ' ');
}

/** Reads a number typed in `fmt`. Empty (or blank) text is `value: null`. */
export function parseNumber(text: string, fmt: NumberFormat): ParsedNumber {
  return parse(text, fmt, true);
}

function parse(text: string, fmt: NumberFormat, suggest: boolean): ParsedNumber {
  const t = normalise(text);
  if (t === '') return { ok: true, value: null };
  const shown = plain(t);
  const sign = /^[+-]/.test(t) ? t[0] : '';
  const body = sign ? t.slice(1).trim() : t;
  if (!/^[\d.,'\s\u00a0\u202f\u2009\u2007]+$/.test(body) || !/\d/.test(body))
    return {
      ok: false,
      message: `“${shown}” is not a number. Type digits only, e.g. 1${fmt.decimal}5.`,
    };
  const dec = fmt.decimal;
  const pieces = body.split(dec);
  if (pieces.length > 2) return wrongMark(shown, body, fmt, suggest);
  const [intText, frac = null] = pieces as [string, string?];
  if (frac !== null && !/^\d*$/.test(frac)) return wrongMark(shown, body, fmt, suggest);
  const groups = intText.split(/[.,'\s\u00a0\u202f\u2009\u2007]/);
  let intDigits: string;
  if (groups.length === 1) intDigits = intText;
  else {
    const seps = new Set(intText.replace(/\d/g, '').replace(SPACES, ' '));
    if (seps.size > 1 || !validGroups(groups)) return wrongMark(shown, body, fmt, suggest);
    intDigits = groups.join('');
  }
  if (intDigits === '' && (frac === null || frac === '')) return notNumber(shown, fmt);
  // A decimal comma followed by exactly three digits is also how one thousand is grouped.
  if (dec === ',' && frac !== null && /^\d{3}$/.test(frac) && /^[1-9]\d{0,2}$/.test(intText))
    return ambiguous(shown, intText, frac, fmt);
  const value = Number(`${sign}${intDigits || '0'}.${frac || '0'}`);
  if (!Number.isFinite(value)) return notNumber(shown, fmt);
  // With a decimal point, "1.000" is 1; say what else it might have meant.
  if (dec === '.' && frac !== null && /^\d{3}$/.test(frac) && /^[1-9]\d{0,2}$/.test(intText)) {
    const alternative = Number(`${sign}${intText}${frac}`);
    return { ok: true, value, alternative };
  }
  return { ok: true, value };
}

function notNumber(shown: string, fmt: NumberFormat): ParsedNumber {
  return { ok: false, message: `“${shown}” is not a number. Type digits, e.g. 1${fmt.decimal}5.` };
}

function markName(fmt: NumberFormat): string {
  return fmt.decimal === '.' ? 'a point (.)' : 'a comma (,)';
}

function groupName(fmt: NumberFormat): string {
  return fmt.group === ',' ? 'commas' : fmt.group === '.' ? 'points' : 'spaces';
}

/** The text read in the other decimal convention, to suggest what to type. */
function otherReading(body: string, fmt: NumberFormat): number | null {
  const swapped: NumberFormat = fmt.decimal === '.' ? NUMBER_FORMATS.comma : NUMBER_FORMATS.point;
  const r = parse(body, swapped, false);
  return r.ok && r.value !== null ? r.value : null;
}

function wrongMark(shown: string, body: string, fmt: NumberFormat, suggest: boolean): ParsedNumber {
  const alt = suggest ? otherReading(body, fmt) : null;
  const setting = `Numbers here use ${markName(fmt)} for decimals and ${groupName(fmt)} between thousands (Settings › Number format)`;
  const hint =
    alt === null
      ? `Type the number without separators, e.g. 1500${fmt.decimal}5.`
      : `If you mean ${groupForReading(alt, fmt)}, type ${plainDigits(alt, fmt)}.`;
  return { ok: false, message: `“${shown}” cannot be read for sure. ${setting}. ${hint}` };
}

function ambiguous(shown: string, int: string, frac: string, fmt: NumberFormat): ParsedNumber {
  const thousand = `${int}${frac}`;
  const small = frac.replace(/0+$/, '');
  return {
    ok: false,
    message:
      `“${shown}” is ambiguous: with a decimal comma it is ${small ? `${int},${small}` : int}, ` +
      `but it is also how ${thousand} is written with a comma between thousands. ` +
      `Type ${thousand} for ${thousand} (or ${formatDigits(thousand, fmt, 1000)}), ` +
      `or ${int},${frac}0 for ${int} and ${frac} thousandths.`,
  };
}

/** A number in `fmt` without grouping, as the user should type it. */
function plainDigits(x: number, fmt: NumberFormat): string {
  return String(x).replace('.', fmt.decimal);
}

function groupForReading(x: number, fmt: NumberFormat): string {
  return formatDigits(String(x), fmt, 1000);
}

/**
 * A number already rounded to text with a point ("12345.60", as `toFixed` gives it) in the
 * user's format: their decimal mark, and digit groups from `groupFrom` up (default 10 000,
 * so four-digit figures such as years and 1500 stay ungrouped).
 */
export function formatDigits(fixed: string, fmt: NumberFormat, groupFrom = 10_000): string {
  const m = /^(-?)(\d+)(?:\.(\d+))?$/.exec(fixed);
  if (!m) return fixed;
  const [, sign, int, frac] = m as unknown as [string, string, string, string | undefined];
  const grouped = Number(int) >= groupFrom ? int.replace(/\B(?=(\d{3})+(?!\d))/g, fmt.group) : int;
  return `${sign}${grouped}${frac === undefined ? '' : fmt.decimal + frac}`;
}
