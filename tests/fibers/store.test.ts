import { beforeEach, describe, expect, it } from 'vitest';
import { EditConflictError, FiberStore, InvalidRecordError, NameClashError, NotFoundError, StoreClosedError } from '../../src/fibers/db';
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

describe('an edit made in two places at once', () => {
  // Two tabs are two connections to one database: the same name opened twice.
  it('the second save, based on a version changed meanwhile, is refused with what changed, and the first edit is kept', async () => {
    const a = await store.add(stepInput({ coreDiameterUm: 9, na: 0.13 }), 1_780_000_000_000);
    // Both tabs read version a; tab 1 saves first.
    const first = await store.update(a.id, stepInput({ coreDiameterUm: 9.1, na: 0.13 }), 1_780_000_100_000, { base: a });
    const err = await store.update(a.id, stepInput({ coreDiameterUm: 8.9, na: 0.13 }), 1_780_000_200_000, { base: a }).catch((e) => e);
    expect(err).toBeInstanceOf(EditConflictError);
    expect((err as EditConflictError).current).toEqual(first);
    expect((err as EditConflictError).changes).toEqual(['Core diameter: 9 µm → 9.1 µm']);
    expect((err as EditConflictError).message).toMatch(/changed in another tab/);
    expect(await store.get(a.id)).toEqual(first);
  });

  it('saving over the other version knowingly (its version as the base) writes, and moves the change time on', async () => {
    const a = await store.add(stepInput(), 1_780_000_000_000);
    const first = await store.update(a.id, stepInput({ notes: 'tab 1' }), 1_780_000_100_000, { base: a });
    const mine = await store.update(a.id, stepInput({ notes: 'tab 2' }), 1_780_000_200_000, { base: first });
    expect(mine).toMatchObject({ notes: 'tab 2', updatedAt: 1_780_000_200_000 });
    expect(await store.get(a.id)).toEqual(mine);
  });

  it('the change time moves forward on every save even when the clock does not (or goes back), so a version is never taken for another', async () => {
    const a = await store.add(stepInput(), 1_780_000_000_000);
    const b = await store.update(a.id, stepInput({ notes: 'one' }), 1_780_000_000_000);
    const c = await store.update(a.id, stepInput({ notes: 'two' }), 1_779_999_000_000);
    expect(b.updatedAt).toBe(a.updatedAt + 1);
    expect(c.updatedAt).toBe(b.updatedAt + 1);
    await expect(store.update(a.id, stepInput({ notes: 'stale' }), 1_780_000_000_000, { base: b })).rejects.toBeInstanceOf(EditConflictError);
  });

  it('a change of content under the same change time (an import replacing the library) is still caught', async () => {
    const a = await store.add(stepInput(), 1_780_000_000_000);
    await store.applyRecords([{ ...a, na: 0.12 }], 'replace');
    const err = await store.update(a.id, stepInput({ notes: 'mine' }), 1_780_000_100_000, { base: a }).catch((e) => e);
    expect(err).toBeInstanceOf(EditConflictError);
    expect((err as EditConflictError).changes).toEqual(['NA: 0.14 → 0.12']);
  });

  it('a type deleted in the other tab while this one edits it: refused as before, nothing written', async () => {
    const a = await store.add(stepInput());
    await store.delete(a.id);
    await expect(store.update(a.id, stepInput({ notes: 'late' }), Date.now(), { base: a })).rejects.toBeInstanceOf(NotFoundError);
    expect(await store.count()).toBe(0);
  });
});

describe('a name already saved, on add and on rename', () => {
  it('adding a type under a name already saved (other case and spacing) is refused with a proposed name, and nothing is written', async () => {
    const a = await store.add(stepInput({ name: 'Splice tray 12 — Øst' }));
    await store.add(stepInput({ name: 'splice tray 12 — øst (2)' }));
    const err = await store.add(gradedInput({ name: '  SPLICE tray   12 — Øst ' }), Date.now(), { refuseSameName: true }).catch((e) => e);
    expect(err).toBeInstanceOf(NameClashError);
    expect((err as NameClashError).existing).toEqual(a);
    expect((err as NameClashError).proposedName).toBe('SPLICE tray   12 — Øst (3)');
    expect(await store.count()).toBe(2);
  });

  it('kept on purpose (no refusal asked), the same name is saved', async () => {
    await store.add(stepInput({ name: 'Tray 7' }));
    await store.add(gradedInput({ name: 'tray 7' }));
    expect((await store.list()).map((r) => r.name)).toEqual(['Tray 7', 'tray 7']);
  });

  it('renaming to a name another type has is refused; editing other fields of a type that already shares a name is not', async () => {
    const a = await store.add(stepInput({ name: 'Tray 7' }));
    const b = await store.add(gradedInput({ name: 'Tray 8' }));
    await expect(store.update(b.id, gradedInput({ name: 'TRAY 7' }), Date.now(), { refuseSameName: true, base: b })).rejects.toBeInstanceOf(NameClashError);
    expect(await store.get(b.id)).toEqual(b);
    const twin = await store.add(stepInput({ name: 'tray 7' }));
    await expect(store.update(twin.id, stepInput({ name: 'tray 7', notes: 'checked' }), Date.now(), { refuseSameName: true, base: twin })).resolves.toMatchObject({ notes: 'checked' });
    await expect(store.update(a.id, stepInput({ name: 'Tray 7' }), Date.now(), { refuseSameName: true })).resolves.toMatchObject({ id: a.id });
  });
});
