import { beforeEach, describe, expect, it } from 'vitest';
import { FiberStore, InvalidRecordError, NotFoundError, StoreClosedError } from '../../src/fibers/db';
import { freshIndexedDb, gradedInput, labelInput, stepInput, uniqueDbName } from './helpers';

let store: FiberStore;
beforeEach(async () => {
  freshIndexedDb();
  store = await FiberStore.open({ name: uniqueDbName() });
  return () => store.close();
});

describe('saving fiber types', () => {
  it.each([
    ['a step-index type', stepInput()],
    ['a graded-index OM3 type', gradedInput()],
    ['a type entered from its label', labelInput()],
  ])('%s is saved and read back field by field', async (_what, input) => {
    const saved = await store.add(input, 1_780_000_000_000);
    const back = await store.get(saved.id);
    expect(back).toEqual(saved);
    for (const [k, v] of Object.entries(input)) expect(back?.[k as keyof typeof back], k).toEqual(v);
    expect(back?.createdAt).toBe(1_780_000_000_000);
    expect(back?.updatedAt).toBe(1_780_000_000_000);
  });

  it('each saved type gets its own id', async () => {
    const a = await store.add(stepInput());
    const b = await store.add(stepInput());
    expect(a.id).not.toBe(b.id);
    expect(await store.count()).toBe(2);
  });

  it('the list is sorted by name, whatever the case', async () => {
    for (const name of ['tray B', 'Alpha drum', 'cable 7', 'Beta spool']) await store.add(stepInput({ name }));
    expect((await store.list()).map((r) => r.name)).toEqual(['Alpha drum', 'Beta spool', 'cable 7', 'tray B']);
  });

  it('an edit keeps the id and creation time and moves the change time', async () => {
    const a = await store.add(stepInput(), 1_780_000_000_000);
    const b = await store.update(a.id, stepInput({ name: 'Renamed', na: 0.13 }), 1_780_000_500_000);
    expect(b).toMatchObject({ id: a.id, createdAt: a.createdAt, updatedAt: 1_780_000_500_000, name: 'Renamed', na: 0.13 });
    expect(await store.get(a.id)).toEqual(b);
  });

  it('editing a type deleted meanwhile says so and writes nothing', async () => {
    await expect(store.update('ft_gone', stepInput())).rejects.toBeInstanceOf(NotFoundError);
    expect(await store.count()).toBe(0);
  });

  it('a delete returns the record, and undo puts it back exactly', async () => {
    const a = await store.add(gradedInput());
    const gone = await store.delete(a.id);
    expect(gone).toEqual(a);
    expect(await store.get(a.id)).toBeUndefined();
    await store.restore(gone!);
    expect(await store.get(a.id)).toEqual(a);
  });

  it('deleting an id that is not there changes nothing', async () => {
    await store.add(stepInput());
    expect(await store.delete('ft_nothing')).toBeUndefined();
    expect(await store.count()).toBe(1);
  });

  it('an invalid type is refused with the field named, and nothing is written', async () => {
    const err = await store.add(stepInput({ na: 1.4 })).catch((e) => e);
    expect(err).toBeInstanceOf(InvalidRecordError);
    expect(Object.keys((err as InvalidRecordError).errors)).toEqual(['na']);
    expect(await store.count()).toBe(0);
  });

  it('an invalid edit leaves the saved record as it was', async () => {
    const a = await store.add(stepInput());
    await expect(store.update(a.id, stepInput({ coreDiameterUm: -3 }))).rejects.toBeInstanceOf(InvalidRecordError);
    expect(await store.get(a.id)).toEqual(a);
  });

  it('listeners hear about each change', async () => {
    let heard = 0;
    const off = store.subscribe(() => heard++);
    const a = await store.add(stepInput());
    await store.update(a.id, stepInput({ name: 'x' }));
    await store.delete(a.id);
    off();
    await store.add(stepInput());
    expect(heard).toBe(3);
  });

  it('a closed library refuses work with a reason instead of failing silently', async () => {
    store.close();
    await expect(store.list()).rejects.toBeInstanceOf(StoreClosedError);
  });
});
