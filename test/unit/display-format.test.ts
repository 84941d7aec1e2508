// Large figures carry digit groups in the user's format, and precision fits the size of the
// figure (no 0.1 lb on a 100,000 lb tank). Conversions by exact definitions (NIST SP 811 App. B:
// 1 lb = 0.45359237 kg, 1 US gal = 3.785411784 L); digits worked out by hand.
import { describe, expect, it } from 'vitest';
import { DisplayUnits, fitPrecision } from '../../components/display.js';
import { NUMBER_FORMATS } from '../../components/number-parse.js';
import { DEFAULT_SETTINGS } from '../../components/types.js';
import { toSI } from '../../thermo/units.js';

const usUnits = DEFAULT_SETTINGS.units;
const metricUnits = {
  pressure: 'barg',
  temperature: 'C',
  volume: 'L',
  mass: 'kg',
  length: 'cm',
} as const;
const en = new DisplayUnits(usUnits, 101_325, NUMBER_FORMATS.point);
const de = new DisplayUnits(metricUnits, 101_325, NUMBER_FORMATS.comma);
const fr = new DisplayUnits(metricUnits, 101_325, NUMBER_FORMATS['comma-space']);
const plain = new DisplayUnits(usUnits);

describe('DisplayUnits.format with a number format', () => {
  it('a 100,000 lb figure is whole and grouped; rounding direction is kept', () => {
    const kg = toSI('mass', 100_000.46, 'lb');
    expect(en.format('mass', kg)).toBe('100,000 lb');
    expect(en.format('mass', kg, 'up')).toBe('100,001 lb');
    expect(en.format('mass', toSI('mass', 21.25, 'lb'))).toBe('21.3 lb'); // small: one decimal stays
    expect(en.format('mass', toSI('mass', 3400.9, 'lb'), 'down')).toBe('3400 lb'); // below 10 000: no group
  });

  it('volumes in litres with a decimal comma and point or space groups', () => {
    // 30 000 US gal × 3.785411784 L = 113 562.35 L
    const m3 = toSI('volume', 30_000, 'usgal');
    expect(de.format('volume', m3)).toBe('113.562 L');
    expect(fr.format('volume', m3)).toBe('113\u202f562 L');
    expect(de.format('volume', toSI('volume', 34, 'L'))).toBe('34,0 L');
  });

  it('pressures and temperatures take the decimal comma', () => {
    // 250 psig = 17.2369 bar g (1 psi = 0.06894757 bar)
    expect(de.format('gaugePressure', toSI('gaugePressure', 250, 'psig'))).toBe('17,24 bar g');
    expect(de.format('temperature', toSI('temperature', 21.5, 'C'))).toBe('21,5 °C');
  });

  it('without a number format the text stays plain, as before', () => {
    expect(plain.format('mass', toSI('mass', 100_000, 'lb'))).toBe('100000 lb');
    expect(plain.number('mass', toSI('mass', 12.34, 'lb'))).toBe('12.3');
  });

  it('ranges are written in the user format', () => {
    expect(en.range('volume', toSI('volume', 100, 'usgal'), toSI('volume', 1e6, 'usgal'))).toBe(
      'from 100 to 1,000,000 US gal',
    );
  });

  it('fitPrecision: whole from 1000 up, at most one decimal from 100 up, only for mass and volume', () => {
    expect(fitPrecision('mass', 1000, 1)).toBe(0);
    expect(fitPrecision('mass', 999, 2)).toBe(1);
    expect(fitPrecision('volume', 99, 3)).toBe(3);
    expect(fitPrecision('temperature', 5000, 1)).toBe(1);
  });
});
