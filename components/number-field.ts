/**
 * A labelled numeric input that takes and gives SI values and shows the user's unit. The
 * conversion goes through `DisplayUnits` (thermo/units.ts); the field keeps the text as typed so
 * a half-typed number is never rewritten under the user's thumb.
 *
 * Typed text is read by the one parser (`number-parse.ts`) in the user's number format, so a
 * thousands separator is never taken for a decimal mark; an ambiguous entry is refused with why.
 *
 * Bad input (not a number, out of range, missing when required) shows a message right under
 * the field naming it and its valid range in the user's unit; the event then carries
 * `valid: false` and the last valid value is not replaced.
 *
 * A value inside the valid range but outside the plausible one (`plausibleMin`/`plausibleMax`,
 * e.g. a 1 US gal storage tank) is not taken silently: the field asks ("Did you mean …?") and
 * reports `valid: false` until the user corrects it or taps "… is right".
 *
 * @fires value-change - `CustomEvent<NumberFieldChange>` on every edit.
 */
import { LitElement, html, nothing, type PropertyValues } from 'lit';
import { numberFieldStyles } from './number-field-styles.js';
import { roundSignificant, sameNumber } from './number-text.js';
import { DisplayUnits, trimZeros, type Quantity } from './display.js';
import { DEFAULT_SETTINGS } from './types.js';
import { formatDigits, parseNumber } from './number-parse.js';

export interface NumberFieldChange {
  /** SI value, or null when the field is empty. Only meaningful when `valid`. */
  value: number | null;
  valid: boolean;
  /** The field's name (`name` property). */
  name: string;
  /** True when the value is valid but implausible and awaits the user's confirmation. */
  unconfirmed?: boolean;
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
    plausibleMin: { attribute: false },
    plausibleMax: { attribute: false },
    plausibleWhat: { type: String, attribute: 'plausible-what' },
    _text: { state: true },
    _error: { state: true },
    _question: { state: true },
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
  /** Lowest plausible value, SI (optional): below it the field asks before taking the value. */
  declare plausibleMin: number | undefined;
  /** Highest plausible value, SI (optional). */
  declare plausibleMax: number | undefined;
  /** What the plausible range is for, e.g. "for a storage tank". */
  declare plausibleWhat: string;
  declare _text: string;
  declare _error: string;
  declare _question: string;

