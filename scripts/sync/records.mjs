/**
 * Plainly invented tank and check records for the team-sync tests and the first-sync timing
 * (scripts/sync-first-time.mjs); not check values of any kind. Shaped as the app stores them.
 */

/** A stored tank record (TankRecord); `over` replaces any of its fields. */
export function tank(id, over = {}) {
  return {
    id,
    site: 'Invented Yard',
    name: `Test tank ${id}`,
    notes: '',
    nameplate: { waterCapacity: 1.9, designPressureGauge: 1.72e6 },
    productId: 'propane',
    demo: false,
    createdAt: '2026-06-01T08:00:00.000Z',
    updatedAt: '2026-06-01T08:00:00.000Z',
    ...over,
  };
}

/** A stored check record (CheckRecord) of tank `tankId`, saved at `at`. */
export function check(id, tankId, at = '2026-06-02T09:00:00.000Z') {
  return {
    id,
    tankId,
    at,
    readings: {
      liquidTemperature: 293.15,
      contentsMode: 'gaugePercent',
      gaugePercent: 40,
      levelHeight: null,
      netMass: null,
      pressureReadingGauge: null,
      peakAirTemperature: 308.15,
      sunAllowance: 8,
    },
    productLabel: 'Propane',
    summary: {
      phase: 'two-phase',
      pGauge: 7e5,
      totalMass: 400,
      liquidVolume: 0.76,
      fillingDensity: 0.2,
      maxMass: 800,
      roomLeftMass: 400,
      stopAtGaugePercent: 80,
      binding: 'weight',
      peakTemperature: 316,
      peakGauge: 1.3e6,
      peakLiquidFraction: 0.45,
      headroomToDesign: 4e5,
      headroomToRelief: 3e5,
      liquidFullTemperature: 340,
      topLevel: null,
      cautions: [],
    },
    demo: false,
  };
}
