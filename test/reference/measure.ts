/**
 * Worst deviations of the default model from the reference tables (test/reference/*.csv,
 * computed from each fluid's published reference equation of state; see README.md here).
 * Shared by scripts/accuracy.ts (the README table) and test/thermo/reference.test.ts.
 */
import { readFileSync } from 'node:fs';
import { splitLine } from '../../scripts/lib/csv.js';
import { closedTank, dewPoint, liquidDensity, saturation } from '../../thermo/index.js';
import { REFRIGERANT_BLENDS } from '../../thermo/data/blends.js';
import { fluidById } from '../../thermo/data/fluids.js';
import { T_FIT_MAX, T_FIT_MIN } from './blend-rows.js';

export const TARGETS = {
  psat: 0.005,
  rhoL: 0.005,
  rhoV: 0.02,
  compressed: 0.01,
  liquidFullK: 1,
  bubble: 0.02,
} as const;

/** The range the targets apply to: −40 °C … +50 °C, capped at 0.97·Tc. */
export function targetRange(id: string): [number, number] {
  const f = fluidById(id)!;
  return [233.15, Math.min(323.15, 0.97 * f.Tc)];
}

const DIR = new URL('./', import.meta.url);

export function readTable(name: string): Record<string, string>[] {
  const text = readFileSync(new URL(name, DIR), 'utf8');
  const lines = text.split(/\r?\n/).filter((l) => l.trim() !== '' && !l.startsWith('#'));
  const head = splitLine(lines[0]!);
  return lines.slice(1).map((l) => {
    const cells = splitLine(l);
    return Object.fromEntries(head.map((h, i) => [h, cells[i] ?? '']));
  });
}

export const REFERENCE_FLUIDS = readTable('fluids.csv').map((r) => r.fluid!);

export interface AccuracyRow {
  fluid: string;
  psat: number | null;
  rhoL: number | null;
  rhoV: number | null;
  compressed: number | null;
  liquidFullK: number | null;
  points: number;
}

const rel = (a: number, b: number) => Math.abs(a / b - 1);

/** Temperature at which the closed tank of overall density rho goes liquid-full (bisection). */
export function liquidFullT(id: string, rho: number, lo: number, hi: number): number {
  let fLo = closedTank(id, lo, rho).liquidFraction;
  if (fLo >= 1) return lo;
  for (let i = 0; i < 60; i++) {
    const mid = 0.5 * (lo + hi);
    const s = closedTank(id, mid, rho);
    if (s.phase === 'liquid' || (s.phase === 'supercritical' && s.liquidFraction >= 1)) hi = mid;
    else {
      lo = mid;
      fLo = s.liquidFraction;
    }
  }
  return 0.5 * (lo + hi);
}

export function measureAccuracy(): AccuracyRow[] {
  const lf = readTable('liquid-full.csv');
  return REFERENCE_FLUIDS.map((id) => {
    const [Tlo, Thi] = targetRange(id);
    const inRange = (T: number) => T >= Tlo - 1e-9 && T <= Thi + 1e-9;
    let psat = 0;
    let rhoL = 0;
    let rhoV = 0;
    let compressed = 0;
    let points = 0;
    for (const r of readTable(`sat/${id}.csv`)) {
      const T = +r.T_K!;
      if (!inRange(T)) continue;
      const s = saturation(id, T);
      psat = Math.max(psat, rel(s.pAbs, +r.p_Pa!));
      rhoL = Math.max(rhoL, rel(s.rhoL, +r.rhoL_kg_m3!));
      rhoV = Math.max(rhoV, rel(s.rhoV, +r.rhoV_kg_m3!));
      points += 3;
    }
    for (const r of readTable(`liquid/${id}.csv`)) {
      const T = +r.T_K!;
      if (!inRange(T)) continue;
      compressed = Math.max(compressed, rel(liquidDensity(id, T, +r.p_Pa!), +r.rho_kg_m3!));
      points++;
    }
    let lfk: number | null = null;
    for (const r of lf) {
      if (r.fluid !== id || r.transition !== 'liquid-full') continue;
      const Tref = +r.T_transition_K!;
      const T = liquidFullT(
        id,
        +r.rho_overall_kg_m3!,
        Tref - 15,
        Math.min(Tref + 15, fluidById(id)!.Tc + 20),
      );
      lfk = Math.max(lfk ?? 0, Math.abs(T - Tref));
      points++;
    }
    return { fluid: id, psat, rhoL, rhoV, compressed, liquidFullK: lfk, points };
  });
}