  private readonly _id = `nf${++nextId}`;
  /** The SI value the current text stands for (to tell our own echoes from outside changes). */
  private _textValue: number | null = null;
  /** A value the user confirmed as right although implausible. */
  private _confirmed: number | null = null;
  /** The value awaiting confirmation. */
  private _pending: number | null = null;
  /** Another reading of the typed text (e.g. 1000 for "1.000"), for "Did you mean". */
  private _alternative: number | undefined = undefined;
  private _typed = false;

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
    this.plausibleMin = undefined;
    this.plausibleMax = undefined;
    this.plausibleWhat = '';
    this._text = '';
    this._error = '';
    this._question = '';
  }

  static override styles = numberFieldStyles;

  protected override willUpdate(changed: PropertyValues<this>): void {
    // A value or unit change from outside rewrites the text, unless it is our own echo.
    if (changed.has('value') || changed.has('display') || changed.has('quantity')) {
      const unitChanged = changed.has('display') || changed.has('quantity');
      if (unitChanged || !sameNumber(this.value, this._textValue)) {
        this._text = this._format(this.value);
        this._textValue = this.value;
        this._question = '';
        this._error =
          this._text === '' && !this.required
            ? ''
            : this._error && this._validate(this.value).error;
      }
    }
    // The plausible range moved (e.g. another container class): ask again about typed text.
    if (
      this._typed &&
      (changed.has('plausibleMin') || changed.has('plausibleMax')) &&
      (changed.get('plausibleMin') !== undefined || changed.get('plausibleMax') !== undefined)
    )
      this._evaluate(this._text);
  }

  private _format(v: number | null): string {
    if (v === null || !Number.isFinite(v)) return '';
    const plain =
      this.quantity === null
        ? String(Number(v.toFixed(this.decimals ?? 2)))
        : // Drop trailing zeros the user never typed ("68.0" → "68").
          trimZeros(this.display.number(this.quantity, v, 'nearest', this.decimals));
    return formatDigits(plain, this.display.inputFormat());
  }

  private _unit(): string {
    return this.quantity === null ? this.unitText : this.display.label(this.quantity);
  }

  /** The valid range in the user's unit, e.g. "from −40 to 140 °F" (rounded inward). */
  private _range(min = this.min, max = this.max): string {
    return this.display.range(this.quantity, min, max, { unitText: this.unitText });
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

  /** True when `v` lies outside the plausible range and was not confirmed. */
  private _implausible(v: number | null): boolean {
    if (v === null || sameNumber(v, this._confirmed)) return false;
    return (
      (this.plausibleMin !== undefined && v < this.plausibleMin) ||
      (this.plausibleMax !== undefined && v > this.plausibleMax)
    );
  }

  private _shown(v: number): string {
    const text = this._format(v);
    const unit = this._unit();
    return unit ? `${text} ${unit}` : text;
  }

  /**
   * The plausible range in the user's unit to two significant figures, rounded inward, so any
   * value asked about is outside the range the question names ("380 to 3,700,000 L").
   */
  private _usual(): string {
    const q = this.quantity;
    const shown = (si: number | undefined, dir: 'up' | 'down'): string | undefined => {
      if (si === undefined) return undefined;
      const x = q === null ? si : this.display.fromSI(q, si);
      return this.display.localize(roundSignificant(x, 2, dir), true);
    };
    const lo = shown(this.plausibleMin, 'up');
    const hi = shown(this.plausibleMax, 'down');
    const unit = this._unit() ? ` ${this._unit()}` : '';
    if (lo !== undefined && hi !== undefined) return `${lo} to ${hi}${unit}`;
    return lo !== undefined ? `at least ${lo}${unit}` : `at most ${hi ?? ''}${unit}`;
  }

  private _ask(v: number): string {
    const name = this.label || this.name;
    const usual = this._usual();
    const alt =
      this._alternative !== undefined && this.quantity !== null
        ? this.display.toSI(this.quantity, this._alternative)
        : this._alternative;
    const mean =
      alt !== undefined && !this._implausible(alt) ? ` Did you mean ${this._shown(alt)}?` : '';
    const what = this.plausibleWhat ? ` ${this.plausibleWhat}` : '';
    return `${name} ${this._shown(v)} is unusual${what} (usually ${usual}).${mean} Correct it, or confirm it is right.`;
  }

  /** Reads `text`, sets the message and value, and reports the change. */
  private _evaluate(text: string): void {
    const parsed = parseNumber(text, this.display.inputFormat());
    let value: number | null = null;
    let valid = false;
    this._question = '';
    this._alternative = undefined;
    if (!parsed.ok) {
      this._error = `${this.label || this.name}: ${parsed.message}`;
    } else {
      this._alternative = parsed.alternative;
      try {
        value =
          parsed.value === null || this.quantity === null
            ? parsed.value
            : this.display.toSI(this.quantity, parsed.value);
        this._error = this._validate(value).error;
        valid = this._error === '';
      } catch {
        value = null;
        this._error = `${this.label || this.name} must be ${this._range()}.`;
      }
    }
    const unconfirmed = valid && this._implausible(value);
    if (unconfirmed && value !== null) {
      this._question = this._ask(value);
      this._pending = value;
      valid = false;
    }
    if (valid) {
      this._textValue = value;
      this.value = value;
    }
    this._emit(value, valid, unconfirmed);
  }

  private _emit(value: number | null, valid: boolean, unconfirmed = false): void {
    this.dispatchEvent(
      new CustomEvent<NumberFieldChange>('value-change', {
        detail: { value, valid, name: this.name, ...(unconfirmed ? { unconfirmed } : {}) },
        bubbles: true,
        composed: true,
      }),
    );
  }

  private _onInput(e: Event): void {
    this._typed = true;
    this._text = (e.target as HTMLInputElement).value;
    this._evaluate(this._text);
  }

  private _confirm(): void {
    const v = this._pending;
    if (v === null) return;
    this._confirmed = v;
    this._question = '';
    this._textValue = v;
    this.value = v;
    this._emit(v, true);
    void this.updateComplete.then(() => this.renderRoot.querySelector('input')?.focus());
  }

  /** True when the current text is a valid (and, if implausible, confirmed) value. */
  get valid(): boolean {
    const parsed = parseNumber(this._text, this.display.inputFormat());
    if (!parsed.ok || this._question) return false;
    return this._validate(this.value).error === '';
  }

  /**
   * Shows this field's message now (e.g. "… is needed" for an empty required field, as when a
   * form is saved) and returns whether the field is valid.
   */
  reportValidity(): boolean {
    if (this._error || this._question) return false;
    const parsed = parseNumber(this._text, this.display.inputFormat());
    if (!parsed.ok) return false;
    const v = parsed.value === null ? null : this.value;
    this._error = this._validate(v).error;
    return this._error === '';
  }

  /** Moves the keyboard focus into the input. */
  override focus(): void {
    this.renderRoot.querySelector('input')?.focus();
  }

  override render() {
    const id = this._id;
    const unit = this._unit();
    const describedBy = [
      this.hint ? `${id}-hint` : '',
      this._error ? `${id}-err` : '',
      this._question ? `${id}-ask` : '',
    ]
      .filter(Boolean)
      .join(' ');
    const bad = Boolean(this._error || this._question);
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
          aria-invalid=${bad ? 'true' : 'false'}
          aria-describedby=${describedBy || nothing}
          @input=${this._onInput}
        />
        ${unit ? html`<span class="unit" aria-hidden="true">${unit}</span>` : nothing}
      </div>
      ${this._error ? html`<p class="error" id="${id}-err" role="alert">${this._error}</p>` : nothing}
      ${
        this._question
          ? html`<div class="question" id="${id}-ask" role="alert">
              <p>${this._question}</p>
              <button
                type="button"
                data-testid=${this.testid ? `${this.testid}-confirm` : nothing}
                @click=${this._confirm}
              >
                Yes, ${this._pending === null ? '' : this._shown(this._pending)} is right
              </button>
            </div>`
          : nothing
      }
    `;
  }
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
