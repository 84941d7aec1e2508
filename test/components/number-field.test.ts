/// <reference types="mocha" />
// <number-field>: SI in, SI out, conversion through thermo/units.ts, clear errors.
import { expect, fixture, html, oneEvent } from '@open-wc/testing';
import '../../components/number-field.js';
import type { NumberField, NumberFieldChange } from '../../components/number-field.js';
import { roundSignificant } from '../../components/number-text.js';
import { NUMBER_FORMATS } from '../../components/number-parse.js';
import { DisplayUnits } from '../../components/display.js';
import { toSI } from '../../thermo/units.js';

const fahrenheit = new DisplayUnits({
  pressure: 'psig',
  temperature: 'F',
  volume: 'usgal',
  mass: 'lb',
  length: 'in',
});
const fahrenheitPoint = new DisplayUnits(fahrenheit.units, 101_325, NUMBER_FORMATS.point);
const celsius = new DisplayUnits(
  { pressure: 'barg', temperature: 'C', volume: 'L', mass: 'kg', length: 'cm' },
  101_325,
  NUMBER_FORMATS.comma,
);

function input(el: NumberField): HTMLInputElement {
  return el.shadowRoot!.querySelector('input')!;
}

async function type(el: NumberField, text: string): Promise<NumberFieldChange> {
  const i = input(el);
  i.value = text;
  const ev = oneEvent(el, 'value-change');
  i.dispatchEvent(new Event('input'));
  const detail = ((await ev) as CustomEvent<NumberFieldChange>).detail;
  await el.updateComplete;
  return detail;
}

