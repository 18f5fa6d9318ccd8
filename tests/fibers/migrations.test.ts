// Every migration from every earlier schema version, with the data checked field by field.
// Old records are written with the old schema exactly as that version of the app wrote them.
import { beforeEach, describe, expect, it } from 'vitest';
import { FiberStore, openRaw, SCHEMA_VERSION, type FiberTypeV1, type FiberTypeV2, type StoreStatus } from '../../src/fibers/db';
import { freshIndexedDb, T0, uniqueDbName } from './helpers';

const V1_RECORDS: FiberTypeV1[] = [
  {
    id: 'v1_step',
    name: '  Yard Spool   4 ',
    profile: 'step',
    coreDiameterUm: 8.2,
    claddingDiameterUm: 125,
    na: 0.14,
    attenuationDbPerKm: 0.21,
    attenuationWavelengthNm: 1550,
    category: 'G.652.D',
    notes: 'north yard',
    createdAt: T0,
    updatedAt: T0 + 1000,
  },
  {
    id: 'v1_graded',
    name: 'Riser OM1',
    profile: 'graded',
    coreDiameterUm: 62.5,
    claddingDiameterUm: 125,
    na: 0.275,
    notes: '',
    createdAt: T0,
    updatedAt: T0,
  },
  {
    id: 'v1_label',
    name: 'Drum 12',
    profile: 'label',
    claddingDiameterUm: 125,
    cutoffWavelengthNm: 1250,
    cutoffKind: 'cable',
    mfdUm: 9.1,
    mfdWavelengthNm: 1310,
    attenuationDbPerKm: 0.34,
    attenuationWavelengthNm: 1310,
    notes: 'label photo in job file',
    createdAt: T0 + 5,
    updatedAt: T0 + 6,
  },
];

const V2_RECORDS: FiberTypeV2[] = [
  {
    id: 'v2_graded',
    name: 'Plant Room OM4',
    profile: 'graded',
    gradedAlpha: 2.05,
    coreDiameterUm: 50,
    claddingDiameterUm: 125,
    na: 0.2,
    attenuation: [
      { wavelengthNm: 850, dbPerKm: 2.8 },
      { wavelengthNm: 1300, dbPerKm: 0.9 },
    ],
    category: 'OM4',
    notes: '',
    createdAt: T0,
    updatedAt: T0,
  },
];

/**
 * What each v1 record must look like in the newest schema, written out literally (not built from the code's constants):
 * the single attenuation value becomes a one-entry list; a v1 graded fiber gets α = 2, because v1 drew every graded
 * core as parabolic (its own documentation of the graded profile, the common-practice default α = 2); the name key is
 * the name trimmed, inner spaces collapsed and lower-cased.
 */
const EXPECTED_FROM_V1: Record<string, object> = {
  v1_step: {
    id: 'v1_step',
    name: '  Yard Spool   4 ',
    profile: 'step',
    coreDiameterUm: 8.2,
    claddingDiameterUm: 125,
    na: 0.14,
    attenuation: [{ wavelengthNm: 1550, dbPerKm: 0.21 }],
    category: 'G.652.D',
    notes: 'north yard',
    createdAt: T0,
    updatedAt: T0 + 1000,
    nameKey: 'yard spool 4',
  },
  v1_graded: {
    id: 'v1_graded',
    name: 'Riser OM1',
    profile: 'graded',
    gradedAlpha: 2,
    coreDiameterUm: 62.5,
    claddingDiameterUm: 125,
    na: 0.275,
    attenuation: [],
    notes: '',
    createdAt: T0,
    updatedAt: T0,
    nameKey: 'riser om1',
  },
  v1_label: {
    id: 'v1_label',
    name: 'Drum 12',
    profile: 'label',
    claddingDiameterUm: 125,
    cutoffWavelengthNm: 1250,
    cutoffKind: 'cable',
    mfdUm: 9.1,
    mfdWavelengthNm: 1310,
    attenuation: [{ wavelengthNm: 1310, dbPerKm: 0.34 }],
    notes: 'label photo in job file',
    createdAt: T0 + 5,
    updatedAt: T0 + 6,
    nameKey: 'drum 12',
  },
};

function expectedFromV1(r: FiberTypeV1): Record<string, unknown> {
  return EXPECTED_FROM_V1[r.id] as Record<string, unknown>;
}

/** Name keys of the v2 records in the newest schema (the name trimmed, spaces collapsed, lower-cased), written out. */
const V2_NAME_KEYS: Record<string, string> = { v2_graded: 'plant room om4' };

async function seed(name: string, version: number, records: object[]): Promise<void> {
  const db = await openRaw({ name, version });
  const tx = db.transaction('fiberTypes', 'readwrite');
  // Untyped put: the typed schema is the newest one, these are older shapes.
  for (const r of records) await (tx.store as unknown as { put(v: object): Promise<unknown> }).put(r);
  await tx.done;
  db.close();
}

