// The one IndexedDB module of the app: the saved fiber library, typed with idb's DBSchema.
//
// Schema history (one explicit migration per version, run in order inside `upgrade`):
//   v1  store `fiberTypes` (keyPath id), index `byName`. One attenuation value per record
//       (`attenuationDbPerKm` + `attenuationWavelengthNm`); graded fibers implied α = 2.
//   v2  attenuation becomes a list `attenuation: [{ wavelengthNm, dbPerKm }]`; graded records get an
//       explicit `gradedAlpha` (2, what v1 implied); index `byUpdatedAt`.
//   v3  derived `nameKey` (normalised name) with index `byNameKey` replacing `byName`; store `meta`
//       with a log of the migrations run on this device.
// A migration never drops a record: what it cannot convert it leaves as it was, and validation marks it.
import { openDB, type DBSchema, type IDBPDatabase, type IDBPTransaction } from 'idb';
import { contentSignature, nameKeyOf, newFiberId, type FiberType, type FiberTypeInput } from './model';
import { fieldChanges } from './differences';
import { compareByName, proposeDistinctName } from './names';
import { describeErrors, validateInput, validateRecord, type FieldErrors } from './validate';

export const DB_NAME = 'modewright-fiber-library';
export const SCHEMA_VERSION = 3;
const CHANNEL_NAME = 'modewright-fiber-library';

export interface MigrationLogEntry {
  fromVersion: number;
  toVersion: number;
  atMs: number;
  recordsConverted: number;
}

interface MetaEntry {
  key: 'migrations';
  log: MigrationLogEntry[];
}

export interface FiberDbSchema extends DBSchema {
  fiberTypes: { key: string; value: FiberType; indexes: { byNameKey: string; byUpdatedAt: number } };
  meta: { key: string; value: MetaEntry };
}

/** The record shape of schema v1, kept for the migration and its tests. */
export interface FiberTypeV1 {
  id: string;
  name: string;
  profile: 'step' | 'graded' | 'label';
  coreDiameterUm?: number;
  claddingDiameterUm: number;
  na?: number;
  cutoffWavelengthNm?: number;
  cutoffKind?: 'fiber' | 'cable';
  mfdUm?: number;
  mfdWavelengthNm?: number;
  attenuationDbPerKm?: number;
  attenuationWavelengthNm?: number;
  category?: string;
  notes: string;
  createdAt: number;
  updatedAt: number;
}

/** The record shape of schema v2 (v3 adds nameKey). */
export type FiberTypeV2 = Omit<FiberTypeV1, 'attenuationDbPerKm' | 'attenuationWavelengthNm'> & {
  attenuation: { wavelengthNm: number; dbPerKm: number }[];
  gradedAlpha?: number;
};

// ---------------------------------------------------------------------------------------------
// Errors, each explained in plain words for the screen.

export class StoreError extends Error {
  override name = 'StoreError';
}

/** A record (or an input) failed validation: nothing was written. */
export class InvalidRecordError extends StoreError {
  override name = 'InvalidRecordError';
  constructor(readonly errors: FieldErrors) {
    super(`Not saved: ${describeErrors(errors).join(' ')}`);
  }
}

/** The browser refused to store more (quota). Nothing of the failed write was kept. */
export class StorageFullError extends StoreError {
  override name = 'StorageFullError';
  constructor() {
    super(
      'Not saved: the storage this browser allows the app is full. Nothing was changed. Free space on the phone or delete fiber types you no longer need, then try again.',
    );
  }
}

/** The connection was closed (a newer version of the app in another tab, or the browser). */
export class StoreClosedError extends StoreError {
  override name = 'StoreClosedError';
  constructor(readonly reason: StoreStatus) {
    super(STATUS_TEXT[reason] ?? 'The fiber library is closed. Reload this page.');
  }
}

export class NotFoundError extends StoreError {
  override name = 'NotFoundError';
  constructor(id: string) {
    super(`No fiber type with id ${id} is in the library (it may have been deleted in another tab).`);
  }
}

/**
 * Add or rename by hand: the name is already saved for another type (same name once case and spacing
 * are ignored). Nothing was written; the person chooses a distinct name (one is proposed) or keeps it.
 */
