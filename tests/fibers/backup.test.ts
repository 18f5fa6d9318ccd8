import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { FiberStore, StorageFullError } from '../../src/fibers/db';
import {
  applyImport,
  decodeBackup,
  EMPTY_FILE_TEXT,
  NOT_TEXT_TEXT,
  NOT_UTF8_TEXT,
  proposeDistinctName,
  readBackupBytes,
  sameName,
  UTF16_TEXT,
  BACKUP_FORMAT_ID,
  BACKUP_FORMAT_VERSION,
  exportLibrary,
  MAX_BACKUP_BYTES,
  planImport,
  readBackup,
  type ParsedBackup,
  type Refusal,
} from '../../src/fibers/backup';
import type { FiberType } from '../../src/fibers/model';
import { freshIndexedDb, gradedInput, labelInput, record, stepInput, T0, uniqueDbName } from './helpers';

let store: FiberStore;
beforeEach(async () => {
  freshIndexedDb();
  store = await FiberStore.open({ name: uniqueDbName() });
  await store.add(stepInput({ name: 'Existing A' }), T0);
  await store.add(gradedInput({ name: 'Existing B' }), T0);
});
afterEach(() => store.close());

function ok(p: ParsedBackup | Refusal): ParsedBackup {
  if (!p.ok) throw new Error(`expected a readable backup, got refusal: ${p.reason}`);
  return p;
}

function file(records: unknown[], over: Record<string, unknown> = {}): string {
  return JSON.stringify({ format: BACKUP_FORMAT_ID, formatVersion: BACKUP_FORMAT_VERSION, exportedAt: '2026-06-01T08:00:00.000Z', appVersion: 't', recordCount: records.length, records, ...over });
}

/** Tries the whole import path as the screen does; returns what the person is told. */
async function tryImport(text: string, mode: 'merge' | 'replace' = 'merge') {
  const parsed = readBackup(text);
  if (!parsed.ok) return { refused: parsed.reason };
  const plan = planImport(parsed, await store.list(), mode);
  return { plan, result: await applyImport(store, plan) };
}

describe('export then import gives back the same library', () => {
  it('round trip into an empty library is identical field by field', async () => {
    await store.add(labelInput({ name: 'Drum 12', coreDiameterUm: 8.3, notes: 'line one\nline two' }), T0 + 10);
    await store.add(stepInput({ name: 'With indices', na: undefined, coreIndex: 1.4504, claddingIndex: 1.4447 }), T0 + 20);
    const before = await store.list();
    const text = exportLibrary(before, { nowMs: T0, appVersion: '0.1.0' });
    const other = await FiberStore.open({ name: uniqueDbName() });
    const parsed = ok(readBackup(text));
    expect(parsed.rejected).toEqual([]);
    const res = await applyImport(other, planImport(parsed, [], 'replace'));
    expect(res.ok).toBe(true);
    expect(await other.list()).toEqual(before);
    other.close();
  });

  it('the exported file says what it is and which format version', () => {
    const f = JSON.parse(exportLibrary([], { nowMs: T0, appVersion: '0.1.0' }));
    expect(f).toEqual({ format: 'modewright.fiber-library', formatVersion: 1, exportedAt: '2026-06-01T08:00:00.000Z', appVersion: '0.1.0', recordCount: 0, records: [] });
  });

  it('importing the library’s own backup again changes nothing', async () => {
    const before = await store.list();
    const { plan, result } = await tryImport(exportLibrary(before, { appVersion: 't' }));
    expect(plan!.unchanged.length).toBe(2);
    expect(plan!.toWrite).toEqual([]);
    expect(result!.ok).toBe(true);
    expect(await store.list()).toEqual(before);
  });
});

