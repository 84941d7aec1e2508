/**
 * checkTank end to end for refrigerant blends in cylinders, against figures taken outside the
 * model: bubble pressures and bubble-line liquid densities of the reference tables
 * (test/reference/blends/: Lemmon & Jacobsen 2004 mixture model), the not-liquid-full rule at
 * 130 °F (49 CFR 173.304a(a)(2), CFR 2015 ed.) and the recovery-cylinder limit (common practice,
 * test/reference/trade/FACTS.md a3).
 */
import { describe, expect, it } from 'vitest';
import { checkTank, type TankCheckInput } from '../../thermo/check/index.js';
import { blendGlide } from '../../thermo/check/blendShift.js';
import { InputError } from '../../thermo/errors.js';
import { readTable } from '../reference/measure.js';
import { checkClose } from '../helpers/check.js';
import { PSI_PA, US_GAL_M3, toSI } from '../../thermo/units.js';
import { P_ATM_Pa } from '../../thermo/constants.js';

const SRC = 'Lemmon & Jacobsen 2004 mixture model, test/reference/blends/';
const row = (id: string, T: number) => readTable(`blends/${id}.csv`).find((r) => +r.T_K! === T)!;
const F = (f: number) => toSI('temperature', f, 'F');
const PSI = PSI_PA;
const ATM = P_ATM_Pa;
/** 50 lb of water at 60 °F (8.32828 lb/US gal): a common recovery-cylinder size. */
const WC_50LB = (50 / 8.32828) * US_GAL_M3;

function r410aCylinder(over: Partial<TankCheckInput> = {}): TankCheckInput {
  // Filled to the reference bubble-line liquid density at 323.15 K: liquid-full there.
  const rho323 = +row('r410a', 323.15).rhoL_bubble_kg_m3!;
  return {
    tank: {
      waterCapacity: WC_50LB,
      designPressureGauge: 400 * PSI,
      containerClass: 'cylinder',
      recovery: {},
    },
    product: 'r410a',
    liquidTemperature: 298.15,
    contents: { netMass: rho323 * WC_50LB },
    barometricPressureAbs: ATM,
    peakTemperature: F(140),
    ...over,
  };
}

describe('an R-410A recovery cylinder in a 140 °F van', () => {
  const r = checkTank(
    r410aCylinder({ pressureReadingGauge: +row('r410a', 298.15).p_bubble_Pa! - ATM }),
  );

  it('gives the pressure now as the reference bubble pressure', () => {
    checkClose({
      what: 'pressure now (gauge)',
      input: { T: 298.15 },
      actual: r.pGauge,
      expected: +row('r410a', 298.15).p_bubble_Pa! - ATM,
      rtol: 0.006,
      kind: 'published',
      source: SRC + 'r410a.csv',
      why: 'bubble-pressure target 0.5 % on the absolute pressure, plus the 100 Pa rounding up',
    });
    expect(r.diagnosis?.verdict).toBe('fits');
  });

  it('goes liquid-full where the reference bubble-line density equals the fill', () => {
    checkClose({
      what: 'liquid-full temperature',
      input: { fill: 'ρ_bubble(323.15 K)' },
      actual: r.liquidFullTemperature!,
      expected: 323.15,
      atol: 1,
      kind: 'published',
      source: SRC + 'r410a.csv',
      why: 'the liquid-full target of the pure fluids, 1 K',
    });
    expect(r.peak.phase).toBe('liquid-full');
    const codes = r.cautions.map((c) => c.code);
    expect(codes).toContain('liquid-full-at-peak');
    expect(codes).toContain('standing');
  });

  it('applies the 130 °F not-liquid-full rule with the bubble-line liquid density', () => {
    const lim = r.fillLimit.limits.find((l) => l.id === 'refrigerant-130F')!;
    // Reference ρ_bubble at 130 °F = 327.594 K, interpolated linearly between 323.15 and 328.15 K.
    const a = +row('r410a', 323.15).rhoL_bubble_kg_m3!;
    const b = +row('r410a', 328.15).rhoL_bubble_kg_m3!;
    const rho130 = a + ((b - a) * (F(130) - 323.15)) / 5;
    checkClose({
      what: '130 °F limit mass',
      input: { WC: WC_50LB },
      actual: lim.maxMass,
      expected: WC_50LB * rho130 * (1 - 0.005),
      rtol: 0.006,
      kind: 'published',
      source: '49 CFR 173.304a(a)(2) with ' + SRC + 'r410a.csv',
      why: 'liquid-density target 0.5 % (the limit takes a further 0.5 % off the model density)',
    });
  });

  it('adds the recovery-cylinder limit, 80 % of the volume by default (common practice)', () => {
    const lim = r.fillLimit.limits.find((l) => l.id === 'recovery-cylinder')!;
    checkClose({
      what: 'recovery limit mass',
      input: { fraction: 0.8, T: 298.15 },
      actual: lim.maxMass,
      expected: 0.8 * WC_50LB * +row('r410a', 298.15).rhoL_bubble_kg_m3! * (1 - 0.005),
      rtol: 0.006,
      kind: 'published',
      source: 'test/reference/trade/FACTS.md a3 (80 % of volume, common practice) with ' + SRC,
    });
    expect(lim.citation).toMatch(/common practice/);
    // Below the 130 °F rule, above the not-liquid-full limit of a 140 °F peak (which binds).
    const rule130 = r.fillLimit.limits.find((l) => l.id === 'refrigerant-130F')!;
    expect(lim.maxMass).toBeLessThan(rule130.maxMass);
    expect(r.fillLimit.binding).toBe('not-liquid-full-at-peak');
    expect(r.fillLimit.roomLeftMass).toBeLessThan(0);
    const mild = checkTank(r410aCylinder({ peakTemperature: F(100) }));
    expect(mild.fillLimit.binding).toBe('recovery-cylinder');
  });

  it('takes the recovery fraction per tank and refuses one out of range, naming the field', () => {
    const r70 = checkTank(
      r410aCylinder({ tank: { ...r410aCylinder().tank, recovery: { fillFraction: 0.7 } } }),
    );
    const l80 = r.fillLimit.limits.find((l) => l.id === 'recovery-cylinder')!.maxMass;
    const l70 = r70.fillLimit.limits.find((l) => l.id === 'recovery-cylinder')!.maxMass;
    checkClose({
      what: 'limit ratio 70/80',
      input: {},
      actual: l70 / l80,
      expected: 0.7 / 0.8,
      rtol: 1e-3,
      kind: 'identity',
      source: 'mass proportional to the liquid-volume fraction',
    });
    expect(() =>
      checkTank(
        r410aCylinder({ tank: { ...r410aCylinder().tank, recovery: { fillFraction: 1.2 } } }),
      ),
    ).toThrow(/tank\.recovery\.fillFraction must be a fraction from 0\.5 to 0\.95/);
  });

  it('names air first when the reading is high', () => {
    const high = checkTank(
      r410aCylinder({ pressureReadingGauge: +row('r410a', 298.15).p_bubble_Pa! - ATM + 50 * PSI }),
    );
    expect(high.diagnosis?.verdict).toBe('high');
    expect(high.diagnosis?.causes[0]).toMatch(/liquid-full|Air or another non-condensable/);
    const air = high.diagnosis!.causes.findIndex((c) => /Air or another non-condensable/.test(c));
    expect(air).toBeLessThanOrEqual(1);
  });
});

