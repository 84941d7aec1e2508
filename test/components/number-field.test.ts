/// <reference types="mocha" />
// <number-field>: SI in, SI out, conversion through thermo/units.ts, clear errors.
import { expect, fixture, html, oneEvent } from '@open-wc/testing';
import '../../components/number-field.js';
import type { NumberField, NumberFieldChange } from '../../components/number-field.js';
import { parseDecimal } from '../../components/number-field.js';
import { DisplayUnits } from '../../components/display.js';
import { toSI } from '../../thermo/units.js';

const fahrenheit = new DisplayUnits({
  pressure: 'psig',
  temperature: 'F',
  volume: 'usgal',
  mass: 'lb',
  length: 'in',
});
const celsius = new DisplayUnits({
  pressure: 'barg',
  temperature: 'C',
  volume: 'L',
  mass: 'kg',
  length: 'cm',
});

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
    const d = await type(el, '12..3');
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
    expect(input(el).value).to.equal('6.89');
    expect(el.shadowRoot!.querySelector('.unit')!.textContent).to.equal('bar g');
  });

  it('parseDecimal reads comma or point decimals and refuses the rest', () => {
    expect(parseDecimal(' 1,5 ')).to.equal(1.5);
    expect(parseDecimal('-3')).to.equal(-3);
    expect(parseDecimal('−3')).to.equal(-3);
    expect(parseDecimal('.5')).to.equal(0.5);
    expect(parseDecimal('')).to.equal(null);
    expect(parseDecimal('abc')).to.equal(undefined);
    expect(parseDecimal('1.2.3')).to.equal(undefined);
    expect(parseDecimal('Infinity')).to.equal(undefined);
  });
});
