// Faults a phone on site really has, in real Chromium on the production build: signal lost in the
// middle of a session, a new version arriving while a form is half filled, storage full during a
// save, no IndexedDB at all, and the tab closed while a save is under way. The promise under every
// fault: the calculators keep working, the app says what happened in plain words, and no saved
// fiber type is lost or corrupted. Each test reads the whole library straight from IndexedDB before
// and after and compares it record by record (id, name, updatedAt, and every other field).
import { describe, expect, it } from 'vitest';
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { chromium, type BrowserContext, type Page } from 'playwright-core';
import { BUILDS, CHROMIUM_ARGS, CHROMIUM_PATH, closedAfterEach, PHONE, storedRecords, UPDATE_OFFER, waitForScreen, waitForServiceWorkerControl, type StoredRecord } from './harness';
import { BACKUP_FORMAT_ID, BACKUP_FORMAT_VERSION } from '../../src/fibers/backup';

const { serve, profile, later } = closedAfterEach();

/**
 * The storage faults (storage full, no IndexedDB, a tab closed mid-save) concern IndexedDB alone: their
 * browsers block the service worker, which would otherwise install and fill its cache meanwhile. The
 * offline and update tests keep it.
 */
const STORAGE_ONLY = { serviceWorkers: 'block' } as const;



/**
 * One user-data-dir that can be closed and opened again: the same phone, with the browser quit
 * and started between two visits (an init script added to one session is gone in the next).
 */
function reusableProfile(serviceWorkers: 'allow' | 'block' = 'allow'): { open(): Promise<BrowserContext> } {
  const dir = mkdtempSync(join(tmpdir(), 'modewright-fault-profile-'));
  let current: BrowserContext | undefined;
  later(async () => {
    await current?.close().catch(() => undefined);
    rmSync(dir, { recursive: true, force: true });
  });
  return {
    async open() {
      await current?.close().catch(() => undefined);
      current = await chromium.launchPersistentContext(dir, {
        executablePath: CHROMIUM_PATH,
        args: CHROMIUM_ARGS,
        viewport: PHONE,
        colorScheme: 'light',
        serviceWorkers,
      });
      return current;
    },
  };
}

function firstPage(context: BrowserContext): Promise<Page> {
  return Promise.resolve(context.pages()[0] ?? context.newPage());
}

/** Uncaught exceptions in the page: every fault test ends with this list empty. */
function watchPageErrors(page: Page): string[] {
  const errors: string[] = [];
  page.on('pageerror', (e) => errors.push(`${e.name}: ${e.message}`));
  return errors;
}

/**
 * The library after a fault must hold every record it held before, each identical (id, name and
 * updatedAt first, for a readable failure, then every field). Returns how many were compared.
 */
function expectSameRecords(after: StoredRecord[], before: StoredRecord[], fault: string): number {
  const summary = (rs: StoredRecord[]) => rs.map((r) => ({ id: r.id, name: r.name, updatedAt: r.updatedAt }));
  expect(summary(after), `${fault}: ids, names and updatedAt`).toEqual(summary(before));
  expect(after, `${fault}: every field of every record`).toEqual(before);
  return before.length;
}

async function openLibrary(page: Page, url: string): Promise<void> {
  await page.goto(`${url}#/library`);
  await waitForScreen(page);
  await page.locator('#lib-saved').waitFor();
}

async function fillStepType(page: Page, name: string, coreUm: string, na: string): Promise<void> {
  await page.getByRole('button', { name: 'Add a fiber type' }).click();
  await page.locator('#ff-name').fill(name);
  await page.locator('#ff-core').fill(coreUm);
  await page.locator('#ff-na').fill(na);
}

async function addStepType(page: Page, name: string, coreUm: string, na: string): Promise<void> {
  await fillStepType(page, name, coreUm, na);
  await page.getByRole('button', { name: 'Save', exact: true }).click();
  await page.getByText(`Saved “${name}”.`).waitFor();
}

/** Three invented spools, saved through the form as a person would. */
async function saveThreeTypes(page: Page): Promise<void> {
  await addStepType(page, 'Marrow Lane drum 1', '9', '0.13');
  await addStepType(page, 'Marrow Lane drum 2', '50', '0.2');
  await addStepType(page, 'Hobb quarry patch', '62.5', '0.275');
}

