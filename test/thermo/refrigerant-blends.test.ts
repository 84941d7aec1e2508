/**
 * Refrigerant blends by id against the reference tables of test/reference/blends/: multi-fluid
 * mixture models of Lemmon & Jacobsen (2004, J. Phys. Chem. Ref. Data 33, 593–620) for R-410A,
 * R-404A, R-407C, R-507A and Bell (2023, J. Phys. Chem. Ref. Data 52, 013101) for R-454B.
 * Targets over 233.15–333.15 K: bubble and dew pressure 0.5 %, bubble-liquid density 0.5 %,
 * dew-vapour density 2 %, compressed liquid 1 %. Rows marked "held-out" were not used by
 * scripts/fit-blends.ts; their error must stay close to that of the fitted rows.
 */
import { describe, expect, it } from 'vitest';
import { dewPoint, liquidDensity, saturation, describeProduct } from '../../thermo/index.js';
import { InputError } from '../../thermo/errors.js';
import { REFRIGERANT_BLENDS } from '../../thermo/data/blends.js';
import { BLEND_TARGETS, measureRefrigerantBlends, readTable } from '../reference/measure.js';
import { isHeldOut, T_FIT_MAX, T_FIT_MIN } from '../reference/blend-rows.js';
import { checkClose } from '../helpers/check.js';
import { citation } from '../../thermo/data/sources.js';

const SRC = (id: string) =>
  `${id === 'r454b' ? 'Bell 2023' : 'Lemmon & Jacobsen 2004'} mixture model, test/reference/blends/${id}.csv`;

const inRange = (T: number) => T >= T_FIT_MIN - 1e-9 && T <= T_FIT_MAX + 1e-9;

describe.each(REFRIGERANT_BLENDS.map((b) => [b.id] as const))(
  '%s against its reference table',
  (id) => {
    const sat = readTable(`blends/${id}.csv`).filter((r) => inRange(+r.T_K!));
    it.each(sat.map((r) => [+r.T_K!, isHeldOut(+r.T_K!) ? 'held-out' : 'fitted', r] as const))(
      'T = %f K (%s row): bubble and dew pressure, bubble-liquid and dew-vapour density',
      (T, rowKind, r) => {
        const b = saturation(id, T);
        const d = dewPoint(id, T);
        const input = { blend: id, T, row: rowKind };
        const t = BLEND_TARGETS;
        const cases = [
          ['bubble pressure', b.pAbs, +r.p_bubble_Pa!, t.bubble],
          ['dew pressure', d.pAbs, +r.p_dew_Pa!, t.dew],
          ['bubble liquid density', b.rhoL, +r.rhoL_bubble_kg_m3!, t.rhoL],
          ['dew vapour density', d.rhoV, +r.rhoV_dew_kg_m3!, t.rhoV],
        ] as const;
        for (const [what, actual, expected, target] of cases)
          checkClose({
            what,
            input,
            actual,
            expected,
            rtol: target,
            kind: 'published',
            source: SRC(id),
          });
      },
    );
    const liq = readTable(`blends/${id}-liquid.csv`).filter((r) => inRange(+r.T_K!));
    it.each(
      liq.map((r) => [+r.T_K!, +r.p_Pa!, isHeldOut(+r.T_K!) ? 'held-out' : 'fitted'] as const),
    )('compressed liquid at T = %f K, p = %f Pa (%s row)', (T, p, rowKind) => {
      const r = liq.find((x) => +x.T_K! === T && +x.p_Pa! === p)!;
      checkClose({
        what: 'compressed liquid density',
        input: { blend: id, T, p, row: rowKind },
        actual: liquidDensity(id, T, p),
        expected: +r.rho_kg_m3!,
        rtol: BLEND_TARGETS.compressed,
        kind: 'published',
        source: SRC(`${id}-liquid`.replace('-liquid', '')) + ' (-liquid.csv)',
      });
    });
  },
);

/**
 * No reference has the blends' compressed liquid at +5 MPa above the bubble pressure; the
 * pure-fluid tables have it for every component (p_sat + 5 MPa every 10 K), so the components
 * are checked there over the blends' whole range, 233–333 K (the pure-fluid tests stop at
 * 323 K or 0.97·Tc).
 */
