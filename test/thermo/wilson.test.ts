/**
 * Wilson's K-value estimate against what it was built to reproduce: K = pc/p at the critical
 * temperature, and at T = 0.7·Tc the reduced vapour pressure 10^−(1+ω) that defines the acentric
 * factor (Pitzer et al., J. Am. Chem. Soc. 77 (1955) 3433; Wilson's 5.373 is (7/3)·ln 10 to four
 * figures: Michelsen & Mollerup, Thermodynamic Models, 2nd ed., ch. 9).
 */
import { describe, expect, it } from 'vitest';
import { resolveProduct } from '../../thermo/product.js';
import { wilsonK, wilsonKOf } from '../../thermo/solvers/wilson.js';
import { checkClose } from '../helpers/check.js';

// Two made-up sets of critical constants (the estimate needs no fluid data to be checked).
const LIGHT = { Tc: 300, pc: 4.0e6, omega: 0.1 };
const HEAVY = { Tc: 450, pc: 3.0e6, omega: 0.3 };

// 5.373 against (7/3)·ln 10 = 5.372699 shifts the exponent at 0.7·Tc by 3.0e-4·(1+ω)·3/7,
// under 2e-4 relative for ω ≤ 0.5.
const WILSON_ROUNDING = 2e-4;

describe('wilsonKOf', () => {
  for (const m of [LIGHT, HEAVY]) {
    it(`gives the acentric factor's reduced pressure at 0.7·Tc (ω = ${m.omega})`, () => {
      checkClose({
        what: 'K·p/pc at 0.7 Tc',
        input: m,
        actual: wilsonKOf(m, 0.7 * m.Tc, m.pc),
        expected: 10 ** -(1 + m.omega),
        rtol: WILSON_ROUNDING,
        kind: 'published',
        source: 'acentric factor definition, Pitzer et al. 1955',
        why: '5.373 is (7/3)·ln 10 rounded',
      });
    });

    it(`gives pc/p at the critical temperature (ω = ${m.omega})`, () => {
      for (const p of [1, 1e5, m.pc / 4]) {
        checkClose({
          what: 'K at Tc',
          input: { ...m, p },
          actual: wilsonKOf(m, m.Tc, p),
          expected: m.pc / p,
          rtol: 1e-14,
          kind: 'identity',
          source: 'Wilson 1968: the exponent vanishes at T = Tc',
          why: 'floating point',
        });
      }
    });
  }

  it('rises with temperature below Tc and is larger for the lighter component', () => {
    const T = 280;
    expect(wilsonKOf(LIGHT, T, 1e6)).toBeGreaterThan(wilsonKOf(HEAVY, T, 1e6));
    expect(wilsonKOf(LIGHT, T + 1, 1e6)).toBeGreaterThan(wilsonKOf(LIGHT, T, 1e6));
  });
});

describe('wilsonK', () => {
  it('gives each component of a product its own estimate, in order', () => {
    const product = resolveProduct({
      components: [
        { id: 'propane', moleFraction: 0.6 },
        { id: 'n-butane', moleFraction: 0.4 },
      ],
    });
    const propane = product.components[0]!;
    const T = 0.7 * propane.Tc;
    const K = wilsonK(product, T, propane.pc);
    expect(K).toHaveLength(2);
    checkClose({
      what: 'K of propane at its 0.7 Tc and pc',
      input: T,
      actual: K[0]!,
      expected: 10 ** -(1 + propane.omega),
      rtol: WILSON_ROUNDING,
      kind: 'published',
      source: 'acentric factor definition, Pitzer et al. 1955',
      why: '5.373 is (7/3)·ln 10 rounded',
    });
    // n-butane is heavier: a smaller K than propane's at the same state.
    expect(K[1]).toBeLessThan(K[0]!);
    expect(K[1]).toBeGreaterThan(0);
  });
});