/** The number in a result line such as "1.9953 mW" or "2.1543". */
function numberIn(text: string | null): number {
  const m = /[-−]?\d+(?:[.,]\d+)?(?:e[-+]?\d+)?/i.exec(text ?? '');
  return m ? Number(m[0].replace('−', '-').replace(',', '.')) : NaN;
}

// Definition of dBm: P[mW] = 10^(dBm/10); 3 dBm = 1.9953 mW.
async function expectPowerComputes(page: Page, dbm: string, mw: number): Promise<void> {
  await page.locator('#f-powerDbm').fill(dbm);
  const shown = page.locator('section[aria-label="The same power in each unit"] dd').nth(1);
  await expect.poll(async () => numberIn(await shown.textContent())).toBeCloseTo(mw, 3);
}

async function vNumberShown(page: Page): Promise<number> {
  // The single-mode check leads with V in its headline answer.
  const value = page.locator('main output .answer-value').first();
  await value.waitFor();
  return numberIn(await value.textContent());
}

// V = 2π a NA / λ (Gloge 1971): for one fiber, V scales as 1/λ, so V(1310)/V(1550) = 1550/1310.
async function expectSingleModeComputes(page: Page): Promise<void> {
  await page.locator('#f-wavelengthNm').fill('1310');
  await expect.poll(() => vNumberShown(page)).toBeGreaterThan(0);
  const v1310 = await vNumberShown(page);
  await page.locator('#f-wavelengthNm').fill('1550');
  await expect.poll(() => vNumberShown(page)).not.toBe(v1310);
  const v1550 = await vNumberShown(page);
  // The screen shows 4 significant figures: 1e-3 relative covers the rounding of both values.
  expect(v1310 / v1550, `V(1310) = ${v1310}, V(1550) = ${v1550}`).toBeCloseTo(1550 / 1310, 2);
}

async function gotoScreen(page: Page, id: string): Promise<void> {
  // A hash change within the running app: no request, as a tap on a link.
  await page.evaluate((route) => (location.hash = `#/${route}`), id);
  await waitForScreen(page);
}

describe('no signal in the middle of a session', () => {
  it('offline with a calculator half filled: screens still open and compute, and after an offline reload every saved type is there unchanged', async () => {
    const server = await serve();
    const p = await profile();
    const errors = watchPageErrors(p.page);
    await openLibrary(p.page, server.url);
    await waitForServiceWorkerControl(p.page);
    await saveThreeTypes(p.page);
    const before = await storedRecords(p.page);
    expect(before.length).toBe(3);

    // Half filled: a power typed but not finished.
    await gotoScreen(p.page, 'power');
    await p.page.locator('#f-powerDbm').fill('-1');

    await p.context.setOffline(true);
    await server.close();
    const seen = server.requests.length;

    await p.page.locator('#f-powerDbm').press('End');
    await p.page.keyboard.type('2');
    // -12 dBm = 10^-1.2 mW = 0.063096 mW
    const shown = p.page.locator('section[aria-label="The same power in each unit"] dd').nth(1);
    await expect.poll(async () => numberIn(await shown.textContent())).toBeCloseTo(0.063096, 5);
    await gotoScreen(p.page, 'single-mode');
    await expectSingleModeComputes(p.page);
    await gotoScreen(p.page, 'library');
    await p.page.locator('.fiber-list').waitFor();
    expect(await p.page.locator('.fiber-list .fiber-name').allTextContents()).toEqual(['Hobb quarry patch', 'Marrow Lane drum 1', 'Marrow Lane drum 2']);

    await p.page.reload();
    await waitForScreen(p.page);
    await p.page.locator('.fiber-list').waitFor();
    expect(await p.page.locator('.fiber-list .fiber-item').count()).toBe(3);
    const compared = expectSameRecords(await storedRecords(p.page), before, 'offline reload');
    await gotoScreen(p.page, 'power');
    await expectPowerComputes(p.page, '3', 1.9953);
    await gotoScreen(p.page, 'single-mode');
    await expectSingleModeComputes(p.page);

    expect(server.requests.length, 'nothing reached the server once offline').toBe(seen);
    expect(errors).toEqual([]);
    console.info(`offline: ${compared} records compared`);
  });
});

