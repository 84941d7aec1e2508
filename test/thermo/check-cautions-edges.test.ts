/**
 * Cautions the other tests do not reach (thermo/check/cautions.ts, caution-text.ts), each on
 * both sides of its threshold where the threshold can be reached, with its figures in the
 * message in both unit systems. Sources: FACTS.md (test/reference/trade/FACTS.md) cases 8
 * (propane 199.6 psig at 110 °F, 213.4 psig at 115 °F) and 11 (propane at 42 % of the water
 * weight is liquid-full at 146.6 °F ± 2 °F), section c (CO2 critical point 87.8 °F; propane SG
 * 0.5072, ASTM D2598 Table 1); the volume of a sphere, πd³/6; unit definitions (NIST SP 811:
 * 1 psi = 6.894757 kPa). Thresholds (5 K to liquid-full, 5 % of the relief setting, 95 % liquid,
 * 3 % shape mismatch, 2 % SG, 0.01 kg over the limit) are the check's own, documented in
 * cautions.ts and caution-text.ts.
 */
import { describe, expect, it } from 'vitest';
import { checkTank, type TankCheckInput, type TankCheckResult } from '../../thermo/index.js';
import { WATER_FD_KG_M3 } from '../../thermo/rules/water.js';
import { toSI } from '../../thermo/units.js';

const F = (x: number) => toSI('temperature', x, 'F');
const gal = (x: number) => toSI('volume', x, 'usgal');
const psig = (x: number) => toSI('gaugePressure', x, 'psig');
const V = gal(1000);
const codes = (r: TankCheckResult) => r.cautions.map((c) => c.code);
const find = (r: TankCheckResult, code: string) => r.cautions.find((c) => c.code === code);

function propane(over: Partial<TankCheckInput> = {}, tank: Partial<TankCheckInput['tank']> = {}) {
  return checkTank({
    tank: {
      waterCapacity: V,
      designPressureGauge: psig(250),
      reliefSetPressureGauge: psig(250),
      ...tank,
    },
    product: 'propane',
    liquidTemperature: F(60),
    contents: { gaugePercent: 50 },
    peakTemperature: F(60),
    ...over,
  });
}
const RANK = { danger: 0, warning: 1, caution: 2, notice: 3 } as const;

function expectRanked(r: TankCheckResult) {
  const c = r.cautions;
  expect(c.at(-1)!.code).toBe('standing');
  expect(c.at(-1)!.value).toBeNull();
  for (let i = 1; i < c.length - 1; i++)
    expect(RANK[c[i]!.level]).toBeGreaterThanOrEqual(RANK[c[i - 1]!.level]);
}

describe('near the relief setting at the peak (FACTS.md case 8, relief 220 psig)', () => {
  const relief = { reliefSetPressureGauge: psig(220) };
  it('at 115 °F (213.4 psig, headroom 6.6 psi less the allowance) the headroom is under 5 %', () => {
    const r = propane({ liquidTemperature: F(80), peakTemperature: F(115) }, relief);
    const c = find(r, 'relief-near-at-peak')!;
    expect(c.level).toBe('caution');
    // the caution's figure is its first: the peak temperature
    expect(c.quantity).toBe('temperature');
    expect(c.value!).toBeCloseTo(F(115), 9);
    const h = c.params['headroom'] as { value: number };
    expect(h.value).toBeGreaterThan(0);
    expect(h.value).toBeLessThan(0.05 * psig(220));
    expect(c.message).toContain('220.0 psig (1517 kPa g)');
    expect(c.message).toContain('115.0 °F (46.1 °C)');
    expect(codes(r)).not.toContain('relief-at-peak');
    expectRanked(r);
  });
  it('at 110 °F (199.6 psig, about 20 psi of headroom) there is no such caution', () => {
    const r = propane({ liquidTemperature: F(80), peakTemperature: F(110) }, relief);
    expect(codes(r)).not.toContain('relief-near-at-peak');
    expect(codes(r)).not.toContain('relief-at-peak');
  });
});