export class NameClashError extends StoreError {
  override name = 'NameClashError';
  constructor(
    readonly existing: FiberType,
    readonly proposedName: string,
  ) {
    super(`Not saved yet: a fiber type is already saved as “${existing.name}”. Two entries with the same name cannot be told apart in the pickers. Save it as “${proposedName}”, change the name, or keep the same name on purpose.`);
  }
}

/**
 * An edit was based on a version of the record that is no longer the saved one: another tab (or an
 * import) changed it meanwhile. Nothing was written; `current` is the saved version, `changes` what
 * differs from the version the edit started from.
 */
export class EditConflictError extends StoreError {
  override name = 'EditConflictError';
  readonly changes: string[];
  constructor(
    readonly current: FiberType,
    readonly base: FiberType,
  ) {
    const changes = fieldChanges(base, current);
    super(
      `Not saved: “${current.name}” was changed in another tab (or by an import) after you opened it here${changes.length ? `: ${changes.join('; ')}` : ''}. Load the other version, or save yours over it knowingly.`,
    );
    this.changes = changes;
  }
}

/** The longest name prefix that can still be followed by " (k)": names sharing it are the candidates for a proposal. */
function proposalRange(nameKey: string): IDBKeyRange {
  return IDBKeyRange.bound(nameKey, nameKey + '\uffff');
}

export interface WriteOptions {
  /** Refuse (NameClashError) when another saved type has the same name. The form asks for this; imports and undo do not. */
  refuseSameName?: boolean;
}

export interface UpdateOptions extends WriteOptions {
  /**
   * The version the edit started from. When the saved record is no longer that version (its change
   * time or its content differ), the update is refused with EditConflictError; checked inside the
   * write transaction, so no other write can slip between the check and the put.
   */
  base?: FiberType;
}

export type StoreStatus = 'open' | 'blocked' | 'closed-for-upgrade' | 'terminated' | 'closed';

export const STATUS_TEXT: Record<StoreStatus, string> = {
  open: 'The fiber library is open.',
  blocked:
    'The fiber library is waiting: another tab of Modewright still has it open with an older version. Close or reload the other tab.',
  'closed-for-upgrade':
    'A newer version of Modewright opened in another tab and upgraded the fiber library. Reload this page to keep using it; your saved types are safe.',
  terminated: 'The browser closed the fiber library unexpectedly (for example to free space). Reload this page; saved types are kept.',
  closed: 'The fiber library is closed. Reload this page.',
};

function isQuotaError(e: unknown): boolean {
  const n = (e as { name?: string } | null)?.name;
  return n === 'QuotaExceededError' || n === 'NS_ERROR_DOM_QUOTA_REACHED';
}

function translate(e: unknown): unknown {
  if (isQuotaError(e)) return new StorageFullError();
  if ((e as { name?: string } | null)?.name === 'InvalidStateError') return new StoreClosedError('closed');
  return e;
}

/** A request fails with AbortError when its transaction aborts; the transaction's own error (quota) says why. */
function causeOf(e: unknown, tx: { error: DOMException | null }): unknown {
  return isQuotaError(tx.error) ? tx.error : e;
}

/** What browsers throw from indexedDB.open when the site may not store anything (or the API is broken). */
function isStorageRefused(e: unknown): boolean {
  const n = (e as { name?: string } | null)?.name;
  return e instanceof TypeError || n === 'SecurityError' || n === 'InvalidAccessError' || n === 'NotAllowedError' || n === 'UnknownError';
}

/** Said whenever the database cannot be opened at all: the calculators work, only saving is off. */
export const STORAGE_OFF_TEXT =
  'Saving fiber types is off: this browser gives the app no storage for them (IndexedDB is missing or switched off, as in some private windows). The calculators still work with standard categories and typed values.';

// ---------------------------------------------------------------------------------------------
// Migrations. Each takes the versionchange transaction; the store is reached untyped because the
// typed schema describes only the newest version.

type UpgradeTx = IDBPTransaction<FiberDbSchema, ('fiberTypes' | 'meta')[], 'versionchange'>;
type AnyDb = IDBPDatabase<unknown>;
type AnyTx = IDBPTransaction<unknown, string[], 'versionchange'>;

