/**
 * The engine's default English wording (thermo/check/caution-text.ts): every caution states its
 * figures, US trade units first and SI in brackets, rounded the way its parameter says (toward
 * safety), and its optional parts appear exactly when their parameter is given. Expected figures
 * are converted by hand from the unit definitions (NIST SP 811 Appendix B: 1 psi = 6.894757 kPa,
 * 1 lb = 0.45359237 kg, 1 US gal = 3.785411784 L; T(°F) = (T(K) − 273.15)·9/5 + 32) and the CO2
 * triple point of Span & Wagner 1996 (517.96 kPa = 75.1 psia = 60.4 psig at sea level, FACTS.md
 * case 12).
 */
import { describe, expect, it } from 'vitest';
import { CAUSE_TEXT, cautionMessage } from '../../thermo/check/caution-text.js';
import { CAUSE_CODES, CAUTION_CODES, num, type MessageParams } from '../../thermo/check/codes.js';
import { STANDING_CAUTION } from '../../thermo/check/standing.js';

const BARO = 101_325;
const K = (f: number) => ((f - 32) * 5) / 9 + 273.15;
const PSI = 6894.757293168;
const msg = (code: (typeof CAUTION_CODES)[number], p: MessageParams) =>
  cautionMessage(code, p, BARO);

