/**
 * From the check form's readings to the engine input (components/check-input.ts): the peak
 * liquid temperature is the peak air temperature plus the sun allowance (a rule of thumb, common
 * practice). Expected values are worked by hand in kelvin: 0 °C = 273.15 K (ISO 80000-5), a
 * temperature difference of 1 °C = 1 K.
 */
import { describe, expect, it } from 'vitest';
import { buildCheckInput } from '../../components/check-input.js';
import {
  DEFAULT_SETTINGS,
  emptyReadings,
  type Readings,
  type TankRecord,
} from '../../components/types.js';
import { checkClose } from '../helpers/check.js';

const tank: TankRecord = {
  id: 'test-tank',
  site: 'Test bench',
  name: 'Fixture tank',
  notes: '',
  nameplate: {
    waterCapacity: 1,
    designPressureGauge: 1.7e6,
    placement: 'aboveground',
    containerClass: 'storage',
  },
  productId: 'propane',
  demo: false,
  createdAt: '2024-01-01T00:00:00.000Z',
  updatedAt: '2024-01-01T00:00:00.000Z',
};

function readings(patch: Partial<Readings>): Readings {
  // 20 °C liquid = 293.15 K; 30 °C peak air = 303.15 K.
  return {
    ...emptyReadings(8),
    liquidTemperature: 293.15,
    gaugePercent: 50,
    peakAirTemperature: 303.15,
    ...patch,
  };
}

function peakOf(r: Readings): number {
  return buildCheckInput(tank, r, DEFAULT_SETTINGS).input!.peakTemperature!;
}

describe('buildCheckInput peak temperature', () => {
  it('adds the sun allowance to the peak air temperature: 30 °C + 8 K = 311.15 K', () => {
    checkClose({
      what: 'peak liquid temperature',
      input: { air: '30 °C', sun: '8 K' },
      actual: peakOf(readings({})),
      expected: 311.15,
      atol: 1e-9,
      kind: 'identity',
      source: 'worked by hand: 273.15 + 30 + 8',
    });
  });

  it('takes an emptied sun-allowance field as no allowance: 30 °C = 303.15 K', () => {
    checkClose({
      what: 'peak liquid temperature',
      input: { air: '30 °C', sun: 'empty' },
      actual: peakOf(readings({ sunAllowance: null })),
      expected: 303.15,
      atol: 1e-9,
      kind: 'identity',
      source: 'worked by hand: 273.15 + 30',
    });
  });

  it('takes the peak at the liquid temperature when no forecast is entered, and says so', () => {
    const built = buildCheckInput(tank, readings({ peakAirTemperature: null }), DEFAULT_SETTINGS);
    expect(built.peakEstimated).toBe(true);
    expect(built.input!.peakTemperature).toBe(293.15);
  });
});
