/**
 * <site-rules-form>: the site's rule set and its own stricter rule. What the user types reaches
 * the site record as the engine's figures (a percent stays a percent; a filling density typed in
 * % becomes a fraction of the water weight, as thermo/rules/siteRule.ts takes it); a figure out
 * of range is refused on its field with the range, and nothing is emitted for it.
 */
import { expect, fixture, html, oneEvent } from '@open-wc/testing';
import '../../components/site-rules-form.js';
import type { SiteRulesForm } from '../../components/site-rules-form.js';
import type { SiteRules } from '../../components/site-rules.js';
import type { SiteForecast } from '../../components/walkdown-board.js';
import { siteRulesOf, siteRulesProblem } from '../../components/site-rules.js';
import { byTestId, deep, settleAll, typeText, FIELD_ERROR } from './dom.js';

async function form(rules: SiteRules = {}): Promise<SiteRulesForm> {
  const el = await fixture<SiteRulesForm>(
    html`<site-rules-form .rules=${rules}></site-rules-form>`,
  );
  await settleAll(el);
  return el;
}

async function typeInto(el: SiteRulesForm, testid: string, text: string): Promise<SiteRules> {
  const ev = oneEvent(el, 'site-rules-change');
  typeText(byTestId(el, testid) as HTMLInputElement, text);
  return ((await ev) as CustomEvent<SiteRules>).detail;
}

describe('site-rules-form', () => {
  it('offers the registered rule sets, US federal chosen by default', async () => {
    const el = await form();
    const select = byTestId(el, 'site-rule-set') as HTMLSelectElement;
    expect(select.value).to.equal('us-federal');
    expect(select.selectedOptions[0]!.textContent).to.match(/US federal/);
    expect(deep(el, '#rule-set-edition')?.textContent).to.match(/CFR 2015/);
  });

  it('an 80 % company limit by volume is kept as 80', async () => {
    const el = await form();
    const next = await typeInto(el, 'site-max-fill-percent', '80');
    expect(next.siteRule).to.deep.equal({ maxFillPercent: 80 });
  });

  it('a 40 % filling density is kept as the fraction 0.4 of the water weight', async () => {
    const el = await form({ siteRule: { maxFillPercent: 80 } });
    const next = await typeInto(el, 'site-max-filling-density', '40');
    expect(next.siteRule?.maxFillPercent).to.equal(80);
    expect(next.siteRule?.maxFillingDensity).to.be.closeTo(0.4, 1e-12);
  });

  it('emptying a field drops that figure, and the rule with it when none is left', async () => {
    const el = await form({ siteRule: { maxFillPercent: 80 } });
    const next = await typeInto(el, 'site-max-fill-percent', '');
    expect(next).to.deep.equal({});
  });

  it('refuses 120 % on its field, naming the range, and emits nothing', async () => {
    const el = await form();
    let emitted = false;
    el.addEventListener('site-rules-change', () => (emitted = true));
    typeText(byTestId(el, 'site-max-fill-percent') as HTMLInputElement, '120');
    await settleAll(el);
    const field = deep(el, 'number-field[name="maxFillPercent"]')!;
    const err = deep(field, FIELD_ERROR);
    expect(err?.textContent).to.match(/1/);
    expect(err?.textContent).to.match(/100/);
    expect(emitted).to.equal(false);
  });
});

describe('site rules with the site record', () => {
  it('a record without them (an older backup) has none and is valid', () => {
    const old: SiteForecast = {
      site: 'Yard',
      days: [],
      sunAllowance: 0,
      tankAllowances: [],
      enteredAt: '',
    };
    expect(siteRulesOf(old)).to.deep.equal({});
    expect(siteRulesProblem({ ...old })).to.equal(null);
  });
  it('a bad stored rule is named', () => {
    expect(siteRulesProblem({ ruleSet: 'nowhere' })).to.match(/rule set/);
    expect(siteRulesProblem({ siteRule: { maxFillPercent: 0 } })).to.match(
      /maxFillPercent.*1 to 100/,
    );
    expect(siteRulesProblem({ siteRule: { maxFillingDensity: 2 } })).to.match(/0.01 to 1.25/);
    expect(siteRulesProblem({ siteRule: { other: 1 } })).to.match(/unknown field other/);
  });
});
