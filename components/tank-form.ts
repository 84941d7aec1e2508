/**
 * Add or edit a tank: site, name, product and the nameplate (water capacity, design pressure /
 * MAWP, relief setting, placement, insulation, container class, dip tube, optional shape and
 * minimum design metal temperature). Values in SI; the user's units through `DisplayUnits`.
 *
 * @fires tank-save - `CustomEvent<{ tank: TankRecord }>` when every field is valid.
 * @fires tank-cancel - `CustomEvent<Record<string, never>>`
 *
 * data-testid: `tank-site`, `tank-name`, `tank-product`, `tank-water-capacity`,
 * `tank-design-pressure`, `tank-relief-pressure`, `tank-placement`, `tank-class`, `tank-save`,
 * `tank-cancel`.
 */
import { LitElement, html, css, nothing, type PropertyValues } from 'lit';
import { baseStyles } from './styles.js';
import { DisplayUnits } from './display.js';
import './number-field.js';
import type { NumberFieldChange } from './number-field.js';
import { productChoices, productLabel, type ProductGroup } from './products.js';
import { DEFAULT_SETTINGS, type TankRecord } from './types.js';
import { blankTank } from './blank-tank.js';
import { FILL_METHOD_HINT, FILL_METHOD_WORDS } from './fill-words.js';
import { TEXT_LIMITS } from './limits.js';
import { PLAUSIBLE_DESIGN_PRESSURE, PLAUSIBLE_WATER_CAPACITY, plausibleFor } from './plausible.js';
import type { NumberField } from './number-field.js';
import type {
  ContainerClass,
  FillMethod,
  HeadKind,
  Placement,
  TankInput,
  TankShape,
} from '../thermo/check/types.js';

/** Ranges the form accepts, SI. They match what the check engine accepts (thermo/check/validate.ts). */
export const TANK_RANGES = {
  waterCapacity: { min: 1e-4, max: 1e5 },
  pressure: { min: 1e4, max: 1e8 },
  mdmt: { min: 73.15, max: 373.15 },
  sphereDiameter: { min: 0.05, max: 50 },
  diameter: { min: 0.05, max: 20 },
  shellLength: { min: 0, max: 200 },
  /** Recovery-cylinder liquid-volume limit, fraction (thermo/rules/recovery.ts). */
  recoveryFraction: { min: 0.5, max: 0.95 },
} as const;

export interface TankSaveDetail {
  tank: TankRecord;
}

type ShapeKind = 'none' | TankShape['kind'];

export class TankForm extends LitElement {
  static override properties = {
    tank: { attribute: false },
    display: { attribute: false },
    sites: { attribute: false },
    heading: { type: String },
    _draft: { state: true },
    _invalid: { state: true },
    _message: { state: true },
    _nameMissing: { state: true },
  };

  /** The tank to edit (a new one has a fresh id and default nameplate). */
  declare tank: TankRecord;
  /** The user's display units. */
  declare display: DisplayUnits;
  /** Existing site names, offered as suggestions. */
  declare sites: string[];
  /** Form heading, e.g. "Add a tank". */
  declare heading: string;
  declare _draft: TankRecord;
  declare _invalid: Set<string>;
  declare _message: string;
  declare _nameMissing: boolean;

  constructor() {
    super();
    this.tank = blankTank('new');
    this.display = DisplayUnits.fromSettings(DEFAULT_SETTINGS);
    this.sites = [];
    this.heading = 'Tank';
    this._draft = this.tank;
    this._invalid = new Set();
    this._message = '';
    this._nameMissing = false;
  }