describe('number-field', () => {
  it('number-field shows an SI temperature in the user unit with a label and a decimal keypad', async () => {
    const el = await fixture<NumberField>(
      html`<number-field
        label="Liquid temperature"
        quantity="temperature"
        .display=${fahrenheit}
        .value=${toSI('temperature', 68, 'F')}
        testid="t"
      ></number-field>`,
    );
    const i = input(el);
    expect(i.value).to.equal('68');
    expect(i.getAttribute('inputmode')).to.equal('decimal');
    expect(i.dataset.testid).to.equal('t');
    const label = el.shadowRoot!.querySelector('label')!;
    expect(label.textContent).to.equal('Liquid temperature');
    expect(label.htmlFor).to.equal(i.id);
    expect(el.shadowRoot!.querySelector('.unit')!.textContent).to.equal('°F');
  });

  it('number-field converts typed text to SI and fires value-change', async () => {
    const el = await fixture<NumberField>(
      html`<number-field
        label="Liquid temperature"
        name="lt"
        quantity="temperature"
        .display=${celsius}
      ></number-field>`,
    );
    const d = await type(el, '21,5');
    expect(d.valid).to.equal(true);
    expect(d.name).to.equal('lt');
    expect(d.value).to.be.closeTo(294.65, 1e-9); // 21.5 °C, exact arithmetic
    expect(el.value).to.be.closeTo(294.65, 1e-9);
  });

  it('number-field names the field and its range for an out-of-range value and keeps the last valid value', async () => {
    const el = await fixture<NumberField>(
      html`<number-field
        label="Float gauge"
        unit-text="%"
        .min=${0}
        .max=${100}
        .value=${50}
      ></number-field>`,
    );
    const d = await type(el, '120');
    expect(d.valid).to.equal(false);
    expect(el.value).to.equal(50);
    const err = el.shadowRoot!.querySelector('.error')!;
    expect(err.textContent).to.contain('Float gauge');
    expect(err.textContent).to.contain('from 0 to 100 %');
    expect(input(el).getAttribute('aria-invalid')).to.equal('true');
    expect(el.shadowRoot!.textContent).not.to.contain('NaN');
  });

  it('number-field says text is not a number', async () => {
    const el = await fixture<NumberField>(
      html`<number-field label="Scale mass" quantity="mass" .display=${fahrenheit}></number-field>`,
    );
    const d = await type(el, 'abc');
    expect(d.valid).to.equal(false);
    expect(el.shadowRoot!.querySelector('.error')!.textContent).to.contain('not a number');
  });

  it('number-field asks for a required value when emptied', async () => {
    const el = await fixture<NumberField>(
      html`<number-field
        label="Water capacity"
        required
        quantity="volume"
        .display=${fahrenheit}
        .value=${1}
      ></number-field>`,
    );
    const d = await type(el, '');
    expect(d.valid).to.equal(false);
    expect(el.shadowRoot!.querySelector('.error')!.textContent).to.contain(
      'Water capacity is needed',
    );
  });

  it('number-field rewrites the text when the unit changes', async () => {
    const el = await fixture<NumberField>(
      html`<number-field
        label="p"
        quantity="gaugePressure"
        .display=${fahrenheit}
        .value=${toSI('gaugePressure', 100, 'psig')}
      ></number-field>`,
    );
    expect(input(el).value).to.equal('100');
    el.display = celsius;
    await el.updateComplete;
    expect(input(el).value).to.equal('6,89');
    expect(el.shadowRoot!.querySelector('.unit')!.textContent).to.equal('bar g');
  });

  it('number-field reads "1,000" US gal as one thousand with a decimal point (the 1 US gal misreading)', async () => {
    const el = await fixture<NumberField>(
      html`<number-field
        label="Water capacity"
        quantity="volume"
        .display=${fahrenheitPoint}
      ></number-field>`,
    );
    const d = await type(el, '1,000');
    expect(d.valid).to.equal(true);
    // 1000 US gal = 1000 · 231 in³ · (0.0254 m/in)³ = 3.785411784 m³ (NIST SP 811 App. B, exact)
    expect(d.value).to.be.closeTo(3.785411784, 1e-9);
  });

  it('number-field refuses "1,000" °C with a decimal comma, names the field and says what to type', async () => {
    const el = await fixture<NumberField>(
      html`<number-field
        label="Liquid temperature"
        quantity="temperature"
        .display=${celsius}
        .value=${toSI('temperature', 20, 'C')}
      ></number-field>`,
    );
    const d = await type(el, '1,000');
    expect(d.valid).to.equal(false);
    const err = el.shadowRoot!.querySelector('.error')!.textContent!;
    expect(err).to.contain('Liquid temperature');
    expect(err).to.contain('ambiguous');
    expect(err).to.contain('Type 1000');
    expect(el.value).to.be.closeTo(293.15, 1e-9); // the last valid value stays
    expect(input(el).getAttribute('aria-invalid')).to.equal('true');
  });

  it('number-field asks about an implausible value, offers the other reading and takes it only when confirmed', async () => {
    const el = await fixture<NumberField>(
      html`<number-field
        label="Water capacity"
        quantity="volume"
        testid="wc"
        plausible-what="for a storage tank"
        .display=${fahrenheitPoint}
        .min=${1e-4}
        .max=${1e5}
        .plausibleMin=${toSI('volume', 100, 'usgal')}
        .plausibleMax=${toSI('volume', 1_000_000, 'usgal')}
      ></number-field>`,
    );
    const d = await type(el, '1.000');
    expect(d.valid).to.equal(false);
    expect(d.unconfirmed).to.equal(true);
    const q = el.shadowRoot!.querySelector('.question')!.textContent!;
    expect(q).to.contain('1 US gal is unusual for a storage tank');
    expect(q).to.contain('Did you mean 1000 US gal?');
    expect(el.value).to.equal(null);
    const ev = oneEvent(el, 'value-change');
    el.shadowRoot!.querySelector<HTMLButtonElement>('[data-testid="wc-confirm"]')!.click();
    const c = ((await ev) as CustomEvent<NumberFieldChange>).detail;
    expect(c.valid).to.equal(true);
    expect(c.value).to.be.closeTo(toSI('volume', 1, 'usgal'), 1e-12);
    await el.updateComplete;
    expect(el.shadowRoot!.querySelector('.question')).to.equal(null);
  });

  it('number-field shows large figures with digit groups and reads them back', async () => {
    const el = await fixture<NumberField>(
      html`<number-field
        label="Water capacity"
        quantity="volume"
        .display=${fahrenheitPoint}
        .value=${toSI('volume', 30_000, 'usgal')}
      ></number-field>`,
    );
    expect(input(el).value).to.equal('30,000');
    const d = await type(el, input(el).value);
    expect(d.valid).to.equal(true);
    expect(d.value).to.be.closeTo(toSI('volume', 30_000, 'usgal'), 1e-9);
  });

  it('reportValidity marks an empty required field with its own message', async () => {
    const el = await fixture<NumberField>(
      html`<number-field
        label="Design pressure"
        required
        quantity="gaugePressure"
        .display=${fahrenheit}
      ></number-field>`,
    );
    expect(el.reportValidity()).to.equal(false);
    await el.updateComplete;
    expect(el.shadowRoot!.querySelector('.error')!.textContent).to.contain(
      'Design pressure is needed',
    );
    expect(input(el).getAttribute('aria-invalid')).to.equal('true');
  });

  it('roundSignificant rounds the named range inward to two significant figures', () => {
    // 100 US gal = 378.541 L; 1 000 000 US gal = 3 785 411.784 L (NIST SP 811 App. B, exact)
    expect(roundSignificant(378.541, 2, 'up')).to.equal('380');
    expect(roundSignificant(3_785_411.784, 2, 'down')).to.equal('3700000');
    expect(roundSignificant(0.25, 2, 'up')).to.equal('0.25');
    expect(roundSignificant(-58, 2, 'up')).to.equal('-58');
    // 80 psig = 5.5158 bar; 600 psig = 41.369 bar (1 psi = 0.06894757 bar)
    expect(roundSignificant(5.5158, 2, 'up')).to.equal('5.6');
    expect(roundSignificant(41.369, 2, 'down')).to.equal('41');
  });
});