describe('a bad file is refused or reported, and the library is unchanged', () => {
  const valid = record({ id: 'ft_new1' }, stepInput({ name: 'From file' }));
  const exported = () => exportLibrary([valid], { appVersion: 't' });
  const CASES: [string, () => string, RegExp | 'partial'][] = [
    ['a truncated file', () => exported().slice(0, 120), /damaged or cut off/],
    ['an empty file', () => '', /The file is empty/],
    ['a file of only spaces and line breaks', () => ' \n\r\n ', /The file is empty/],
    ['JSON that is a list, not a backup', () => '[1,2,3]', /not a fiber library backup/],
    ['a JSON file of another kind', () => JSON.stringify({ hello: 'world' }), /format marker/],
    ['records that are not a list', () => file([], { records: { a: 1 } }), /no list of fiber types/],
    ['a format version that is text', () => file([valid], { formatVersion: '1' }), /no valid format version/],
    ['format version 0', () => file([valid], { formatVersion: 0 }), /no valid format version/],
    ['a future format version', () => file([valid], { formatVersion: BACKUP_FORMAT_VERSION + 1 }), /newer version of the app/],
    ['a 10 MB file', () => file([{ ...valid, notes: 'x'.repeat(10 * 1024 * 1024) }]), /too large/],
    ['a file just over the limit in multi-byte characters', () => file([valid], { pad: 'µ'.repeat(MAX_BACKUP_BYTES / 2 + 10) }), /too large/],
  ];

  it.each(CASES)('%s', async (_what, make, expected) => {
    const before = await store.list();
    const out = await tryImport(make());
    expect(out.refused).toMatch(expected as RegExp);
    expect(out.refused).toMatch(/Nothing was imported/);
    expect(await store.list()).toEqual(before);
  });

  it.each([
    ['wrong types in a record', { ...valid, id: 'ft_bad1', coreDiameterUm: '8.2' }, /core diameter must be a number/],
    ['a script tag in a name', { ...valid, id: 'ft_bad2', name: '<script>alert(1)</script>' }, /looks like markup/],
    ['an image tag with a handler in a name', { ...valid, id: 'ft_bad3', name: '<img src=x onerror=alert(1)>' }, /looks like markup/],
    ['a record that is not an object', 'just text', /not a fiber type record/],
  ])('%s: that record is refused and reported, the good ones imported', async (_what, bad, problem) => {
    const before = await store.list();
    const good = record({ id: 'ft_good' }, gradedInput({ name: 'Good one' }));
    const { plan, result } = await tryImport(file([good, bad]));
    expect(plan!.rejected).toHaveLength(1);
    expect(plan!.rejected[0].position).toBe(2);
    expect(plan!.rejected[0].problems.join(' ')).toMatch(problem);
    expect(result!.ok).toBe(true);
    const after = await store.list();
    expect(after.map((r) => r.id).sort()).toEqual([...before.map((r) => r.id), 'ft_good'].sort());
    for (const r of before) expect(after.find((a) => a.id === r.id)).toEqual(r);
  });

  it('duplicated ids in one file: the first is imported, the copies reported', async () => {
    const a = record({ id: 'ft_dup' }, stepInput({ name: 'First copy' }));
    const b = record({ id: 'ft_dup' }, stepInput({ name: 'Second copy' }));
    const { plan } = await tryImport(file([a, b, b]));
    expect(plan!.added).toEqual(['First copy']);
    expect(plan!.rejected.map((r) => r.position)).toEqual([2, 3]);
    expect(plan!.rejected[0].problems[0]).toMatch(/same id as fiber type 1/);
    expect((await store.get('ft_dup'))?.name).toBe('First copy');
  });

  it('a file whose every record is bad writes nothing', async () => {
    const before = await store.list();
    const { plan, result } = await tryImport(file([{ id: 'x' }, { name: 5 }]));
    expect(plan!.rejected).toHaveLength(2);
    expect(result!.written).toBe(0);
    expect(await store.list()).toEqual(before);
  });

  it('a write failing half-way (storage full) leaves the library exactly as it was', async () => {
    const before = await store.list();
    const many = Array.from({ length: 20 }, (_, i) => record({ id: `ft_m${i}` }, stepInput({ name: `Many ${i}` })));
    const plan = planImport(ok(readBackup(file(many))), before, 'replace');
    // fake-indexeddb's object store class, as installed on globalThis by 'fake-indexeddb/auto'.
    const proto = (globalThis as unknown as { IDBObjectStore: { prototype: { put: (...a: unknown[]) => unknown } } }).IDBObjectStore.prototype;
    const realPut = proto.put;
    let calls = 0;
    const spy = vi.spyOn(proto, 'put').mockImplementation(function (this: unknown, ...args: unknown[]) {
      calls += 1;
      if (calls === 10) throw new DOMException('quota', 'QuotaExceededError');
      return realPut.apply(this, args);
    });
    const res = await applyImport(store, plan);
    spy.mockRestore();
    expect(calls).toBe(10);
    expect(res.ok).toBe(false);
    expect(res.message).toMatch(/left exactly as it was/);
    expect(res.message).toContain(new StorageFullError().message);
    expect(await store.list()).toEqual(before);
  });
});

