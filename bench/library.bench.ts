// Fiber library (issues 5 and 13): listing 1,000 saved types, searching them, importing 1,000 records.
// Runs in Node over fake-indexeddb (an in-memory IndexedDB written in JS), not a browser's IndexedDB,
// and measures the data path only: no DOM render, since no string renderer for Preact is installed.
// "Listing" = read all through the store + search/sort + the per-row text and check the list shows.
// The harness's benchSync is synchronous; IndexedDB is not, so this file times its own awaited
// calls with the same rules (warm-up, ≥ 20 samples, median) and prints through the same table.
import 'fake-indexeddb/auto';
import { IDBFactory } from 'fake-indexeddb';
import { benchSync, formatMs, parseGoalMs, printRow, quantile, results } from './harness';
import { FiberStore } from '../src/fibers/db';
import { applyImport, exportLibrary, planImport, readBackup } from '../src/fibers/backup';
import { buildIndex, filterAndSort, PAGE_ROWS, rowFacts, search } from '../src/features/library/query';
import { validateRecord } from '../src/fibers/validate';
import type { FiberType, FiberTypeInput } from '../src/fibers/model';

const N = 1000;
const T0 = Date.UTC(2026, 0, 1);

function input(i: number): FiberTypeInput {
  const graded = i % 3 === 0;
  return graded
    ? { name: `Riser ${i} patch`, profile: 'graded', gradedAlpha: 2, coreDiameterUm: 50, claddingDiameterUm: 125, na: 0.2, attenuation: [{ wavelengthNm: 850, dbPerKm: 2.5 + (i % 7) / 10 }], category: 'OM4', notes: `bench record ${i}` }
    : { name: `Drum ${i} backbone`, profile: 'label', claddingDiameterUm: 125, cutoffWavelengthNm: 1200 + (i % 60), cutoffKind: 'cable', mfdUm: 8.8 + (i % 8) / 10, mfdWavelengthNm: 1310, attenuation: [{ wavelengthNm: 1310, dbPerKm: 0.34 }, { wavelengthNm: 1550, dbPerKm: 0.2 }], category: 'G.652.D', notes: '' };
}

const RECORDS: FiberType[] = Array.from({ length: N }, (_, i) => {
  const v = validateRecord({ ...input(i), id: `ft_bench_${String(i).padStart(4, '0')}`, createdAt: T0 + i, updatedAt: T0 + i });
  if (!v.ok) throw new Error(`bench record ${i} invalid: ${JSON.stringify(v.errors)}`);
  return v.value;
});
const BACKUP_TEXT = exportLibrary(RECORDS, { nowMs: T0, appVersion: 'bench' });

async function benchAsync(name: string, fn: () => Promise<unknown>, goal: string, minRuns = 20, minTimeMs = 1000): Promise<void> {
  const warmStart = performance.now();
  for (let i = 0; i < 3 || performance.now() - warmStart < 200; i++) await fn();
  const samples: number[] = [];
  const start = performance.now();
  while (samples.length < minRuns || performance.now() - start < minTimeMs) {
    const t0 = performance.now();
    await fn();
    samples.push(performance.now() - t0);
    if (performance.now() - start > 20_000 && samples.length >= 5) break;
  }
  samples.sort((a, b) => a - b);
  const goalMs = parseGoalMs(goal);
  const medianMs = quantile(samples, 0.5);
  const r = { name, medianMs, p90Ms: quantile(samples, 0.9), runs: samples.length, goal, goalMs, ratio: medianMs / goalMs };
  results.push(r);
  printRow({ name, median: formatMs(r.medianMs), p90: formatMs(r.p90Ms), runs: String(r.runs), goal, ratio: `${r.ratio.toFixed(2)}${r.ratio > 1 ? ' over' : ''}` });
}

globalThis.indexedDB = new IDBFactory();
const listStore = await FiberStore.open({ name: 'bench-list' });
await listStore.applyRecords(RECORDS, 'replace');

await benchAsync(
  'library: list 1,000 saved types (read + index + first page of rows)',
  async () => {
    const index = buildIndex(await listStore.list());
    let chars = 0;
    // A fresh copy of each shown record, so the per-row facts are computed, not found kept.
    for (const t of index.byName.slice(0, PAGE_ROWS)) chars += rowFacts({ ...t.record }).description.length + t.record.name.length;
    return chars;
  },
  '≤ 50 ms',
);

await benchAsync(
  'library: search 1,000 saved types for "drum 12"',
  async () => filterAndSort(await listStore.list(), 'drum 12', 'recent').length,
  '≤ 50 ms',
);

// What one key in Search costs once the library is loaded: the index is built when the records
// change (timed separately), a key only filters it. The browser figure (bench/browser.ts) adds the render.
const LOADED = await listStore.list();
listStore.close();
benchSync('library: build the search index of 1,000 types (per change)', () => buildIndex(LOADED).size, { goal: '≤ 50 ms' });
const INDEX = buildIndex(LOADED);
const KEYS = ['d', 'dr', 'dru', 'drum', 'drum ', 'drum 1', 'drum 12', 'drum 1', 'drum ', 'drum', ''];
let k = 0;
benchSync('library: one key in Search over 1,000 types (index built)', () => search(INDEX, KEYS[k++ % KEYS.length]!, 'name').length, { goal: '≤ 5 ms' });

const importStore = await FiberStore.open({ name: 'bench-import' });
await benchAsync(
  'library: import a 1,000-record backup (read, check, plan, write)',
  async () => {
    const parsed = readBackup(BACKUP_TEXT);
    if (!parsed.ok) throw new Error(parsed.reason);
    const plan = planImport(parsed, await importStore.list(), 'replace');
    const res = await applyImport(importStore, plan);
    if (!res.ok || res.written !== N) throw new Error(res.message);
  },
  '≤ 500 ms',
  10,
  2000,
);
importStore.close();
