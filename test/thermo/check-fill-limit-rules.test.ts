/**
 * Which limits the fill limit takes for a container and fill method, and what it says about them
 * (thermo/check/fillLimit.ts): DOT-4L against ordinary CO2 cylinders, the DOT cargo fixed gauge,
 * a volume-only rule, no rule at all, a recovery cylinder, the lowest printed volume figure, and
 * a not-liquid-full limit that never rises with the reference temperature. Sources: 49 CFR
 * 173.304a(a)(2) and (e)(2), 173.315(b) Note 1 and (c)(1), 29 CFR 1910.111(b)(11) and (b)(14)(v)
 * (CFR 2015 text, test/reference/trade/); FACTS.md case 5; the R-410A reference table
 * test/reference/blends/r410a.csv (Lemmon & Jacobsen 2004 mixture model); the recovery-cylinder
 * 80 % (common practice, README); DECISIONS.md "Full of dense fluid" (the limit never rises as the
 * reference temperature does).
 */
import { describe, expect, it } from 'vitest';
import { checkTank, saturation, type TankCheckInput } from '../../thermo/index.js';
import { LPG_PRESETS } from '../../thermo/rules/presets.js';
import { WATER_FD_KG_M3 } from '../../thermo/rules/water.js';
import { MODEL_ALLOWANCE } from '../../thermo/rules/allowance.js';
import { fromSI, toSI } from '../../thermo/units.js';
import { expectRel, expectWithin } from './check-helpers.js';

const F = (x: number) => toSI('temperature', x, 'F');
const psig = (x: number) => toSI('gaugePressure', x, 'psig');
const gal = (x: number) => toSI('volume', x, 'usgal');
const lb = (kg: number) => fromSI('mass', kg, 'lb');
const codes = (r: ReturnType<typeof checkTank>) => r.cautions.map((c) => c.code);

function co2(tank: Partial<TankCheckInput['tank']>, over: Partial<TankCheckInput> = {}) {
  return checkTank({
    tank: {
      waterCapacity: 0.0227,
      designPressureGauge: psig(1800),
      containerClass: 'cylinder',
      ...tank,
    },
    product: 'carbon-dioxide',
    liquidTemperature: F(0),
    contents: { netMass: 5 },
    peakTemperature: F(0),
    ...over,
  });
}

describe('CO2: a DOT-4L cylinder is an insulated cylinder (49 CFR 173.304a(e)(2))', () => {
  it('insulated, relief 300 psig: the DOT-4L rule', () => {
    const r = co2({ insulated: true, reliefSetPressureGauge: psig(300) });
    expect(r.fillLimit.binding).toBe('dot-4l');
  });
  it('not insulated: the ordinary 68 % cylinder rule of 173.304a(a)(2)', () => {
    const r = co2({ reliefSetPressureGauge: psig(300) });
    expect(r.fillLimit.binding).toBe('co2-cylinder');
    expectWithin(r.fillLimit.maxMass, 0.68 * 0.0227 * WATER_FD_KG_M3, 0.01, {
      input: 'CO2 cylinder, 0.0227 m³',
      source: '49 CFR 173.304a(a)(2): CO2 68 % (FACTS.md a3)',
      kind: 'published',
    });
  });
  it('insulated but not a cylinder: no DOT-4L rule, and no table rule at all', () => {
    const r = co2({
      insulated: true,
      reliefSetPressureGauge: psig(300),
      containerClass: 'storage',
    });
    expect(r.fillLimit.limits.map((l) => l.id)).not.toContain('dot-4l');
    expect(r.fillLimit.binding).toBe('not-liquid-full-at-peak');
    expect(codes(r)).toContain('no-filling-rule');
    // only the physical limit: no "below the rule's limits" note
    expect(r.fillLimit.bindingNote).toBeNull();
    // a looser site rule does not make it "ruled" either
    const s = co2(
      { insulated: true, reliefSetPressureGauge: psig(300), containerClass: 'storage' },
      { siteRule: { maxFillingDensity: 1.2 } },
    );
    expect(s.fillLimit.binding).toBe('not-liquid-full-at-peak');
    expect(s.fillLimit.bindingNote).toBeNull();
  });
});

describe('refrigerated CO2 in a cargo tank: a volume-only rule (49 CFR 173.315(c)(1), 95 %)', () => {
  const tank = { insulated: true, containerClass: 'cargo' as const, waterCapacity: 10 };
  it('at −20 °F the 95 % volume figure binds; a rule is found, so no "no rule" warning', () => {
    const r = co2(tank, { liquidTemperature: F(-20), peakTemperature: F(-20) });
    expect(r.fillLimit.binding).toBe('refrigerated-95-volume');
    expect(r.fillLimit.stopAtGaugePercent).toBe(95);
    expect(codes(r)).not.toContain('no-filling-rule');
    expect(r.fillLimit.bindingNote).toBe(
      'The rule’s volume limit at this temperature binds: 95 % by volume; 49 CFR 173.315(c)(1).',
    );
  });
  it('past the critical temperature there is no level: the volume figure is not applied', () => {
    const r = co2(tank, {
      liquidTemperature: 310,
      peakTemperature: 310,
      contents: { netMass: 2000 },
    });
    expect(r.phase).toBe('supercritical');
    expect(r.fillLimit.limits.map((l) => l.id)).not.toContain('refrigerated-95-volume');
    expect(r.fillLimit.stopAtGaugePercent).toBe(0);
    expect(r.fillLimit.volumetricMaxPercent).toBeNull();
  });
});