  static override styles = [
    baseStyles,
    css`
      form {
        max-width: 40rem;
      }
      .field {
        margin-bottom: 0.75rem;
      }
      .field label {
        display: block;
        margin-bottom: 0.2rem;
      }
      .check {
        display: flex;
        align-items: center;
        gap: 0.6rem;
        min-height: 48px;
        font-weight: 600;
      }
      .check input {
        width: 28px;
        height: 28px;
        min-height: 28px;
        flex: none;
      }
      .hint {
        display: block;
        font-size: 0.9em;
        font-weight: 400;
      }
      .buttons {
        display: flex;
        flex-wrap: wrap;
        gap: 0.5rem;
        margin-top: 1rem;
      }
      .buttons button {
        flex: 1 1 8rem;
      }
    `,
  ];

  protected override willUpdate(changed: PropertyValues<this>): void {
    // A new tank object for the same tank (the shell re-reading storage) must not wipe what the
    // user is typing: the draft restarts only for another tank.
    if (
      changed.has('tank') &&
      (changed.get('tank') as TankRecord | undefined)?.id !== this.tank.id
    ) {
      this._draft = structuredClone(this.tank);
      // A new tank starts with its required figures empty (NaN): they stay invalid until typed.
      const np = this._draft.nameplate;
      this._invalid = new Set(
        (['waterCapacity', 'designPressure'] as const).filter((k) => !Number.isFinite(np[k])),
      );
      this._message = '';
    }
  }

  private _setNameplate(patch: Partial<TankInput>): void {
    const nameplate = { ...this._draft.nameplate, ...patch };
    for (const k of Object.keys(patch) as (keyof TankInput)[])
      if (patch[k] === undefined) delete nameplate[k];
    this._draft = { ...this._draft, nameplate };
  }

  private _number(key: string, apply: (v: number | null) => void) {
    return (e: CustomEvent<NumberFieldChange>) => {
      const invalid = new Set(this._invalid);
      if (e.detail.valid) {
        invalid.delete(key);
        apply(e.detail.value);
      } else invalid.add(key);
      this._invalid = invalid;
    };
  }

  private _shapeKind(): ShapeKind {
    return this._draft.nameplate.shape?.kind ?? 'none';
  }

  private _setShape(kind: ShapeKind): void {
    const old = this._draft.nameplate.shape;
    // No guessed dimensions: empty (NaN) until typed, and invalid meanwhile.
    const diameter = old?.diameter ?? Number.NaN;
    const heads: HeadKind = old && 'heads' in old ? old.heads : 'hemispherical';
    const shellLength = old && 'shellLength' in old ? old.shellLength : Number.NaN;
    const shape: TankShape | undefined =
      kind === 'none'
        ? undefined
        : kind === 'sphere'
          ? { kind, diameter }
          : { kind, heads, diameter, shellLength };
    const invalid = new Set([...this._invalid].filter((k) => !k.startsWith('shape.')));
    if (shape && !Number.isFinite(shape.diameter)) invalid.add('shape.diameter');
    if (shape && 'shellLength' in shape && !Number.isFinite(shape.shellLength))
      invalid.add('shape.shellLength');
    this._invalid = invalid;
    this._setNameplate({ shape });
  }

  private _patchShape(
    patch: Partial<{ heads: HeadKind; diameter: number; shellLength: number }>,
  ): void {
    const s = this._draft.nameplate.shape;
    if (!s) return;
    this._setNameplate({ shape: { ...s, ...patch } as TankShape });
  }

  private _save(e: Event): void {
    e.preventDefault();
    const d = this._draft;
    const missing: string[] = [];
    if (d.name.trim() === '') missing.push('Name');
    if (!Number.isFinite(d.nameplate.waterCapacity)) missing.push('Water capacity');
    if (!Number.isFinite(d.nameplate.designPressure)) missing.push('Design pressure (MAWP)');
    // Every field shows its own message (and aria-invalid), not only the summary below.
    const fields = [...this.renderRoot.querySelectorAll<NumberField>('number-field')];
    const fieldsOk = fields.map((f) => f.reportValidity()).every(Boolean);
    this._nameMissing = d.name.trim() === '';
    if (this._invalid.size > 0 || missing.length > 0 || !fieldsOk) {
      this._message = missing.length
        ? `Needed before saving: ${missing.join(', ')}.`
        : 'Some figures are not valid: see the messages next to the fields.';
      void this._focusFirstInvalid();
      return;
    }
    this._message = '';
    const tank: TankRecord = { ...d, site: d.site.trim(), name: d.name.trim() };
    this.dispatchEvent(
      new CustomEvent<TankSaveDetail>('tank-save', {
        detail: { tank },
        bubbles: true,
        composed: true,
      }),
    );
  }