describe('merge and replace', () => {
  it('merge adds new types, updates from newer copies, keeps the library’s copy otherwise, and skips the same fiber under another id', async () => {
    const [a, b] = await store.list(); // Existing A, Existing B
    const newer = { ...a, notes: 'edited on the other phone', updatedAt: a.updatedAt + 1000 };
    const older = { ...b, notes: 'stale copy' }; // same change time: not newer, so the library's copy stays
    const twin = { ...a, id: 'ft_twin' };
    const fresh = record({ id: 'ft_fresh' }, labelInput({ name: 'Fresh one' }));
    const { plan, result } = await tryImport(file([newer, older, twin, fresh]));
    expect(plan).toMatchObject({ added: ['Fresh one'], updated: ['Existing A'], keptNewer: ['Existing B'], sameAsExisting: [{ name: 'Existing A', existingName: 'Existing A' }] });
    expect(result!.written).toBe(2);
    expect((await store.get(a.id))?.notes).toBe('edited on the other phone');
    expect(await store.get(b.id)).toEqual(b);
    expect(await store.get('ft_twin')).toBeUndefined();
  });

  it('replace leaves exactly the file’s types and says which are removed', async () => {
    const fresh = record({ id: 'ft_only' }, labelInput({ name: 'Only one' }));
    const { plan } = await tryImport(file([fresh]), 'replace');
    expect(plan!.removed.sort()).toEqual(['Existing A', 'Existing B']);
    expect((await store.list()).map((r) => r.id)).toEqual(['ft_only']);
  });

  it('names in the report are cut, never interpreted', async () => {
    const long = record({ id: 'ft_long' }, stepInput({ name: 'x'.repeat(200) }));
    const { plan } = await tryImport(file([long]));
    expect(plan!.rejected[0].name).toBe('x'.repeat(60) + '…');
  });
});

