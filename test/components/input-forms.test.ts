/// <reference types="mocha" />
// Plausible ranges of the check form and the number-format setting: what the user types is
// asked about or refused, never taken silently.
import { expect, fixture, html, oneEvent } from '@open-wc/testing';
import '../../components/check-form.js';
import '../../components/settings-form.js';
import '../../components/backup-panel.js';
import type { BackupPanel } from '../../components/backup-panel.js';
import type { CheckForm, ReadingsChange } from '../../components/check-form.js';
import type { SettingsChange, SettingsForm } from '../../components/settings-form.js';
import type { NumberField } from '../../components/number-field.js';
import { DisplayUnits } from '../../components/display.js';
import { NUMBER_FORMATS } from '../../components/number-parse.js';
import { DEFAULT_SETTINGS, emptyReadings } from '../../components/types.js';
import { toSI } from '../../thermo/units.js';
import { byTestId, typeText } from './dom.js';

const us = new DisplayUnits(DEFAULT_SETTINGS.units, 101_325, NUMBER_FORMATS.point);

async function field(el: HTMLElement, id: string): Promise<ShadowRoot> {
  const root = byTestId(el, id).getRootNode() as ShadowRoot;
  await (root.host as NumberField).updateComplete;
  return root;
}

describe('check-form ranges', () => {
  it('a 200 °F liquid is asked about; 300 °F and "1,000" °F are refused; 60 °F is taken', async () => {
    const el = await fixture<CheckForm>(
      html`<check-form .readings=${emptyReadings(5)} .display=${us}></check-form>`,
    );
    const input = byTestId(el, 'liquid-temperature') as HTMLInputElement;

    let ev = oneEvent(el, 'readings-change');
    typeText(input, '200');
    let d = ((await ev) as CustomEvent<ReadingsChange>).detail;
    expect(d.valid).to.equal(false);
    expect(d.readings.liquidTemperature).to.equal(null);
    // 140 °F (60 °C): 49 CFR 173.304b, the hottest a cylinder must stand without going liquid full
    expect(
      (await field(el, 'liquid-temperature')).querySelector('.question')!.textContent,
    ).to.contain('200 °F is unusual for a liquid in a tank outdoors (usually -58 to 140 °F)');

    ev = oneEvent(el, 'readings-change');
    typeText(input, '300');
    d = ((await ev) as CustomEvent<ReadingsChange>).detail;
    expect(d.valid).to.equal(false);
    // 400 K = 260.33 °F, the engine's upper limit (components/check-input.ts T_RANGE_K)
    expect((await field(el, 'liquid-temperature')).textContent).to.contain('must be from');

    ev = oneEvent(el, 'readings-change');
    typeText(input, '1,000');
    d = ((await ev) as CustomEvent<ReadingsChange>).detail;
    expect(d.valid).to.equal(false);
    expect(d.readings.liquidTemperature).to.equal(null);

    ev = oneEvent(el, 'readings-change');
    typeText(input, '60');
    d = ((await ev) as CustomEvent<ReadingsChange>).detail;
    // 60 °F = 288.705 K (exact: (60 − 32)·5/9 + 273.15)
    expect(d.readings.liquidTemperature).to.be.closeTo(288.70555555555, 1e-9);
  });
});

describe('settings-form number format', () => {
  it('offers the number formats and reports the choice', async () => {
    const el = await fixture<SettingsForm>(
      html`<settings-form .settings=${DEFAULT_SETTINGS}></settings-form>`,
    );
    const select = byTestId(el, 'number-format') as HTMLSelectElement;
    expect([...select.options].map((o) => o.value)).to.deep.equal([
      'auto',
      'point',
      'point-space',
      'comma',
      'comma-space',
    ]);
    const ev = oneEvent(el, 'settings-change');
    select.value = 'comma';
    select.dispatchEvent(new Event('change'));
    const { settings } = ((await ev) as CustomEvent<SettingsChange>).detail;
    expect(settings.numberFormat).to.equal('comma');
    await el.updateComplete;
    expect(el.shadowRoot!.querySelector('#number-format-note')!.textContent).to.contain('12.345,6');
  });

  it('with a decimal comma, a setting field reads "1,5" and shows its value with a comma', async () => {
    const s = { ...DEFAULT_SETTINGS, numberFormat: 'comma' as const, thermometerTolerance: 1.5 };
    const el = await fixture<SettingsForm>(html`<settings-form .settings=${s}></settings-form>`);
    const input = byTestId(el, 'thermometer-tolerance') as HTMLInputElement;
    // 1.5 K shown in °F: 2.7 °F (a difference: × 9/5)
    expect(input.value).to.equal('2,7');
    const ev = oneEvent(el, 'settings-change');
    typeText(input, '1,8');
    const { settings } = ((await ev) as CustomEvent<SettingsChange>).detail;
    expect(settings.thermometerTolerance).to.be.closeTo(
      toSI('temperatureDifference', 1.8, 'F'),
      1e-12,
    );
  });
});

describe('backup-panel delete all', () => {
  it('keeps its confirmation and offers a last-chance backup while asking', async () => {
    const el = await fixture<BackupPanel>(
      html`<backup-panel tank-count="3" check-count="2"></backup-panel>`,
    );
    let cleared = false;
    el.addEventListener('data-clear', () => (cleared = true));
    byTestId(el, 'data-clear').click();
    await el.updateComplete;
    expect(cleared).to.equal(false);
    const ev = oneEvent(el, 'backup-export');
    byTestId(el, 'data-clear-backup').click();
    await ev;
    expect(cleared).to.equal(false);
    byTestId(el, 'data-clear-confirm').click();
    expect(cleared).to.equal(true);
  });
});