beforeEach(() => freshIndexedDb());

describe('schema migrations keep every saved type', () => {
  it('the newest schema version is 3', () => {
    expect(SCHEMA_VERSION).toBe(3);
  });

  it.each(V1_RECORDS.map((r) => [r.id, r] as const))('v1 record %s arrives in v3 with every field preserved', async (_id, r) => {
    const name = uniqueDbName();
    await seed(name, 1, V1_RECORDS);
    const store = await FiberStore.open({ name });
    const got = await store.get(r.id);
    store.close();
    expect(got).toEqual(expectedFromV1(r));
  });

  it('v1 → v2 alone turns the single attenuation value into a list and makes α explicit', async () => {
    const name = uniqueDbName();
    await seed(name, 1, V1_RECORDS);
    const db = await openRaw({ name, version: 2 });
    const all = (await db.getAll('fiberTypes')) as unknown as FiberTypeV2[];
    db.close();
    const byId = new Map(all.map((r) => [r.id, r]));
    for (const r of V1_RECORDS) {
      const { nameKey: _nk, ...want } = expectedFromV1(r);
      expect(byId.get(r.id), r.id).toEqual(want);
    }
  });

  it.each(V2_RECORDS.map((r) => [r.id, r] as const))('v2 record %s arrives in v3 with every field preserved', async (_id, r) => {
    const name = uniqueDbName();
    await seed(name, 2, V2_RECORDS);
    const store = await FiberStore.open({ name });
    expect(await store.get(r.id)).toEqual({ ...r, nameKey: V2_NAME_KEYS[r.id] });
    store.close();
  });

  it('a migrated library passes validation record by record and can be edited', async () => {
    const name = uniqueDbName();
    await seed(name, 1, V1_RECORDS);
    const store = await FiberStore.open({ name });
    for (const r of await store.list()) {
      const { id, createdAt: _c, updatedAt: _u, nameKey: _n, ...input } = r;
      await expect(store.update(id, input), r.id).resolves.toMatchObject({ id });
    }
    store.close();
  });

  it('a damaged old record is kept as it was rather than dropped', async () => {
    const name = uniqueDbName();
    await seed(name, 1, [{ id: 'v1_damaged', profile: 'step', notes: 42 }]);
    const store = await FiberStore.open({ name });
    expect(await store.get('v1_damaged')).toMatchObject({ id: 'v1_damaged', notes: 42, attenuation: [] });
    store.close();
  });

  it('the device logs the migrations of the upgrade (v1 was created before the log existed)', async () => {
    const name = uniqueDbName();
    await seed(name, 1, V1_RECORDS);
    const store = await FiberStore.open({ name });
    const log = await store.migrationLog();
    store.close();
    expect(log.map((l) => [l.fromVersion, l.toVersion, l.recordsConverted])).toEqual([
      [1, 2, 3],
      [2, 3, 3],
    ]);
  });

  it('a fresh library is created at the newest version, empty', async () => {
    const store = await FiberStore.open({ name: uniqueDbName() });
    expect(await store.count()).toBe(0);
    expect((await store.migrationLog()).map((l) => l.toVersion)).toEqual([1, 2, 3]);
    store.close();
  });
});

describe('two tabs during an upgrade', () => {
  it('the older tab closes cleanly, says to reload, and the newer tab upgrades with the data intact', async () => {
    const name = uniqueDbName();
    await seed(name, 1, V1_RECORDS);
    const oldStatus: StoreStatus[] = [];
    const oldTab = await FiberStore.open({ name, version: 2, onStatus: (s) => oldStatus.push(s) });
    const newTab = await FiberStore.open({ name });
    expect(oldStatus).toContain('closed-for-upgrade');
    expect(oldTab.state).toBe('closed-for-upgrade');
    await expect(oldTab.list()).rejects.toThrow(/Reload this page/);
    expect((await newTab.list()).map((r) => r.id).sort()).toEqual(['v1_graded', 'v1_label', 'v1_step']);
    newTab.close();
  });

  it('an upgrade held up by a tab that does not let go is reported as waiting, then completes', async () => {
    const name = uniqueDbName();
    await seed(name, 2, V2_RECORDS);
    // A connection with no versionchange handler, as an old build without one would hold.
    const stubborn = await new Promise<IDBDatabase>((res, rej) => {
      const req = indexedDB.open(name, 2);
      req.onsuccess = () => res(req.result);
      req.onerror = () => rej(req.error);
    });
    const statuses: StoreStatus[] = [];
    const opening = FiberStore.open({ name, onStatus: (s) => statuses.push(s) });
    await new Promise((r) => setTimeout(r, 50));
    expect(statuses).toEqual(['blocked']);
    stubborn.close();
    const store = await opening;
    expect(statuses).toEqual(['blocked', 'open']);
    expect(await store.get('v2_graded')).toMatchObject({ gradedAlpha: 2.05, nameKey: 'plant room om4' });
    store.close();
  });
});
