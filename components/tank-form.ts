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
import { LitElement, html, nothing, type PropertyValues } from 'lit';
import { DisplayUnits } from './display.js';
import './number-field.js';
import type { NumberFieldChange } from './number-field.js';
import { productChoices, productLabel, type ProductGroup } from './products.js';
import { DEFAULT_SETTINGS, type TankRecord } from './types.js';
import { blankTank } from './blank-tank.js';
import { TEXT_LIMITS } from './limits.js';
import type { NumberField } from './number-field.js';
import type { ContainerClass, HeadKind, TankInput, TankShape } from '../thermo/check/types.js';
import { tankFormStyles } from './tank-form-styles.js';
import {
  nameplateFields,
  shapeFields,
  type ShapeKind,
  type TankFormView,
} from './tank-form-fields.js';

export { TANK_RANGES } from './tank-ranges.js';

export interface TankSaveDetail {
  tank: TankRecord;
}

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

  static override styles = tankFormStyles;

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
        (['waterCapacity', 'designPressureGauge'] as const).filter((k) => !Number.isFinite(np[k])),
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

  /** The handler of a text input, select or text area that puts its value in the draft's `key`. */
  private _text(key: 'site' | 'name' | 'productId' | 'notes') {
    return (e: Event) =>
      (this._draft = { ...this._draft, [key]: (e.target as HTMLInputElement).value });
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
    if (!Number.isFinite(d.nameplate.designPressureGauge)) missing.push('Design pressure (MAWP)');
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

  /** The form's state and actions for the templates of tank-form-fields.ts. */
  private _view(): TankFormView {
    return {
      draft: this._draft,
      display: this.display,
      setNameplate: (patch) => this._setNameplate(patch),
      number: (key, apply) => this._number(key, apply),
      setClass: (c) => this._setClass(c),
      setShape: (kind) => this._setShape(kind),
      patchShape: (patch) => this._patchShape(patch),
    };
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
    const nameMissing = this._nameMissing && d.name.trim() === '';
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
            @input=${this._text('site')}
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
            aria-invalid=${nameMissing ? 'true' : 'false'}
            aria-describedby=${nameMissing ? 'name-err' : nothing}
            @input=${this._text('name')}
          />
          ${nameMissing ? html`<p class="error" id="name-err">Name is needed: the name you know this tank by (at most ${TEXT_LIMITS.name} characters).</p>` : nothing}
        </div>
        <div class="field">
          <label for="product">Product</label>
          <select id="product" data-testid="tank-product" @change=${this._text('productId')}>
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

        ${nameplateFields(this._view())} ${shapeFields(this._view())}

        <div class="field">
          <label for="notes">Notes</label>
          <textarea
            id="notes"
            rows="2"
            maxlength=${TEXT_LIMITS.notes}
            .value=${d.notes}
            @input=${this._text('notes')}
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

customElements.define('tank-form', TankForm);

declare global {
  interface HTMLElementTagNameMap {
    'tank-form': TankForm;
  }
}