  /** Focus goes to the first field in the form's order that has a message. */
  private async _focusFirstInvalid(): Promise<void> {
    await this.updateComplete;
    const fields = [...this.renderRoot.querySelectorAll<NumberField>('number-field')];
    await Promise.all(fields.map((f) => f.updateComplete));
    const first = [
      ...this.renderRoot.querySelectorAll<HTMLElement>('input[aria-invalid="true"], number-field'),
    ].find(
      (el) =>
        el.tagName !== 'NUMBER-FIELD' ||
        el.shadowRoot?.querySelector('input[aria-invalid="true"]') !== null,
    );
    first?.focus();
  }

  private _cancel(): void {
    this.dispatchEvent(
      new CustomEvent('tank-cancel', { detail: {}, bubbles: true, composed: true }),
    );
  }

  /** A recovery-cylinder limit belongs to cylinders only: leaving the class drops it. */
  private _setClass(containerClass: ContainerClass): void {
    this._setNameplate(
      containerClass === 'cylinder' ? { containerClass } : { containerClass, recovery: undefined },
    );
  }

  /** Recovery-cylinder option (cylinders only): the common-practice liquid-volume limit. */
  private _recoveryFields() {
    const np = this._draft.nameplate;
    if ((np.containerClass ?? 'storage') !== 'cylinder') return nothing;
    const on = np.recovery !== undefined;
    return html`<label class="check">
        <input
          type="checkbox"
          data-testid="tank-recovery"
          .checked=${on}
          @change=${(e: Event) => this._setNameplate({ recovery: (e.target as HTMLInputElement).checked ? {} : undefined })}
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
              .display=${this.display}
              .value=${np.recovery?.fillFraction ?? 0.8}
              .min=${TANK_RANGES.recoveryFraction.min}
              .max=${TANK_RANGES.recoveryFraction.max}
              @value-change=${this._number('recoveryFraction', (v) => this._setNameplate({ recovery: { fillFraction: v ?? 0.8 } }))}
            ></number-field>`
          : nothing
      }`;
  }

  private _productOptions() {
    const groups = new Map<ProductGroup, ReturnType<typeof productChoices>>();
    for (const p of productChoices()) groups.set(p.group, [...(groups.get(p.group) ?? []), p]);
    return [...groups.entries()].map(
      ([g, list]) =>
        html`<optgroup label=${g}>
          ${list.map((p) => html`<option value=${p.id} ?selected=${p.id === this._draft.productId}>${p.label}</option>`)}
        </optgroup>`,
    );
  }

  override render() {
    const d = this._draft;
    const np = d.nameplate;
    const disp = this.display;
    const shape = np.shape;
    const kind = this._shapeKind();
    const wc = plausibleFor(PLAUSIBLE_WATER_CAPACITY, np.containerClass);
    const dp = plausibleFor(PLAUSIBLE_DESIGN_PRESSURE, np.containerClass);
    return html`
      <form @submit=${this._save} novalidate>
        <h2>${this.heading}</h2>
        <div class="field">
          <label for="site">Site</label>
          <input
            id="site"
            data-testid="tank-site"
            list="sites"
            autocomplete="off"
            maxlength=${TEXT_LIMITS.site}
            .value=${d.site}
            @input=${(e: Event) => (this._draft = { ...this._draft, site: (e.target as HTMLInputElement).value })}
          />
          <datalist id="sites">
            ${this.sites.map((s) => html`<option value=${s}></option>`)}
          </datalist>
        </div>
        <div class="field">
          <label for="name">Name</label>
          <input
            id="name"
            data-testid="tank-name"
            required
            autocomplete="off"
            maxlength=${TEXT_LIMITS.name}
            .value=${d.name}
            aria-invalid=${this._nameMissing && d.name.trim() === '' ? 'true' : 'false'}
            aria-describedby=${this._nameMissing && d.name.trim() === '' ? 'name-err' : nothing}
            @input=${(e: Event) => (this._draft = { ...this._draft, name: (e.target as HTMLInputElement).value })}
          />
          ${this._nameMissing && d.name.trim() === '' ? html`<p class="error" id="name-err">Name is needed: the name you know this tank by (at most ${TEXT_LIMITS.name} characters).</p>` : nothing}
        </div>
        <div class="field">
          <label for="product">Product</label>
          <select
            id="product"
            data-testid="tank-product"
            @change=${(e: Event) => (this._draft = { ...this._draft, productId: (e.target as HTMLSelectElement).value })}
          >
            ${this._productOptions()}
          </select>
          ${
            // A closed select cuts a long name off on a narrow phone: the whole name, below it.
            productLabel(d.productId).length > 20
              ? html`<p class="hint" data-testid="tank-product-name">
                  ${productLabel(d.productId)}
                </p>`
              : nothing
          }
        </div>

