/* global indexedDB -- run inside the page by playwright */
/**
 * Fills the built app's database with a register of invented tanks and one saved check each, for
 * scripts/register-bench.mjs and the end-to-end test of a large register. The tanks are copies
 * of the demo tanks' nameplates under made-up names ("Register tank 1" …) at made-up sites; the
 * check is a copy of one check the caller saved through the app (so its summary is the app's
 * own), re-dated and re-assigned to each tank. Written straight into IndexedDB (schema v4: the
 * newest check of each tank goes into `latestChecks` too, as the app's Store keeps it).
 *
 * @param page a playwright page on the app (its database created)
 * @param opts { tanks, checks, sites }: how many tanks, checks (spread over the tanks) and sites
 */
export async function seedRegister(page, { tanks = 5000, checks = 5000, sites = 250 } = {}) {
  await page.evaluate(
    async ([nTanks, nChecks, nSites]) => {
      const db = await new Promise((res, rej) => {
        const r = indexedDB.open('tankside');
        r.onsuccess = () => res(r.result);
        r.onerror = () => rej(r.error);
      });
      const all = (store) =>
        new Promise((res) => {
          const r = db.transaction(store).objectStore(store).getAll();
          r.onsuccess = () => res(r.result);
        });
      // Every tank there is (the demo site, one of them now the user's own after the saved check).
      const demo = await all('tanks');
      const template = (await all('checks'))[0];
      if (!template) throw new Error('seedRegister: save one check through the app first');
      // An app before schema v4 has no store of latest checks (for a before/after comparison).
      const v4 = db.objectStoreNames.contains('latestChecks');
      const tx = db.transaction(
        v4 ? ['tanks', 'checks', 'latestChecks'] : ['tanks', 'checks'],
        'readwrite',
      );
      const ids = [];
      for (let i = 0; i < nTanks; i++) {
        const t = demo[i % demo.length];
        const id = `reg-${i}`;
        ids.push(id);
        tx.objectStore('tanks').put({
          ...t,
          id,
          demo: false,
          name: `Register tank ${i + 1}`,
          site: `Customer site ${(i % nSites) + 1}`,
        });
      }
      const latest = new Map();
      const t0 = Date.parse('2026-01-01T00:00:00.000Z');
      for (let k = 0; k < nChecks; k++) {
        const tankId = ids[k % ids.length];
        const at = new Date(t0 + k * 60_000).toISOString();
        const c = { ...template, id: `reg-check-${k}`, tankId, at, demo: false };
        tx.objectStore('checks').put(c);
        latest.set(tankId, c);
      }
      if (v4)
        for (const c of latest.values())
          tx.objectStore('latestChecks').put({
            tankId: c.tankId,
            id: c.id,
            at: c.at,
            summary: { topLevel: c.summary.topLevel },
          });
      await new Promise((res, rej) => {
        tx.oncomplete = res;
        tx.onerror = () => rej(tx.error);
      });
      db.close();
    },
    [tanks, checks, sites],
  );
}

/** Saves one check of the first demo tank through the app (the template seedRegister copies). */
export async function saveOneCheck(page) {
  await page.getByTestId('tank-item').first().locator('button.open').click();
  await page.locator('check-screen[data-check-input]').waitFor({ timeout: 30_000 });
  await page.getByTestId('check-save').click();
  await page.getByText('Check saved to this tank').waitFor({ timeout: 30_000 });
}
