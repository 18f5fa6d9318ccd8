// Issue 8, fault tests in real Chromium on the production build. Each injects one fault a phone on site has —
// signal lost mid-session, a new version arriving while a form is half filled, storage full during a save,
// no IndexedDB at all, the tab closed during a save — and checks what the app promises (DEVELOPERS.md, "Fault
// model"): the calculators keep working, the app says what happened, and no saved fiber type is lost or
// corrupted. The library is read straight from IndexedDB before and after and compared record by record.
import { afterEach, describe, expect, it } from 'vitest';
import type { BrowserContext, Page } from 'playwright-core';
import { BUILDS, freshProfile, startServer, waitForScreen, waitForServiceWorkerControl, type FreshProfile, type StaticServer } from './harness';
import { BACKUP_FORMAT_ID, BACKUP_FORMAT_VERSION } from '../../src/fibers/backup';
import { DB_NAME, STORAGE_OFF_TEXT } from '../../src/fibers/db';

const UPDATE_OFFER = 'A new version is ready — reload to update.';

let cleanups: (() => Promise<void>)[] = [];
afterEach(async () => {
  for (const c of cleanups.reverse()) await c().catch(() => undefined);
  cleanups = [];
});
const tally = { faults: 0, recordsCompared: 0 };
afterEach(() => {
  console.log(`faults injected so far: ${tally.faults}; saved records compared before/after: ${tally.recordsCompared}`);
});

async function serve(dir = BUILDS.current): Promise<StaticServer> {
  const s = await startServer(dir);
  let closed = false;
  cleanups.push(async () => {
    if (!closed) await s.close();
  });
  const close = s.close.bind(s);
  s.close = async () => {
    closed = true;
    await close();
  };
  return s;
}

async function profile(): Promise<FreshProfile> {
  const p = await freshProfile();
  cleanups.push(() => p.close());
  return p;
}

type Library = Map<string, string>;

/** Every record of the library, id → JSON of the whole record, read through the page's own IndexedDB. */
async function readLibrary(page: Page): Promise<Library> {
  const rows = await page.evaluate(
    (name) =>
      new Promise<[string, string][]>((resolve, reject) => {
        const req = indexedDB.open(name);
        req.onerror = () => reject(req.error);
        req.onsuccess = () => {
          const db = req.result;
          if (!db.objectStoreNames.contains('fiberTypes')) {
            db.close();
            resolve([]);
            return;
          }
          const all = db.transaction('fiberTypes', 'readonly').objectStore('fiberTypes').getAll();
          all.onsuccess = () => {
            db.close();
            resolve((all.result as { id: string }[]).map((r) => [r.id, JSON.stringify(r, Object.keys(r).sort())]));
          };
          all.onerror = () => reject(all.error);
        };
      }),
    DB_NAME,
  );
  return new Map(rows);
}

/** Same records, field for field. */
function expectSameLibrary(after: Library, before: Library): void {
  tally.recordsCompared += before.size;
  expect([...after.keys()].sort()).toEqual([...before.keys()].sort());
  for (const [id, json] of before) expect(after.get(id), `record ${id}`).toBe(json);
}

async function openLibrary(page: Page, baseUrl: string): Promise<void> {
  await page.goto(`${baseUrl}#/library`);
  await waitForScreen(page);
  await page.locator('#lib-saved').waitFor();
}

async function saveStepType(page: Page, name: string): Promise<void> {
  await page.getByRole('button', { name: 'Add a fiber type' }).click();
  await page.locator('#ff-name').fill(name);
  await page.locator('#ff-core').fill('8.2');
  await page.locator('#ff-na').fill('0.14');
  await page.getByRole('button', { name: 'Save', exact: true }).click();
}

async function saveAndWait(page: Page, name: string): Promise<void> {
  await saveStepType(page, name);
  await page.locator('.fiber-list').getByText(name, { exact: true }).waitFor();
}

/** The power screen computes: a new dBm value gives the matching mW (10^(dBm/10), definition of dBm). */
async function expectPowerScreenComputes(page: Page, baseUrl: string): Promise<void> {
  await page.goto(`${baseUrl}#/power`);
  await waitForScreen(page);
  await page.locator('#f-powerDbm').fill('10');
  await expect.poll(async () => (await page.locator('main').innerText()).includes('10 mW')).toBe(true);
  expect(await page.locator('main').innerText()).not.toMatch(/\bNaN\b|Infinity|undefined/);
}

/** Three saved types, through the app's own form. */
async function seedLibrary(page: Page, baseUrl: string): Promise<Library> {
  await openLibrary(page, baseUrl);
  for (const n of ['Tarn spool 1', 'Tarn spool 2', 'Tarn tail']) await saveAndWait(page, n);
  const lib = await readLibrary(page);
  expect(lib.size).toBe(3);
  return lib;
}