describe('liquid-full near the peak (FACTS.md case 11: 42 % propane is full at 146.6 °F)', () => {
  const contents = { netMass: 0.42 * V * WATER_FD_KG_M3 };
  it('a 140 °F peak is less than 5 K (9 °F) below it: a warning, and the liquid fills > 95 %', () => {
    const r = propane({ contents, peakTemperature: F(140) }, { designPressureGauge: psig(400) });
    const w = find(r, 'liquid-full-near-peak')!;
    expect(w.level).toBe('warning');
    expect(w.quantity).toBe('temperature');
    expect(w.value!).toBeGreaterThan(F(144.6));
    expect(w.value!).toBeLessThan(F(148.6));
    expect(w.message).toContain('less than 9 °F (5 °C) above the forecast peak 140.0 °F (60.0 °C)');
    const s = find(r, 'small-vapour-space-at-peak')!;
    expect(s.level).toBe('caution');
    expect(s.value!).toBeGreaterThan(0.95);
    expect(s.value!).toBeLessThan(1);
    expect(s.value!).toBeGreaterThanOrEqual(r.peak.liquidFraction);
    expect(codes(r)).not.toContain('liquid-full-at-peak');
    expectRanked(r);
  });
  it('a 135 °F peak is more than 5 K below it: no warning', () => {
    const r = propane({ contents, peakTemperature: F(135) }, { designPressureGauge: psig(400) });
    expect(codes(r)).not.toContain('liquid-full-near-peak');
  });
  it('a 150 °F peak is past it: a danger, from about the liquid-full temperature', () => {
    const r = propane({ contents, peakTemperature: F(150) }, { designPressureGauge: psig(400) });
    const d = find(r, 'liquid-full-at-peak')!;
    expect(d.level).toBe('danger');
    expect(d.message).toContain('At the forecast peak 150.0 °F (65.6 °C)');
    expect(d.message).toMatch(/from about 14[5-8]\.\d °F/);
    expect(codes(r)).not.toContain('liquid-full-near-peak');
  });
  it('at 100 °F the liquid is far from filling the tank: no small-vapour-space caution', () => {
    const r = propane({ contents, peakTemperature: F(100) }, { designPressureGauge: psig(400) });
    expect(codes(r)).not.toContain('small-vapour-space-at-peak');
    expect(codes(r)).not.toContain('liquid-full-near-peak');
  });
});

describe('CO2 past its critical temperature, 87.8 °F (31.0 °C)', () => {
  const cyl = {
    waterCapacity: 0.0227,
    designPressureGauge: psig(1800),
    reliefSetPressureGauge: psig(1800),
    containerClass: 'cylinder' as const,
  };
  it('contents denser than the critical density at 310 K: full of dense fluid now (danger)', () => {
    const r = checkTank({
      tank: cyl,
      product: 'carbon-dioxide',
      liquidTemperature: 310,
      contents: { netMass: 0.6 * 0.0227 * WATER_FD_KG_M3 },
      peakTemperature: 310,
    });
    expect(r.full).toBe('dense-fluid');
    const d = find(r, 'dense-fluid-now')!;
    expect(d.level).toBe('danger');
    expect(d.message).toContain('above the critical temperature 87.8 °F (31.0 °C)');
    expect(d.message).toContain('(60.0 % of the water weight capacity)');
    expect(find(r, 'supercritical-now')!.level).toBe('warning');
    const n = find(r, 'reference-above-critical')!;
    expect(n.level).toBe('notice');
    expect(n.message).toContain('87.8 °F (31.0 °C)');
    expect(codes(r)).not.toContain('liquid-full-now');
    expectRanked(r);
  });
  it('two-phase at 70 °F, thinner than critical, peak 95 °F: supercritical at the peak (caution)', () => {
    const r = checkTank({
      tank: cyl,
      product: 'carbon-dioxide',
      liquidTemperature: F(70),
      contents: { netMass: 0.3 * 0.0227 * WATER_FD_KG_M3 },
      peakTemperature: F(95),
    });
    expect(r.phase).toBe('two-phase');
    const c = find(r, 'supercritical-at-peak')!;
    expect(c.level).toBe('caution');
    expect(c.message).toContain('At the forecast peak 95.0 °F (35.0 °C)');
    expect(codes(r)).not.toContain('supercritical-now');
    expect(codes(r)).not.toContain('dense-fluid-at-peak');
  });
});

