// Shared builders for the fiber-library tests. Each test gets a fresh in-memory IndexedDB.
import 'fake-indexeddb/auto';
import { IDBFactory } from 'fake-indexeddb';
import type { FiberType, FiberTypeInput } from '../../src/fibers/model';

/** A fresh, empty IndexedDB for one test (fake-indexeddb, installed for store tests). */
export function freshIndexedDb(): void {
  globalThis.indexedDB = new IDBFactory();
}

let counter = 0;
export function uniqueDbName(): string {
  counter += 1;
  return `test-fibers-${counter}`;
}

/** A step-index single-mode type typed by hand: 8.2 µm core, NA 0.14 (typical G.652.D-like, common practice). */
export function stepInput(over: Partial<FiberTypeInput> = {}): FiberTypeInput {
  return {
    name: 'Yard spool 4, step-index',
    profile: 'step',
    coreDiameterUm: 8.2,
    claddingDiameterUm: 125,
    na: 0.14,
    attenuation: [
      { wavelengthNm: 1310, dbPerKm: 0.35 },
      { wavelengthNm: 1550, dbPerKm: 0.21 },
    ],
    notes: '',
    ...over,
  };
}

export function gradedInput(over: Partial<FiberTypeInput> = {}): FiberTypeInput {
  return {
    name: 'Plant room patch, 50 µm',
    profile: 'graded',
    gradedAlpha: 2,
    coreDiameterUm: 50,
    claddingDiameterUm: 125,
    na: 0.2,
    attenuation: [{ wavelengthNm: 850, dbPerKm: 2.5 }],
    category: 'OM3',
    notes: 'patch leads only',
    ...over,
  };
}

export function labelInput(over: Partial<FiberTypeInput> = {}): FiberTypeInput {
  return {
    name: 'Drum 12 from label',
    profile: 'label',
    claddingDiameterUm: 125,
    cutoffWavelengthNm: 1260,
    cutoffKind: 'cable',
    mfdUm: 9.2,
    mfdWavelengthNm: 1310,
    attenuation: [],
    notes: '',
    ...over,
  };
}

export const T0 = Date.UTC(2026, 5, 1, 8, 0, 0);

export function record(over: Partial<FiberType> & { id: string }, input: FiberTypeInput = stepInput()): FiberType {
  return { ...input, createdAt: T0, updatedAt: T0, nameKey: '', ...over } as FiberType;
}