describe('LP-gas DOT cargo tank with a fixed gauge (FACTS.md case 5; 49 CFR 173.315(b) Note 1)', () => {
  it('3,000 gal, SG 0.508: 97 % of 45 % = 43.65 % → 10,905.8 lb', () => {
    const r = checkTank({
      tank: {
        waterCapacity: gal(3000),
        designPressureGauge: psig(250),
        containerClass: 'cargo',
        fillMethod: 'fixed-gauge',
      },
      product: 'propane',
      specificGravity: 0.508,
      liquidTemperature: F(60),
      contents: { gaugePercent: 20 },
      peakTemperature: F(60),
    });
    const w = r.fillLimit.limits.find((l) => l.kind === 'rule' && l.referenceTemperature === null)!;
    expectWithin(lb(w.maxMass), 10905.8, 1, {
      input: '3,000 gal cargo, fixed gauge',
      source: 'FACTS.md case 5',
      kind: 'published',
    });
    expectWithin(w.fillingDensity, 0.4365, 1e-12, {
      input: '45 % × 0.97',
      source: '49 CFR 173.315(b) Note 1',
      kind: 'published',
    });
    expect(r.fillLimit.stopAtFixedGauge).toBe(true);
    // the gauge setting is the only figure by volume here
    const g = r.fillLimit.limits.find((l) => l.kind === 'gauge-setting')!;
    expect(r.fillLimit.volumetricMaxPercent).toBe(g.gaugePercent);
  });
  it('a weight rule alone is a rule found: ammonia filled by weight has no "no rule" warning', () => {
    const r = checkTank({
      tank: { waterCapacity: gal(1000), designPressureGauge: psig(265), fillMethod: 'weight' },
      product: 'ammonia',
      liquidTemperature: F(60),
      contents: { gaugePercent: 30 },
      peakTemperature: F(60),
    });
    expect(r.fillLimit.binding).toBe('nh3-storage-aboveground');
    expect(codes(r)).not.toContain('no-filling-rule');
  });
});

describe('the lowest printed volume figure and the fixed gauge above it (29 CFR 1910.111)', () => {
  it('ammonia at 20 °F by a fixed gauge set at 85 %: 82 % by volume is the most, stop before the gauge', () => {
    const r = checkTank({
      tank: { waterCapacity: gal(1000), designPressureGauge: psig(265), fillMethod: 'fixed-gauge' },
      product: 'ammonia',
      liquidTemperature: F(20),
      contents: { gaugePercent: 30 },
      peakTemperature: F(20),
    });
    expect(r.fillLimit.volumetricMaxPercent).toBe(82);
    expect(r.fillLimit.stopAtFixedGauge).toBe(false);
    expect(r.fillLimit.bindingNote).toContain(
      'The fixed maximum-level gauge is set at 85 %, above the limit at this temperature: stop by the float gauge at 82 %, before liquid appears at the fixed gauge.',
    );
  });
});

describe('a refrigerant recovery cylinder (common practice: 80 % liquid at 77 °F or warmer)', () => {
  it('R-410A at 60 °F: 0.8 × V × ρL(77 °F) less the model allowance', () => {
    const V = 0.0227;
    const r = checkTank({
      tank: {
        waterCapacity: V,
        designPressureGauge: psig(400),
        containerClass: 'cylinder',
        recovery: {},
      },
      product: 'r410a',
      liquidTemperature: F(60),
      contents: { gaugePercent: 50 },
      peakTemperature: F(60),
    });
    const l = r.fillLimit.limits.find((x) => x.id === 'recovery-cylinder')!;
    expect(r.fillLimit.binding).toBe('recovery-cylinder');
    expect(l.kind).toBe('rule');
    expect(l.referenceTemperature).toBe(298.15);
    const rho = saturation('r410a', 298.15).rhoL;
    expectWithin(l.maxMass, 0.8 * V * rho * (1 - MODEL_ALLOWANCE.liquidDensity), 0.011, {
      input: 'R-410A, 77 °F',
      source: 'identity with the core’s saturation() (bubble liquid) at 298.15 K',
      kind: 'identity',
    });
    expectRel(l.maxMass, 0.8 * V * 1058.620549 * 0.995, 0.005, {
      input: 'R-410A, 77 °F',
      source: 'test/reference/blends/r410a.csv at 298.15 K (Lemmon & Jacobsen 2004)',
      kind: 'published',
      why: 'bubble-liquid density within 0.5 % (README accuracy table)',
    });
  });
});

describe('the not-liquid-full limit never rises as the peak gets hotter (DECISIONS.md)', () => {
  it('through the end of a blend’s bubble curve, where its liquid is thinner than ρc', () => {
    const product = LPG_PRESETS[0]!.product;
    const maxAt = (Tpeak: number) =>
      checkTank({
        tank: { waterCapacity: 1, designPressureGauge: psig(900) },
        product,
        liquidTemperature: 288.15,
        contents: { gaugePercent: 5 },
        peakTemperature: Tpeak,
      }).fillLimit.limits.find((l) => l.id === 'not-liquid-full-at-peak')!.maxMass;
    let last = Infinity;
    for (const T of [360, 365, 368, 370, 371, 375, 380, 390]) {
      const m = maxAt(T);
      expect(m, `at ${T} K`).toBeLessThanOrEqual(last);
      last = m;
    }
  });
});