describe('a new version arrives while a form is half filled', () => {
  it('the half-filled fiber form keeps its text and focus, the page does not reload, the update is offered, and after accepting every saved type is unchanged', async () => {
    const server = await serve();
    const p = await profile();
    const errors = watchPageErrors(p.page);
    await openLibrary(p.page, server.url);
    await waitForServiceWorkerControl(p.page);
    await addStepType(p.page, 'Sallow bridge spool', '9', '0.13');
    await addStepType(p.page, 'Sallow bridge tail', '50', '0.2');
    const before = await storedRecords(p.page);

    await fillStepType(p.page, 'Half typed', '8.', '');
    await p.page.locator('#ff-name').click();
    await p.page.locator('#ff-name').press('End');
    await p.page.evaluate(() => ((window as unknown as { __sameDocument: boolean }).__sameDocument = true));

    server.setRoot(BUILDS.next);
    // The check the app makes when it comes back into view, made at once.
    await p.page.evaluate(async () => (await navigator.serviceWorker.getRegistration())?.update());
    await p.page.getByText(UPDATE_OFFER).waitFor({ timeout: 30_000 });
    await p.page.keyboard.type(' name');
    await p.page.waitForTimeout(2000);

    expect(await p.page.evaluate(() => (window as unknown as { __sameDocument?: boolean }).__sameDocument), 'no reload by itself').toBe(true);
    expect(await p.page.locator('#ff-name').inputValue()).toBe('Half typed name');
    expect(await p.page.locator('#ff-core').inputValue()).toBe('8.');
    expect(await p.page.evaluate(() => document.activeElement?.id)).toBe('ff-name');
    expect(await p.page.locator('[data-build-id]').textContent()).toContain(BUILDS.currentId);
    expectSameRecords(await storedRecords(p.page), before, 'update offered');

    await Promise.all([p.page.waitForEvent('load'), p.page.getByRole('button', { name: 'Reload to update' }).click()]);
    await expect.poll(async () => (await p.page.locator('[data-build-id]').textContent())?.trim()).toBe(BUILDS.nextId);
    await waitForScreen(p.page);
    await p.page.locator('.fiber-list').waitFor();
    expect(await p.page.locator('.fiber-list .fiber-name').allTextContents()).toEqual(['Sallow bridge spool', 'Sallow bridge tail']);
    const compared = expectSameRecords(await storedRecords(p.page), before, 'after the update');
    expect(errors).toEqual([]);
    console.info(`update: ${compared} records compared (twice)`);
  });
});

/**
 * Makes IndexedDB refuse writes as a full disk does, after `allowed` writes on this page.
 *   'throw':   put/add throw QuotaExceededError at once (as some browsers do for an oversized value);
 *   'pending': the transaction aborts with a QuotaExceededError while the write is pending, so the
 *              request itself fails with AbortError and only the transaction says why;
 *   'commit':  the write succeeds, then the commit fails: the transaction aborts with a
 *              QuotaExceededError as its error (the origin's quota checked at commit).
 * Writes inside a versionchange transaction (opening and upgrading) are let through.
 */
type QuotaMode = 'throw' | 'pending' | 'commit';
function quotaFault(arg: { mode: QuotaMode; allowed: number }): void {
  const w = window as unknown as { __quotaRefusals: number };
  w.__quotaRefusals = 0;
  let writes = 0;
  const failed = new WeakSet<IDBTransaction>();
  const errorGetter = Object.getOwnPropertyDescriptor(IDBTransaction.prototype, 'error')!.get!;
  Object.defineProperty(IDBTransaction.prototype, 'error', {
    configurable: true,
    get(this: IDBTransaction) {
      return failed.has(this) ? new DOMException('The quota has been exceeded.', 'QuotaExceededError') : errorGetter.call(this);
    },
  });
  for (const method of ['put', 'add'] as const) {
    const original = IDBObjectStore.prototype[method];
    IDBObjectStore.prototype[method] = function (this: IDBObjectStore, ...args: Parameters<IDBObjectStore['put']>) {
      if (this.transaction.mode === 'versionchange' || writes++ < arg.allowed) return original.apply(this, args);
      w.__quotaRefusals++;
      if (arg.mode === 'throw') throw new DOMException('The quota has been exceeded.', 'QuotaExceededError');
      const tx = this.transaction;
      const request = original.apply(this, args);
      failed.add(tx);
      const abort = () => {
        try {
          tx.abort();
        } catch {
          // already finished
        }
      };
      if (arg.mode === 'pending') queueMicrotask(abort);
      else request.addEventListener('success', abort);
      return request;
    };
  }
}