describe('a zeotropic blend (R-407C)', () => {
  it('has the glide of the reference table', () => {
    // Reference glide: ln(p_bubble/p_dew) over the bubble curve's d ln p/dT at 298.15 K.
    const r298 = row('r407c', 298.15);
    const r293 = row('r407c', 293.15);
    const slope = Math.log(+r298.p_bubble_Pa! / +r293.p_bubble_Pa!) / 5;
    const glideRef = Math.log(+r298.p_bubble_Pa! / +r298.p_dew_Pa!) / slope;
    checkClose({
      what: 'temperature glide',
      input: { T: 298.15 },
      actual: blendGlide('r407c', 298.15)!.kelvin,
      expected: glideRef,
      atol: 0.3,
      kind: 'published',
      source: SRC + 'r407c.csv',
    });
  });

  it('says a low reading can be a composition shift, naming the light and heavy components', () => {
    const pb = +row('r407c', 298.15).p_bubble_Pa!;
    const r = checkTank({
      tank: { waterCapacity: WC_50LB, designPressureGauge: 400 * PSI, containerClass: 'cylinder' },
      product: 'r407c',
      liquidTemperature: 298.15,
      contents: { netMass: 10 },
      pressureReadingGauge: pb - ATM - 40 * PSI,
      barometricPressureAbs: ATM,
      peakTemperature: 305,
    });
    expect(r.diagnosis?.verdict).toBe('low');
    const shift = r.diagnosis!.causes.find((c) => /zeotropic/.test(c));
    expect(shift).toMatch(/vapour-only withdrawal or a vapour leak/);
    expect(shift).toMatch(/R-32 and R-125/);
    expect(shift).toMatch(/richer in R-134a/);
  });

  it('is not called zeotropic for the near-azeotrope R-507A', () => {
    expect(blendGlide('r507a', 298.15)!.kelvin).toBeLessThan(0.2);
  });
});

describe('bad blend input at the check', () => {
  it('refuses an unknown blend id, naming the field', () => {
    let err: unknown;
    try {
      checkTank(r410aCylinder({ product: 'r410b' }));
    } catch (e) {
      err = e;
    }
    expect(err).toBeInstanceOf(InputError);
    expect((err as InputError).field).toBe('product');
  });
});
