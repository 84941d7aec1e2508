/**
 * The nameplate and shape parts of `<tank-form>`, as templates over the form's state. They render
 * inside the form's shadow root, so ids, labels and data-testids are the form's own.
 */
import { html, nothing, type TemplateResult } from 'lit';
import type { DisplayUnits } from './display.js';
import type { NumberFieldChange } from './number-field.js';
import type { TankRecord } from './types.js';
import { FILL_METHOD_HINT, FILL_METHOD_WORDS } from './fill-words.js';
import { PLAUSIBLE_DESIGN_PRESSURE, PLAUSIBLE_WATER_CAPACITY, plausibleFor } from './plausible.js';
import { TANK_RANGES } from './tank-ranges.js';
import type {
  ContainerClass,
  FillMethod,
  HeadKind,
  Placement,
  TankInput,
  TankShape,
} from '../thermo/check/types.js';

export type ShapeKind = 'none' | TankShape['kind'];

/** What the templates read from and call on the form. */
export interface TankFormView {
  draft: TankRecord;
  /** The user's display units. */
  display: DisplayUnits;
  setNameplate(patch: Partial<TankInput>): void;
  /** A `value-change` handler that records the field's validity under `key` and applies a valid value. */
  number(
    key: string,
    apply: (v: number | null) => void,
  ): (e: CustomEvent<NumberFieldChange>) => void;
  setClass(containerClass: ContainerClass): void;
  setShape(kind: ShapeKind): void;
  patchShape(patch: Partial<{ heads: HeadKind; diameter: number; shellLength: number }>): void;
}

export function nameplateFields(f: TankFormView): TemplateResult {
  const np = f.draft.nameplate;
  const wc = plausibleFor(PLAUSIBLE_WATER_CAPACITY, np.containerClass);
  const dp = plausibleFor(PLAUSIBLE_DESIGN_PRESSURE, np.containerClass);
  return html`
    <fieldset>
      <legend>Nameplate</legend>
      <number-field
        label="Water capacity"
        name="waterCapacity"
        quantity="volume"
        required
        testid="tank-water-capacity"
        hint="Volume of the container full of water (W.C.)"
        .display=${f.display}
        .value=${np.waterCapacity}
        .min=${TANK_RANGES.waterCapacity.min}
        .max=${TANK_RANGES.waterCapacity.max}
        .plausibleMin=${wc.min}
        .plausibleMax=${wc.max}
        plausible-what=${wc.what}
        @value-change=${f.number('waterCapacity', (v) => f.setNameplate({ waterCapacity: v ?? Number.NaN }))}
      ></number-field>
      <number-field
        label="Design pressure (MAWP)"
        name="designPressureGauge"
        quantity="gaugePressure"
        required
        testid="tank-design-pressure"
        .display=${f.display}
        .value=${np.designPressureGauge}
        .min=${TANK_RANGES.pressure.min}
        .max=${TANK_RANGES.pressure.max}
        .plausibleMin=${dp.min}
        .plausibleMax=${dp.max}
        plausible-what=${dp.what}
        @value-change=${f.number('designPressureGauge', (v) => f.setNameplate({ designPressureGauge: v ?? Number.NaN }))}
      ></number-field>
      <number-field
        label="Relief valve set pressure"
        name="reliefSetPressureGauge"
        quantity="gaugePressure"
        testid="tank-relief-pressure"
        hint="Leave empty to use the design pressure"
        .display=${f.display}
        .value=${np.reliefSetPressureGauge ?? null}
        .min=${TANK_RANGES.pressure.min}
        .max=${TANK_RANGES.pressure.max}
        .plausibleMin=${dp.min}
        .plausibleMax=${dp.max}
        plausible-what=${dp.what}
        @value-change=${f.number('reliefSetPressureGauge', (v) => f.setNameplate({ reliefSetPressureGauge: v ?? undefined }))}
      ></number-field>
      ${nameplateChoices(f)} ${recoveryFields(f)}
      <number-field
        label="Minimum design metal temperature"
        name="mdmt"
        quantity="temperature"
        hint="Optional, from the nameplate (MDMT)"
        .display=${f.display}
        .value=${np.minDesignMetalTemperature ?? null}
        .min=${TANK_RANGES.mdmt.min}
        .max=${TANK_RANGES.mdmt.max}
        @value-change=${f.number('mdmt', (v) => f.setNameplate({ minDesignMetalTemperature: v ?? undefined }))}
      ></number-field>
    </fieldset>
  `;
}

/** Placement, container class, insulation and fill method. */
function nameplateChoices(f: TankFormView): TemplateResult {
  const np = f.draft.nameplate;
  return html`
    <div class="field">
      <label for="placement">Placement</label>
      <p class="hint" id="placement-hint">A partly buried tank counts as aboveground.</p>
      <select
        id="placement"
        aria-describedby="placement-hint"
        data-testid="tank-placement"
        @change=${(e: Event) => f.setNameplate({ placement: (e.target as HTMLSelectElement).value as Placement })}
      >
        <option value="aboveground" ?selected=${(np.placement ?? 'aboveground') === 'aboveground'}>
          Aboveground
        </option>
        <option value="underground" ?selected=${np.placement === 'underground'}>Underground</option>
      </select>
    </div>
    <div class="field">
      <label for="class">Container class (picks the filling rule)</label>
      <p class="hint" id="class-hint">Storage: a stationary ASME container.</p>
      <select
        id="class"
        aria-describedby="class-hint"
        data-testid="tank-class"
        @change=${(e: Event) => f.setClass((e.target as HTMLSelectElement).value as ContainerClass)}
      >
        ${CLASSES.map(([v, text]) => html`<option value=${v} ?selected=${(np.containerClass ?? 'storage') === v}>${text}</option>`)}
      </select>
    </div>
    <label class="check">
      <input
        type="checkbox"
        .checked=${np.insulated ?? false}
        @change=${(e: Event) => f.setNameplate({ insulated: (e.target as HTMLInputElement).checked || undefined })}
      />
      Insulated shell (a DOT cylinder so marked is read as a DOT-4L)
    </label>
    <div class="field">
      <label for="fill-method">How it is filled</label>
      <p class="hint" id="fill-method-hint">${FILL_METHOD_HINT}</p>
      <select
        id="fill-method"
        aria-describedby="fill-method-hint"
        data-testid="tank-fill-method"
        @change=${(e: Event) => f.setNameplate({ fillMethod: (e.target as HTMLSelectElement).value as FillMethod, fixedDipTube: undefined })}
      >
        ${FILL_METHOD_WORDS.map(([v, text]) => html`<option value=${v} ?selected=${fillMethodOf(np) === v}>${text}</option>`)}
      </select>
    </div>
  `;
}