describe('signal lost in the middle of a session', () => {
  it('offline, the calculators still compute, the library still lists every saved type, and nothing is lost', async () => {
    const server = await serve();
    const p = await profile();
    const errors: string[] = [];
    p.page.on('pageerror', (e) => errors.push(e.message));
    await p.page.goto(server.url);
    await waitForServiceWorkerControl(p.page);
    const before = await seedLibrary(p.page, server.url);
    // The fault: no network, and the server gone too, so only the service worker's cache can answer.
    tally.faults++;
    await p.context.setOffline(true);
    await server.close();
    await expectPowerScreenComputes(p.page, server.url);
    await p.page.reload();
    await waitForScreen(p.page);
    await openLibrary(p.page, server.url);
    expect(await p.page.locator('.fiber-list .fiber-item').count()).toBe(3);
    // And a save while offline is local, so it works: IndexedDB needs no network.
    await saveAndWait(p.page, 'Saved offline');
    const after = await readLibrary(p.page);
    expect(after.size).toBe(4);
    after.delete([...after.keys()].find((k) => !before.has(k))!);
    expectSameLibrary(after, before);
    expect(errors).toEqual([]);
  });
});

describe('a new version arrives while a form is half filled', () => {
  it('the update is offered, the form keeps its text, the page does not reload by itself, and no record changes', async () => {
    const server = await serve();
    const p = await profile();
    await p.page.goto(server.url);
    await waitForServiceWorkerControl(p.page);
    const before = await seedLibrary(p.page, server.url);
    await p.page.getByRole('button', { name: 'Add a fiber type' }).click();
    await p.page.locator('#ff-name').fill('Half typed');
    await p.page.locator('#ff-core').fill('9.');
    // A marker that only survives if the page is never reloaded.
    await p.page.evaluate(() => ((window as unknown as { __sameDocument: boolean }).__sameDocument = true));
    tally.faults++;
    server.setRoot(BUILDS.next);
    await p.page.evaluate(async () => (await navigator.serviceWorker.getRegistration())?.update());
    await p.page.getByText(UPDATE_OFFER).waitFor({ timeout: 30_000 });
    await p.page.waitForTimeout(1000);
    expect(await p.page.evaluate(() => (window as unknown as { __sameDocument?: boolean }).__sameDocument)).toBe(true);
    expect(await p.page.locator('#ff-name').inputValue()).toBe('Half typed');
    expect(await p.page.locator('#ff-core').inputValue()).toBe('9.');
    expect((await p.page.locator('[data-build-id]').textContent())?.trim()).toContain(BUILDS.currentId);
    expectSameLibrary(await readLibrary(p.page), before);
  });
});

/** Makes every IndexedDB write throw QuotaExceededError while window.__quotaFull is true. */
const QUOTA_INIT = () => {
  const w = window as unknown as { __quotaFull?: boolean };
  for (const method of ['put', 'add'] as const) {
    const original = IDBObjectStore.prototype[method];
    IDBObjectStore.prototype[method] = function (this: IDBObjectStore, ...args: Parameters<IDBObjectStore['put']>) {
      if (w.__quotaFull) throw new DOMException('The quota has been exceeded.', 'QuotaExceededError');
      return original.apply(this, args);
    } as IDBObjectStore['put'];
  }
};

async function contextPage(p: FreshProfile | { context: BrowserContext }): Promise<{ page: Page; errors: string[] }> {
  const page = await p.context.newPage();
  const errors: string[] = [];
  page.on('pageerror', (e) => errors.push(e.message));
  return { page, errors };
}

describe('storage full during a save', () => {
  it('the save is refused in plain words, the form keeps what was typed, and the library is unchanged; it saves once space is back', async () => {
    const server = await serve();
    const p = await profile();
    await p.context.addInitScript(QUOTA_INIT);
    const { page, errors } = await contextPage(p);
    const before = await seedLibrary(page, server.url);
    tally.faults++;
    await page.evaluate(() => ((window as unknown as { __quotaFull: boolean }).__quotaFull = true));
    await saveStepType(page, 'One too many');
    const alert = page.locator('form [role="alert"]').first();
    await alert.waitFor();
    expect(await alert.innerText()).toMatch(/full|space|storage/i);
    expect(await page.locator('#ff-name').inputValue()).toBe('One too many');
    expectSameLibrary(await readLibrary(page), before);
    // Space freed: the same form saves.
    await page.evaluate(() => ((window as unknown as { __quotaFull: boolean }).__quotaFull = false));
    await page.getByRole('button', { name: 'Save', exact: true }).click();
    await page.locator('.fiber-list').getByText('One too many', { exact: true }).waitFor();
    const after = await readLibrary(page);
    expect(after.size).toBe(before.size + 1);
    after.delete([...after.keys()].find((k) => !before.has(k))!);
    expectSameLibrary(after, before);
    expect(errors).toEqual([]);
  });
});