describe('notices on the nameplate and the readings', () => {
  it('no relief setting: taken as the design pressure, said once', () => {
    const r = checkTank({
      tank: { waterCapacity: V, designPressureGauge: psig(250) },
      product: 'propane',
      liquidTemperature: F(60),
      contents: { gaugePercent: 50 },
      peakTemperature: F(60),
    });
    const n = find(r, 'relief-assumed')!;
    expect(n.level).toBe('notice');
    expect(n.value).toBe(psig(250));
    expect(n.quantity).toBe('gaugePressure');
    // 250 psig = 1723.7 kPa (1 psi = 6.894757 kPa)
    expect(n.message).toContain('taken as the design pressure 250.0 psig (1724 kPa g)');
    expect(codes(propane())).not.toContain('relief-assumed');
  });
  it('a relief setting above the design pressure is pointed out; at it, not', () => {
    const r = propane({}, { reliefSetPressureGauge: psig(260) });
    expect(find(r, 'relief-above-design')!.message).toContain(
      'The relief set pressure 260.0 psig (1793 kPa g) is above the design pressure 250.0 psig (1724 kPa g)',
    );
    expect(codes(propane())).not.toContain('relief-above-design');
  });
  it('an entered SG more than 2 % off propane’s 0.5072 is pointed out; within 2 %, not', () => {
    expect(find(propane({ specificGravity: 0.52 }), 'sg-differs')!.message).toContain(
      'The entered specific gravity 0.520 differs by more than 2 %',
    );
    expect(find(propane({ specificGravity: 0.49 }), 'sg-differs')).toBeDefined();
    expect(codes(propane({ specificGravity: 0.515 }))).not.toContain('sg-differs');
    expect(codes(propane({ specificGravity: 0.5 }))).not.toContain('sg-differs');
  });
  it('a blend’s two-phase pressure is its bubble pressure, said in a notice; not for a pure fluid', () => {
    const r = checkTank({
      tank: { waterCapacity: 0.0227, designPressureGauge: psig(400), containerClass: 'cylinder' },
      product: 'r410a',
      liquidTemperature: F(80),
      contents: { gaugePercent: 50 },
      peakTemperature: F(80),
    });
    const n = find(r, 'blend-bubble-point')!;
    expect(n.level).toBe('notice');
    expect(n.value!).toBeGreaterThanOrEqual(r.pGauge);
    expect(codes(propane())).not.toContain('blend-bubble-point');
  });
  it('a scale reading of zero: empty (notice); the sphere’s dimensions 4.7 % over the capacity', () => {
    // sphere of 1 m: π/6 = 0.5236 m³ against 0.5 m³ entered: 4.7 % more (> 3 %)
    const r = checkTank({
      tank: {
        waterCapacity: 0.5,
        designPressureGauge: psig(250),
        shape: { kind: 'sphere', diameter: 1 },
      },
      product: 'propane',
      liquidTemperature: F(80),
      contents: { netMass: 0 },
      peakTemperature: F(80),
    });
    const e = find(r, 'empty')!;
    expect([e.level, e.value, e.quantity]).toEqual(['notice', 0, 'mass']);
    const m = find(r, 'shape-capacity-mismatch')!;
    expect(m.level).toBe('caution');
    expect(m.message).toContain('4.7 % more volume than the water capacity entered');
    // 0.52 m³ entered: 0.7 % apart, within 3 %
    const ok = checkTank({
      tank: {
        waterCapacity: 0.52,
        designPressureGauge: psig(250),
        shape: { kind: 'sphere', diameter: 1 },
      },
      product: 'propane',
      liquidTemperature: F(80),
      contents: { netMass: 1 },
      peakTemperature: F(80),
    });
    expect(codes(ok)).not.toContain('shape-capacity-mismatch');
    expect(codes(ok)).not.toContain('empty');
  });
});

describe('a vacuum: read on the gauge, or expected at the liquid temperature', () => {
  it('a gauge below zero on propane at 60 °F (92 psig expected) is a vacuum read, not expected', () => {
    // propane at 60 °F: 92.4 psig (test/reference/trade/saturation_properties.csv)
    const r = propane({ pressureReadingGauge: -1000 });
    const w = find(r, 'vacuum')!;
    expect(w.level).toBe('warning');
    expect(w.params['source']).toBe('reading');
    expect(w.value).toBe(-1000);
    expect(w.message).toContain('The tank is under vacuum (-0.1 psig (-1 kPa g), gauge reading)');
    expect(codes(propane({ pressureReadingGauge: 0 }))).not.toContain('vacuum');
  });
  it('n-butane at 0 °F is expected below atmospheric (−7.46 psig, FACTS.md case 14)', () => {
    const r = checkTank({
      tank: { waterCapacity: V, designPressureGauge: psig(250) },
      product: 'n-butane',
      liquidTemperature: F(0),
      contents: { gaugePercent: 50 },
      peakTemperature: F(0),
    });
    const w = find(r, 'vacuum')!;
    expect(w.params['source']).toBe('expected');
    expect(w.message).toContain(', expected at 0.0 °F (-17.8 °C))');
    expect(w.message).toMatch(/under vacuum \(-7\.[3-6] psig/);
  });
});

describe('over the fill limit: by more than the 0.01 kg the limit is rounded to', () => {
  const at = (mass: number) => propane({ contents: { netMass: mass } });
  const limit = propane().fillLimit.maxMass;
  it('at the limit and 0.005 kg over it: not over; 0.05 kg over: a warning naming the limit', () => {
    expect(codes(at(limit))).not.toContain('over-fill-limit');
    expect(codes(at(limit + 0.005))).not.toContain('over-fill-limit');
    const r = at(limit + 0.05);
    const w = find(r, 'over-fill-limit')!;
    expect(w.level).toBe('warning');
    expect(w.quantity).toBe('mass');
    expect(w.params['limitId']).toBe('h27-aboveground-small');
    expect(w.message).toContain('29 CFR 1910.110(b)(12)(i) Table H-27');
    // 42 % × 1,000 gal × 8.32828 lb/gal = 3,497.9 lb, rounded down (FACTS.md case 4)
    expect(w.message).toContain('above the fill limit of 3497 lb (1586.6 kg)');
  });
});
