/// <reference types="mocha" />
// The tank's fill method in backups: an older backup without `fillMethod` (and with the older
// `fixedDipTube`) still imports whole, and the check reads its fixed dip tube as a fill to the
// fixed gauge (29 CFR 1910.111(b)(14)(v): ammonia gauge set at 85 %). Kind: behaviour; the
// records are placeholders written as an earlier version of the app wrote them.
import { expect } from '@open-wc/testing';
import { BACKUP_FORMAT, parseBackup } from '../../pwa/backup.js';
import { DEFAULT_SETTINGS } from '../../components/types.js';
import { checkTank } from '../../thermo/index.js';

function oldBackup(nameplate: Record<string, unknown>): string {
  return JSON.stringify({
    format: BACKUP_FORMAT,
    version: 1,
    exportedAt: '2024-03-01T00:00:00.000Z',
    tanks: [
      {
        id: 'old-1',
        site: 'S',
        name: 'Older record',
        notes: '',
        productId: 'ammonia',
        demo: false,
        createdAt: '2024-01-01T00:00:00.000Z',
        updatedAt: '2024-01-01T00:00:00.000Z',
        nameplate,
      },
    ],
    checks: [],
    settings: DEFAULT_SETTINGS,
  });
}

describe('fill method in backups', () => {
  it('parseBackup imports an older backup with fixedDipTube and no fillMethod, and the check reads it as the fixed gauge', () => {
    const r = parseBackup(
      oldBackup({ waterCapacity: 3.785, designPressureGauge: 1.72e6, fixedDipTube: true }),
    );
    expect(r.ok, r.ok ? '' : r.reason).to.equal(true);
    if (!r.ok) return;
    const np = r.data.tanks[0]!.nameplate;
    expect(np.fillMethod).to.equal(undefined);
    const res = checkTank({
      tank: np,
      product: 'ammonia',
      liquidTemperature: 295.37,
      contents: { gaugePercent: 30 },
      peakTemperature: 295.37,
    });
    expect(res.fillLimit.fillMethod).to.equal('fixed-gauge');
    expect(res.fillLimit.binding).to.equal('nh3-fixed-gauge');
    expect(res.fillLimit.stopAtGaugePercent).to.equal(85);
  });

  it('parseBackup imports an older backup with neither field (a fill by gauge)', () => {
    const r = parseBackup(oldBackup({ waterCapacity: 1, designPressureGauge: 1e6 }));
    expect(r.ok, r.ok ? '' : r.reason).to.equal(true);
  });

  it('parseBackup keeps a fill method and refuses an unknown one, naming the tank and the field', () => {
    const ok = parseBackup(
      oldBackup({ waterCapacity: 1, designPressureGauge: 1e6, fillMethod: 'weight' }),
    );
    expect(ok.ok).to.equal(true);
    if (ok.ok) expect(ok.data.tanks[0]!.nameplate.fillMethod).to.equal('weight');
    const bad = parseBackup(
      oldBackup({ waterCapacity: 1, designPressureGauge: 1e6, fillMethod: 'bucket' }),
    );
    expect(bad.ok).to.equal(false);
    if (!bad.ok) {
      expect(bad.reason).to.contain('Older record');
      expect(bad.reason).to.contain('fillMethod');
    }
  });
});
