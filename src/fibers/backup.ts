// Backup of the fiber library: export to our own JSON format (BACKUP_FORMAT.md), and import with a
// preview. Import is three steps so the screen can show what will happen before anything changes:
//   readBackup(text) → a parsed file, or a refusal in plain words (malformed, too large, future version);
//   planImport(parsed, existing, mode) → what would be added, updated, kept, skipped, and why;
//   applyImport(store, plan) → one transaction: all of the plan, or (on any failure) nothing.
import { contentSignature, nameKeyOf, type FiberType } from './model';
import { describeErrors, validateRecord } from './validate';
import type { FiberStore } from './db';

export const BACKUP_FORMAT_ID = 'modewright.fiber-library';
export const BACKUP_FORMAT_VERSION = 1;
/** Largest file read: a library of 10,000 types is about 6 MB of JSON; 5 MB is far above real use. */
export const MAX_BACKUP_BYTES = 5 * 1024 * 1024;
export const MAX_BACKUP_RECORDS = 10_000;

/** A record as exported: the stored record without derived fields. */
export type ExportedFiberType = Omit<FiberType, 'nameKey'>;

export interface BackupFile {
  format: typeof BACKUP_FORMAT_ID;
  formatVersion: number;
  exportedAt: string;
  appVersion: string;
  recordCount: number;
  records: ExportedFiberType[];
}

export function toExported(r: FiberType): ExportedFiberType {
  const { nameKey: _derived, ...rest } = r;
  return rest;
}

/** The whole library as the text of a backup file. */
export function exportLibrary(records: readonly FiberType[], opts: { nowMs?: number; appVersion: string }): string {
  const file: BackupFile = {
    format: BACKUP_FORMAT_ID,
    formatVersion: BACKUP_FORMAT_VERSION,
    exportedAt: new Date(opts.nowMs ?? Date.now()).toISOString(),
    appVersion: opts.appVersion,
    recordCount: records.length,
    records: records.map(toExported),
  };
  return JSON.stringify(file, null, 2) + '\n';
}

export function backupFileName(nowMs = Date.now()): string {
  return `modewright-fiber-types-${new Date(nowMs).toISOString().slice(0, 10)}.json`;
}

export interface RejectedRecord {
  /** 1-based position in the file. */
  position: number;
  /** The record's name, cut to 60 characters, when it has one (shown as text only). */
  name?: string;
  problems: string[];
}

export interface ParsedBackup {
  ok: true;
  formatVersion: number;
  exportedAt?: string;
  totalInFile: number;
  valid: FiberType[];
  rejected: RejectedRecord[];
}

export interface Refusal {
  ok: false;
  reason: string;
}

const SHOWN_NAME_CHARS = 60;

function shownName(r: unknown): string | undefined {
  const n = (r as { name?: unknown } | null)?.name;
  if (typeof n !== 'string') return undefined;
  return n.length > SHOWN_NAME_CHARS ? n.slice(0, SHOWN_NAME_CHARS) + '…' : n;
}

function byteLength(text: string): number {
  return new TextEncoder().encode(text).length;
}

function mb(bytes: number): string {
  return `${(bytes / (1024 * 1024)).toFixed(1)} MB`;
}

/** Size check before reading a chosen file, so a huge file is never read into memory. */
export function checkFileSize(sizeBytes: number): Refusal | undefined {
  if (sizeBytes > MAX_BACKUP_BYTES) {
    return { ok: false, reason: `The file is too large (${mb(sizeBytes)}); a backup of this app is at most ${mb(MAX_BACKUP_BYTES)}. Nothing was imported.` };
  }
  return undefined;
}

/** Reads the text of a backup file. Never throws: a bad file gives a Refusal. */
export function readBackup(text: string): ParsedBackup | Refusal {
  if (typeof text !== 'string') return { ok: false, reason: 'The file could not be read as text. Nothing was imported.' };
  // Characters ≤ bytes, so the cheap length test first; then the exact UTF-8 size.
  const tooBig = text.length > MAX_BACKUP_BYTES ? checkFileSize(text.length) : checkFileSize(byteLength(text));
  if (tooBig) return tooBig;
  let data: unknown;
  try {
    data = JSON.parse(text);
  } catch {
    return { ok: false, reason: 'The file is not a complete backup: its JSON text is damaged or cut off. Nothing was imported.' };
  }
  if (data === null || typeof data !== 'object' || Array.isArray(data)) {
    return { ok: false, reason: 'The file is JSON but not a fiber library backup. Nothing was imported.' };
  }
  const f = data as Partial<Record<keyof BackupFile, unknown>>;
  if (f.format !== BACKUP_FORMAT_ID) {
    return { ok: false, reason: 'The file is not a Modewright fiber library backup (its format marker is missing or different). Nothing was imported.' };
  }
  const v = f.formatVersion;
  if (typeof v !== 'number' || !Number.isInteger(v) || v < 1) {
    return { ok: false, reason: 'The backup has no valid format version. Nothing was imported.' };
  }
  if (v > BACKUP_FORMAT_VERSION) {
    return {
      ok: false,
      reason: `The backup was made by a newer version of the app (format ${v}; this app reads up to format ${BACKUP_FORMAT_VERSION}). Update the app, then import again. Nothing was imported.`,
    };
  }
  if (!Array.isArray(f.records)) return { ok: false, reason: 'The backup has no list of fiber types. Nothing was imported.' };
  if (f.records.length > MAX_BACKUP_RECORDS) {
    return { ok: false, reason: `The backup holds ${f.records.length} fiber types; at most ${MAX_BACKUP_RECORDS} can be imported. Nothing was imported.` };
  }

  const valid: FiberType[] = [];
  const rejected: RejectedRecord[] = [];
  const firstPosById = new Map<string, number>();
  f.records.forEach((raw: unknown, i) => {
    const position = i + 1;
    const res = validateRecord(raw);
    if (!res.ok) {
      rejected.push({ position, name: shownName(raw), problems: describeErrors(res.errors) });
      return;
    }
    const first = firstPosById.get(res.value.id);
    if (first !== undefined) {
      rejected.push({ position, name: shownName(raw), problems: [`It has the same id as fiber type ${first} in the file; only the first is imported.`] });
      return;
    }
    firstPosById.set(res.value.id, position);
    valid.push(res.value);
  });
  return { ok: true, formatVersion: v, exportedAt: typeof f.exportedAt === 'string' ? f.exportedAt : undefined, totalInFile: f.records.length, valid, rejected };
}

