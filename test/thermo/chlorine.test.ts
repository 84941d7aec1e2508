/**
 * Chlorine has no reference table here. Its tuned parameters were fitted to the normal boiling
 * point, the acentric-factor point and the critical point of Thol et al. (2021) and to the
 * Rackett equation (Z_RA of Hankinson & Thomson 1979) — scripts/fit-fluids.ts — so every
 * check below compares with figures the fit never saw.
 */
import { describe, it } from 'vitest';
import { saturation } from '../../thermo/index.js';
import { readTable } from '../reference/measure.js';
import { checkClose } from '../helpers/check.js';
import { toSI } from '../../thermo/units.js';

const F = (f: number) => toSI('temperature', f, 'F');

describe('saturation(chlorine)', () => {
  it('matches the NIST SRD 134 vapour-pressure table within 1.5 % from 240 to 370 K', () => {
    // NIST states 1 % uncertainty; the newer Thol et al. (2021) equation the fit follows differs
    // from that older evaluation by up to about 1 % near 370 K, hence 1.5 %.
    for (const r of readTable('chlorine-nist-srd134.csv')) {
      const T = +r.T_K!;
      checkClose({
        what: 'chlorine p_sat',
        input: { T },
        actual: saturation('chlorine', T).pAbs,
        expected: +r.p_kPa! * 1000,
        rtol: 0.015,
        kind: 'published',
        source: 'NIST SRD 134, chlorine, vapor pressure (test/reference/chlorine-nist-srd134.csv)',
      });
    }
  });

  it('gives the 86.8 psig at 70 °F that chlorine is shipped at', () => {
    // Source: compressed-gas shipping description restated on a chemical supplier's page
    // ("vapor pressure of 86.767 psig at 70 °F (598.26 kPa at 21.1 °C)"), CGA-style figure; 1 %.
    const p = saturation('chlorine', F(70)).pAbs - 101_325;
    checkClose({
      what: 'chlorine gauge pressure at 70 °F',
      input: { T_F: 70 },
      actual: p,
      expected: 598_260,
      rtol: 0.01,
      kind: 'published',
      source: 'supplier restatement of the CGA shipping figure, 86.767 psig at 70 °F',
    });
  });

  it('matches the Thol et al. (2021) saturated-liquid density at 15 °C within 1 %', () => {
    // Source: Thol, Herrig, Span & Lemmon (2021), AIChE J. 67:e17326, evaluated at 288.15 K
    // (test/reference/fluid-constants.csv, rho_liq_sat_15C_kg_m3 = 1423.38). The fit used only
    // the Rackett equation, whose typical accuracy is about 1 % (from memory): the 0.5 % target
    // of the reference fluids is not met for chlorine (measured −0.54 %), see README.
    const row = readTable('fluid-constants.csv').find((r) => r.fluid === 'chlorine')!;
    checkClose({
      what: 'chlorine rho_L at 15 °C',
      input: { T: 288.15 },
      actual: saturation('chlorine', 288.15).rhoL,
      expected: +row.rho_liq_sat_15C_kg_m3!,
      rtol: 0.01,
      kind: 'published',
      source: 'Thol et al. 2021 EOS via test/reference/fluid-constants.csv',
    });
    checkClose({
      what: 'chlorine p_sat at 15 °C',
      input: { T: 288.15 },
      actual: saturation('chlorine', 288.15).pAbs,
      expected: +row.psat_15C_Pa!,
      rtol: 0.005,
      kind: 'published',
      source: 'Thol et al. 2021 EOS via test/reference/fluid-constants.csv',
    });
  });

  it('gives a liquid density near 1.55 g/cm³ at its boiling point (−34.1 °C)', () => {
    // Source: encyclopaedic handbook figure "density 1.55 at −34.1 °C" (printed to 3 s.f.) and
    // 1.5625 g/cm³ at the boiling point (from memory); 1.5 % covers both and the Rackett fit.
    checkClose({
      what: 'chlorine rho_L at normal boiling point',
      input: { T: 239.05 },
      actual: saturation('chlorine', 239.05).rhoL,
      expected: 1550,
      rtol: 0.015,
      kind: 'published',
      source: 'handbook, 1.55 g/cm³ at −34.1 °C',
    });
  });
});
