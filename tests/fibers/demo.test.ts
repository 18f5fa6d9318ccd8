import { beforeEach, describe, expect, it } from 'vitest';
import { FiberStore } from '../../src/fibers/db';
import { DEMO_TYPES, demoRecords, loadDemoLibrary } from '../../src/fibers/demo';
import { freshIndexedDb, stepInput, uniqueDbName } from './helpers';

let store: FiberStore;
beforeEach(async () => {
  freshIndexedDb();
  store = await FiberStore.open({ name: uniqueDbName() });
  return () => store.close();
});

describe('demo library', () => {
  it('a new library holds no demo data until asked', async () => {
    expect(await store.count()).toBe(0);
  });

  it('every demo type is a valid record and says it is invented', () => {
    const recs = demoRecords();
    expect(recs).toHaveLength(DEMO_TYPES.length);
    for (const r of recs) expect(r.notes).toMatch(/invented scenario/);
  });

  it('loading it adds the demo types next to the person’s own, and loading again adds nothing', async () => {
    const own = await store.add(stepInput({ name: 'My own spool' }));
    const first = await loadDemoLibrary(store);
    expect(first).toMatchObject({ ok: true, written: DEMO_TYPES.length });
    const second = await loadDemoLibrary(store);
    expect(second).toMatchObject({ ok: true, written: 0 });
    expect(await store.count()).toBe(DEMO_TYPES.length + 1);
    expect(await store.get(own.id)).toEqual(own);
  });

  it('a demo type the person edited is not overwritten by loading the demo again', async () => {
    await loadDemoLibrary(store, Date.now() - 10_000);
    const r = (await store.get('demo_wxpr'))!;
    const { id, createdAt: _c, updatedAt: _u, nameKey: _n, ...input } = r;
    await store.update(id, { ...input, notes: 'my edit' }, Date.now() - 5_000);
    await loadDemoLibrary(store);
    expect((await store.get('demo_wxpr'))?.notes).toBe('my edit');
  });
});