        <fieldset>
          <legend>Nameplate</legend>
          <number-field
            label="Water capacity"
            name="waterCapacity"
            quantity="volume"
            required
            testid="tank-water-capacity"
            hint="Volume of the container full of water (W.C.)"
            .display=${disp}
            .value=${np.waterCapacity}
            .min=${TANK_RANGES.waterCapacity.min}
            .max=${TANK_RANGES.waterCapacity.max}
            .plausibleMin=${wc.min}
            .plausibleMax=${wc.max}
            plausible-what=${wc.what}
            @value-change=${this._number('waterCapacity', (v) => this._setNameplate({ waterCapacity: v ?? Number.NaN }))}
          ></number-field>
          <number-field
            label="Design pressure (MAWP)"
            name="designPressure"
            quantity="gaugePressure"
            required
            testid="tank-design-pressure"
            .display=${disp}
            .value=${np.designPressure}
            .min=${TANK_RANGES.pressure.min}
            .max=${TANK_RANGES.pressure.max}
            .plausibleMin=${dp.min}
            .plausibleMax=${dp.max}
            plausible-what=${dp.what}
            @value-change=${this._number('designPressure', (v) => this._setNameplate({ designPressure: v ?? Number.NaN }))}
          ></number-field>
          <number-field
            label="Relief valve set pressure"
            name="reliefSetPressure"
            quantity="gaugePressure"
            testid="tank-relief-pressure"
            hint="Leave empty to use the design pressure"
            .display=${disp}
            .value=${np.reliefSetPressure ?? null}
            .min=${TANK_RANGES.pressure.min}
            .max=${TANK_RANGES.pressure.max}
            .plausibleMin=${dp.min}
            .plausibleMax=${dp.max}
            plausible-what=${dp.what}
            @value-change=${this._number('reliefSetPressure', (v) => this._setNameplate({ reliefSetPressure: v ?? undefined }))}
          ></number-field>
          <div class="field">
            <label for="placement">Placement</label>
            <p class="hint" id="placement-hint">A partly buried tank counts as aboveground.</p>
            <select
              id="placement"
              aria-describedby="placement-hint"
              data-testid="tank-placement"
              @change=${(e: Event) => this._setNameplate({ placement: (e.target as HTMLSelectElement).value as Placement })}
            >
              <option
                value="aboveground"
                ?selected=${(np.placement ?? 'aboveground') === 'aboveground'}
              >
                Aboveground
              </option>
              <option value="underground" ?selected=${np.placement === 'underground'}>
                Underground
              </option>
            </select>
          </div>
          <div class="field">
            <label for="class">Container class (picks the filling rule)</label>
            <p class="hint" id="class-hint">Storage: a stationary ASME container.</p>
            <select
              id="class"
              aria-describedby="class-hint"
              data-testid="tank-class"
              @change=${(e: Event) => this._setClass((e.target as HTMLSelectElement).value as ContainerClass)}
            >
              ${CLASSES.map(([v, text]) => html`<option value=${v} ?selected=${(np.containerClass ?? 'storage') === v}>${text}</option>`)}
            </select>
          </div>
          <label class="check">
            <input
              type="checkbox"
              .checked=${np.insulated ?? false}
              @change=${(e: Event) => this._setNameplate({ insulated: (e.target as HTMLInputElement).checked || undefined })}
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
              @change=${(e: Event) => this._setNameplate({ fillMethod: (e.target as HTMLSelectElement).value as FillMethod, fixedDipTube: undefined })}
            >
              ${FILL_METHOD_WORDS.map(([v, text]) => html`<option value=${v} ?selected=${fillMethodOf(np) === v}>${text}</option>`)}
            </select>
          </div>
          ${this._recoveryFields()}
          <number-field
            label="Minimum design metal temperature"
            name="mdmt"
            quantity="temperature"
            hint="Optional, from the nameplate (MDMT)"
            .display=${disp}
            .value=${np.minDesignMetalTemperature ?? null}
            .min=${TANK_RANGES.mdmt.min}
            .max=${TANK_RANGES.mdmt.max}
            @value-change=${this._number('mdmt', (v) => this._setNameplate({ minDesignMetalTemperature: v ?? undefined }))}
          ></number-field>
        </fieldset>