describe('a file that is not UTF-8 text is refused in its own words, and the library is unchanged', () => {
  const NAME = 'Tray «Øst» café';
  const text = () => file([record({ id: 'ft_enc' }, stepInput({ name: NAME, notes: 'façade riser' }))]);
  // Bytes of noise from a fixed linear congruential generator (Numerical Recipes constants), seed 13.
  const noise = (n: number) => {
    let seed = 13;
    return Uint8Array.from({ length: n }, () => ((seed = (seed * 1664525 + 1013904223) >>> 0) >>> 24) & 0xff);
  };
  const CASES: [string, () => Uint8Array, string, RegExp][] = [
    // Latin-1 (ISO 8859-1): « Ø » é are single bytes 0xAB 0xD8 0xBB 0xE9, invalid as UTF-8.
    ['a backup saved again as Latin-1', () => Uint8Array.from(Buffer.from(text(), 'latin1')), NOT_UTF8_TEXT, /not in the UTF-8 text encoding; export it again from the app/],
    ['a backup saved again as UTF-16 with its byte-order mark', () => Uint8Array.from(Buffer.from('\ufeff' + text(), 'utf16le')), UTF16_TEXT, /UTF-16 text encoding, not UTF-8/],
    ['a backup saved again as UTF-16 (big-endian) without a byte-order mark', () => Uint8Array.from(Buffer.from(text(), 'utf16le').swap16()), UTF16_TEXT, /UTF-16 text encoding, not UTF-8/],
    ['an empty file', () => new Uint8Array(0), EMPTY_FILE_TEXT, /The file is empty/],
    ['random bytes', () => noise(4096), NOT_TEXT_TEXT, /This is not a text file/],
    ['a PNG picture’s first bytes', () => Uint8Array.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a, 0, 0, 0, 0x0d, 0x49, 0x48, 0x44, 0x52]), NOT_TEXT_TEXT, /This is not a text file/],
  ];

  it.each(CASES)('%s', async (_what, bytes, words, pattern) => {
    const before = await store.list();
    const res = readBackupBytes(bytes());
    expect(res.ok).toBe(false);
    const reason = (res as Refusal).reason;
    expect(reason).toBe(words);
    expect(reason).toMatch(pattern);
    expect(reason).toMatch(/Nothing was imported/);
    expect(reason).not.toMatch(/damaged or cut off/);
    expect(await store.list()).toEqual(before);
  });

  it('the four refusals are four different sentences', () => {
    expect(new Set([EMPTY_FILE_TEXT, NOT_UTF8_TEXT, UTF16_TEXT, NOT_TEXT_TEXT]).size).toBe(4);
  });

  it('the same backup in UTF-8, with or without the byte-order mark some editors add, keeps every accented letter', async () => {
    for (const bom of ['', '\ufeff']) {
      const decoded = decodeBackup(Uint8Array.from(Buffer.from(bom + text(), 'utf8')));
      expect(decoded).toEqual({ ok: true, text: text() });
      const parsed = ok(readBackupBytes(Uint8Array.from(Buffer.from(bom + text(), 'utf8'))));
      expect(parsed.valid.map((r) => [r.name, r.notes])).toEqual([[NAME, 'façade riser']]);
    }
  });
});

