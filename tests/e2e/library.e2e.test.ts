// The fiber library in real Chromium: IndexedDB, the service worker and the DOM are what only a
// browser can show. Saved types survive an offline reload; two tabs during a schema upgrade keep
// every record; a name with markup characters is shown as text, never interpreted.
import { describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { closedAfterEach, waitForScreen, waitForServiceWorkerControl } from './harness';
import { DB_NAME, SCHEMA_VERSION } from '../../src/fibers/db';

const { serve, profile } = closedAfterEach();



async function openLibrary(page: Page, url: string): Promise<void> {
  await page.goto(`${url}#/library`);
  await waitForScreen(page);
  await page.locator('#lib-saved').waitFor();
}

async function addStepType(page: Page, name: string, coreUm: string, na: string): Promise<void> {
  await page.getByRole('button', { name: 'Add a fiber type' }).click();
  await page.locator('#ff-name').fill(name);
  await page.locator('#ff-core').fill(coreUm);
  await page.locator('#ff-na').fill(na);
  await page.getByRole('button', { name: 'Save', exact: true }).click();
  await page.locator('.fiber-list').waitFor();
}

async function listedNames(page: Page): Promise<string[]> {
  return page.locator('.fiber-list .fiber-name').allTextContents();
}

/** Every record in the app's database, read straight from IndexedDB in the page. */
async function rawRecords(page: Page): Promise<{ version: number; records: Record<string, unknown>[] }> {
  return page.evaluate(
    (dbName) =>
      new Promise((resolve, reject) => {
        const req = indexedDB.open(dbName);
        req.onerror = () => reject(req.error);
        req.onsuccess = () => {
          const db = req.result;
          const all = db.transaction('fiberTypes').objectStore('fiberTypes').getAll();
          all.onsuccess = () => {
            const out = { version: db.version, records: all.result as Record<string, unknown>[] };
            db.close();
            resolve(out);
          };
          all.onerror = () => reject(all.error);
        };
      }),
    DB_NAME,
  );
}

describe('saved fiber types in a real browser', () => {
  it('a saved type is still there after an offline reload', async () => {
    const server = await serve();
    const p = await profile();
    await openLibrary(p.page, server.url);
    await waitForServiceWorkerControl(p.page);
    await addStepType(p.page, 'Quarry road spool 3', '9', '0.13');
    expect(await listedNames(p.page)).toEqual(['Quarry road spool 3']);

    await p.context.setOffline(true);
    await server.close();
    await p.page.reload();
    await waitForScreen(p.page);
    await p.page.locator('.fiber-list').waitFor();
    expect(await listedNames(p.page)).toEqual(['Quarry road spool 3']);
    // A value and its unit are joined by a no-break space on screen.
    expect((await p.page.locator('.fiber-list .fiber-desc').first().textContent())?.replace(/\s/g, ' ')).toContain('core 9 µm, NA 0.13');
  });

  it('a name with markup characters is shown exactly as typed, as text', async () => {
    const server = await serve();
    const p = await profile();
    await openLibrary(p.page, server.url);
    const name = `Tray <3> & "east" 'riser' > 2`; // markup characters, but no tag: allowed, and must show verbatim
    await addStepType(p.page, name, '50', '0.2');
    expect(await listedNames(p.page)).toEqual([name]);
    expect(await p.page.locator('.fiber-list .fiber-name strong').evaluate((el) => el.childElementCount)).toBe(0);
  });

  it('a markup name is refused by the form, and one planted straight into the database is still shown as text', async () => {
    const server = await serve();
    const p = await profile();
    await openLibrary(p.page, server.url);
    await p.page.getByRole('button', { name: 'Add a fiber type' }).click();
    await p.page.locator('#ff-name').fill('<script>window.__planted = 1</script>');
    await p.page.locator('#ff-core').fill('9');
    await p.page.locator('#ff-na').fill('0.13');
    await p.page.getByRole('button', { name: 'Save', exact: true }).click();
    await expect.poll(() => p.page.locator('#ff-name-err').textContent()).toMatch(/looks like markup/);
    await p.page.getByRole('button', { name: 'Cancel' }).click();

    // Bypass the app: write a hostile name directly, as a damaged or crafted database might hold.
    const hostile = '<img src=x onerror="window.__planted=1"><b>bold</b>';
    await p.page.evaluate(
      ([dbName, n]) =>
        new Promise<void>((resolve, reject) => {
          const req = indexedDB.open(dbName);
          req.onsuccess = () => {
            const db = req.result;
            const tx = db.transaction('fiberTypes', 'readwrite');
            const now = Date.now();
            tx.objectStore('fiberTypes').put({ id: 'ft_planted', name: n, nameKey: n.toLowerCase(), profile: 'step', coreDiameterUm: 9, claddingDiameterUm: 125, na: 0.13, attenuation: [], notes: n, createdAt: now, updatedAt: now });
            tx.oncomplete = () => {
              db.close();
              resolve();
            };
            tx.onerror = () => reject(tx.error);
          };
          req.onerror = () => reject(req.error);
        }),
      [DB_NAME, hostile] as const,
    );
    await p.page.reload();
    await waitForScreen(p.page);
    await p.page.locator('.fiber-list').waitFor();
    expect(await listedNames(p.page)).toEqual([hostile]);
    expect(await p.page.locator('.fiber-list img, .fiber-list b, .fiber-list script').count()).toBe(0);
    expect(await p.page.evaluate(() => (window as unknown as { __planted?: number }).__planted)).toBeUndefined();
  });
});

describe('two tabs during a schema upgrade', () => {
  it('an old tab holding a v1 library while the app upgrades it: every record arrives, the old tab is asked to let go', async () => {
    const server = await serve();
    const p = await profile();
    const oldTab = p.page;
    await oldTab.goto(`${server.url}#/`);
    // The old tab plays an earlier build: it creates schema v1, writes v1 records, keeps the
    // connection open and closes it when told a newer version wants the database (as v1 did).
    await oldTab.evaluate(
      (dbName) =>
        new Promise<void>((resolve, reject) => {
          const req = indexedDB.open(dbName, 1);
          req.onupgradeneeded = () => req.result.createObjectStore('fiberTypes', { keyPath: 'id' }).createIndex('byName', 'name');
          req.onsuccess = () => {
            const db = req.result;
            (window as unknown as { __oldDb: IDBDatabase }).__oldDb = db;
            db.onversionchange = () => {
              (window as unknown as { __toldToClose: boolean }).__toldToClose = true;
              db.close();
            };
            const tx = db.transaction('fiberTypes', 'readwrite');
            const s = tx.objectStore('fiberTypes');
            for (let i = 0; i < 50; i++) {
              s.put({ id: `v1_${i}`, name: `Old drum ${i}`, profile: 'step', coreDiameterUm: 8.2, claddingDiameterUm: 125, na: 0.14, attenuationDbPerKm: 0.2 + i / 1000, attenuationWavelengthNm: 1550, notes: `note ${i}`, createdAt: 1_700_000_000_000 + i, updatedAt: 1_700_000_000_000 + i });
            }
            tx.oncomplete = () => resolve();
            tx.onerror = () => reject(tx.error);
          };
          req.onerror = () => reject(req.error);
        }),
      DB_NAME,
    );

    const newTab = await p.context.newPage();
    await openLibrary(newTab, server.url);
    await newTab.locator('.fiber-list').waitFor();
    // The list shows a page of rows at a time; its count says how many it holds.
    expect(await newTab.locator('#lib-count').textContent()).toBe('50 saved.');
    expect(await oldTab.evaluate(() => (window as unknown as { __toldToClose?: boolean }).__toldToClose)).toBe(true);

    const { version, records } = await rawRecords(newTab);
    expect(version).toBe(SCHEMA_VERSION);
    const byId = new Map(records.map((r) => [r.id as string, r]));
    for (let i = 0; i < 50; i++) {
      expect(byId.get(`v1_${i}`), `v1_${i}`).toEqual({
        id: `v1_${i}`, name: `Old drum ${i}`, nameKey: `old drum ${i}`, profile: 'step', coreDiameterUm: 8.2, claddingDiameterUm: 125, na: 0.14,
        attenuation: [{ wavelengthNm: 1550, dbPerKm: 0.2 + i / 1000 }], notes: `note ${i}`, createdAt: 1_700_000_000_000 + i, updatedAt: 1_700_000_000_000 + i,
      });
    }
  });

  it('a newer version opened in another tab: this tab closes the library cleanly, says to reload, and no record is lost', async () => {
    const server = await serve();
    const p = await profile();
    const tab = p.page;
    await openLibrary(tab, server.url);
    await addStepType(tab, 'Kept across upgrade A', '9', '0.13');
    await addStepType(tab, 'Kept across upgrade B', '50', '0.2');
    const before = (await rawRecords(tab)).records;

    // The other tab plays a newer build with schema version SCHEMA_VERSION + 1.
    const newer = await p.context.newPage();
    await newer.goto(`${server.url}#/`);
    const upgraded = await newer.evaluate(
      ([dbName, v]) =>
        new Promise<string>((resolve) => {
          const req = indexedDB.open(dbName, v);
          req.onblocked = () => resolve('blocked');
          req.onupgradeneeded = () => req.result.createObjectStore('futureStore');
          req.onsuccess = () => {
            req.result.close();
            resolve('upgraded');
          };
          req.onerror = () => resolve(`error ${req.error?.name}`);
        }),
      [DB_NAME, SCHEMA_VERSION + 1] as const,
    );
    expect(upgraded).toBe('upgraded');

    const alert = tab.locator('[data-store-status="closed-for-upgrade"]');
    await alert.waitFor();
    expect(await alert.textContent()).toMatch(/newer version of Modewright opened in another tab.*Reload this page/);
    expect(await tab.getByRole('button', { name: 'Add a fiber type' }).isDisabled()).toBe(true);

    const after = await rawRecords(newer);
    expect(after.version).toBe(SCHEMA_VERSION + 1);
    expect(after.records).toEqual(before);
  });
});