        <fieldset>
          <legend>Shape (only for a level-height reading)</legend>
          <div class="field">
            <label for="shape">Shape</label>
            <select
              id="shape"
              @change=${(e: Event) => this._setShape((e.target as HTMLSelectElement).value as ShapeKind)}
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
                    @change=${(e: Event) => this._patchShape({ heads: (e.target as HTMLSelectElement).value as HeadKind })}
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
                  .display=${disp}
                  .value=${shape.diameter}
                  .min=${shape.kind === 'sphere' ? TANK_RANGES.sphereDiameter.min : TANK_RANGES.diameter.min}
                  .max=${shape.kind === 'sphere' ? TANK_RANGES.sphereDiameter.max : TANK_RANGES.diameter.max}
                  @value-change=${this._number('shape.diameter', (v) => this._patchShape({ diameter: v ?? Number.NaN }))}
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
                  .display=${disp}
                  .value=${shape.shellLength}
                  .min=${TANK_RANGES.shellLength.min}
                  .max=${TANK_RANGES.shellLength.max}
                  @value-change=${this._number('shape.shellLength', (v) => this._patchShape({ shellLength: v ?? Number.NaN }))}
                ></number-field>`
              : nothing
          }
        </fieldset>

        <div class="field">
          <label for="notes">Notes</label>
          <textarea
            id="notes"
            rows="2"
            maxlength=${TEXT_LIMITS.notes}
            .value=${d.notes}
            @input=${(e: Event) => (this._draft = { ...this._draft, notes: (e.target as HTMLTextAreaElement).value })}
          ></textarea>
        </div>
        ${this._message ? html`<p class="error" role="alert">${this._message}</p>` : nothing}
        <div class="buttons">
          <button type="submit" class="primary" data-testid="tank-save">Save tank</button>
          <button type="button" data-testid="tank-cancel" @click=${this._cancel}>Cancel</button>
        </div>
      </form>
    `;
  }
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

customElements.define('tank-form', TankForm);

declare global {
  interface HTMLElementTagNameMap {
    'tank-form': TankForm;
  }
}
