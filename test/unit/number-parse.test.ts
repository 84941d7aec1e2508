// The one number parser (components/number-parse.ts): a thousands separator, a decimal comma
// and a decimal point are never confused. Expected values are the numbers as written by the
// conventions of each locale in the Unicode CLDR (v44 number symbols: en-US "." decimal and ","
// group; de-DE "," and "."; fr-FR "," and U+202F narrow no-break space; en-IN "." and ",", with
// lakh grouping #,##,##0), worked out by hand for each string.
import { describe, expect, it } from 'vitest';
import { checkClose } from '../helpers/check.js';
import {
  NUMBER_FORMATS,
  formatDigits,
  formatOfLocale,
  parseNumber,
  resolveNumberFormat,
  type NumberFormat,
} from '../../components/number-parse.js';

const CLDR = 'Unicode CLDR v44 number symbols and grouping of the locale';
const EN_US = formatOfLocale('en-US');
const DE_DE = formatOfLocale('de-DE');
const FR_FR = formatOfLocale('fr-FR');
const EN_IN = formatOfLocale('en-IN');

function value(text: string, fmt: NumberFormat): number {
  const r = parseNumber(text, fmt);
  if (!r.ok) throw new Error(`“${text}” was refused: ${r.message}`);
  if (r.value === null) throw new Error(`“${text}” read as empty`);
  return r.value;
}

function reads(text: string, fmt: NumberFormat, expected: number, locale: string): void {
  // Exact decimal strings: the only error allowed is the binary representation (1e-12 relative).
  checkClose({
    what: `“${text}” in ${locale}`,
    input: text,
    actual: value(text, fmt),
    expected,
    rtol: 1e-12,
    atol: 1e-12,
    kind: 'published',
    source: CLDR,
    why: 'binary representation of a decimal only',
  });
}

function refused(text: string, fmt: NumberFormat): string {
  const r = parseNumber(text, fmt);
  expect(r.ok, `“${text}” must be refused`).toBe(false);
  return r.ok ? '' : r.message;
}

describe('number formats of locales (CLDR)', () => {
  it('locales resolve to their decimal mark and group separator', () => {
    expect(EN_US).toEqual({ decimal: '.', group: ',' });
    expect(DE_DE).toEqual({ decimal: ',', group: '.' });
    expect(FR_FR).toEqual({ decimal: ',', group: '\u202f' });
    expect(EN_IN).toEqual({ decimal: '.', group: ',' });
    // A choice in Settings wins over the locale.
    expect(resolveNumberFormat('comma', 'en-US')).toEqual(NUMBER_FORMATS.comma);
    expect(resolveNumberFormat('auto', 'de-DE')).toEqual(NUMBER_FORMATS.comma);
    expect(resolveNumberFormat(undefined, 'en-US')).toEqual(NUMBER_FORMATS.point);
  });
});

describe('parseNumber, decimal point (en-US, en-IN)', () => {
  it('reads thousands separators, decimals and signs', () => {
    reads('1,000', EN_US, 1000, 'en-US');
    reads('1,000,000', EN_US, 1_000_000, 'en-US');
    reads('30,000.5', EN_US, 30_000.5, 'en-US');
    reads('  68 ', EN_US, 68, 'en-US');
    reads('-40', EN_US, -40, 'en-US');
    reads('\u221240', EN_US, -40, 'en-US (true minus sign)');
    reads('.5', EN_US, 0.5, 'en-US');
    reads('1 000.25', EN_US, 1000.25, 'en-US with a spaced group');
    reads('１，０００', EN_US, 1000, 'en-US typed with full-width digits');
    reads('1,00,000', EN_IN, 100_000, 'en-IN lakh grouping');
    reads('12,34,567.8', EN_IN, 1_234_567.8, 'en-IN lakh grouping');
  });

  it('"1.000" is one, and the result says it might have meant one thousand', () => {
    const r = parseNumber('1.000', EN_US);
    expect(r).toEqual({ ok: true, value: 1, alternative: 1000 });
  });

  it('"1,5" is refused with what to type', () => {
    const m = refused('1,5', EN_US);
    expect(m).toContain('a point (.) for decimals');
    expect(m).toContain('type 1.5');
  });

  it('a decimal comma after point groups is refused with the plain figure to type', () => {
    const m = refused('1.000,5', EN_US);
    expect(m).toContain('type 1000.5');
    expect(refused('1.000.000', EN_US)).toContain('type 1000000');
  });

  it('wrong grouping, letters, exponents and mixed separators are refused', () => {
    for (const t of [
      '1,00',
      '12,3456',
      'abc',
      '1e5',
      '5 kg',
      '1,000 000',
      '.',
      '-',
      '1,,000',
      '0x10',
    ])
      refused(t, EN_US);
  });

  it('empty text is an empty value', () => {
    expect(parseNumber('', EN_US)).toEqual({ ok: true, value: null });
    expect(parseNumber(' \u202f ', EN_US)).toEqual({ ok: true, value: null });
  });
});

describe('parseNumber, decimal comma (de-DE, fr-FR)', () => {
  it('reads point groups, space groups and decimal commas', () => {
    reads('1.000', DE_DE, 1000, 'de-DE');
    reads('1.000,5', DE_DE, 1000.5, 'de-DE');
    reads('1,5', DE_DE, 1.5, 'de-DE');
    reads('0,500', DE_DE, 0.5, 'de-DE (a leading 0 cannot start a thousands group)');
    reads('1,25', DE_DE, 1.25, 'de-DE');
    reads('1,2500', DE_DE, 1.25, 'de-DE');
    reads('1\u202f000,5', FR_FR, 1000.5, 'fr-FR narrow no-break space');
    reads('1\u00a0000', FR_FR, 1000, 'fr-FR no-break space');
    reads('12 345,6', FR_FR, 12345.6, 'fr-FR typed space');
  });

  it('"1,000" is ambiguous with a decimal comma: refused, saying why and what to type', () => {
    const m = refused('1,000', DE_DE);
    expect(m).toContain('ambiguous');
    expect(m).toContain('Type 1000 for 1000');
    expect(m).toContain('1,0000');
    refused('12,500', DE_DE);
    refused('1,000', FR_FR);
  });

  it('"1.5" is refused with a decimal comma, saying to type 1,5', () => {
    expect(refused('1.5', DE_DE)).toContain('type 1,5');
  });
});

describe('formatDigits', () => {
  it('groups from ten thousand up in the user format, never below', () => {
    expect(formatDigits('100000', EN_US)).toBe('100,000');
    expect(formatDigits('1500.5', EN_US)).toBe('1500.5');
    expect(formatDigits('30000.25', DE_DE)).toBe('30.000,25');
    expect(formatDigits('-12345.6', FR_FR)).toBe('-12\u202f345,6');
    expect(formatDigits('1000', EN_US, 1000)).toBe('1,000');
  });

  it('what formatDigits writes, parseNumber reads back', () => {
    for (const fmt of [EN_US, DE_DE, FR_FR, NUMBER_FORMATS['point-space']])
      for (const x of [0.25, 7, 1234.5, 12_345.678, 987_654_321])
        reads(formatDigits(String(x), fmt), fmt, x, JSON.stringify(fmt));
  });
});