describe('each caution states its figures in both unit systems', () => {
  // [code, params, fragments the message must hold]
  const T100 = num(K(100), 'temperature');
  const G250 = num(250 * PSI, 'gaugePressure');
  const cases: [(typeof CAUTION_CODES)[number], MessageParams, string[]][] = [
    [
      'liquid-full-now',
      { temperature: T100, fillingDensity: num(0.456, 'fraction', 'up') },
      ['liquid-full now at 100.0 °F (37.8 °C)', '45.6 % of the water weight capacity'],
    ],
    [
      'dense-fluid-now',
      {
        temperature: T100,
        criticalTemperature: num(304.1282, 'temperature'),
        fillingDensity: num(0.6, 'fraction', 'up'),
      },
      [
        'full of dense fluid now: at 100.0 °F (37.8 °C)',
        'critical temperature 87.8 °F (31.0 °C)',
        '(60.0 % of',
      ],
    ],
    [
      'relief-now',
      {
        pressure: num(251 * PSI, 'gaugePressure', 'up'),
        upper: num(253 * PSI, 'gaugePressure', 'up'),
        relief: G250,
      },
      [
        '251.0 psig (1731 kPa g)',
        'up to 253.0 psig (1745 kPa g)',
        'relief set pressure 250.0 psig (1724 kPa g)',
      ],
    ],
    [
      'supercritical-now',
      { temperature: T100, criticalTemperature: num(304.1282, 'temperature') },
      [
        'The liquid temperature 100.0 °F (37.8 °C) is above the critical temperature 87.8 °F (31.0 °C)',
        'only the weight tells',
      ],
    ],
    [
      'co2-below-triple-point',
      { threshold: num(517_960 - BARO, 'gaugePressure'), tripleAbsolute: num(517_960, 'pressure') },
      ['75.1 psia (518.0 kPa a) = 60.4 psig (417 kPa g)', 'dry ice'],
    ],
    [
      'below-mdmt',
      { temperature: num(K(-30), 'temperature'), mdmt: num(K(-20), 'temperature') },
      [
        'The liquid at -30.0 °F (-34.4 °C) is colder than the minimum design metal temperature -20.0 °F (-28.9 °C)',
      ],
    ],
    [
      'autorefrigeration-below-mdmt',
      { boiling: num(K(-43.8), 'temperature'), mdmt: num(K(-20), 'temperature') },
      [
        'its boiling point at atmospheric pressure, -43.8 °F (-42.1 °C)',
        'temperature -20.0 °F (-28.9 °C)',
      ],
    ],
    [
      'reference-above-critical',
      { reference: num(K(131), 'temperature'), criticalTemperature: num(304.1282, 'temperature') },
      ['At 131.0 °F (55.0 °C) the product is above its critical temperature 87.8 °F (31.0 °C)'],
    ],
    [
      'liquid-full-near-peak',
      {
        full: num(K(140), 'temperature', 'down'),
        peak: num(K(134), 'temperature'),
        margin: num(5, 'temperatureDifference'),
      },
      [
        'liquid-full at 140.0 °F (60.0 °C), less than 9 °F (5 °C) above the forecast peak 134.0 °F (56.7 °C)',
      ],
    ],
    [
      'liquid-full-beyond-model',
      { top: num(K(160), 'temperature', 'down') },
      ['it lies above 160.0 °F (71.1 °C)'],
    ],
    [
      'design-at-peak',
      {
        peak: T100,
        pressure: num(260 * PSI, 'gaugePressure', 'up'),
        allowance: num(0.005, 'fraction'),
        design: G250,
        over: num(10 * PSI, 'pressureDifference', 'up'),
      },
      [
        'At the forecast peak 100.0 °F (37.8 °C) the expected pressure 260.0 psig (1793 kPa g) (with the model allowance of 0.5 %) is above the design pressure 250.0 psig (1724 kPa g) by 10.0 psi (69 kPa)',
      ],
    ],
    [
      'relief-near-at-peak',
      { peak: T100, headroom: num(5 * PSI, 'pressureDifference', 'down'), relief: G250 },
      [
        'Little headroom at the forecast peak 100.0 °F (37.8 °C): 5.0 psi (34 kPa) below the relief set pressure 250.0 psig (1724 kPa g)',
      ],
    ],
    [
      'supercritical-at-peak',
      { peak: T100, criticalTemperature: num(304.1282, 'temperature') },
      [
        'At the forecast peak 100.0 °F (37.8 °C) the product is above its critical temperature 87.8 °F (31.0 °C)',
      ],
    ],
    [
      'small-vapour-space-at-peak',
      { liquidFraction: num(0.978, 'fraction', 'up') },
      ['the liquid would fill 97.8 % of the tank'],
    ],
    ['gauge-at-end', { reading: num(1, 'fraction') }, ['The float gauge reads 100.0 %']],
    ['empty', { contents: num(0, 'mass') }, ['The scale shows no product in the tank.']],
    [
      'shape-capacity-mismatch',
      {
        shapeVolume: num(3.785411784, 'volume'),
        waterCapacity: num(3.7, 'volume'),
        excess: num(0.0231, 'fraction'),
      },
      ['give 2.3 % more volume than the water capacity entered'],
    ],
    [
      'relief-assumed',
      { design: G250 },
      ['taken as the design pressure 250.0 psig (1724 kPa g)', 'Table H-26: 88–100 %'],
    ],
    [
      'relief-above-design',
      { relief: num(260 * PSI, 'gaugePressure'), design: G250 },
      [
        'The relief set pressure 260.0 psig (1793 kPa g) is above the design pressure 250.0 psig (1724 kPa g)',
      ],
    ],
    [
      'sg-differs',
      { entered: num(0.52, null), model: num(0.5072, null) },
      [
        'The entered specific gravity 0.520 differs by more than 2 % from the model’s 0.5072'.replace(
          '’',
          "'",
        ),
      ],
    ],
    [
      'peak-below-now',
      { peak: num(K(70), 'temperature'), temperature: T100 },
      ['The forecast peak 70.0 °F (21.1 °C) is colder than the liquid now 100.0 °F (37.8 °C)'],
    ],
    [
      'blend-bubble-point',
      { pressure: num(236.5 * PSI, 'gaugePressure', 'up') },
      ['bubble-point pressure of the whole contents (236.5 psig (1631 kPa g) now)'],
    ],
    ['standing', {}, [STANDING_CAUTION]],
  ];
  for (const [code, p, fragments] of cases)
    it(code, () => {
      const m = msg(code, p);
      for (const f of fragments) expect(m).toContain(f);
      expect(m).not.toMatch(/NaN|undefined/);
    });

  it('every caution code has a message (none empty, none printing NaN)', () => {
    for (const code of CAUTION_CODES) {
      const m = msg(code, {});
      expect(m.length, code).toBeGreaterThan(20);
      expect(m, code).not.toMatch(/NaN/);
    }
    for (const c of CAUSE_CODES) expect(CAUSE_TEXT[c].length, c).toBeGreaterThan(20);
  });
});