describe('storage full during a save', () => {
  it.each(['throw', 'pending', 'commit'] as const)(
    'quota exceeded (%s): the form says storage is full and nothing was saved, the saved types stay as they were, and without the fault the library is intact',
    async (mode) => {
      const server = await serve();
      const phone = reusableProfile(STORAGE_ONLY.serviceWorkers);

      // Visit 1, no fault: three types saved.
      let page = await firstPage(await phone.open());
      await openLibrary(page, server.url);
      await saveThreeTypes(page);
      const seeded = await storedRecords(page);

      // Visit 2: the disk fills up after one more write.
      const context = await phone.open();
      await context.addInitScript(quotaFault, { mode, allowed: 1 });
      page = await firstPage(context);
      let errors = watchPageErrors(page);
      await openLibrary(page, server.url);
      await page.locator('.fiber-list').waitFor();
      await addStepType(page, 'Last one that fits', '9', '0.13');
      const before = await storedRecords(page);
      expect(before.length).toBe(seeded.length + 1);

      await fillStepType(page, 'One too many', '9', '0.14');
      await page.getByRole('button', { name: 'Save', exact: true }).click();
      const alert = page.locator('form.fiber-form [role="alert"]').first();
      await alert.waitFor();
      expect(await alert.textContent()).toMatch(/Not saved: the storage .* is full\. Nothing was changed\./);
      expect(await page.evaluate(() => (window as unknown as { __quotaRefusals: number }).__quotaRefusals)).toBeGreaterThan(0);
      // The form stays open with what was typed, so nothing is lost on screen either.
      expect(await page.locator('#ff-name').inputValue()).toBe('One too many');
      let compared = expectSameRecords(await storedRecords(page), before, `quota ${mode}, after the refused save`);
      await page.getByRole('button', { name: 'Cancel' }).click();
      expect(await page.locator('.fiber-list .fiber-item').count()).toBe(before.length);

      // An import of a whole backup while full: one transaction, so none of it lands.
      await page.locator('.backup input[type="file"]').setInputFiles({ name: 'reels.json', mimeType: 'application/json', buffer: Buffer.from(backupFile(importBatch(5))) });
      await page.getByRole('button', { name: 'Import 5 types' }).click();
      await expect
        .poll(() => page.locator('.backup [role="status"]').textContent())
        .toMatch(/The import failed and the library was left exactly as it was\. Reason: Not saved: the storage .* is full/);
      compared += expectSameRecords(await storedRecords(page), before, `quota ${mode}, after the refused import`);
      expect(errors).toEqual([]);

      // Visit 3: space freed (no fault): the library is whole and takes a new type again.
      page = await firstPage(await phone.open());
      errors = watchPageErrors(page);
      await openLibrary(page, server.url);
      await page.locator('.fiber-list').waitFor();
      compared += expectSameRecords(await storedRecords(page), before, `quota ${mode}, next visit`);
      await addStepType(page, 'One too many', '9', '0.14');
      expect((await storedRecords(page)).length).toBe(before.length + 1);
      expect(errors).toEqual([]);
      console.info(`quota ${mode}: ${compared} records compared`);
    },
  );
});

