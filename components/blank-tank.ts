/** The record of a tank not yet entered. */
import type { TankRecord } from './types.js';

/** A new tank with empty-ish defaults (the user must check every nameplate figure). */
export function blankTank(id: string, now = new Date().toISOString()): TankRecord {
  return {
    id,
    site: '',
    name: '',
    notes: '',
    // No guessed nameplate figures: NaN shows as an empty field and blocks saving until typed.
    nameplate: {
      waterCapacity: Number.NaN,
      designPressureGauge: Number.NaN,
      placement: 'aboveground',
      containerClass: 'storage',
    },
    productId: 'propane',
    demo: false,
    createdAt: now,
    updatedAt: now,
  };
}
