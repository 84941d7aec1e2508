/**
 * What the caller calls a product — a listed fluid id, a blend of listed fluids, or a custom
 * fluid given by its constants — resolved and validated into component models.
 */
import { REFRIGERANT_BLENDS, refrigerantBlendById } from './data/blends.js';
import { fluidById, FLUIDS } from './data/fluids.js';
import {
  interactionCurve,
  interactionAsymmetry,
  interactionParameter,
  interactionSlope,
  volumeExcess,
} from './data/kij.js';
import { componentModel, MODEL_IDS, type ComponentModel, type ModelId } from './eos/model.js';
import { InputError } from './errors.js';

/** A custom fluid: an engineer's escape hatch. Textbook models apply (PR under the default). */
export interface CustomFluid {
  name: string;
  /** kg/mol */
  molarMass: number;
  /** K */
  Tc: number;
  /** Pa */
  Pc: number;
  /** Acentric factor. */
  omega: number;
}

export interface BlendComponent {
  id: string;
  moleFraction: number;
}

export type Product = string | { components: BlendComponent[] } | { custom: CustomFluid };

export interface ModelOptions {
  /** `'PR'` (1976) or `'SRK'` (1972), untranslated; omitted means the tuned default. */
  model?: ModelId;
}

/** A product resolved into component models and mole fractions. */
export interface ResolvedProduct {
  readonly label: string;
  readonly components: readonly ComponentModel[];
  /** Mole fractions, summing to 1 (normalised after validation). */
  readonly z: readonly number[];
  /** Binary interaction parameters k_ij at T_REF (symmetric, zero diagonal). */
  readonly kij: readonly (readonly number[])[];
  /**
   * Temperature slopes of k_ij: k_ij(T) = kij + kijSlope·(T/T_REF − 1), T_REF = 298.15 K
   * (data/kij.ts). Absent means constant k_ij.
   */
  readonly kijSlope?: readonly (readonly number[])[];
  /** Curvature of k_ij(T): adds kijCurve·(T/T_REF − 1)². Absent means none. */
  readonly kijCurve?: readonly (readonly number[])[];
  /**
   * Asymmetric terms m_ij (antisymmetric, eos/asymmetricMixing.ts); absent where every pair
   * uses the symmetric rule alone.
   */
  readonly kijAsym?: readonly (readonly number[])[];
  /**
   * Binary volume-correction parameters (symmetric, zero diagonal; see mixtureModelVolume in
   * eos/blendVolume.ts): ξ_ij in K, v^E_ij in m³/mol. Absent means plain Kay's rule and no
   * excess volume.
   */
  readonly volumeMixing?: {
    readonly xi: readonly (readonly number[])[];
    readonly vE: readonly (readonly number[])[];
    /** Temperature slope of v^E_ij (per unit of T/T_REF − 1), m³/mol; absent means none. */
    readonly vESlope?: readonly (readonly number[])[];
    /** Excess of the distance-function amplitude δ, m³/mol; absent means none. */
    readonly deltaE?: readonly (readonly number[])[];
  };
  /** Highest temperature of a blend offered by id (its dew-curve end, less a margin), K. */
  readonly Tmax?: number;
  /** Lowest temperature accepted, K: the highest triple point of the components. */
  readonly Tmin: number;
  /** Mixture molar mass, kg/mol. */
  readonly molarMass: number;
  readonly model: ModelId;
}

/** Highest temperature accepted by the API, K. The models are fitted well below it. */
export { T_MODEL_MAX_K as T_MAX_K } from './limits.js';

const KNOWN_IDS = () => [...FLUIDS, ...REFRIGERANT_BLENDS].map((f) => f.id).join(', ');

function resolveModel(options: ModelOptions | undefined): ModelId {
  const model = options?.model ?? 'tuned';
  if (!MODEL_IDS.includes(model))
    throw new InputError(
      'options.model',
      `one of ${MODEL_IDS.map((m) => `'${m}'`).join(', ')}`,
      model,
    );
  return model;
}