describe('IndexedDB unavailable', () => {
  it.each([
    ['missing (window.indexedDB deleted)', () => Object.defineProperty(window, 'indexedDB', { value: undefined, configurable: true })],
    [
      'refusing (indexedDB.open throws)',
      () => {
        IDBFactory.prototype.open = () => {
          throw new DOMException('The user denied permission to access the database.', 'SecurityError');
        };
      },
    ],
  ])('with IndexedDB %s the calculators still compute and the library says saving is off; the stored records are untouched', async (_how, init) => {
    const server = await serve();
    const p = await profile();
    const before = await seedLibrary(p.page, server.url);
    tally.faults++;
    // The fault only in a second tab of the same profile, so the real store can be read again afterwards.
    const { page, errors } = await contextPage(p);
    await page.addInitScript(init);
    await expectPowerScreenComputes(page, server.url);
    await page.goto(`${server.url}#/library`);
    await waitForScreen(page);
    await page.getByText(STORAGE_OFF_TEXT.slice(0, 40), { exact: false }).waitFor();
    expect(await page.getByRole('button', { name: 'Add a fiber type' }).isDisabled()).toBe(true);
    expect(await page.locator('main').innerText()).not.toMatch(/\bNaN\b|undefined|\[object /);
    expect(errors).toEqual([]);
    await page.close();
    expectSameLibrary(await readLibrary(p.page), before);
  });
});

describe('the tab is closed during a save', () => {
  it('closing the tab right after Save leaves the record either whole or absent, and the others untouched', async () => {
    const server = await serve();
    const p = await profile();
    const before = await seedLibrary(p.page, server.url);
    for (let attempt = 0; attempt < 3; attempt++) {
      const { page } = await contextPage(p);
      await openLibrary(page, server.url);
      await page.getByRole('button', { name: 'Add a fiber type' }).click();
      await page.locator('#ff-name').fill(`Closed mid-save ${attempt}`);
      await page.locator('#ff-core').fill('8.2');
      await page.locator('#ff-na').fill('0.14');
      tally.faults++;
      // Click and close without waiting for the write to finish.
      await page.getByRole('button', { name: 'Save', exact: true }).click({ noWaitAfter: true });
      await page.close({ runBeforeUnload: false });
    }
    const after = await readLibrary(p.page);
    const added = [...after.entries()].filter(([id]) => !before.has(id));
    for (const [, json] of added) {
      const r = JSON.parse(json) as Record<string, unknown>;
      // Whole: every field the form sets is there with the value typed.
      expect(r.name).toMatch(/^Closed mid-save \d$/);
      expect(r.coreDiameterUm).toBe(8.2);
      expect(r.na).toBe(0.14);
      expect(typeof r.createdAt).toBe('number');
    }
    for (const id of added.map(([k]) => k)) after.delete(id);
    expectSameLibrary(after, before);
  });

  it('closing the tab during a 400-type import leaves all 400 or none, never some', async () => {
    const server = await serve();
    const p = await profile();
    const before = await seedLibrary(p.page, server.url);
    const { page } = await contextPage(p);
    await openLibrary(page, server.url);
    const now = Date.now();
    const records = Array.from({ length: 400 }, (_, i) => ({ id: `bulk-${i}`, name: `Bulk reel ${i}`, profile: 'step', coreDiameterUm: 8.2, claddingDiameterUm: 125, na: 0.14, createdAt: now, updatedAt: now }));
    const file = JSON.stringify({ format: BACKUP_FORMAT_ID, formatVersion: BACKUP_FORMAT_VERSION, exportedAt: new Date(now).toISOString(), appVersion: 'test', recordCount: records.length, records });
    await page.locator('.backup input[type="file"]').setInputFiles({ name: 'bulk.json', mimeType: 'application/json', buffer: Buffer.from(file) });
    const confirm = page.getByRole('button', { name: 'Import 400 types' });
    await confirm.waitFor();
    tally.faults++;
    await confirm.click({ noWaitAfter: true });
    await page.close({ runBeforeUnload: false });
    const after = await readLibrary(p.page);
    const bulk = [...after.keys()].filter((k) => !before.has(k)).length;
    expect([0, 400], `imported ${bulk} of 400`).toContain(bulk);
    for (const k of [...after.keys()]) if (!before.has(k)) after.delete(k);
    expectSameLibrary(after, before);
  });
});