describe('a record whose name is already saved for a different fiber', () => {
  // Existing A is step-index 8.2 µm, NA 0.14 (helpers.stepInput).
  const clashing = (id: string, over = {}) => record({ id, updatedAt: T0 + 5 }, gradedInput({ name: 'existing a', ...over }));

  it('is not counted as a new type: the plan names it, says what differs, and proposes a distinct name', async () => {
    const { plan } = await tryImport(file([clashing('ft_c1')]));
    expect(plan!.added).toEqual([]);
    expect(plan!.clashes).toHaveLength(1);
    const c = plan!.clashes[0]!;
    expect(c).toMatchObject({ position: 1, existingInFile: false, proposedName: 'existing a (2)', choice: 'keep-both' });
    expect(c.existing.name).toBe('Existing A');
    expect(c.differences).toEqual(expect.arrayContaining(['Profile: step-index → graded-index', 'Core diameter: 8.2 µm → 50 µm', 'NA: 0.14 → 0.2']));
    expect(plan!.records.map((r) => [r.position, r.name, r.fate])).toEqual([[1, 'existing a', 'clash']]);
  });

  it('keep both (the default) imports it under the proposed name; the saved one is untouched', async () => {
    const before = await store.list();
    const { result } = await tryImport(file([clashing('ft_c1')]));
    expect(result!.written).toBe(1);
    const after = await store.list();
    for (const r of before) expect(after.find((a) => a.id === r.id)).toEqual(r);
    expect(await store.get('ft_c1')).toEqual({ ...clashing('ft_c1'), name: 'existing a (2)', nameKey: 'existing a (2)' });
  });

  it('skip writes nothing; replace removes the saved one and writes the file’s, in one transaction', async () => {
    const before = await store.list();
    const a = before.find((r) => r.name === 'Existing A')!;
    const parsed = ok(readBackup(file([clashing('ft_c1')])));
    const skip = planImport(parsed, before, 'merge', { ft_c1: 'skip' });
    expect(skip.toWrite).toEqual([]);
    expect((await applyImport(store, skip)).written).toBe(0);
    expect(await store.list()).toEqual(before);
    const replace = planImport(parsed, before, 'merge', { ft_c1: 'replace' });
    expect(replace.toDelete).toEqual([a.id]);
    await applyImport(store, replace);
    expect(await store.get(a.id)).toBeUndefined();
    expect(await store.get('ft_c1')).toEqual({ ...clashing('ft_c1'), nameKey: 'existing a' });
    expect(await store.count()).toBe(before.length);
  });

  it('a proposed name is free in the library and in the file; two clashes in one file get two names', async () => {
    const inFile = record({ id: 'ft_c3' }, labelInput({ name: 'Existing A (2)' }));
    const plan = planImport(ok(readBackup(file([clashing('ft_c1'), clashing('ft_c2', { coreDiameterUm: 62.5 }), inFile]))), await store.list(), 'merge');
    expect(plan.clashes.map((c) => c.proposedName)).toEqual(['existing a (3)', 'existing a (4)']);
    // The first is kept under a new name, so the name still belongs to the saved type for the second.
    expect(plan.clashes.map((c) => c.existing.name)).toEqual(['Existing A', 'Existing A']);
  });

  it('two records of the file with the same name: the second can be kept under another name or skipped, not replace the first', async () => {
    const one = record({ id: 'ft_f1' }, labelInput({ name: 'Drum 40' }));
    const two = record({ id: 'ft_f2' }, labelInput({ name: 'DRUM  40', mfdUm: 9.4 }));
    const plan = planImport(ok(readBackup(file([one, two]))), await store.list(), 'merge', { ft_f2: 'replace' });
    expect(plan.added).toEqual(['Drum 40']);
    expect(plan.clashes).toHaveLength(1);
    expect(plan.clashes[0]).toMatchObject({ existingInFile: true, choice: 'keep-both', proposedName: 'DRUM  40 (2)' });
    expect(plan.clashes[0]!.differences).toEqual(['Mode field diameter: 9.2 µm → 9.4 µm']);
  });

  it('the same fiber under the same name and another id is still a duplicate, skipped (no choice needed)', async () => {
    const [a] = await store.list();
    const { plan } = await tryImport(file([{ ...a, id: 'ft_twin2', name: '  existing   A ' }]));
    expect(plan!.clashes).toEqual([]);
    expect(plan!.sameAsExisting).toEqual([{ name: 'existing   A', existingName: 'Existing A' }]);
  });

  it('sameName ignores case, spacing and compatible characters; proposals fit the 80-character limit', () => {
    expect(sameName('Splice tray 12 — Øst', '  splice TRAY  12 — øst')).toBe(true);
    expect(sameName('Tray 1', 'Tray 1 ')).toBe(true);
    expect(sameName('Tray 1', 'Tray 11')).toBe(false);
    expect(sameName('Ｔray 1', 'Tray 1')).toBe(true); // fullwidth Ｔ is compatible with T (NFKC)
    const long = 'x'.repeat(80);
    const p = proposeDistinctName(long, new Set([long]));
    expect(p).toBe('x'.repeat(76) + ' (2)');
    expect(p.length).toBe(80);
    expect(proposeDistinctName('Tray', new Set(['tray', 'tray (2)', 'tray (3)']))).toBe('Tray (4)');
  });
});

// Keep the type import used even when a case list is edited.
export type _Unused = FiberType;
