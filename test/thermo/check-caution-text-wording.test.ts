/**
 * The wording of the engine's default messages (thermo/check/caution-text.ts) as a whole:
 * no message reads as leave to fill, withdraw or carry on (README "Limitations": "it never says
 * a tank may be filled"), the ones that meet a procedure defer to the site, the supplier or the
 * applicable code, and the figures a person acts on are rounded toward safety (DEVELOPERS.md:
 * "fill limits down, pressures up"). Figures are converted by hand (NIST SP 811 Appendix B:
 * 1 psi = 6.894 757 kPa, 1 lb = 0.453 592 37 kg, 1 US gal = 3.785 411 784 L).
 */
import { describe, expect, it } from 'vitest';
import { CAUSE_TEXT, cautionMessage, formatParam } from '../../thermo/check/caution-text.js';
import {
  CAUSE_CODES,
  CAUTION_CODES,
  num,
  type CautionCode,
  type MessageParams,
} from '../../thermo/check/codes.js';

const BARO = 101_325;
const PSI = 6894.757;
const K = (f: number) => ((f - 32) * 5) / 9 + 273.15;

/** Every figure a message can name, filled in with plain values. */
const ALL: MessageParams = {
  temperature: num(K(100), 'temperature'),
  criticalTemperature: num(304.1282, 'temperature'),
  fillingDensity: num(0.456, 'fraction', 'up'),
  pressure: num(251 * PSI, 'gaugePressure', 'up'),
  upper: num(253 * PSI, 'gaugePressure', 'up'),
  relief: num(250 * PSI, 'gaugePressure'),
  tripleAbsolute: num(517_960, 'pressure'),
  threshold: num(517_960 - BARO, 'gaugePressure'),
  mdmt: num(K(-20), 'temperature'),
  boiling: num(K(-43.8), 'temperature'),
  contents: num(1000, 'mass', 'up'),
  limit: num(900, 'mass', 'down'),
  over: num(100, 'mass', 'up'),
  reference: num(K(131), 'temperature'),
  peak: num(K(134), 'temperature'),
  from: num(K(130), 'temperature', 'down'),
  full: num(K(140), 'temperature', 'down'),
  margin: num(5, 'temperatureDifference'),
  top: num(K(160), 'temperature', 'down'),
  allowance: num(0.005, 'fraction'),
  design: num(250 * PSI, 'gaugePressure'),
  headroom: num(5 * PSI, 'pressureDifference', 'down'),
  liquidFraction: num(0.978, 'fraction', 'up'),
  reading: num(500_000, 'gaugePressure'),
  expected: num(550_000, 'gaugePressure'),
  difference: num(-50_000, 'pressureDifference'),
  tolerance: num(40_000, 'pressureDifference'),
  excess: num(0.0231, 'fraction'),
  entered: num(0.52, null),
  model: num(0.5072, null),
  stop: num(0.8, 'fraction', 'down'),
  figure: num(0.8, 'fraction', 'down'),
  form: 'percent',
  source: 'reading',
  containerClass: 'cargo',
  shown: 'not-full',
  cause: 'liquid-colder',
};
const msg = (code: CautionCode, p: MessageParams = ALL) => cautionMessage(code, p, BARO);

/** Words that would read as leave to go ahead. */
const PERMISSION =
  /\b(safe to|is safe|are safe|ok to|okay to|allowed|permitted|you (?:may|can)|(?:may|can) (?:be )?fill\w*|no (?:risk|danger)|go ahead)\b/i;

describe('no message reads as leave to go ahead', () => {
  it('every caution, with every figure filled in', () => {
    for (const code of CAUTION_CODES) {
      // The standing caution says what the figures do NOT say; nothing else may say "safe".
      const m = msg(code).replace(
        'do not say that filling, withdrawing or leaving the tank as it is is safe',
        '',
      );
      expect(m, code).not.toMatch(PERMISSION);
    }
  });
  it('every likely cause of a reading off the band', () => {
    for (const c of CAUSE_CODES) expect(CAUSE_TEXT[c], c).not.toMatch(PERMISSION);
  });
});