export type ImportMode = 'merge' | 'replace';

export interface ImportPlan {
  mode: ImportMode;
  /** Records the transaction will put (new or updated). */
  toWrite: FiberType[];
  added: string[];
  updated: string[];
  /** Same id and same content: nothing to do. */
  unchanged: string[];
  /** Same id, the library's copy is newer: kept. */
  keptNewer: string[];
  /** A different id but the same fiber already in the library: skipped. */
  sameAsExisting: { name: string; existingName: string }[];
  /** Replace only: library records that will be removed. */
  removed: string[];
  rejected: RejectedRecord[];
  totalInFile: number;
}

/** What the import would do, without doing it. */
export function planImport(parsed: ParsedBackup, existing: readonly FiberType[], mode: ImportMode): ImportPlan {
  const plan: ImportPlan = {
    mode,
    toWrite: [],
    added: [],
    updated: [],
    unchanged: [],
    keptNewer: [],
    sameAsExisting: [],
    removed: [],
    rejected: parsed.rejected,
    totalInFile: parsed.totalInFile,
  };
  if (mode === 'replace') {
    const incoming = new Set(parsed.valid.map((r) => r.id));
    plan.removed = existing.filter((r) => !incoming.has(r.id)).map((r) => r.name);
    for (const r of parsed.valid) {
      plan.toWrite.push(r);
      (existing.some((e) => e.id === r.id) ? plan.updated : plan.added).push(r.name);
    }
    return plan;
  }
  const byId = new Map(existing.map((r) => [r.id, r]));
  const bySignature = new Map(existing.map((r) => [contentSignature(r), r]));
  for (const r of parsed.valid) {
    const old = byId.get(r.id);
    if (old) {
      if (contentSignature(old) === contentSignature(r)) plan.unchanged.push(r.name);
      else if (r.updatedAt > old.updatedAt) {
        plan.toWrite.push(r);
        plan.updated.push(r.name);
      } else plan.keptNewer.push(r.name);
      continue;
    }
    const twin = bySignature.get(contentSignature(r));
    if (twin) {
      plan.sameAsExisting.push({ name: r.name, existingName: twin.name });
      continue;
    }
    plan.toWrite.push(r);
    plan.added.push(r.name);
    bySignature.set(contentSignature(r), r);
  }
  return plan;
}

/** Plain-words report lines of a plan (before) or of a finished import (after). */
export function describePlan(plan: ImportPlan): string[] {
  const lines: string[] = [];
  const n = (k: number, one: string, many = `${one}s`) => `${k} ${k === 1 ? one : many}`;
  lines.push(`${n(plan.totalInFile, 'fiber type')} in the file.`);
  if (plan.mode === 'replace') lines.push(`Replace: the library will hold exactly the ${n(plan.toWrite.length, 'valid type')} of the file; ${n(plan.removed.length, 'type')} now in the library will be removed.`);
  else {
    lines.push(`${n(plan.added.length, 'new type')} to add, ${n(plan.updated.length, 'type')} to update with a newer copy.`);
    if (plan.unchanged.length) lines.push(`${n(plan.unchanged.length, 'type')} already in the library, identical: nothing to do.`);
    if (plan.keptNewer.length) lines.push(`${n(plan.keptNewer.length, 'type')} kept as they are: the library's copy is newer.`);
    if (plan.sameAsExisting.length) lines.push(`${n(plan.sameAsExisting.length, 'duplicate')} skipped: the same fiber is already saved under another entry.`);
  }
  if (plan.rejected.length) lines.push(`${n(plan.rejected.length, 'type')} in the file cannot be imported (listed below).`);
  return lines;
}

export interface ImportResult {
  ok: boolean;
  written: number;
  message: string;
}

/** Carries out a plan in one transaction. On failure the library is untouched and the reason is given. */
export async function applyImport(store: FiberStore, plan: ImportPlan): Promise<ImportResult> {
  if (plan.mode === 'merge' && plan.toWrite.length === 0) return { ok: true, written: 0, message: 'Nothing to import: the library already has everything in the file.' };
  try {
    await store.applyRecords(plan.toWrite, plan.mode);
    return { ok: true, written: plan.toWrite.length, message: `Imported: ${plan.toWrite.length} fiber type${plan.toWrite.length === 1 ? '' : 's'} written.` };
  } catch (e) {
    const why = e instanceof Error ? e.message : 'an unknown error';
    return { ok: false, written: 0, message: `The import failed and the library was left exactly as it was. Reason: ${why}` };
  }
}

/** True when two names would be confused in a list (used to warn on add and on import). */
export function sameName(a: string, b: string): boolean {
  return nameKeyOf(a) === nameKeyOf(b);
}
