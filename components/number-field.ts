/**
 * A labelled numeric input that takes and gives SI values and shows the user's unit. The
 * conversion goes through `DisplayUnits` (thermo/units.ts); the field keeps the text as typed so
 * a half-typed number is never rewritten under the user's thumb.
 *
 * Bad input (not a number, out of range, missing when required) shows a message right under
 * the field naming it and its valid range in the user's unit; the event then carries
 * `valid: false` and the last valid value is not replaced.
 *
 * @fires value-change - `CustomEvent<NumberFieldChange>` on every edit.
 */
import { LitElement, html, css, nothing, type PropertyValues } from 'lit';
import { baseStyles } from './styles.js';
import { DisplayUnits, trimZeros, type Quantity } from './display.js';
import { DEFAULT_SETTINGS } from './types.js';

export interface NumberFieldChange {
  /** SI value, or null when the field is empty. Only meaningful when `valid`. */
  value: number | null;
  valid: boolean;
  /** The field's name (`name` property). */
  name: string;
}

let nextId = 0;

export class NumberField extends LitElement {
  static override properties = {
    label: { type: String },
    name: { type: String },
    quantity: { type: String },
    display: { attribute: false },
    value: { attribute: false },
    min: { type: Number },
    max: { type: Number },
    required: { type: Boolean },
    hint: { type: String },
    testid: { type: String },
    unitText: { type: String, attribute: 'unit-text' },
    decimals: { type: Number },
    _text: { state: true },
    _error: { state: true },
  };

  /** Visible label, e.g. "Liquid temperature". */
  declare label: string;
  /** Name reported in events. */
  declare name: string;
  /** Quantity of `thermo/units.ts` the value measures; `null` for a plain number shown with `unitText`. */
  declare quantity: Quantity | null;
  /** The user's display units. */
  declare display: DisplayUnits;
  /** Value in SI (unit per `quantity`), or null when empty. */
  declare value: number | null;
  /** Lowest valid value, SI, inclusive (optional). */
  declare min: number | undefined;
  /** Highest valid value, SI, inclusive (optional). */
  declare max: number | undefined;
  declare required: boolean;
  /** Help text under the label. */
  declare hint: string;
  /** `data-testid` put on the inner <input>. */
  declare testid: string;
  /** Unit text shown when `quantity` is null (e.g. "%"). */
  declare unitText: string;
  /** Digits shown when the value is set from outside. */
  declare decimals: number | undefined;
  declare _text: string;
  declare _error: string;

  private readonly _id = `nf${++nextId}`;
  /** The SI value the current text stands for (to tell our own echoes from outside changes). */
  private _textValue: number | null = null;

  constructor() {
    super();
    this.label = '';
    this.name = '';
    this.quantity = null;
    this.display = DisplayUnits.fromSettings(DEFAULT_SETTINGS);
    this.value = null;
    this.min = undefined;
    this.max = undefined;
    this.required = false;
    this.hint = '';
    this.testid = '';
    this.unitText = '';
    this.decimals = undefined;
    this._text = '';
    this._error = '';
  }

  static override styles = [
    baseStyles,
    css`
      :host {
        margin-bottom: 0.75rem;
      }
      .box {
        display: flex;
        align-items: stretch;
      }
      input {
        flex: 1 1 auto;
        min-width: 0;
        border-top-right-radius: 0;
        border-bottom-right-radius: 0;
      }
      .unit {
        /* Never shrinks below its text: "US gal" was cut off on a 320 px phone. */
        flex: 0 0 auto;
        display: flex;
        align-items: center;
        padding: 0 0.6rem;
        min-width: 3.2rem;
        border: var(--border-width) solid var(--ink);
        border-left: 0;
        border-radius: 0 0.4rem 0.4rem 0;
        background: var(--paper-2);
        font-weight: 600;
        white-space: nowrap;
      }
      input[aria-invalid='true'] {
        border-color: var(--danger);
        outline: 2px solid var(--danger);
      }
      .hint {
        display: block;
        font-size: 0.9em;
        margin: 0.1rem 0 0.25rem;
      }
      label {
        display: block;
        margin-bottom: 0.2rem;
      }
      .error {
        margin: 0.25rem 0 0;
      }
    `,
  ];

  protected override willUpdate(changed: PropertyValues<this>): void {
    // A value or unit change from outside rewrites the text, unless it is our own echo.
    if (changed.has('value') || changed.has('display') || changed.has('quantity')) {
      const unitChanged = changed.has('display') || changed.has('quantity');
      if (unitChanged || !sameNumber(this.value, this._textValue)) {
        this._text = this._format(this.value);
        this._textValue = this.value;
        this._error =
          this._text === '' && !this.required
            ? ''
            : this._error && this._validate(this.value).error;
      }
    }
  }