describe('no IndexedDB at all', () => {
  const faults = {
    // A browser with storage switched off for the site: the API is there, opening throws.
    'opening the database throws': () => {
      IDBFactory.prototype.open = function () {
        throw new DOMException('The user denied permission to access the database.', 'SecurityError');
      };
    },
    // A browser without the API (or an embedded view that removes it).
    'window.indexedDB is missing': () => {
      Object.defineProperty(window, 'indexedDB', { value: undefined, configurable: true });
    },
  };
  it.each(Object.keys(faults) as (keyof typeof faults)[])(
    '%s: the calculators compute, the library screen says in plain words that saving is off, and no error escapes',
    async (fault) => {
      const server = await serve();
      const p = await profile(STORAGE_ONLY);
      await p.context.addInitScript(faults[fault]);
      const errors = watchPageErrors(p.page);
      const rejections: string[] = [];
      p.page.on('console', (m) => {
        if (m.type() === 'error') rejections.push(m.text());
      });

      await p.page.goto(`${server.url}#/power`);
      await waitForScreen(p.page);
      await expectPowerComputes(p.page, '3', 1.9953);
      await gotoScreen(p.page, 'single-mode');
      await expectSingleModeComputes(p.page);

      await gotoScreen(p.page, 'library');
      const status = p.page.locator('[data-store-status="unavailable"]');
      await status.waitFor();
      expect(await status.textContent()).toMatch(/saving fiber types is off/i);
      expect(await p.page.getByRole('button', { name: 'Add a fiber type' }).isDisabled()).toBe(true);
      expect(await p.page.locator('main').textContent()).not.toMatch(/NaN|undefined|\[object /);
      expect(errors).toEqual([]);
      expect(rejections.filter((t) => /Uncaught/.test(t))).toEqual([]);
    },
  );
});

function backupFile(records: Record<string, unknown>[]): string {
  return JSON.stringify({
    format: BACKUP_FORMAT_ID,
    formatVersion: BACKUP_FORMAT_VERSION,
    exportedAt: new Date().toISOString(),
    appVersion: 'fault-test',
    recordCount: records.length,
    records,
  });
}

/** An invented batch of distinct step-index types, each valid, with known content. */
function importBatch(n: number, tag = 'a'): Record<string, unknown>[] {
  const t0 = Date.UTC(2026, 0, 5);
  return Array.from({ length: n }, (_, i) => ({
    id: `imp_${tag}_${String(i).padStart(4, '0')}`,
    name: `Wick marsh reel ${tag}-${i}`,
    profile: 'step',
    coreDiameterUm: 8 + (i % 50) / 100,
    claddingDiameterUm: 125,
    na: 0.12 + (i % 7) / 1000,
    attenuation: [{ wavelengthNm: 1550, dbPerKm: 0.18 + (i % 10) / 100 }],
    notes: `batch record ${i} `.repeat(20),
    createdAt: t0 + i,
    updatedAt: t0 + i,
  }));
}

// When the tab goes matters: right at the click, the write has not begun; later it is under way or
// done. Several moments in one profile, so at least some closes land while the transaction runs.
const IMPORT_CLOSE_DELAYS_MS = [0, 10, 30, 60, 120, 250, 500];
const SAVE_CLOSE_DELAYS_MS = [0, 5, 20, 50];
const BATCH_SIZE = 600;

describe('the tab is closed during a save', () => {
  it(`closing the tab 0 to 500 ms after confirming an import of ${BATCH_SIZE} types, and halfway through its writes: on reopening the library holds either all of them or none, each complete, and the earlier types unchanged`, async () => {
    const server = await serve();
    const p = await profile(STORAGE_ONLY);
    // Counts the writes issued on the page; when asked, write number __stallAt stalls the page for
    // 3 s (a slow phone), so the last round closes the tab for certain in the middle of the
    // import's one transaction, with half of its writes issued.
    await p.context.addInitScript(() => {
      const w = window as unknown as { __puts: number; __stallAt?: number };
      w.__puts = 0;
      const put = IDBObjectStore.prototype.put;
      IDBObjectStore.prototype.put = function (this: IDBObjectStore, ...args: Parameters<IDBObjectStore['put']>) {
        const request = put.apply(this, args);
        if (++w.__puts === w.__stallAt) {
          console.info('modewright-test: write stalled');
          const until = performance.now() + 3000;
          while (performance.now() < until) {
            // busy: the page does nothing else until the tab is closed
          }
        }
        return request;
      };
    });
    let page = p.page;
    await openLibrary(page, server.url);
    await saveThreeTypes(page);
    let expected = await storedRecords(page);
    const outcomes: string[] = [];
    let compared = 0;
    const rounds = [
      ...IMPORT_CLOSE_DELAYS_MS.map((ms) => ({ when: `${ms} ms`, wait: (pg: Page) => pg.waitForTimeout(ms), stallAt: undefined as number | undefined })),
      {
        when: `while write ${BATCH_SIZE / 2} of ${BATCH_SIZE} stalls`,
        wait: async (pg: Page) => {
          await pg.waitForEvent('console', { predicate: (m) => m.text() === 'modewright-test: write stalled', timeout: 30_000 });
        },
        stallAt: BATCH_SIZE / 2,
      },
    ];

    for (const [round, { when, wait, stallAt }] of rounds.entries()) {
      const tag = `r${round}`;
      const batch = importBatch(BATCH_SIZE, tag);
      await page.locator('.backup input[type="file"]').setInputFiles({ name: 'reels.json', mimeType: 'application/json', buffer: Buffer.from(backupFile(batch)) });
      await page.evaluate((at) => Object.assign(window, { __puts: 0, __stallAt: at }), stallAt);
      const confirm = page.getByRole('button', { name: `Import ${BATCH_SIZE} types` });
      // A stalled page cannot answer the click's own follow-up checks; dispatch it and move on.
      await (stallAt ? confirm.dispatchEvent('click') : confirm.click());
      await wait(page);
      await page.close({ runBeforeUnload: false });

      page = await p.context.newPage();
      const errors = watchPageErrors(page);
      await openLibrary(page, server.url);
      await page.locator('.fiber-list').waitFor();
      const after = await storedRecords(page);
      const landed = after.filter((r) => r.id.startsWith(`imp_${tag}_`));
      expect([0, batch.length], `closed ${when}: one transaction, all or none (got ${landed.length})`).toContain(landed.length);
      compared += expectSameRecords(after.filter((r) => !r.id.startsWith(`imp_${tag}_`)), expected, `tab closed ${when} into an import`);
      const byId = new Map(batch.map((r) => [r.id as string, r]));
      for (const r of landed) {
        const { nameKey, ...rest } = r;
        expect(rest, `imported ${r.id} complete`).toEqual(byId.get(r.id));
        expect(nameKey).toBe(r.name.toLowerCase());
      }
      compared += landed.length;
      // The list shows a page of rows at a time; its count says how many it holds.
      expect(await page.locator('#lib-count').textContent()).toBe(`${after.length} saved.`);
      expect(errors).toEqual([]);
      outcomes.push(`${when}: ${landed.length ? 'all' : 'none'}`);
      expected = after;
    }
    console.info(`tab closed during import: ${outcomes.join(', ')}; ${compared} records compared`);
  });

  it('closing the tab 0 to 50 ms after pressing Save: the new type is either fully there or not there, and the earlier types unchanged', async () => {
    const server = await serve();
    const p = await profile(STORAGE_ONLY);
    let page = p.page;
    await openLibrary(page, server.url);
    await saveThreeTypes(page);
    let expected = await storedRecords(page);
    const outcomes: string[] = [];
    let compared = 0;

    for (const [round, delayMs] of SAVE_CLOSE_DELAYS_MS.entries()) {
      const name = `Closed mid-save ${round}`;
      await fillStepType(page, name, '9.2', '0.135');
      await page.locator('#ff-cutoff').fill('1260');
      await page.locator('#ff-cutoff-kind').selectOption('cable');
      await page.getByRole('button', { name: 'Save', exact: true }).click();
      if (delayMs) await page.waitForTimeout(delayMs);
      await page.close({ runBeforeUnload: false });

      page = await p.context.newPage();
      const errors = watchPageErrors(page);
      await openLibrary(page, server.url);
      await page.locator('.fiber-list').waitFor();
      const after = await storedRecords(page);
      const knownIds = new Set(expected.map((r) => r.id));
      const added = after.filter((r) => !knownIds.has(r.id));
      expect(added.length, `closed after ${delayMs} ms: at most the one new record`).toBeLessThanOrEqual(1);
      compared += expectSameRecords(after.filter((r) => knownIds.has(r.id)), expected, `tab closed ${delayMs} ms into a save`);
      for (const r of added) {
        expect(r).toMatchObject({
          name,
          nameKey: name.toLowerCase(),
          profile: 'step',
          coreDiameterUm: 9.2,
          na: 0.135,
          claddingDiameterUm: 125,
          cutoffWavelengthNm: 1260,
          cutoffKind: 'cable',
          attenuation: [],
          notes: '',
        });
        expect(r.createdAt).toBe(r.updatedAt);
      }
      compared += added.length;
      expect(errors).toEqual([]);
      outcomes.push(`${delayMs} ms: ${added.length ? 'saved' : 'not saved'}`);
      expected = after;
    }
    console.info(`tab closed during save: ${outcomes.join(', ')}; ${compared} records compared`);
  });
});