export interface BlendAccuracyRow {
  mixture: string;
  bubble: number;
  rhoL: number;
  rhoV: number;
  points: number;
}

/** Worst deviations per blend of test/reference/bubble.csv (GERG-2008 reference). */
export function measureBlends(): BlendAccuracyRow[] {
  const byName = new Map<string, BlendAccuracyRow>();
  for (const r of readTable('bubble.csv')) {
    const comps = [
      { id: 'propane', moleFraction: +r.x_propane! },
      { id: 'ethane', moleFraction: +r.x_ethane! },
      { id: 'n-butane', moleFraction: +r.x_n_butane! },
    ].filter((c) => c.moleFraction > 0);
    const s = saturation({ components: comps }, +r.T_K!);
    const row = byName.get(r.mixture!) ?? {
      mixture: r.mixture!,
      bubble: 0,
      rhoL: 0,
      rhoV: 0,
      points: 0,
    };
    row.bubble = Math.max(row.bubble, rel(s.pAbs, +r.p_bubble_Pa!));
    row.rhoL = Math.max(row.rhoL, rel(s.rhoL, +r.rhoL_kg_m3!));
    row.rhoV = Math.max(row.rhoV, rel(s.rhoV, +r.rhoV_incipient_kg_m3!));
    row.points++;
    byName.set(r.mixture!, row);
  }
  return [...byName.values()];
}

/** Targets of the refrigerant blends over 233.15–333.15 K (relative, worst case). */
export const BLEND_TARGETS = {
  bubble: 0.005,
  dew: 0.005,
  rhoL: 0.005,
  rhoV: 0.02,
  compressed: 0.01,
} as const;

export interface RefrigerantAccuracyRow {
  blend: string;
  bubble: number;
  dew: number;
  rhoL: number;
  rhoV: number;
  compressed: number;
  points: number;
}

/**
 * Worst deviations per refrigerant blend (by product id) from test/reference/blends/ (Lemmon &
 * Jacobsen 2004 and Bell 2023 mixture models), over T_FIT_MIN…T_FIT_MAX; `rows` picks the
 * table rows (all, fitted or held-out).
 */
export function measureRefrigerantBlends(
  rows: (T: number) => boolean = () => true,
): RefrigerantAccuracyRow[] {
  return REFRIGERANT_BLENDS.map(({ id }) => {
    const inRange = (T: number) => T >= T_FIT_MIN - 1e-9 && T <= T_FIT_MAX + 1e-9 && rows(T);
    const row: RefrigerantAccuracyRow = {
      blend: id,
      bubble: 0,
      dew: 0,
      rhoL: 0,
      rhoV: 0,
      compressed: 0,
      points: 0,
    };
    for (const r of readTable(`blends/${id}.csv`)) {
      const T = +r.T_K!;
      if (!inRange(T)) continue;
      const b = saturation(id, T);
      const d = dewPoint(id, T);
      row.bubble = Math.max(row.bubble, rel(b.pAbs, +r.p_bubble_Pa!));
      row.dew = Math.max(row.dew, rel(d.pAbs, +r.p_dew_Pa!));
      row.rhoL = Math.max(row.rhoL, rel(b.rhoL, +r.rhoL_bubble_kg_m3!));
      row.rhoV = Math.max(row.rhoV, rel(d.rhoV, +r.rhoV_dew_kg_m3!));
      row.points += 4;
    }
    for (const r of readTable(`blends/${id}-liquid.csv`)) {
      const T = +r.T_K!;
      if (!inRange(T)) continue;
      row.compressed = Math.max(row.compressed, rel(liquidDensity(id, T, +r.p_Pa!), +r.rho_kg_m3!));
      row.points++;
    }
    return row;
  });
}