  private _format(v: number | null): string {
    if (v === null || !Number.isFinite(v)) return '';
    if (this.quantity === null) return String(Number(v.toFixed(this.decimals ?? 2)));
    // Drop trailing zeros the user never typed ("68.0" → "68").
    return trimZeros(this.display.number(this.quantity, v, 'nearest', this.decimals));
  }

  private _unit(): string {
    return this.quantity === null ? this.unitText : this.display.label(this.quantity);
  }

  /** The valid range in the user's unit, e.g. "from −40 to 140 °F" (rounded inward). */
  private _range(): string {
    return this.display.range(this.quantity, this.min, this.max, { unitText: this.unitText });
  }

  private _validate(v: number | null): { error: string } {
    const name = this.label || this.name;
    if (v === null)
      return { error: this.required ? `${name} is needed: enter ${this._range()}.` : '' };
    // Compare in SI with a little slack so a value shown rounded at the limit is still accepted.
    const slack = 1e-9 * Math.max(1, Math.abs(v));
    if (
      (this.min !== undefined && v < this.min - slack) ||
      (this.max !== undefined && v > this.max + slack)
    ) {
      return { error: `${name} must be ${this._range()}.` };
    }
    return { error: '' };
  }

  private _onInput(e: Event): void {
    const text = (e.target as HTMLInputElement).value;
    this._text = text;
    const parsed = parseDecimal(text);
    let value: number | null = null;
    let valid = true;
    if (parsed === undefined) {
      valid = false;
      this._error = `${this.label || this.name} must be ${this._range()}: “${text.trim()}” is not a number.`;
    } else {
      try {
        value =
          parsed === null
            ? null
            : this.quantity === null
              ? parsed
              : this.display.toSI(this.quantity, parsed);
      } catch {
        value = null;
        valid = false;
      }
      if (valid) {
        const { error } = this._validate(value);
        this._error = error;
        valid = error === '';
      } else {
        this._error = `${this.label || this.name} must be ${this._range()}.`;
      }
    }
    if (valid) {
      this._textValue = value;
      this.value = value;
    }
    this.dispatchEvent(
      new CustomEvent<NumberFieldChange>('value-change', {
        detail: { value, valid, name: this.name },
        bubbles: true,
        composed: true,
      }),
    );
  }

  /** True when the current text is a valid value. */
  get valid(): boolean {
    const parsed = parseDecimal(this._text);
    if (parsed === undefined) return false;
    return this._validate(this.value).error === '';
  }

  override render() {
    const id = this._id;
    const unit = this._unit();
    const describedBy = [this.hint ? `${id}-hint` : '', this._error ? `${id}-err` : '']
      .filter(Boolean)
      .join(' ');
    return html`
      <label for=${id}>${this.label}</label>
      ${this.hint ? html`<span class="hint muted" id="${id}-hint">${this.hint}</span>` : nothing}
      <div class="box">
        <input
          id=${id}
          type="text"
          inputmode="decimal"
          autocomplete="off"
          enterkeyhint="next"
          spellcheck="false"
          data-testid=${this.testid || nothing}
          .value=${this._text}
          aria-invalid=${this._error ? 'true' : 'false'}
          aria-describedby=${describedBy || nothing}
          @input=${this._onInput}
        />
        ${unit ? html`<span class="unit" aria-hidden="true">${unit}</span>` : nothing}
      </div>
      ${this._error ? html`<p class="error" id="${id}-err" role="alert">${this._error}</p>` : nothing}
    `;
  }
}

/**
 * Reads a decimal number as typed on a phone: a comma or a point as the decimal mark, an
 * optional sign, spaces ignored. Empty text is null; anything else that is not a number is
 * undefined.
 */
export function parseDecimal(text: string): number | null | undefined {
  const t = text.replace(/[\s\u00a0\u202f]/g, '').replace('−', '-');
  if (t === '') return null;
  const normal = t.replace(',', '.');
  if (!/^[+-]?(\d+\.?\d*|\.\d+)([eE][+-]?\d+)?$/.test(normal)) return undefined;
  const x = Number(normal);
  return Number.isFinite(x) ? x : undefined;
}

function sameNumber(a: number | null, b: number | null): boolean {
  if (a === null || b === null) return a === b;
  return Math.abs(a - b) <= 1e-12 * Math.max(1, Math.abs(a));
}

customElements.define('number-field', NumberField);

declare global {
  interface HTMLElementTagNameMap {
    'number-field': NumberField;
  }
  interface HTMLElementEventMap {
    'value-change': CustomEvent<NumberFieldChange>;
  }
}