const cache = new Map<string, ResolvedProduct>();

export function resolveProduct(product: Product, options?: ModelOptions): ResolvedProduct {
  const model = resolveModel(options);
  if (typeof product === 'string') {
    const key = `${model}|${product}`;
    const hit = cache.get(key);
    if (hit) return hit;
    const f = fluidById(product);
    const blend = f ? undefined : refrigerantBlendById(product);
    if (blend) {
      const r = resolveBlend(blendComponents(blend.massFractions), model);
      const named: ResolvedProduct = { ...r, label: blend.name, Tmax: blend.Tmax };
      cache.set(key, named);
      return named;
    }
    if (!f)
      throw new InputError(
        'product',
        `a listed fluid or blend id (${KNOWN_IDS()}), a blend or a custom fluid`,
        product,
      );
    const cm = componentModel(f, model);
    const r: ResolvedProduct = {
      label: f.name,
      components: [cm],
      z: [1],
      kij: [[0]],
      Tmin: f.Ttriple,
      molarMass: f.molarMass,
      model: cm.model,
    };
    cache.set(key, r);
    return r;
  }
  if (product === null || typeof product !== 'object') {
    throw new InputError(
      'product',
      `a listed fluid id (${KNOWN_IDS()}), a blend or a custom fluid`,
      product,
    );
  }
  if ('custom' in product) return resolveCustom(product.custom, model);
  if ('components' in product) {
    // Blends are cached by value too, so repeated calls (a heating sweep) share one resolved
    // product and the solvers' warm starts. Bounded: the oldest entry goes first.
    let key: string | undefined;
    try {
      key = `${model}|${JSON.stringify(product.components)}`;
    } catch {
      key = undefined;
    }
    const hit = key ? cache.get(key) : undefined;
    if (hit) return hit;
    const r = resolveBlend(product.components, model);
    if (key) {
      if (cache.size >= 256) cache.delete(cache.keys().next().value!);
      cache.set(key, r);
    }
    return r;
  }
  throw new InputError(
    'product',
    'a fluid id, { components: [...] } or { custom: {...} }',
    product,
  );
}

/** Mole fractions from mass fractions: x_i = (w_i/M_i)/Σ(w_j/M_j). */
function blendComponents(
  massFractions: readonly { readonly id: string; readonly w: number }[],
): BlendComponent[] {
  const n = massFractions.map((c) => c.w / fluidById(c.id)!.molarMass);
  const sum = n.reduce((s, x) => s + x, 0);
  return massFractions.map((c, i) => ({ id: c.id, moleFraction: n[i]! / sum }));
}

function resolveCustom(c: CustomFluid, model: ModelId): ResolvedProduct {
  if (c === null || typeof c !== 'object')
    throw new InputError('product.custom', 'an object { name, molarMass, Tc, Pc, omega }', c);
  const check = (field: keyof CustomFluid, lo: number, hi: number, unit: string) => {
    const x = c[field];
    if (typeof x !== 'number' || !Number.isFinite(x) || x < lo || x > hi) {
      throw new InputError(`product.custom.${field}`, `a number from ${lo} to ${hi} ${unit}`, x);
    }
  };
  check('molarMass', 0.002, 1, 'kg/mol');
  check('Tc', 5, 1000, 'K');
  check('Pc', 1e5, 1e8, 'Pa');
  check('omega', -0.4, 1.5, '(acentric factor)');
  if (typeof c.name !== 'string' || c.name.trim() === '')
    throw new InputError('product.custom.name', 'a non-empty name', c.name);
  const cm = componentModel(
    { id: `custom:${c.name}`, molarMass: c.molarMass, Tc: c.Tc, pc: c.Pc, omega: c.omega },
    model,
  );
  return {
    label: c.name,
    components: [cm],
    z: [1],
    kij: [[0]],
    // No triple point is known for a custom fluid: accept down to 0.3·Tc, where cubic alphas are still sane.
    Tmin: 0.3 * c.Tc,
    molarMass: c.molarMass,
    model: cm.model,
  };
}

