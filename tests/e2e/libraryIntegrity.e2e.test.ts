// Issue 13 in real Chromium on the production build: the four ways the fiber library still failed the
// person who relies on it, each shown as a user meets it, each reading the library straight from
// IndexedDB before and after and comparing it record by record.
//   1. a backup record with another id but a name already saved: the preview names it, says the
//      values differ, and lets the person keep both (under a proposed name), replace, or skip;
//      the same warning when a type is added or renamed by hand;
//   2. a backup that is not UTF-8 (Latin-1), an empty file and random bytes: refused in their own words;
//   3. the same type edited in two tabs: the second save is refused with what changed, and the person
//      loads the other version or overwrites it knowingly;
//   4. a thousand saved types: the list shows a page at a time, every type is reachable, and a key in
//      Search sorts nothing (the speed itself is measured by `npm run bench`, never asserted here).
// Also: persistent storage is asked for after the first save and the screen says plainly whether the
// library is protected; the backup file is chosen through a labelled button reachable from the keyboard.
import { describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { closedAfterEach, storedRecords, waitForScreen, type StoredRecord } from './harness';
import { DB_NAME } from '../../src/fibers/db';
import { BACKUP_FORMAT_ID, BACKUP_FORMAT_VERSION } from '../../src/fibers/backup';

const { serve, profile } = closedAfterEach();

/** Writes records straight into IndexedDB (no app code), as a library saved earlier holds them. */
async function plantRecords(page: Page, records: Record<string, unknown>[]): Promise<void> {
  await page.evaluate(
    ([dbName, recs]) =>
      new Promise<void>((resolve, reject) => {
        const req = indexedDB.open(dbName);
        req.onerror = () => reject(req.error);
        req.onsuccess = () => {
          const db = req.result;
          const tx = db.transaction('fiberTypes', 'readwrite');
          for (const r of recs) tx.objectStore('fiberTypes').put(r);
          tx.oncomplete = () => {
            db.close();
            resolve();
          };
          tx.onerror = () => reject(tx.error);
        };
      }),
    [DB_NAME, records] as const,
  );
}

function byId(records: StoredRecord[]): Map<string, StoredRecord> {
  return new Map(records.map((r) => [r.id, r]));
}

/** Records in `after` that are not in `before` (by id), and those in `before` missing from `after`. */
function diffIds(before: StoredRecord[], after: StoredRecord[]): { added: StoredRecord[]; removed: StoredRecord[] } {
  const b = byId(before);
  const a = byId(after);
  return { added: after.filter((r) => !b.has(r.id)), removed: before.filter((r) => !a.has(r.id)) };
}

function expectSameRecords(after: StoredRecord[], before: StoredRecord[], when: string): void {
  const summary = (rs: StoredRecord[]) => rs.map((r) => ({ id: r.id, name: r.name, updatedAt: r.updatedAt }));
  expect(summary(after), `${when}: ids, names and change times`).toEqual(summary(before));
  expect(after, `${when}: every field of every record`).toEqual(before);
}

function watchPageErrors(page: Page): string[] {
  const errors: string[] = [];
  page.on('pageerror', (e) => errors.push(`${e.name}: ${e.message}`));
  return errors;
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

function backupText(records: Record<string, unknown>[]): string {
  return JSON.stringify({
    format: BACKUP_FORMAT_ID,
    formatVersion: BACKUP_FORMAT_VERSION,
    exportedAt: '2026-03-01T08:00:00.000Z',
    appVersion: 'issue-13-test',
    recordCount: records.length,
    records,
  });
}

async function chooseBackup(page: Page, name: string, bytes: Buffer): Promise<void> {
  await page.locator('.backup input[type="file"]').setInputFiles({ name, mimeType: 'application/json', buffer: bytes });
}

const T_FILE = Date.UTC(2026, 1, 10, 9, 0, 0);

describe('1. a backup record whose name is already saved for a different fiber', () => {
  const NAME = 'Splice tray 12 — Øst';
  // The same name, another id, another fiber: step-index 50 µm instead of the saved graded 62.5 µm.
  const fromFile = (id: string, over: Record<string, unknown> = {}) => ({
    id,
    name: NAME,
    profile: 'step',
    coreDiameterUm: 50,
    claddingDiameterUm: 125,
    na: 0.2,
    attenuation: [{ wavelengthNm: 850, dbPerKm: 2.7 }],
    notes: 'from the other phone',
    createdAt: T_FILE,
    updatedAt: T_FILE,
    ...over,
  });

  it('the preview names the record and the clash; keep both imports it under a distinct proposed name, skip writes nothing, replace swaps the saved one; the saved type is untouched otherwise', async () => {
    const server = await serve();
    const p = await profile();
    const page = p.page;
    const errors = watchPageErrors(page);
    await openLibrary(page, server.url);
    await page.getByRole('button', { name: 'Add a fiber type' }).click();
    await page.locator('#ff-name').fill(NAME);
    await page.locator('#ff-profile').selectOption('graded');
    await page.locator('#ff-core').fill('62.5');
    await page.locator('#ff-alpha').fill('2');
    await page.locator('#ff-na').fill('0.275');
    await page.getByRole('button', { name: 'Save', exact: true }).click();
    await page.getByText(`Saved “${NAME}”.`).waitFor();
    const before = await storedRecords(page);
    expect(before.map((r) => r.name)).toEqual([NAME]);
    const saved = before[0]!;

    // Keep both (the choice offered first): the file's fiber arrives under a name of its own.
    await chooseBackup(page, 'other-phone.json', Buffer.from(backupText([fromFile('ft_other_a')])));
    const preview = page.locator('.import-preview');
    await preview.waitFor();
    const row = preview.locator('.import-records li', { hasText: NAME });
    await row.first().waitFor();
    const rowText = (await row.first().textContent()) ?? '';
    expect(rowText).toContain(`“${NAME}”`);
    expect(rowText).toMatch(/already the name of a different fiber/);
    // What differs, in the trade's words: profile and core.
    expect(rowText).toMatch(/profile: graded-index → step-index/i);
    // A value and its unit are joined by a no-break space on screen: \s matches it.
    expect(rowText).toMatch(/core diameter: 62\.5\s+µm → 50\s+µm/i);
    const choice = preview.getByLabel(`What to do with “${NAME}”`);
    expect(await choice.inputValue()).toBe('keep-both');
    expect(await choice.locator('option:checked').textContent()).toContain(`“${NAME} (2)”`);
    expect(await preview.textContent()).not.toMatch(/1 new type to add/);
    await page.getByRole('button', { name: 'Import 1 type' }).click();
    await page.getByText('Imported: 1 fiber type written.').waitFor();
    let after = await storedRecords(page);
    let d = diffIds(before, after);
    expect(d.removed).toEqual([]);
    expect(d.added).toHaveLength(1);
    expect(d.added[0]).toEqual({ ...fromFile('ft_other_a'), name: `${NAME} (2)`, nameKey: `${NAME} (2)`.toLowerCase() });
    expect(byId(after).get(saved.id)).toEqual(saved);
    expect(await page.locator('.fiber-list .fiber-name').allTextContents()).toEqual([NAME, `${NAME} (2)`]);

    // Skip: nothing written.
    const step = after;
    await chooseBackup(page, 'other-phone.json', Buffer.from(backupText([fromFile('ft_other_b', { coreDiameterUm: 62.5, na: 0.22 })])));
    await preview.waitFor();
    const choiceB = preview.getByLabel(`What to do with “${NAME}”`);
    expect(await choiceB.locator('option:checked').textContent()).toContain(`“${NAME} (3)”`);
    await choiceB.selectOption('skip');
    expect(await page.getByRole('button', { name: /^Import \d+ types?$/ }).isDisabled()).toBe(true);
    await page.getByRole('button', { name: 'Cancel' }).click();
    expectSameRecords(await storedRecords(page), step, 'after skipping');

    // Replace: the saved type gives way to the file's, and the other entry is untouched.
    await chooseBackup(page, 'other-phone.json', Buffer.from(backupText([fromFile('ft_other_c', { coreDiameterUm: 9, na: 0.13, attenuation: [] })])));
    await preview.waitFor();
    await preview.getByLabel(`What to do with “${NAME}”`).selectOption('replace');
    await page.getByRole('button', { name: 'Import 1 type' }).click();
    await page.getByText('Imported: 1 fiber type written.').waitFor();
    after = await storedRecords(page);
    d = diffIds(step, after);
    expect(d.removed.map((r) => r.id)).toEqual([saved.id]);
    expect(d.added).toEqual([{ ...fromFile('ft_other_c', { coreDiameterUm: 9, na: 0.13, attenuation: [] }), nameKey: NAME.toLowerCase() }]);
    expect(byId(after).get('ft_other_a')).toEqual(byId(step).get('ft_other_a'));
    expect(errors).toEqual([]);
  });

  it('adding or renaming a type by hand to a name already saved warns and writes nothing until the person chooses', async () => {
    const server = await serve();
    const p = await profile();
    const page = p.page;
    const errors = watchPageErrors(page);
    await openLibrary(page, server.url);
    await addStepType(page, NAME, '9', '0.13');
    await addStepType(page, 'Hobb quarry patch', '62.5', '0.275');
    const before = await storedRecords(page);

    // Add: the same name in other case and spacing, for another fiber.
    await fillStepType(page, '  splice TRAY 12 — øst ', '50', '0.2');
    await page.getByRole('button', { name: 'Save', exact: true }).click();
    const warning = page.locator('form.fiber-form .name-clash');
    await warning.waitFor();
    expect(await warning.textContent()).toMatch(new RegExp(`already saved as “${NAME}”`));
    expectSameRecords(await storedRecords(page), before, 'after the warning on add');
    await warning.getByRole('button', { name: `Save as “splice TRAY 12 — øst (2)”` }).click();
    await page.getByText('Saved “splice TRAY 12 — øst (2)”.').waitFor();
    const afterAdd = await storedRecords(page);
    const added = diffIds(before, afterAdd);
    expect(added.removed).toEqual([]);
    expect(added.added).toHaveLength(1);
    expect(added.added[0]).toMatchObject({ name: 'splice TRAY 12 — øst (2)', coreDiameterUm: 50, na: 0.2 });
    for (const r of before) expect(byId(afterAdd).get(r.id)).toEqual(r);

    // Rename: the quarry patch renamed to the tray's name.
    await page.getByRole('button', { name: 'Edit Hobb quarry patch' }).click();
    await page.locator('#ff-name').fill(NAME);
    await page.getByRole('button', { name: 'Save changes' }).click();
    await warning.waitFor();
    expectSameRecords(await storedRecords(page), afterAdd, 'after the warning on rename');
    // Knowingly keeping the same name is allowed: the person decided.
    await warning.getByRole('button', { name: 'Save with the same name anyway' }).click();
    await page.locator('.fiber-list').waitFor();
    const afterRename = await storedRecords(page);
    const quarry = before.find((r) => r.name === 'Hobb quarry patch')!;
    expect(byId(afterRename).get(quarry.id)).toMatchObject({ ...quarry, name: NAME, nameKey: NAME.toLowerCase(), updatedAt: expect.any(Number) });
    for (const r of afterAdd) if (r.id !== quarry.id) expect(byId(afterRename).get(r.id)).toEqual(r);
    expect(errors).toEqual([]);
  });
});

describe('2. a backup that is not UTF-8 text', () => {
  const NAME = 'Tray «Øst» café';
  const record = {
    id: 'ft_latin',
    name: NAME,
    profile: 'step',
    coreDiameterUm: 9,
    claddingDiameterUm: 125,
    na: 0.13,
    attenuation: [],
    notes: 'façade riser',
    createdAt: T_FILE,
    updatedAt: T_FILE,
  };

  it('a Latin-1 file, an empty file and random bytes are each refused in their own words with nothing written; the same backup in UTF-8 keeps every accented letter', async () => {
    const server = await serve();
    const p = await profile();
    const page = p.page;
    const errors = watchPageErrors(page);
    await openLibrary(page, server.url);
    await addStepType(page, 'Marrow Lane drum 1', '9', '0.13');
    const before = await storedRecords(page);
    const status = page.locator('.backup [role="status"]');

    // Bytes of random noise from a fixed generator (a linear congruential sequence, seed 13).
    let seed = 13;
    const noise = Buffer.from(Array.from({ length: 2048 }, () => ((seed = (seed * 1103515245 + 12345) >>> 0) >>> 16) & 0xff));
    const cases: [string, Buffer, RegExp][] = [
      ['Latin-1', Buffer.from(backupText([record]), 'latin1'), /this file is not in the UTF-8 text encoding; export it again from the app/i],
      ['empty', Buffer.alloc(0), /the file is empty/i],
      ['random bytes', noise, /this is not a text file/i],
    ];
    for (const [what, bytes, words] of cases) {
      await chooseBackup(page, `${what}.json`, bytes);
      await expect.poll(() => status.textContent(), { message: what }).toMatch(words);
      expect(await status.textContent(), what).toMatch(/Nothing was imported/);
      expect(await status.textContent(), what).not.toMatch(/damaged or cut off|✓/);
      expect(await page.locator('.import-preview').count(), what).toBe(0);
      expectSameRecords(await storedRecords(page), before, `after the ${what} file`);
    }

    await chooseBackup(page, 'utf8.json', Buffer.from(backupText([record]), 'utf8'));
    await page.getByRole('button', { name: 'Import 1 type' }).click();
    await page.getByText('Imported: 1 fiber type written.').waitFor();
    const after = await storedRecords(page);
    const d = diffIds(before, after);
    expect(d.added).toEqual([{ ...record, nameKey: NAME.toLowerCase() }]);
    expect(await page.locator('.fiber-list .fiber-name').allTextContents()).toContain(NAME);
    expect(errors).toEqual([]);
  });
});

describe('3. the same type edited in two tabs', () => {
  it('the second save is refused with what changed; reloading the other version or overwriting it knowingly are both offered, and nothing is lost silently', async () => {
    const server = await serve();
    const p = await profile();
    const tabA = p.page;
    const errorsA = watchPageErrors(tabA);
    await openLibrary(tabA, server.url);
    await addStepType(tabA, 'Hollin cross drum', '9', '0.13');
    await addStepType(tabA, 'Hollin cross tail', '50', '0.2');
    const tabB = await p.context.newPage();
    const errorsB = watchPageErrors(tabB);
    await openLibrary(tabB, server.url);
    await tabB.locator('.fiber-list').getByText('Hollin cross drum').waitFor();

    // Both tabs open the same type for editing.
    for (const tab of [tabA, tabB]) await tab.getByRole('button', { name: 'Edit Hollin cross drum' }).click();
    await tabA.locator('#ff-core').fill('9.1');
    await tabA.getByRole('button', { name: 'Save changes' }).click();
    await tabA.getByText('Saved “Hollin cross drum”.').waitFor();
    const afterA = await storedRecords(tabA);
    const drum = afterA.find((r) => r.name === 'Hollin cross drum')!;
    expect(drum.coreDiameterUm).toBe(9.1);

    await tabB.locator('#ff-core').fill('8.9');
    await tabB.getByRole('button', { name: 'Save changes' }).click();
    const conflict = tabB.locator('form.fiber-form .edit-conflict');
    await conflict.waitFor();
    expect(await conflict.textContent()).toMatch(/changed in another tab/);
    expect(await conflict.textContent()).toMatch(/core diameter: 9\s+µm → 9\.1\s+µm/i);
    expectSameRecords(await storedRecords(tabB), afterA, 'B refused: A’s edit kept');

    // Reload the other version: the form now holds A's values; nothing is written.
    await conflict.getByRole('button', { name: 'Load the other version' }).click();
    expect(await tabB.locator('#ff-core').inputValue()).toBe('9.1');
    expectSameRecords(await storedRecords(tabB), afterA, 'after loading the other version');
    // Editing from there is no longer a conflict.
    await tabB.locator('#ff-notes').fill('checked against the drum label');
    await tabB.getByRole('button', { name: 'Save changes' }).click();
    await tabB.getByText('Saved “Hollin cross drum”.').waitFor();
    const afterB = await storedRecords(tabB);
    expect(byId(afterB).get(drum.id)).toMatchObject({ ...drum, notes: 'checked against the drum label', updatedAt: expect.any(Number) });
    expect(byId(afterB).get(drum.id)!.updatedAt).toBeGreaterThan(drum.updatedAt);

    // Overwrite knowingly: A edits again while B is editing; B keeps its own values on purpose.
    await tabA.locator('.fiber-list').getByText('Hollin cross drum').waitFor();
    await tabA.getByRole('button', { name: 'Edit Hollin cross drum' }).click();
    await tabB.getByRole('button', { name: 'Edit Hollin cross drum' }).click();
    await tabA.locator('#ff-na').fill('0.14');
    await tabA.getByRole('button', { name: 'Save changes' }).click();
    await tabA.getByText('Saved “Hollin cross drum”.').waitFor();
    const afterA2 = await storedRecords(tabA);
    await tabB.locator('#ff-core').fill('8.9');
    await tabB.getByRole('button', { name: 'Save changes' }).click();
    await conflict.waitFor();
    expect(await conflict.textContent()).toMatch(/NA: 0\.13 → 0\.14/);
    expectSameRecords(await storedRecords(tabB), afterA2, 'second conflict: A’s edit kept until B decides');
    await conflict.getByRole('button', { name: 'Save mine over it' }).click();
    await tabB.getByText('Saved “Hollin cross drum”.').waitFor();
    const final = await storedRecords(tabB);
    expect(byId(final).get(drum.id)).toMatchObject({ coreDiameterUm: 8.9, na: 0.13, notes: 'checked against the drum label' });
    for (const r of afterA2) if (r.id !== drum.id) expect(byId(final).get(r.id)).toEqual(r);
    expect(errorsA).toEqual([]);
    expect(errorsB).toEqual([]);
  });
});

describe('4. a thousand saved types', () => {
  const N = 1000;
  const T0 = Date.UTC(2026, 0, 1);
  // Invented types, two kinds, with names that sort differently from their ids.
  const thousand = Array.from({ length: N }, (_, i) => {
    const graded = i % 3 === 0;
    const name = graded ? `Riser ${i} patch` : `Drum ${i} backbone`;
    return graded
      ? { id: `ft_k${String(i).padStart(4, '0')}`, name, nameKey: name.toLowerCase(), profile: 'graded', gradedAlpha: 2, coreDiameterUm: 50, claddingDiameterUm: 125, na: 0.2, attenuation: [{ wavelengthNm: 850, dbPerKm: 2.5 }], category: 'OM4', notes: `bench record ${i}`, createdAt: T0 + i, updatedAt: T0 + i }
      : { id: `ft_k${String(i).padStart(4, '0')}`, name, nameKey: name.toLowerCase(), profile: 'label', claddingDiameterUm: 125, cutoffWavelengthNm: 1200 + (i % 60), cutoffKind: 'cable', mfdUm: 9.2, mfdWavelengthNm: 1310, attenuation: [], category: 'G.652.D', notes: '', createdAt: T0 + i, updatedAt: T0 + i };
  });
  // The list's promise in words: every word of the query appears in the name, category or notes,
  // ignoring case; matches are listed by name.
  const matches = (q: string) => {
    const words = q.toLowerCase().split(/\s+/).filter(Boolean);
    return thousand.filter((r) => words.every((w) => `${r.name} ${r.category} ${r.notes}`.toLowerCase().includes(w))).map((r) => r.name).sort((a, b) => (a.toLowerCase() < b.toLowerCase() ? -1 : 1));
  };

  it('the list shows a page at a time, every type is reachable by paging and by search, a key in Search sorts nothing, and the library is unchanged', async () => {
    const server = await serve();
    const p = await profile();
    const page = p.page;
    const errors = watchPageErrors(page);
    // Counts sorts of long arrays while the test says so: a search must filter a list already in order.
    await p.context.addInitScript(() => {
      const w = window as unknown as { __countSorts: boolean; __longSorts: number };
      w.__countSorts = false;
      w.__longSorts = 0;
      const sort = Array.prototype.sort;
      Array.prototype.sort = function <T>(this: T[], cmp?: (a: T, b: T) => number) {
        if (w.__countSorts && this.length >= 100) w.__longSorts++;
        return sort.call(this, cmp) as T[];
      };
    });
    await openLibrary(page, server.url);
    await plantRecords(page, thousand);
    const before = await storedRecords(page);
    expect(before).toHaveLength(N);
    await page.reload();
    await waitForScreen(page);
    await page.locator('.fiber-list').waitFor();

    // A page of rows, not a thousand, and the count said in words.
    const rows = page.locator('.fiber-list .fiber-item');
    const firstPage = await rows.count();
    expect(firstPage).toBeGreaterThan(0);
    expect(firstPage).toBeLessThanOrEqual(100);
    expect(await page.locator('#lib-count').textContent()).toMatch(new RegExp(`${N} saved`));

    // Paging reaches every type, in name order, exactly once.
    for (let guard = 0; guard < N; guard++) {
      const more = page.getByRole('button', { name: /^Show \d+ more/ });
      if ((await more.count()) === 0) break;
      await more.click();
    }
    const allNames = await page.locator('.fiber-list .fiber-name').allTextContents();
    expect(allNames).toEqual(matches(''));
    expect(new Set(await rows.evaluateAll((els) => els.map((e) => e.getAttribute('data-fiber-id')))).size).toBe(N);

    // Typing, key by key, and clearing: the list follows, and nothing is sorted on a key.
    const search = page.locator('#lib-search');
    await search.click();
    await page.evaluate(() => ((window as unknown as { __countSorts: boolean }).__countSorts = true));
    for (const q of ['drum 12', 'riser 99', 'om4 bench record 7']) {
      await search.fill('');
      await search.pressSequentially(q, { delay: 20 });
      const want = matches(q);
      await expect.poll(() => page.locator('#lib-count').textContent(), { message: q }).toMatch(new RegExp(`^${want.length} of ${N} match`));
      const shown = await page.locator('.fiber-list .fiber-name').allTextContents();
      expect(shown, q).toEqual(want.slice(0, shown.length));
      expect(shown.length, q).toBe(Math.min(want.length, firstPage));
    }
    await search.press('Control+a');
    await search.press('Backspace');
    await expect.poll(() => page.locator('#lib-count').textContent()).toMatch(new RegExp(`^${N} saved`));
    expect(await page.evaluate(() => (window as unknown as { __longSorts: number }).__longSorts), 'sorts of long lists while typing').toBe(0);
    await page.evaluate(() => ((window as unknown as { __countSorts: boolean }).__countSorts = false));

    // A type far down the list is found by its name.
    for (const i of [0, 499, 998, 999]) {
      const name = thousand[i]!.name;
      await search.fill(name);
      await expect.poll(() => page.locator('.fiber-list .fiber-name').first().textContent(), { message: name }).toBe(name);
    }

    expectSameRecords(await storedRecords(page), before, 'after listing, paging and searching');
    expect(errors).toEqual([]);
  });
});

describe('storage protection and the backup reminder', () => {
  it('persistent storage is asked for after the first save, and the screen says plainly whether the library is protected', async () => {
    const server = await serve();
    const p = await profile();
    await p.context.addInitScript(() => {
      const w = window as unknown as { __persistAsked: number };
      w.__persistAsked = 0;
      const persist = StorageManager.prototype.persist;
      StorageManager.prototype.persist = function (this: StorageManager) {
        w.__persistAsked++;
        return persist.call(this);
      };
    });
    const page = p.page;
    await openLibrary(page, server.url);
    expect(await page.evaluate(() => (window as unknown as { __persistAsked: number }).__persistAsked)).toBe(0);
    await addStepType(page, 'First drum', '9', '0.13');
    await expect.poll(() => page.evaluate(() => (window as unknown as { __persistAsked: number }).__persistAsked)).toBe(1);
    const granted = await page.evaluate(() => navigator.storage.persisted());
    const statement = page.locator('[data-persistence]');
    await expect
      .poll(() => statement.getAttribute('data-persistence'))
      .toBe(granted ? 'granted' : 'not-granted');
    expect(await statement.textContent()).toMatch(granted ? /The library is protected/ : /The library is not protected/);
    // The reminder to keep a backup stays, whatever the browser decided.
    expect(await page.locator('main').textContent()).toMatch(/export a backup/i);
    // A second save does not ask again.
    await addStepType(page, 'Second drum', '9', '0.13');
    await page.waitForTimeout(300);
    expect(await page.evaluate(() => (window as unknown as { __persistAsked: number }).__persistAsked)).toBe(1);
  });
});

describe('choosing a backup file', () => {
  it('a labelled button of at least 44 × 44 px opens the file chooser from the keyboard', async () => {
    const server = await serve();
    const p = await profile();
    const page = p.page;
    await openLibrary(page, server.url);
    const input = page.locator('.backup input[type="file"]');
    // The browser's own control is not shown; the labelled button stands for it.
    expect(await input.evaluate((el) => el.getBoundingClientRect().width <= 1 && el.getBoundingClientRect().height <= 1)).toBe(true);
    const button = page.locator('.backup .library-file-button');
    const box = (await button.boundingBox())!;
    expect(box.width).toBeGreaterThanOrEqual(44);
    expect(box.height).toBeGreaterThanOrEqual(44);
    expect(await input.evaluate((el) => (el as HTMLInputElement).labels?.[0]?.textContent?.trim())).toBe('Import a backup…');
    // The control is enabled once the library has opened its store.
    await expect.poll(() => input.isEnabled()).toBe(true);
    await input.focus();
    // The focus shows on the button a person sees.
    expect(await button.evaluate((el) => getComputedStyle(el).outlineStyle !== 'none' || getComputedStyle(el).boxShadow !== 'none')).toBe(true);
    // Waiting for the chooser makes Playwright ask the browser to intercept it; a round trip to the page
    // after that request makes sure it is in place before the key is pressed, else the key can win the race.
    const chooserShown = page.waitForEvent('filechooser');
    await page.evaluate(() => undefined);
    await page.keyboard.press('Space');
    expect((await chooserShown).isMultiple()).toBe(false);
  });
});