describe('blend components at p_sat + 5 MPa, 233–333 K', () => {
  const ids = ['r32', 'r125', 'r134a', 'r143a', 'r1234yf'];
  it.each(ids)('%s: compressed-liquid density within 1 %', (id) => {
    const key = readTable('fluids.csv').find((r) => r.fluid === id)!.eos_bibtex_key!;
    const rows = readTable(`liquid/${id}.csv`).filter(
      (r) => +r.dp_above_psat_MPa! === 5 && inRange(+r.T_K!),
    );
    expect(rows.length).toBeGreaterThanOrEqual(10);
    for (const r of rows)
      checkClose({
        what: 'compressed liquid density at p_sat + 5 MPa',
        input: { id, T: +r.T_K!, p: +r.p_Pa! },
        actual: liquidDensity(id, +r.T_K!, +r.p_Pa!),
        expected: +r.rho_kg_m3!,
        rtol: BLEND_TARGETS.compressed,
        kind: 'published',
        source: `${citation(key)} (reference EOS), test/reference/liquid/${id}.csv`,
      });
  });
});

describe('held-out rows', () => {
  it('have worst errors close to those of the fitted rows (no chasing of rows)', () => {
    const fit = measureRefrigerantBlends((T) => !isHeldOut(T));
    const held = measureRefrigerantBlends(isHeldOut);
    for (const [i, h] of held.entries()) {
      const f = fit[i]!;
      for (const q of ['bubble', 'dew', 'rhoL', 'rhoV', 'compressed'] as const) {
        checkClose({
          what: `held-out worst ${q} error`,
          input: { blend: h.blend, fitted: f[q] },
          actual: h[q],
          expected: 0,
          atol: 1.25 * f[q] + 0.0005,
          kind: 'published',
          source: SRC(h.blend),
          why: 'held-out worst error at most 1.25 × fitted worst error + 0.05 %',
        });
      }
    }
  });
});

describe('blend products by id', () => {
  it('resolve to the mole fractions of the reference README (from the nominal mass fractions)', () => {
    // test/reference/blends/README.md, table "Blends", mole fractions.
    const expected: Record<string, number[]> = {
      r410a: [0.697615, 0.302385],
      r404a: [0.357817, 0.038264, 0.603919],
      r407c: [0.381109, 0.179559, 0.439332],
      r507a: [0.41184, 0.58816],
      r454b: [0.829248, 0.170752],
    };
    for (const [id, x] of Object.entries(expected)) {
      const d = describeProduct(id);
      x.forEach((xi, i) =>
        checkClose({
          what: 'mole fraction',
          input: { id, component: d.components[i]!.id },
          actual: d.components[i]!.moleFraction,
          expected: xi,
          atol: 2e-5,
          kind: 'published',
          source: 'test/reference/blends/README.md (mole fractions of the reference equations)',
        }),
      );
    }
  });

  it('refuse an unknown blend id, naming the field and the ids', () => {
    expect(() => saturation('r999z', 280)).toThrow(InputError);
    expect(() => saturation('r999z', 280)).toThrow(
      /^product must be .*r410a, r404a, r407c, r507a, r454b/,
    );
  });

  it('refuse a composition that does not sum to 1, naming the field', () => {
    const bad = {
      components: [
        { id: 'r32', moleFraction: 0.7 },
        { id: 'r125', moleFraction: 0.2 },
      ],
    };
    expect(() => saturation(bad, 280)).toThrow(
      /product\.components\[\]\.moleFraction must be fractions that sum to 1/,
    );
  });

  it('refuse a temperature above the end of the dew curve, naming T and its range', () => {
    for (const b of REFRIGERANT_BLENDS) {
      let err: unknown;
      try {
        dewPoint(b.id, b.Tmax + 5);
      } catch (e) {
        err = e;
      }
      expect(err).toBeInstanceOf(InputError);
      const e = err as InputError;
      expect(e.field).toBe('T');
      expect(e.limits?.max).toBe(b.Tmax);
      expect(e.message).toMatch(/dew curve/);
      // and the last offered temperature still solves, with bubble ≥ dew pressure
      expect(saturation(b.id, b.Tmax).pAbs).toBeGreaterThanOrEqual(
        dewPoint(b.id, b.Tmax).pAbs * (1 - 1e-6),
      );
    }
  });
});