function resolveBlend(list: BlendComponent[], model: ModelId): ResolvedProduct {
  if (!Array.isArray(list) || list.length === 0)
    throw new InputError('product.components', 'a non-empty array of { id, moleFraction }', list);
  if (list.length > 12)
    throw new InputError('product.components', 'at most 12 components', list.length);
  const seen = new Set<string>();
  let sum = 0;
  list.forEach((c, i) => {
    const f = c && typeof c === 'object' ? fluidById(c.id) : undefined;
    if (!f)
      throw new InputError(
        `product.components[${i}].id`,
        `a listed fluid id (${KNOWN_IDS()})`,
        c?.id,
      );
    if (seen.has(c.id))
      throw new InputError(`product.components[${i}].id`, 'an id not already in the blend', c.id);
    seen.add(c.id);
    const x = c.moleFraction;
    // −1e-9 tolerates the rounding of a caller's own arithmetic (such a fraction counts as 0).
    if (typeof x !== 'number' || !Number.isFinite(x) || x < -1e-9 || x > 1 + 1e-9) {
      throw new InputError(`product.components[${i}].moleFraction`, 'a number from 0 to 1', x);
    }
    sum += Math.max(0, x);
  });
  if (Math.abs(sum - 1) > 1e-6)
    throw new InputError(
      'product.components[].moleFraction',
      'fractions that sum to 1 (within 1e-6)',
      sum,
    );
  const kept = list.filter((c) => c.moleFraction > 0);
  const fluids = kept.map((c) => fluidById(c.id)!);
  const components = fluids.map((f) => componentModel(f, model));
  const z = kept.map((c) => c.moleFraction / sum);
  const kij = fluids.map((fi) =>
    fluids.map((fj) => (fi === fj ? 0 : interactionParameter(fi.id, fj.id, model))),
  );
  const kijSlope = fluids.map((fi) =>
    fluids.map((fj) => (fi === fj ? 0 : interactionSlope(fi.id, fj.id, model))),
  );
  const kijCurve = fluids.map((fi) =>
    fluids.map((fj) => (fi === fj ? 0 : interactionCurve(fi.id, fj.id, model))),
  );
  const asym = fluids.map((fi) =>
    fluids.map((fj) => (fi === fj ? 0 : interactionAsymmetry(fi.id, fj.id, model))),
  );
  const kijAsym = asym.some((row) => row.some((m) => m !== 0)) ? asym : undefined;
  const excess = fluids.map((fi) =>
    fluids.map((fj) =>
      fi === fj ? { xi: 0, vE: 0, vESlope: 0, deltaE: 0 } : volumeExcess(fi.id, fj.id, model),
    ),
  );
  const hasExcess = excess.some((row) =>
    row.some((e) => e.xi !== 0 || e.vE !== 0 || e.vESlope !== 0 || e.deltaE !== 0),
  );
  const volumeMixing = hasExcess
    ? {
        xi: excess.map((r) => r.map((e) => e.xi)),
        vE: excess.map((r) => r.map((e) => e.vE)),
        vESlope: excess.map((r) => r.map((e) => e.vESlope)),
        deltaE: excess.map((r) => r.map((e) => e.deltaE)),
      }
    : undefined;
  return {
    label: kept
      .map((c, i) => `${fluids[i]!.name} ${(c.moleFraction * 100).toFixed(1)} %`)
      .join(' + '),
    components,
    z,
    kij,
    kijSlope,
    kijCurve,
    kijAsym,
    volumeMixing,
    Tmin: Math.max(...fluids.map((f) => f.Ttriple)),
    molarMass: fluids.reduce((s, f, i) => s + f.molarMass * z[i]!, 0),
    model: components.every((c) => c.model === 'tuned') ? 'tuned' : (components[0]?.model ?? model),
  };
}
