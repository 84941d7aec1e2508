/**
 * The key figures a driver acts on (components/key-figures.ts): which engine figure each one is,
 * in which base temperature, and how they read in words. The tank is a made-up fixture; the
 * figures come from `checkTank` for the same input (the screen adds only formatting), and the
 * gallon count is checked by hand with 1 US gal = 3.785411784 L (NIST Handbook 44, App. C).
 */
import { describe, expect, it } from 'vitest';
import { checkTank, type TankCheckInput } from '../../thermo/index.js';
import { toSI } from '../../thermo/units.js';
import { DisplayUnits } from '../../components/display.js';
import { DEFAULT_SETTINGS } from '../../components/types.js';
import { keyFigures, keyWords } from '../../components/key-figures.js';
import { checkClose } from '../helpers/check.js';

const US = DisplayUnits.fromSettings(DEFAULT_SETTINGS);
const METRIC = new DisplayUnits({
  pressure: 'kPag',
  temperature: 'C',
  volume: 'L',
  mass: 'kg',
  length: 'cm',
});

function input(gaugePercent: number): TankCheckInput {
  return {
    tank: {
      waterCapacity: toSI('volume', 500, 'usgal'),
      designPressureGauge: toSI('gaugePressure', 250, 'psig'),
    },
    product: 'propane',
    liquidTemperature: toSI('temperature', 64, 'F'),
    contents: { gaugePercent },
    peakTemperature: toSI('temperature', 95, 'F'),
  };
}

describe('key figures', () => {
  const r = checkTank(input(40));
  it('in °F the room left is the engine’s liquid volume at 60 °F; in °C at 15 °C', () => {
    expect(keyFigures(r, US).roomLeftVolume).toBe(r.fillLimit.roomLeftVolumeAt60F);
    expect(keyFigures(r, METRIC).roomLeftVolume).toBe(r.fillLimit.roomLeftVolumeAt15C);
    expect(keyFigures(r, US).stopAtPercent).toBe(r.fillLimit.stopAtGaugePercent);
  });

  it('the room left in words is in US gallons at 60 °F, rounded down, with the mass', () => {
    const words = keyWords(keyFigures(r, US), US);
    const m = /^Room left ([\d.]+) US gal as liquid at 60 °F \(([\d.]+) lb\)$/.exec(words.room);
    expect(m, words.room).not.toBeNull();
    const gallons = r.fillLimit.roomLeftVolumeAt60F / 0.003785411784;
    checkClose({
      what: 'room left shown, US gal',
      input: '500 US gal propane tank, 40 %, 64 °F',
      actual: Number(m![1]),
      expected: Math.floor(gallons * 10) / 10,
      atol: 1e-9,
      kind: 'identity',
      source: '1 US gal = 3.785411784 L (NIST Handbook 44, Appendix C); rounded down to 0.1 gal',
    });
    expect(words.stop).toMatch(/^Stop at or below [\d.]+ % on the float gauge/);
  });

  it('an over-full tank reads “over the limit by”, never a negative room left', () => {
    const over = checkTank(input(95));
    expect(over.fillLimit.roomLeftMass).toBeLessThan(0);
    for (const d of [US, METRIC]) {
      const k = keyFigures(over, d);
      expect(k.over).toBe(true);
      const words = keyWords(k, d);
      expect(words.room).toMatch(/^Over the limit by \d/);
      expect(words.room).not.toMatch(/[-−]\d/);
    }
  });

  it('no figure is worded as permission to fill', () => {
    for (const g of [40, 95]) {
      const w = keyWords(keyFigures(checkTank(input(g)), US), US);
      expect(`${w.stop} ${w.room} ${w.peak}`).not.toMatch(/you may|safe to|go ahead|OK to fill/i);
    }
  });
});

describe('an assumed relief setting', () => {
  it('is said to be assumed in the key words, and not when the nameplate gives it', () => {
    // No relief setting entered: the check assumes the design pressure (caution `relief-assumed`).
    const assumed = keyWords(keyFigures(checkTank(input(40)), US), US);
    expect(assumed.peak).toMatch(/headroom to relief \(assumed\) /);
    const entered = input(40);
    entered.tank.reliefSetPressureGauge = toSI('gaugePressure', 250, 'psig');
    const read = keyWords(keyFigures(checkTank(entered), US), US);
    expect(read.peak).not.toMatch(/assumed/);
    expect(read.peak).toMatch(/headroom to relief \d/);
  });
});