export const MIGRATIONS: Record<number, (db: AnyDb, tx: AnyTx) => Promise<number>> = {
  1: async (db) => {
    const s = db.createObjectStore('fiberTypes', { keyPath: 'id' });
    s.createIndex('byName', 'name');
    return 0;
  },
  2: async (_db, tx) => {
    const s = tx.objectStore('fiberTypes');
    let n = 0;
    for (let c = await s.openCursor(); c; c = await c.continue()) {
      const r = c.value as Record<string, unknown>;
      const next: Record<string, unknown> = { ...r };
      const att: { wavelengthNm: number; dbPerKm: number }[] = [];
      if (typeof r.attenuationDbPerKm === 'number' && typeof r.attenuationWavelengthNm === 'number') {
        att.push({ wavelengthNm: r.attenuationWavelengthNm, dbPerKm: r.attenuationDbPerKm });
      }
      if (Array.isArray(r.attenuation)) continue; // already v2-shaped: leave untouched
      delete next.attenuationDbPerKm;
      delete next.attenuationWavelengthNm;
      next.attenuation = att;
      if (r.profile === 'graded' && r.gradedAlpha === undefined) next.gradedAlpha = V1_IMPLIED_GRADED_ALPHA;
      await c.update(next);
      n++;
    }
    s.createIndex('byUpdatedAt', 'updatedAt');
    return n;
  },
  3: async (db, tx) => {
    const s = tx.objectStore('fiberTypes');
    let n = 0;
    for (let c = await s.openCursor(); c; c = await c.continue()) {
      const r = c.value as Record<string, unknown>;
      if (typeof r.name !== 'string') continue; // damaged: left as it was, validation will say so
      await c.update({ ...r, nameKey: nameKeyOf(r.name) });
      n++;
    }
    s.deleteIndex('byName');
    s.createIndex('byNameKey', 'nameKey');
    db.createObjectStore('meta', { keyPath: 'key' });
    return n;
  },
};

/** v1 stored graded fibers without α and the app treated them as parabolic. */
export const V1_IMPLIED_GRADED_ALPHA = 2;

async function runMigrations(db: AnyDb, tx: AnyTx, oldVersion: number, newVersion: number): Promise<void> {
  const log: MigrationLogEntry[] = [];
  for (let v = oldVersion + 1; v <= newVersion; v++) {
    const step = MIGRATIONS[v];
    if (!step) throw new Error(`No migration to schema version ${v}`);
    const recordsConverted = await step(db, tx);
    log.push({ fromVersion: v - 1, toVersion: v, atMs: Date.now(), recordsConverted });
  }
  if (newVersion >= 3) {
    const meta = tx.objectStore('meta');
    const prev = (await meta.get('migrations')) as MetaEntry | undefined;
    await meta.put({ key: 'migrations', log: [...(prev?.log ?? []), ...log] } satisfies MetaEntry);
  }
}

// ---------------------------------------------------------------------------------------------

export interface OpenOptions {
  name?: string;
  /** Only for tests of the migrations: open at an earlier schema version. */
  version?: number;
  onStatus?: (status: StoreStatus, message: string) => void;
}

export type ChangeListener = () => void;

/** Opens (creating or upgrading) the database; the raw connection, for migration tests. */
export async function openRaw(opts: OpenOptions & { onClose?: (s: StoreStatus) => void } = {}): Promise<IDBPDatabase<FiberDbSchema>> {
  const version = opts.version ?? SCHEMA_VERSION;
  const say = (s: StoreStatus) => opts.onStatus?.(s, STATUS_TEXT[s]);
  let db: IDBPDatabase<FiberDbSchema> | undefined;
  let migrationError: unknown;
  const opening = openDB<FiberDbSchema>(opts.name ?? DB_NAME, version, {
    upgrade(udb, oldVersion, newVersion, tx: UpgradeTx) {
      // The migrations chain their requests on the versionchange transaction, which stays open
      // until the last one settles. On any failure the transaction is aborted: the database stays
      // at its old version with its old data, and the error is reported by open.
      void runMigrations(udb as unknown as AnyDb, tx as unknown as AnyTx, oldVersion, newVersion ?? version).catch((e) => {
        migrationError = e;
        try {
          tx.abort();
        } catch {
          // the transaction already ended with the failing request
        }
      });
    },
    blocked() {
      say('blocked');
    },
    blocking() {
      // A newer tab wants to upgrade: close cleanly so it can, and tell this tab's user to reload.
      db?.close();
      opts.onClose?.('closed-for-upgrade');
      say('closed-for-upgrade');
    },
    terminated() {
      opts.onClose?.('terminated');
      say('terminated');
    },
  });
  try {
    db = await opening;
  } catch (e) {
    throw translate(migrationError ?? e);
  }
  say('open');
  return db;
}