describe('the messages that meet a procedure defer to it', () => {
  it('the standing caution: the site procedures, the applicable code, a trained person', () => {
    const m = msg('standing', {});
    expect(m).toContain('never replace');
    expect(m).toContain('the site procedures, the applicable code');
    expect(m).toContain('licensed, trained person');
    expect(m).toContain(
      'They do not say that filling, withdrawing or leaving the tank as it is is safe.',
    );
  });
  it('dry ice in CO2: the supplier’s procedure, and no venting or liquid withdrawal', () => {
    expect(msg('co2-below-triple-point')).toMatch(
      /Do not vent or withdraw liquid; follow the supplier's procedure\.$/,
    );
  });
  it('a shell colder than its MDMT: the site procedure', () => {
    expect(msg('below-mdmt')).toMatch(/follow the site procedure\.$/);
  });
  it('no filling table: the applicable code decides', () => {
    expect(msg('no-filling-rule')).toMatch(/the applicable code decides the real limit\.$/);
  });
  it('a gauge at the end of its scale: check another way', () => {
    expect(msg('gauge-at-end')).toContain('check another way (weight, fixed level gauge)');
  });
  it('the site’s own rule: a stop, at or below the figure', () => {
    expect(msg('site-rule-binds')).toContain('Stop at or below 80.0 % on the float gauge');
  });
});

describe('whole messages, figures rounded toward safety', () => {
  it('relief now: the pressures rounded up', () => {
    // 251.04 psig → 251.1 psig up; 1730.88 kPa g → 1731 up. 253.01 psig → 253.1; 1744.5 → 1745.
    const p = {
      pressure: num(251.04 * PSI, 'gaugePressure', 'up'),
      upper: num(253.01 * PSI, 'gaugePressure', 'up'),
      relief: num(250 * PSI, 'gaugePressure'),
    };
    expect(msg('relief-now', p)).toBe(
      'The expected pressure now, 251.1 psig (1731 kPa g) (up to 253.1 psig (1745 kPa g) with the model allowance), is at or near the relief set pressure 250.0 psig (1724 kPa g): the relief valve may be discharging.',
    );
  });
  it('liquid-full near the peak: the full temperature rounded down, the margin as given', () => {
    // 140.07 °F → 140.0 down; 60.04 °C → 60.0 down. A 5 K margin = 9 °F.
    const p = {
      full: num(K(140.07), 'temperature', 'down'),
      peak: num(K(134), 'temperature'),
      margin: num(5, 'temperatureDifference'),
    };
    expect(msg('liquid-full-near-peak', p)).toBe(
      'The tank would become liquid-full at 140.0 °F (60.0 °C), less than 9 °F (5 °C) above the forecast peak 134.0 °F (56.7 °C).',
    );
  });
  it('a margin rounded down shows the smaller whole degree', () => {
    // 2.9 K = 5.22 °F: down → 5 °F (2 °C); up → 6 °F (3 °C).
    const at = (round: 'up' | 'down') =>
      msg('liquid-full-near-peak', { ...ALL, margin: num(2.9, 'temperatureDifference', round) });
    expect(at('down')).toContain('less than 5 °F (2 °C) above');
    expect(at('up')).toContain('less than 6 °F (3 °C) above');
  });
  it('over the fill limit: contents and excess up, limit down', () => {
    // 1000.2 kg = 2205.07 lb (up 2206); 899.97 kg = 1984.06 lb (down 1984, 899.9 kg);
    // 100.23 kg = 220.97 lb (up 221, 100.3 kg).
    expect(
      msg('over-fill-limit', {
        contents: num(1000.2, 'mass', 'up'),
        limit: num(899.97, 'mass', 'down'),
        over: num(100.23, 'mass', 'up'),
      }),
    ).toBe(
      'The contents, 2206 lb (1000.2 kg), are above the fill limit of 1984 lb (899.9 kg) by 221 lb (100.3 kg).',
    );
  });
  it('a reading off the band: the size of the difference whichever way it lies', () => {
    const low = msg('pressure-low', {
      ...ALL,
      difference: num(-50_000, 'pressureDifference', 'up'),
    });
    const high = msg('pressure-high', {
      ...ALL,
      difference: num(50_000, 'pressureDifference', 'up'),
    });
    // 50 kPa = 7.252 psi: up → 7.3 psi (50 kPa), never a negative figure.
    expect(low).toContain(', 7.3 psi (50 kPa) lower than');
    expect(high).toContain(', 7.3 psi (50 kPa) higher than');
  });
});