/** Recovery-cylinder option (cylinders only): the common-practice liquid-volume limit. */
export function recoveryFields(f: TankFormView) {
  const np = f.draft.nameplate;
  if ((np.containerClass ?? 'storage') !== 'cylinder') return nothing;
  const on = np.recovery !== undefined;
  return html`<label class="check">
      <input
        type="checkbox"
        data-testid="tank-recovery"
        .checked=${on}
        @change=${(e: Event) => f.setNameplate({ recovery: (e.target as HTMLInputElement).checked ? {} : undefined })}
      />
      Refrigerant recovery cylinder (adds the usual liquid-volume limit, common practice)
    </label>
    ${
      on
        ? html`<number-field
            label="Recovery limit, liquid share of the volume"
            name="recoveryFraction"
            quantity="fraction"
            hint="Common practice: 80 %"
            testid="tank-recovery-fraction"
            .display=${f.display}
            .value=${np.recovery?.fillFraction ?? 0.8}
            .min=${TANK_RANGES.recoveryFraction.min}
            .max=${TANK_RANGES.recoveryFraction.max}
            @value-change=${f.number('recoveryFraction', (v) => f.setNameplate({ recovery: { fillFraction: v ?? 0.8 } }))}
          ></number-field>`
        : nothing
    }`;
}

export function shapeFields(f: TankFormView): TemplateResult {
  const shape = f.draft.nameplate.shape;
  const kind: ShapeKind = shape?.kind ?? 'none';
  return html`
    <fieldset>
      <legend>Shape (only for a level-height reading)</legend>
      <div class="field">
        <label for="shape">Shape</label>
        <select
          id="shape"
          @change=${(e: Event) => f.setShape((e.target as HTMLSelectElement).value as ShapeKind)}
        >
          <option value="none" ?selected=${kind === 'none'}>Not given</option>
          <option value="horizontal-cylinder" ?selected=${kind === 'horizontal-cylinder'}>
            Horizontal cylinder
          </option>
          <option value="vertical-cylinder" ?selected=${kind === 'vertical-cylinder'}>
            Vertical cylinder
          </option>
          <option value="sphere" ?selected=${kind === 'sphere'}>Sphere</option>
        </select>
      </div>
      ${
        shape && shape.kind !== 'sphere'
          ? html`<div class="field">
              <label for="heads">Heads</label>
              <select
                id="heads"
                @change=${(e: Event) => f.patchShape({ heads: (e.target as HTMLSelectElement).value as HeadKind })}
              >
                <option value="hemispherical" ?selected=${shape.heads === 'hemispherical'}>
                  Hemispherical
                </option>
                <option value="ellipsoidal" ?selected=${shape.heads === 'ellipsoidal'}>
                  2:1 ellipsoidal
                </option>
                <option value="flat" ?selected=${shape.heads === 'flat'}>Flat</option>
              </select>
            </div>`
          : nothing
      }
      ${
        shape
          ? html`<number-field
              label="Inside diameter"
              name="diameter"
              quantity="length"
              required
              .display=${f.display}
              .value=${shape.diameter}
              .min=${shape.kind === 'sphere' ? TANK_RANGES.sphereDiameter.min : TANK_RANGES.diameter.min}
              .max=${shape.kind === 'sphere' ? TANK_RANGES.sphereDiameter.max : TANK_RANGES.diameter.max}
              @value-change=${f.number('shape.diameter', (v) => f.patchShape({ diameter: v ?? Number.NaN }))}
            ></number-field>`
          : nothing
      }
      ${
        shape && shape.kind !== 'sphere'
          ? html`<number-field
              label="Shell length between head seams"
              name="shellLength"
              quantity="length"
              required
              .display=${f.display}
              .value=${shape.shellLength}
              .min=${TANK_RANGES.shellLength.min}
              .max=${TANK_RANGES.shellLength.max}
              @value-change=${f.number('shape.shellLength', (v) => f.patchShape({ shellLength: v ?? Number.NaN }))}
            ></number-field>`
          : nothing
      }
    </fieldset>
  `;
}

/** The fill method of a nameplate; an older record's `fixedDipTube: true` reads as the fixed gauge. */
const fillMethodOf = (np: TankInput): FillMethod =>
  np.fillMethod ?? (np.fixedDipTube ? 'fixed-gauge' : 'gauge');

const CLASSES: [ContainerClass, string][] = [
  ['storage', 'Storage (ASME)'],
  ['cylinder', 'DOT cylinder'],
  ['cargo', 'Cargo tank'],
  ['portable', 'Portable tank'],
];
