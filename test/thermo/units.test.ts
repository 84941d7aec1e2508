import { describe, it, expect } from 'vitest';
import { InputError } from '../../thermo/errors.js';
import {
  barometricPressureAtElevation,
  formatNumber,
  formatQuantity,
  fromSI,
  toSI,
  UNITS,
  PSI_PA,
} from '../../thermo/units.js';
import { expectRel, expectWithin } from './check-helpers.js';

// Definitions: NIST SP 811 (2008) Appendix B; 1 US gal = 231 in³ (exact); 1 psi = 6.894757 kPa (FACTS.md, 7 s.f.).
const NIST = 'NIST SP 811 (2008) App. B, exact definitions';

describe('toSI / fromSI', () => {
  it('toSI converts by the exact definitions', () => {
    // published: exact definitions → rtol 1e-12 (floating point only)
    expectRel(toSI('volume', 1, 'usgal'), 231 * 0.0254 ** 3, 1e-12, {
      input: '1 US gal',
      source: NIST,
      kind: 'published',
    });
    expectRel(toSI('volume', 1, 'impgal'), 4.54609e-3, 1e-12, {
      input: '1 imp gal',
      source: NIST,
      kind: 'published',
    });
    expectRel(toSI('mass', 1, 'lb'), 0.45359237, 1e-12, {
      input: '1 lb',
      source: NIST,
      kind: 'published',
    });
    expectRel(toSI('length', 1, 'ft'), 0.3048, 1e-12, {
      input: '1 ft',
      source: NIST,
      kind: 'published',
    });
    expectRel(toSI('temperature', 60, 'F'), 288.7055555555556, 1e-12, {
      input: '60 °F',
      source: NIST,
      kind: 'published',
    });
    expectRel(toSI('temperature', -40, 'C'), 233.15, 1e-12, {
      input: '−40 °C',
      source: NIST,
      kind: 'published',
    });
    // published: 1 psi = 6.894757 kPa printed to 7 s.f. in FACTS.md → rtol 1e-7
    expectRel(PSI_PA, 6894.757, 1e-7, {
      input: '1 psi',
      source: 'FACTS.md units line; NIST SP 811 (6.894757 E+03)',
      kind: 'published',
    });
  });

  it('toSI turns gauge into absolute with the barometric pressure', () => {
    // published: 1 atm = 14.696 psia (FACTS.md, 5 s.f.) → 0 psig = 14.696 psia within 5e-4 psi
    const pAbs = toSI('pressure', 0, 'psig');
    expectWithin(fromSI('pressure', pAbs, 'psia'), 14.696, 5e-4, {
      input: '0 psig at sea level',
      source: 'FACTS.md: 1 atm = 14.696 psia',
      kind: 'published',
    });
    // identity: gauge = absolute − barometer at any site
    const baro = 84_000;
    expectWithin(
      toSI('gaugePressure', 2, 'bara', { barometricPressureAbs: baro }),
      2e5 - baro,
      1e-9,
      {
        input: '2 bar a at 84 kPa',
        source: 'definition of gauge pressure',
        kind: 'identity',
      },
    );
    expectWithin(toSI('pressure', 100, 'kPag', { barometricPressureAbs: baro }), 1e5 + baro, 1e-9, {
      input: '100 kPa g at 84 kPa',
      source: 'definition of gauge pressure',
      kind: 'identity',
    });
  });

  it('fromSI inverts toSI for every unit of every quantity', () => {
    for (const [q, list] of Object.entries(UNITS)) {
      for (const u of list) {
        const x = 123.456;
        const si = toSI(q as 'mass', x, u.id as 'kg', { barometricPressureAbs: 90_000 });
        const back = fromSI(q as 'mass', si, u.id as 'kg', { barometricPressureAbs: 90_000 });
        // identity: round trip → rtol 1e-12 (floating point)
        expectRel(back, x, 1e-12, {
          input: `${q} ${u.id}`,
          source: 'round trip',
          kind: 'identity',
        });
      }
    }
  });

  it('toSI throws InputError for an unknown unit or a non-finite value', () => {
    expect(() => toSI('mass', 1, 'stone' as 'kg')).toThrow(InputError);
    expect(() => toSI('mass', Number.NaN, 'kg')).toThrow(InputError);
    expect(() => fromSI('pressure', 1e5, 'psig', { barometricPressureAbs: 5 })).toThrow(InputError);
  });
});

describe('barometricPressureAtElevation', () => {
  // from memory: US Standard Atmosphere 1976 tables (geopotential altitude): 1000 m 89 874.6 Pa,
  // 2000 m 79 495.2 Pa, 5000 m 54 019.9 Pa, 11 000 m 22 632.1 Pa. Printed to 6 s.f.; our R* and
  // M give a 2e-5 spread → rtol 1e-4.
  const cases: [number, number][] = [
    [0, 101_325],
    [1000, 89_874.6],
    [2000, 79_495.2],
    [5000, 54_019.9],
    [11_000, 22_632.1],
  ];
  for (const [z, p] of cases) {
    it(`barometricPressureAtElevation(${z} m) matches the standard atmosphere table`, () => {
      expectRel(barometricPressureAtElevation(z), p, 1e-4, {
        input: `${z} m`,
        source: 'US Standard Atmosphere 1976, Table I (from memory)',
        kind: 'published',
      });
    });
  }
  it('barometricPressureAtElevation rejects elevations outside −500…11 000 m', () => {
    expect(() => barometricPressureAtElevation(12_000)).toThrow(InputError);
    expect(() => barometricPressureAtElevation(Number.NaN)).toThrow(InputError);
  });
});

describe('formatQuantity', () => {
  it('formatQuantity never prints NaN or Infinity', () => {
    for (const v of [Number.NaN, Infinity, -Infinity, null, undefined]) {
      const s = formatQuantity('mass', v as number, 'lb');
      expect(s).not.toMatch(/NaN|Infinity/);
      expect(s).toBe('–');
    }
  });
  it('formatQuantity rounds in the direction asked', () => {
    expect(
      formatQuantity('mass', toSI('mass', 348.79, 'lb'), 'lb', { decimals: 1, round: 'down' }),
    ).toBe('348.7 lb');
    expect(
      formatQuantity('gaugePressure', toSI('gaugePressure', 199.61, 'psig'), 'psig', {
        decimals: 1,
        round: 'up',
      }),
    ).toBe('199.7 psig');
    expect(formatQuantity('fraction', 0.8567, 'percent', { decimals: 1 })).toBe('85.7 %');
    expect(formatNumber(-0.00001, 2)).toBe('0.00');
    expect(formatNumber(0.3 * 3, 1, 'down')).toBe('0.9');
  });
});