describe('the peak messages whole', () => {
  // 150 °F = 65.56 °C; 146.63 °F = 63.68 °C, rounded down (the earlier, cautious figure);
  // 304.1282 K = 87.76 °F = 30.98 °C (CO2's critical point, Span & Wagner 1996);
  // 260.04 psig = 1792.9 kPa g, rounded up.
  const peak = num(K(150), 'temperature');
  const from = num(K(146.63), 'temperature', 'down');
  it('liquid-full at the peak', () => {
    expect(msg('liquid-full-at-peak', { peak, from })).toBe(
      'At the forecast peak 150.0 °F (65.6 °C) the figures show the tank liquid-full (from about 146.6 °F (63.6 °C)): the pressure would then be limited only by the relief valve.',
    );
  });
  it('full of dense fluid at the peak', () => {
    expect(
      msg('dense-fluid-at-peak', { peak, from, criticalTemperature: num(304.1282, 'temperature') }),
    ).toBe(
      'At the forecast peak 150.0 °F (65.6 °C), above the critical temperature 87.8 °F (31.0 °C), the tank would be full of dense fluid (no vapour space from about 146.6 °F (63.6 °C)): the contents are denser than the critical density, so the pressure climbs as steeply as in a liquid-full tank and would be limited only by the relief valve.',
    );
  });
  it('at the relief setting at the peak', () => {
    expect(
      msg('relief-at-peak', {
        peak,
        from,
        pressure: num(260.04 * PSI, 'gaugePressure', 'up'),
        relief: num(250 * PSI, 'gaugePressure'),
      }),
    ).toBe(
      'The relief valve may open: at the forecast peak 150.0 °F (65.6 °C) the expected pressure 260.1 psig (1793 kPa g) (with the model allowance) reaches the relief set pressure 250.0 psig (1724 kPa g), from about 146.6 °F (63.6 °C).',
    );
  });
});

describe('one figure in the default units', () => {
  it('a volume: 1000 US gal = 3.785 411 784 m³; 3.7855 m³ = 1000.02 US gal', () => {
    expect(formatParam(num(3.785411784, 'volume'), 'waterCapacity', BARO)).toBe(
      '1000 US gal (3.785 m³)',
    );
    expect(formatParam(num(3.7855, 'volume', 'up'), 'shapeVolume', BARO)).toBe(
      '1001 US gal (3.786 m³)',
    );
    expect(formatParam(num(3.7855, 'volume', 'down'), 'shapeVolume', BARO)).toBe(
      '1000 US gal (3.785 m³)',
    );
  });
  it('a figure with no rounding given is rounded to the nearest (100.04 psig = 689.75 kPa g)', () => {
    expect(formatParam({ value: 100.04 * PSI, quantity: 'gaugePressure' }, 'pressure', BARO)).toBe(
      '100.0 psig (690 kPa g)',
    );
    expect(num(5, 'temperatureDifference')).toEqual({
      value: 5,
      quantity: 'temperatureDifference',
      round: 'nearest',
    });
  });
  it('a figure given in words is printed as given; a missing one leaves nothing in its place', () => {
    expect(msg('liquid-full-beyond-model', { top: 'the end of the model' })).toBe(
      'No liquid-full temperature is given: for this blend it lies above the end of the model, beyond the range the check searches.',
    );
    expect(msg('liquid-full-beyond-model', {})).toBe(
      'No liquid-full temperature is given: for this blend it lies above , beyond the range the check searches.',
    );
  });
});
