// A demo library from an invented scenario, loaded only when the person asks for it.
// Scenario (invented): the Corrow Fen ring, a small town network with a depot at Wexhallow and a
// long hop out to Saltmarrow Point. Every place, spool and drum name here is made up; the values are
// plausible for their category (typical, common practice) but belong to no real product.
import { planImport, applyImport, type ImportResult } from './backup';
import { validateRecord } from './validate';
import type { FiberStore } from './db';
import type { FiberType, FiberTypeInput } from './model';

const DEMO_NOTE = 'Demo data from an invented scenario (Corrow Fen ring). Not a real product.';

/** Fixed ids, so loading the demo twice adds nothing the second time. */
export const DEMO_TYPES: readonly (FiberTypeInput & { id: string })[] = [
  {
    id: 'demo_cf07',
    name: 'Demo · Corrow Fen backbone, drum CF-07',
    profile: 'label',
    coreDiameterUm: 8.3,
    claddingDiameterUm: 125,
    cutoffWavelengthNm: 1250,
    cutoffKind: 'cable',
    mfdUm: 9.1,
    mfdWavelengthNm: 1310,
    attenuation: [
      { wavelengthNm: 1310, dbPerKm: 0.34 },
      { wavelengthNm: 1550, dbPerKm: 0.2 },
    ],
    category: 'G.652.D',
    notes: `${DEMO_NOTE} Values copied from the drum label.`,
  },
  {
    id: 'demo_wx12',
    name: 'Demo · Wexhallow depot drops, spool WX-12',
    profile: 'label',
    claddingDiameterUm: 125,
    cutoffWavelengthNm: 1240,
    cutoffKind: 'cable',
    mfdUm: 8.7,
    mfdWavelengthNm: 1310,
    attenuation: [
      { wavelengthNm: 1310, dbPerKm: 0.35 },
      { wavelengthNm: 1550, dbPerKm: 0.21 },
    ],
    category: 'G.657.A2',
    notes: `${DEMO_NOTE} Bend-tolerant drop cable for tight trays.`,
  },
  {
    id: 'demo_sp01',
    name: 'Demo · Saltmarrow Point long hop, drum SP-01',
    profile: 'label',
    claddingDiameterUm: 125,
    cutoffWavelengthNm: 1500,
    cutoffKind: 'cable',
    mfdUm: 12.2,
    mfdWavelengthNm: 1550,
    attenuation: [{ wavelengthNm: 1550, dbPerKm: 0.17 }],
    category: 'G.654.E',
    notes: `${DEMO_NOTE} Large effective area for the long unrepeated span.`,
  },
  {
    id: 'demo_wxpr',
    name: 'Demo · Wexhallow plant room patch, 50 µm',
    profile: 'graded',
    gradedAlpha: 2,
    coreDiameterUm: 50,
    claddingDiameterUm: 125,
    na: 0.2,
    attenuation: [
      { wavelengthNm: 850, dbPerKm: 2.5 },
      { wavelengthNm: 1300, dbPerKm: 0.8 },
    ],
    category: 'OM4',
    notes: DEMO_NOTE,
  },
  {
    id: 'demo_cfri',
    name: 'Demo · Corrow Fen old riser, 62.5 µm',
    profile: 'graded',
    gradedAlpha: 2,
    coreDiameterUm: 62.5,
    claddingDiameterUm: 125,
    na: 0.275,
    attenuation: [
      { wavelengthNm: 850, dbPerKm: 3.2 },
      { wavelengthNm: 1300, dbPerKm: 1.0 },
    ],
    category: 'OM1',
    notes: `${DEMO_NOTE} Legacy riser kept for the alarm panels.`,
  },
  {
    id: 'demo_lab1',
    name: 'Demo · Training bench step-index sample',
    profile: 'step',
    coreDiameterUm: 9,
    claddingDiameterUm: 125,
    na: undefined,
    coreIndex: 1.4504,
    claddingIndex: 1.4447,
    attenuation: [],
    notes: `${DEMO_NOTE} Given by its indices, to show how NA follows from them.`,
  },
];

export function demoRecords(nowMs = Date.now()): FiberType[] {
  return DEMO_TYPES.map((t) => {
    const v = validateRecord({ ...t, createdAt: nowMs, updatedAt: nowMs });
    if (!v.ok) throw new Error(`demo record ${t.id} is invalid: ${JSON.stringify(v.errors)}`);
    return v.value;
  });
}

/** Adds the demo types that are not in the library yet; never overwrites anything. */
export async function loadDemoLibrary(store: FiberStore, nowMs = Date.now()): Promise<ImportResult> {
  const records = demoRecords(nowMs);
  const existing = await store.list();
  const plan = planImport({ ok: true, formatVersion: 1, totalInFile: records.length, valid: records, rejected: [] }, existing, 'merge');
  // Merge would update a demo type the person edited if the demo copy were newer: never do that.
  const have = new Set(existing.map((r) => r.id));
  plan.toWrite = plan.toWrite.filter((r) => !have.has(r.id));
  return applyImport(store, plan);
}
