/**
 * <site-rules-form>: the rules a site's checks apply — the rule set (one per jurisdiction,
 * thermo/rules/sets/) and the site's own stricter rule: a company's maximum fill percent by
 * volume and/or maximum filling density, both optional. The check takes the lowest of every
 * limit, so the site's rule can only lower the stop; a figure above the rule set's limit does not
 * change it (said under the fields).
 *
 * @fires site-rules-change - `CustomEvent<SiteRules>` with valid figures only (an emptied field
 *   drops that figure).
 *
 * data-testid: `site-rule-set`, `site-max-fill-percent`, `site-max-filling-density`.
 */
import { LitElement, html, css } from 'lit';
import { baseStyles } from './styles.js';
import { DisplayUnits } from './display.js';
import { DEFAULT_SETTINGS } from './types.js';
import './number-field.js';
import type { NumberFieldChange } from './number-field.js';
import { SITE_RULE_RANGES, type SiteRule, type SiteRules } from './site-rules.js';
import { RULE_SETS } from '../thermo/rules/sets/index.js';

/** The rule sets a site can choose, for the picker: id, title and which text of the rules. */
function ruleSetChoices(): { id: string; text: string; edition: string }[] {
  return RULE_SETS.map((s) => ({ id: s.id, text: s.title, edition: s.edition }));
}

export class SiteRulesForm extends LitElement {
  static override properties = {
    rules: { attribute: false },
    display: { attribute: false },
  };

  /** The site's stored rules. */
  declare rules: SiteRules;
  declare display: DisplayUnits;

  constructor() {
    super();
    this.rules = {};
    this.display = DisplayUnits.fromSettings(DEFAULT_SETTINGS);
  }

  static override styles = [
    baseStyles,
    css`
      .field {
        margin-bottom: 0.75rem;
      }
    `,
  ];

  private _emit(next: SiteRules): void {
    this.dispatchEvent(
      new CustomEvent<SiteRules>('site-rules-change', {
        detail: next,
        bubbles: true,
        composed: true,
      }),
    );
  }

  private _figure(key: keyof SiteRule) {
    return (e: CustomEvent<NumberFieldChange>) => {
      if (!e.detail.valid) return;
      const own: SiteRule = { ...this.rules.siteRule };
      if (e.detail.value === null) delete own[key];
      else own[key] = e.detail.value;
      const { siteRule: _old, ...rest } = this.rules;
      this._emit(Object.keys(own).length ? { ...rest, siteRule: own } : rest);
    };
  }

  private _set(e: Event): void {
    const id = (e.target as HTMLSelectElement).value;
    this._emit({ ...this.rules, ruleSet: id });
  }

  override render() {
    const own = this.rules.siteRule ?? {};
    const choices = ruleSetChoices();
    const current = this.rules.ruleSet ?? choices[0]?.id;
    const edition = choices.find((c) => c.id === current)?.edition ?? '';
    const p = SITE_RULE_RANGES.maxFillPercent;
    const fd = SITE_RULE_RANGES.maxFillingDensity;
    return html`<fieldset>
      <legend>Fill rules at this site</legend>
      <div class="field">
        <label for="rule-set">Rule set</label>
        <select
          id="rule-set"
          data-testid="site-rule-set"
          aria-describedby="rule-set-edition"
          @change=${this._set}
        >
          ${choices.map(
            (c) => html`<option value=${c.id} ?selected=${c.id === current}>${c.text}</option>`,
          )}
        </select>
        <p class="muted" id="rule-set-edition">Figures as in the ${edition} text.</p>
      </div>
      <number-field
        label="Company maximum fill by volume"
        name="maxFillPercent"
        unit-text="%"
        testid="site-max-fill-percent"
        hint="Optional: liquid percent on the float gauge at the liquid temperature"
        .decimals=${1}
        .display=${this.display}
        .value=${own.maxFillPercent ?? null}
        .min=${p.min}
        .max=${p.max}
        @value-change=${this._figure('maxFillPercent')}
      ></number-field>
      <number-field
        label="Company maximum filling density"
        name="maxFillingDensity"
        quantity="fraction"
        testid="site-max-filling-density"
        hint="Optional: share of the water weight capacity"
        .display=${this.display}
        .value=${own.maxFillingDensity ?? null}
        .min=${fd.min}
        .max=${fd.max}
        @value-change=${this._figure('maxFillingDensity')}
      ></number-field>
      <p class="muted">
        Every check at this site takes the lowest limit: this site’s own figures can lower the stop,
        never raise it. A figure above the rule set’s limit changes nothing.
      </p>
    </fieldset>`;
  }
}

customElements.define('site-rules-form', SiteRulesForm);

declare global {
  interface HTMLElementTagNameMap {
    'site-rules-form': SiteRulesForm;
  }
}
