/**
 * The numbers inside caution messages (thermo/check/format.ts): US trade units first, SI in
 * brackets, each rounded the way its use asks. People act on these figures at a tank, so a
 * figure that bounds what may go in (a fill limit, a stop on the gauge, a headroom) is rounded
 * down and one that warns (a pressure, an excess, contents over a limit) is rounded up.
 *
 * Expected strings are converted by hand from the unit definitions of NIST SP 811 (2008),
 * Appendix B: 1 psi = 6.894 757 kPa, 1 lb = 0.453 592 37 kg; T(°F) = (T(K) − 273.15)·9/5 + 32,
 * T(°C) = T(K) − 273.15. Sea-level barometer 101.325 kPa (ISO 2533).
 */
import { describe, expect, it } from 'vitest';
import { fmtAbs, fmtDiff, fmtGauge, fmtMass, fmtPct, fmtT } from '../../thermo/check/format.js';

const PSI = 6894.757; // Pa per psi, NIST SP 811 B.8
const LB = 0.45359237; // kg per lb, NIST SP 811 B.8

describe('each figure in both unit systems, rounded as asked', () => {
  it('gauge pressure: 100.04 psig = 689.75 kPa g', () => {
    const pa = 100.04 * PSI;
    expect(fmtGauge(pa, 'up')).toBe('100.1 psig (690 kPa g)');
    expect(fmtGauge(pa, 'down')).toBe('100.0 psig (689 kPa g)');
    expect(fmtGauge(pa, 'nearest')).toBe('100.0 psig (690 kPa g)');
    expect(fmtGauge(pa)).toBe('100.0 psig (690 kPa g)');
    // A gauge figure does not depend on the barometer (it is already gauge).
    expect(fmtGauge(pa, 'up', 80_000)).toBe('100.1 psig (690 kPa g)');
  });

  it('absolute pressure: the CO2 triple point, 517.96 kPa a = 75.124 psia (Span & Wagner 1996)', () => {
    expect(fmtAbs(517_960, 'up')).toBe('75.2 psia (518.0 kPa a)');
    expect(fmtAbs(517_960, 'down')).toBe('75.1 psia (517.9 kPa a)');
    expect(fmtAbs(517_960)).toBe('75.1 psia (518.0 kPa a)');
  });

  it('pressure difference: 10.03 psi = 69.15 kPa', () => {
    const pa = 10.03 * PSI;
    expect(fmtDiff(pa, 'up')).toBe('10.1 psi (70 kPa)');
    expect(fmtDiff(pa, 'down')).toBe('10.0 psi (69 kPa)');
    expect(fmtDiff(pa)).toBe('10.0 psi (69 kPa)');
  });

  it('temperature: 310.02 K = 98.366 °F = 36.87 °C', () => {
    expect(fmtT(310.02, 'up')).toBe('98.4 °F (36.9 °C)');
    expect(fmtT(310.02, 'down')).toBe('98.3 °F (36.8 °C)');
    expect(fmtT(310.02)).toBe('98.4 °F (36.9 °C)');
  });

  it('mass: 1000.04 kg = 2204.71 lb', () => {
    expect(fmtMass(1000.04, 'up')).toBe('2205 lb (1000.1 kg)');
    expect(fmtMass(1000.04, 'down')).toBe('2204 lb (1000.0 kg)');
    expect(fmtMass(1000.04)).toBe('2205 lb (1000.0 kg)');
  });

  it('a share: 0.8523 = 85.23 %', () => {
    expect(fmtPct(0.8523, 'up')).toBe('85.3 %');
    expect(fmtPct(0.8523, 'down')).toBe('85.2 %');
    expect(fmtPct(0.8523)).toBe('85.2 %');
  });
});

describe('rounding direction toward safety, over a spread of values', () => {
  // Every number shown, read back and converted by hand, is on the safe side of the true
  // figure and within one shown digit of it.
  const nums = (s: string) => [...s.matchAll(/-?\d+(?:\.\d+)?/g)].map((m) => +m[0]);
  const masses = [0.37, 12.345, 99.99, 453.6, 1000.04, 2204.3, 37_854.1];
  const gauges = [0.3, 14.69, 100.04, 249.96, 312.5].map((p) => p * PSI);

  it('a fill limit rounded down never shows more than the limit (lb and kg)', () => {
    for (const kg of masses) {
      const [lb, kgShown] = nums(fmtMass(kg, 'down'));
      expect(lb! * LB, `${kg} kg`).toBeLessThanOrEqual(kg + 1e-9);
      expect(kg - lb! * LB, `${kg} kg`).toBeLessThan(LB);
      expect(kgShown!, `${kg} kg`).toBeLessThanOrEqual(kg + 1e-9);
      expect(kg - kgShown!, `${kg} kg`).toBeLessThan(0.1);
    }
  });

  it('contents over a limit rounded up never show less than the excess', () => {
    for (const kg of masses) {
      const [lb, kgShown] = nums(fmtMass(kg, 'up'));
      expect(lb! * LB, `${kg} kg`).toBeGreaterThanOrEqual(kg - 1e-9);
      expect(kgShown!, `${kg} kg`).toBeGreaterThanOrEqual(kg - 1e-9);
    }
  });

  it('a pressure rounded up never shows less than the pressure; a headroom rounded down never more', () => {
    for (const pa of gauges) {
      const [psig, kpag] = nums(fmtGauge(pa, 'up'));
      expect(psig! * PSI, `${pa} Pa`).toBeGreaterThanOrEqual(pa - 1e-6);
      expect(psig! * PSI - pa, `${pa} Pa`).toBeLessThan(0.1 * PSI);
      expect(kpag! * 1000, `${pa} Pa`).toBeGreaterThanOrEqual(pa - 1e-6);
      const [psi, kpa] = nums(fmtDiff(pa, 'down'));
      expect(psi! * PSI, `${pa} Pa`).toBeLessThanOrEqual(pa + 1e-6);
      expect(kpa! * 1000, `${pa} Pa`).toBeLessThanOrEqual(pa + 1e-6);
    }
  });

  it('a liquid-full temperature rounded down is never later than the true one', () => {
    for (const K of [250.01, 288.149, 310.02, 336.7975, 369.39]) {
      const [F, C] = nums(fmtT(K, 'down'));
      expect(((F! - 32) * 5) / 9 + 273.15, `${K} K`).toBeLessThanOrEqual(K + 1e-9);
      expect(C! + 273.15, `${K} K`).toBeLessThanOrEqual(K + 1e-9);
      expect(K - (C! + 273.15), `${K} K`).toBeLessThan(0.1);
    }
  });

  it('a stop on the gauge rounded down is never above the stop', () => {
    for (const f of [0.0004, 0.42, 0.8, 0.8499, 0.855]) {
      const [pct] = nums(fmtPct(f, 'down'));
      expect(pct! / 100, `${f}`).toBeLessThanOrEqual(f + 1e-12);
      expect(f - pct! / 100, `${f}`).toBeLessThan(0.001);
    }
  });
});