describe('optional parts appear exactly when their parameter is given', () => {
  it('over the fill limit: masses rounded toward safety, the limit named when known', () => {
    // 1,000 kg = 2,204.6 lb (up: 2,205); 900 kg = 1,984.2 lb (down: 1,984); 100 kg = 220.5 lb (up: 221)
    const p = {
      contents: num(1000, 'mass', 'up'),
      limit: num(900, 'mass', 'down'),
      over: num(100, 'mass', 'up'),
      limitId: 'h27',
    };
    expect(msg('over-fill-limit', p)).toBe(
      'The contents, 2205 lb (1000.0 kg), are above the fill limit of 1984 lb (900.0 kg) by 221 lb (100.0 kg).',
    );
    expect(
      msg('over-fill-limit', { ...p, description: 'the 42 % rule', citation: 'Table H-27' }),
    ).toContain('by 221 lb (100.0 kg) (the 42 % rule; Table H-27).');
  });
  it('no filling rule: the specific gravity when given, and which limit is shown', () => {
    const p = { limit: num(900, 'mass', 'down'), containerClass: 'cargo' };
    const a = msg('no-filling-rule', {
      ...p,
      shown: 'not-full',
      specificGravity: num(0.5072, null),
    });
    expect(a).toContain('in a cargo container (specific gravity 0.5072).');
    expect(a).toContain('The limit shown is only the not-liquid-full limit;');
    const b = msg('no-filling-rule', { ...p, shown: 'contents' });
    expect(b).toContain('in a cargo container. The limit shown is the present contents');
    expect(b).not.toContain('specific gravity');
  });
  it('full or at the relief at the peak: "from about" only with a temperature', () => {
    const peak = num(K(150), 'temperature');
    // 146.63 °F = 63.68 °C: both rounded down (toward the earlier, safer figure)
    const from = num(K(146.63), 'temperature', 'down');
    expect(msg('liquid-full-at-peak', { peak, from })).toContain(
      'liquid-full (from about 146.6 °F (63.6 °C)):',
    );
    expect(msg('liquid-full-at-peak', { peak })).toContain('liquid-full: the pressure');
    const Tc = num(304.1282, 'temperature');
    expect(msg('dense-fluid-at-peak', { peak, criticalTemperature: Tc, from })).toContain(
      'full of dense fluid (no vapour space from about 146.6 °F (63.6 °C)):',
    );
    expect(msg('dense-fluid-at-peak', { peak, criticalTemperature: Tc })).toContain(
      'full of dense fluid: the contents',
    );
    const p = {
      peak,
      pressure: num(260 * PSI, 'gaugePressure', 'up'),
      relief: num(250 * PSI, 'gaugePressure'),
    };
    expect(msg('relief-at-peak', { ...p, from })).toContain(
      '250.0 psig (1724 kPa g), from about 146.6 °F (63.6 °C).',
    );
    expect(msg('relief-at-peak', p)).toContain('250.0 psig (1724 kPa g).');
  });
  it('a reading off the band: its size either way, the first cause and the propane split', () => {
    // 50 kPa = 7.25 psi; 40 kPa = 5.80 psi; 500 kPa = 72.5 psig; 550 kPa = 79.8 psig; 300 K = 80.3 °F
    const p = {
      difference: num(-50_000, 'pressureDifference'),
      reading: num(500_000, 'gaugePressure'),
      expected: num(550_000, 'gaugePressure'),
      temperature: num(300, 'temperature'),
      tolerance: num(40_000, 'pressureDifference'),
    };
    const low = msg('pressure-low', {
      ...p,
      cause: 'liquid-colder',
      propaneFraction: num(0.734, 'fraction'),
    });
    expect(low).toContain(
      'The gauge reads 72.5 psig (500 kPa g), 7.3 psi (50 kPa) lower than the 79.8 psig (550 kPa g) expected for this product at 80.3 °F (26.9 °C) (band ±5.8 psi (40 kPa)).',
    );
    expect(low).toContain(`Likely: ${CAUSE_TEXT['liquid-colder']}`);
    expect(low).toContain('a propane/n-butane mix of about 73 % propane (mole).');
    const high = msg('pressure-high', { ...p, difference: num(50_000, 'pressureDifference') });
    expect(high).toContain('7.3 psi (50 kPa) higher than');
    expect(high).toMatch(/Likely: $/);
    expect(high).not.toContain('propane/n-butane');
  });
  it('the site’s own rule: by volume or of the water weight, with the stop and the limit', () => {
    const p = { stop: num(0.8, 'fraction', 'down'), limit: num(900, 'mass', 'down') };
    expect(
      msg('site-rule-binds', { ...p, form: 'percent', figure: num(0.8, 'fraction', 'down') }),
    ).toBe(
      "Limited by this site's own rule: 80.0 % by volume, below the rule set's limits. Stop at or below 80.0 % on the float gauge (1984 lb (900.0 kg)).",
    );
    expect(
      msg('site-rule-binds', {
        ...p,
        form: 'filling-density',
        figure: num(0.4, 'fraction', 'down'),
      }),
    ).toContain('40.0 % of the water weight capacity, below');
  });
  it('a vacuum: read on the gauge, or expected at the temperature given', () => {
    const pressure = num(-3.16 * PSI, 'gaugePressure');
    const temperature = num(K(20), 'temperature');
    expect(msg('vacuum', { pressure, source: 'reading', temperature })).toContain(
      '(-3.2 psig (-22 kPa g), gauge reading)',
    );
    expect(msg('vacuum', { pressure, source: 'expected', temperature })).toContain(
      '(-3.2 psig (-22 kPa g), expected at 20.0 °F (-6.7 °C))',
    );
  });
});