export class FiberStore {
  private status: StoreStatus = 'open';
  private readonly listeners = new Set<ChangeListener>();
  private readonly channel: BroadcastChannel | undefined;

  private constructor(private readonly db: IDBPDatabase<FiberDbSchema>, channelName: string) {
    this.channel = typeof BroadcastChannel === 'function' ? new BroadcastChannel(channelName) : undefined;
    if (this.channel) this.channel.onmessage = () => this.emit();
  }

  static async open(opts: OpenOptions = {}): Promise<FiberStore> {
    // The callbacks can fire only after open resolves, when the holder is filled.
    const holder: { store?: FiberStore } = {};
    const db = await openRaw({
      ...opts,
      onClose: (s) => {
        if (holder.store) holder.store.status = s;
        holder.store?.emit();
      },
    });
    holder.store = new FiberStore(db, `${CHANNEL_NAME}:${opts.name ?? DB_NAME}`);
    return holder.store;
  }

  get state(): StoreStatus {
    return this.status;
  }

  /** Called after any change here or in another tab. Returns the unsubscribe function. */
  subscribe(l: ChangeListener): () => void {
    this.listeners.add(l);
    return () => this.listeners.delete(l);
  }

  private emit(): void {
    for (const l of [...this.listeners]) l();
  }

  private changed(): void {
    this.emit();
    this.channel?.postMessage('changed');
  }

  private ensureOpen(): void {
    if (this.status !== 'open') throw new StoreClosedError(this.status);
  }

  private async run<T>(fn: () => Promise<T>): Promise<T> {
    this.ensureOpen();
    try {
      return await fn();
    } catch (e) {
      throw translate(e);
    }
  }

  /** Every saved type, sorted by name (then by id for equal names). */
  list(): Promise<FiberType[]> {
    return this.run(async () => {
      const all = await this.db.getAllFromIndex('fiberTypes', 'byNameKey');
      return all.sort(compareByName);
    });
  }

  get(id: string): Promise<FiberType | undefined> {
    return this.run(() => this.db.get('fiberTypes', id));
  }

  count(): Promise<number> {
    return this.run(() => this.db.count('fiberTypes'));
  }

  /**
   * Validates and adds a new type; throws InvalidRecordError (nothing written) when a field is wrong,
   * and with `refuseSameName` NameClashError when another saved type has the same name.
   */
  add(input: FiberTypeInput, nowMs = Date.now(), opts: WriteOptions = {}): Promise<FiberType> {
    const v = validateInput(input);
    if (!v.ok) return Promise.reject(new InvalidRecordError(v.errors));
    const record = { ...v.value, id: newFiberId(), createdAt: nowMs, updatedAt: nowMs, nameKey: '' };
    if (!opts.refuseSameName) return this.write(record, 'add');
    return this.run(async () => {
      const rec = checked(record);
      const tx = this.db.transaction('fiberTypes', 'readwrite');
      try {
        await refuseSameName(tx, rec);
        await tx.store.add(rec);
        await tx.done;
      } catch (e) {
        abortQuietly(tx);
        await tx.done.catch(() => undefined);
        throw causeOf(e, tx);
      }
      this.changed();
      return rec;
    });
  }

  /**
   * Validates and replaces the content of an existing type, keeping its id and creation time. The
   * change time always moves forward (at least 1 ms past the saved one), so it identifies the version.
   * With `base`, refuses (EditConflictError) when the saved record is no longer the version the edit
   * started from; with `refuseSameName`, refuses a rename to a name another type has (NameClashError).
   */
  update(id: string, input: FiberTypeInput, nowMs = Date.now(), opts: UpdateOptions = {}): Promise<FiberType> {
    const v = validateInput(input);
    if (!v.ok) return Promise.reject(new InvalidRecordError(v.errors));
    return this.run(async () => {
      const tx = this.db.transaction('fiberTypes', 'readwrite');
      let rec: FiberType;
      try {
        const old = await tx.store.get(id);
        if (!old) throw new NotFoundError(id);
        if (opts.base && (old.updatedAt !== opts.base.updatedAt || contentSignature(old) !== contentSignature(opts.base))) {
          throw new EditConflictError(old, opts.base);
        }
        rec = checked({ ...v.value, id, createdAt: old.createdAt, updatedAt: Math.max(nowMs, old.createdAt, (Number.isFinite(old.updatedAt) ? old.updatedAt : 0) + 1), nameKey: '' });
        // Only a rename is checked: an old pair of equal names is not raised again on every edit.
        if (opts.refuseSameName && rec.nameKey !== old.nameKey) await refuseSameName(tx, rec);
        await tx.store.put(rec);
        await tx.done;
      } catch (e) {
        // Refused or failed: abort so nothing of it lands; done then rejects too, and must not go unhandled.
        abortQuietly(tx);
        await tx.done.catch(() => undefined);
        throw causeOf(e, tx);
      }
      this.changed();
      return rec;
    });
  }

  /** Puts back a whole record as it was (undo of a delete). Validated like every write. */
  restore(record: FiberType): Promise<FiberType> {
    return this.write(record, 'put');
  }

  /** Deletes and returns the deleted record, so the screen can offer undo. */
  delete(id: string): Promise<FiberType | undefined> {
    return this.run(async () => {
      const tx = this.db.transaction('fiberTypes', 'readwrite');
      const old = await tx.store.get(id);
      if (old) await tx.store.delete(id);
      await tx.done;
      if (old) this.changed();
      return old;
    });
  }

  private write(record: FiberType, how: 'add' | 'put'): Promise<FiberType> {
    return this.run(async () => {
      const rec = checked(record);
      const tx = this.db.transaction('fiberTypes', 'readwrite');
      try {
        await (how === 'add' ? tx.store.add(rec) : tx.store.put(rec));
        await tx.done;
      } catch (e) {
        // A failed request aborts its transaction; its done promise then rejects too, and must not go unhandled.
        tx.done.catch(() => undefined);
        throw causeOf(e, tx);
      }
      this.changed();
      return rec;
    });
  }

  /**
   * Writes a whole import in ONE transaction: either every record lands, or (on any failure,
   * quota included) none does and the library is exactly as before.
   */
  applyRecords(records: readonly FiberType[], mode: 'merge' | 'replace', deleteIds: readonly string[] = []): Promise<void> {
    return this.run(async () => {
      const recs = records.map(checked); // validate all before touching anything
      const tx = this.db.transaction('fiberTypes', 'readwrite');
      try {
        if (mode === 'replace') await tx.store.clear();
        for (const id of deleteIds) await tx.store.delete(id);
        for (const r of recs) await tx.store.put(r);
        await tx.done;
      } catch (e) {
        try {
          tx.abort();
        } catch {
          // already aborted by the failing request
        }
        await tx.done.catch(() => undefined);
        throw causeOf(e, tx);
      }
      this.changed();
    });
  }

  migrationLog(): Promise<MigrationLogEntry[]> {
    return this.run(async () => (await this.db.get('meta', 'migrations'))?.log ?? []);
  }

  close(): void {
    if (this.status === 'open') this.status = 'closed';
    this.db.close();
    this.channel?.close();
  }
}

type WriteTx = IDBPTransaction<FiberDbSchema, ['fiberTypes'], 'readwrite'>;

function abortQuietly(tx: WriteTx): void {
  try {
    tx.abort();
  } catch {
    // already finished or aborted by the failing request
  }
}

/** Inside the write transaction: throws NameClashError when another record has rec's name. */
async function refuseSameName(tx: WriteTx, rec: FiberType): Promise<void> {
  const near = await tx.store.index('byNameKey').getAll(proposalRange(rec.nameKey));
  const holder = near.find((r) => r.nameKey === rec.nameKey && r.id !== rec.id);
  if (holder) throw new NameClashError(holder, proposeDistinctName(rec.name, new Set(near.map((r) => r.nameKey))));
}

function checked(record: FiberType): FiberType {
  const v = validateRecord(record);
  if (!v.ok) throw new InvalidRecordError(v.errors);
  return v.value;
}

// ---------------------------------------------------------------------------------------------
// The app's one shared connection.

let shared: Promise<FiberStore> | undefined;
const statusListeners = new Set<(s: StoreStatus, message: string) => void>();

/** The app-wide store, opened on first use. Status changes (blocked, closed for upgrade) go to onStoreStatus listeners. */
export function getFiberStore(): Promise<FiberStore> {
  if (!shared) {
    if (typeof indexedDB === 'undefined' || indexedDB === null) return Promise.reject(new StoreError(STORAGE_OFF_TEXT));
    // An open that throws (storage refused for the site) is the same situation for the user as no
    // IndexedDB at all; the app's own typed errors (full, closed) keep their words.
    shared = FiberStore.open({ onStatus: (s, m) => statusListeners.forEach((l) => l(s, m)) }).catch((e: unknown) => {
      throw isStorageRefused(e) ? new StoreError(STORAGE_OFF_TEXT) : e;
    });
    shared.catch(() => {
      shared = undefined;
    });
  }
  return shared;
}

export function onStoreStatus(l: (s: StoreStatus, message: string) => void): () => void {
  statusListeners.add(l);
  return () => statusListeners.delete(l);
}

// ---------------------------------------------------------------------------------------------
// Persistent storage: without it the browser may evict the library when space runs low.

export type PersistenceState = 'granted' | 'not-granted' | 'unsupported';

export interface PersistenceInfo {
  state: PersistenceState;
  usageBytes?: number;
  quotaBytes?: number;
  message: string;
}

const PERSIST_TEXT: Record<PersistenceState, string> = {
  granted: 'The library is protected: this browser has granted persistent storage and will not clear the saved types to free space. A backup file is still the only copy that survives losing or resetting the phone.',
  'not-granted':
    'The library is not protected: this browser may clear the saved types when the phone runs low on space. Export a backup now and then. Installing the app to the home screen often lets the browser protect it.',
  unsupported: 'This browser cannot say whether the library is protected from clean-up: export a backup now and then.',
};

type StorageLike = Pick<StorageManager, 'persist' | 'persisted'> & Partial<Pick<StorageManager, 'estimate'>>;

function storageManager(): StorageLike | undefined {
  const s = (globalThis.navigator as Navigator | undefined)?.storage;
  return s && typeof s.persisted === 'function' && typeof s.persist === 'function' ? s : undefined;
}

async function info(state: PersistenceState, s: StorageLike | undefined): Promise<PersistenceInfo> {
  let usageBytes: number | undefined;
  let quotaBytes: number | undefined;
  try {
    const e = await s?.estimate?.();
    usageBytes = e?.usage;
    quotaBytes = e?.quota;
  } catch {
    // estimate is optional; its absence changes nothing
  }
  return { state, usageBytes, quotaBytes, message: PERSIST_TEXT[state] };
}

/** Whether persistence is granted now, without asking. */
export async function persistenceStatus(storage: StorageLike | undefined = storageManager()): Promise<PersistenceInfo> {
  if (!storage) return info('unsupported', undefined);
  try {
    return info((await storage.persisted()) ? 'granted' : 'not-granted', storage);
  } catch {
    return info('unsupported', storage);
  }
}

/** Asks the browser for persistent storage (it may grant it silently, prompt, or refuse) and says what it decided. */
export async function requestPersistence(storage: StorageLike | undefined = storageManager()): Promise<PersistenceInfo> {
  if (!storage) return info('unsupported', undefined);
  try {
    if (await storage.persisted()) return info('granted', storage);
    return info((await storage.persist()) ? 'granted' : 'not-granted', storage);
  } catch {
    return info('unsupported', storage);
  }
}
