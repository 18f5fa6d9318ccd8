// Backup of the fiber library: export to our own JSON format (BACKUP_FORMAT.md), and import with a
// preview. Import is four steps so the screen can show what will happen before anything changes:
//   decodeBackup(bytes) → the file's text, strictly UTF-8, or a refusal (empty, not UTF-8, not text);
//   readBackup(text) → a parsed file, or a refusal in plain words (malformed, too large, future version);
//   planImport(parsed, existing, mode, choices) → what would be added, updated, kept, skipped, and why,
//     record by record, with a choice for each record whose name is already saved for another fiber;
//   applyImport(store, plan) → one transaction: all of the plan, or (on any failure) nothing.
import { contentSignature, nameKeyOf, type FiberType } from './model';
import { fieldChanges } from './differences';
import { proposeDistinctName, sameName } from './names';
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
  /** 1-based position in the file of each valid record (same order as `valid`); absent: 1, 2, 3… */
  positions?: number[];
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

export const EMPTY_FILE_TEXT = 'The file is empty: it holds no backup. Choose the file the app exported. Nothing was imported.';
export const NOT_UTF8_TEXT = 'This file is not in the UTF-8 text encoding; export it again from the app. (Another program may have saved it again in Latin-1 or a Windows encoding, which would garble accented names.) Nothing was imported.';
export const UTF16_TEXT = 'This file is in the UTF-16 text encoding, not UTF-8 (another program saved it again); export it again from the app. Nothing was imported.';
export const NOT_TEXT_TEXT = 'This is not a text file (it holds binary data, such as a picture or an archive), so it cannot be a backup of this app. Nothing was imported.';

/** Bytes that never occur in text: NUL and the C0 controls other than tab, line feed, form feed, carriage return, and escape. */
function isBinaryByte(b: number): boolean {
  return b === 0 || (b < 0x20 && b !== 0x09 && b !== 0x0a && b !== 0x0c && b !== 0x0d && b !== 0x1b) || b === 0x7f;
}

/** How many leading bytes the encoding sniff reads: enough to see a pattern, cheap on a 5 MB file. */
const SNIFF_BYTES = 4096;

/** UTF-16 by its byte-order mark, or (without one) by ASCII text with a zero in every other byte. */
function looksUtf16(bytes: Uint8Array): boolean {
  if (bytes.length >= 2 && ((bytes[0] === 0xff && bytes[1] === 0xfe) || (bytes[0] === 0xfe && bytes[1] === 0xff))) return true;
  const n = Math.min(bytes.length, SNIFF_BYTES) & ~1;
  if (n < 4) return false;
  let zeroEven = 0;
  let zeroOdd = 0;
  for (let i = 0; i < n; i += 2) {
    if (bytes[i] === 0) zeroEven++;
    if (bytes[i + 1] === 0) zeroOdd++;
  }
  const pairs = n / 2;
  // JSON text in UTF-16 is almost all ASCII: one byte of each pair is zero (which one: the byte order).
  return Math.max(zeroEven, zeroOdd) >= 0.9 * pairs && Math.min(zeroEven, zeroOdd) <= 0.1 * pairs;
}

/**
 * The text of a chosen backup file, decoded strictly as UTF-8 (the format says UTF-8): a file in
 * another encoding is refused rather than read with replacement characters in its names. Each kind
 * of wrong file has its own words: empty, UTF-16, binary (not text), and other non-UTF-8 text.
 */
export function decodeBackup(bytes: Uint8Array): { ok: true; text: string } | Refusal {
  if (bytes.length === 0) return { ok: false, reason: EMPTY_FILE_TEXT };
  const tooBig = checkFileSize(bytes.length);
  if (tooBig) return tooBig;
  if (looksUtf16(bytes)) return { ok: false, reason: UTF16_TEXT };
  const head = bytes.subarray(0, SNIFF_BYTES);
  let binary = 0;
  for (const b of head) if (isBinaryByte(b)) binary++;
  // One NUL, or more than 1 % control bytes, and it is not text: text files have neither.
  if (head.includes(0) || binary > head.length / 100) return { ok: false, reason: NOT_TEXT_TEXT };
  let text: string;
  try {
    // fatal: an invalid byte sequence throws instead of becoming U+FFFD. The UTF-8 byte-order mark,
    // which some editors add, is dropped (ignoreBOM false).
    text = new TextDecoder('utf-8', { fatal: true, ignoreBOM: false }).decode(bytes);
  } catch {
    return { ok: false, reason: NOT_UTF8_TEXT };
  }
  return { ok: true, text };
}

/** decodeBackup then readBackup: the whole reading of a chosen file's bytes. */
export function readBackupBytes(bytes: Uint8Array): ParsedBackup | Refusal {
  const decoded = decodeBackup(bytes);
  return decoded.ok ? readBackup(decoded.text) : decoded;
}

/** Reads the text of a backup file. Never throws: a bad file gives a Refusal. */
export function readBackup(text: string): ParsedBackup | Refusal {
  if (typeof text !== 'string') return { ok: false, reason: 'The file could not be read as text. Nothing was imported.' };
  if (text.trim() === '') return { ok: false, reason: EMPTY_FILE_TEXT };
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
  const positions: number[] = [];
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
    positions.push(position);
  });
  return { ok: true, formatVersion: v, exportedAt: typeof f.exportedAt === 'string' ? f.exportedAt : undefined, totalInFile: f.records.length, valid, positions, rejected };
}

export type ImportMode = 'merge' | 'replace';

/**
 * What to do with an imported record whose name is already saved for a different fiber:
 * 'keep-both' imports it under a distinct name the plan proposes; 'replace' removes the saved one
 * and imports this one in its place; 'skip' leaves it out.
 */
export type ClashChoice = 'keep-both' | 'replace' | 'skip';
export const CLASH_CHOICES: readonly ClashChoice[] = ['keep-both', 'replace', 'skip'];

export interface NameClash {
  /** The record as it is in the file. */
  incoming: FiberType;
  position: number;
  /** The saved record (or an earlier record of the same file) that already has the name. */
  existing: FiberType;
  /** True when `existing` is an earlier record of this file: it can then only be kept both or skipped. */
  existingInFile: boolean;
  /** A name no saved record and no record of the file has, offered for "keep both". */
  proposedName: string;
  /** How the file's fiber differs from the saved one, one line per field. */
  differences: string[];
  choice: ClashChoice;
}

/** One line of the preview per valid record of the file, in file order. */
export interface PlannedRecord {
  position: number;
  name: string;
  fate: 'add' | 'update' | 'unchanged' | 'kept-newer' | 'duplicate' | 'clash' | 'write';
  /** Plain words for the fate (the clash's own words are built by the screen from `clash`). */
  words: string;
  clash?: NameClash;
}

export interface ImportPlan {
  mode: ImportMode;
  /** Records the transaction will put (new or updated). */
  toWrite: FiberType[];
  /** Saved records the transaction will delete (merge: replaced by a clashing record, by choice). */
  toDelete: string[];
  added: string[];
  updated: string[];
  /** Same id and same content: nothing to do. */
  unchanged: string[];
  /** Same id, the library's copy is newer: kept. */
  keptNewer: string[];
  /** A different id but the same fiber already in the library: skipped. */
  sameAsExisting: { name: string; existingName: string }[];
  /** A different id and a different fiber, but a name already saved: each with the person's choice. */
  clashes: NameClash[];
  /** Replace only: library records that will be removed. */
  removed: string[];
  rejected: RejectedRecord[];
  /** Every valid record of the file with what will happen to it. */
  records: PlannedRecord[];
  totalInFile: number;
}

/**
 * What the import would do, without doing it. `choices` holds the person's choice for each record
 * (by id) whose name is already saved for a different fiber; without one, the record is kept under
 * a distinct name, so nothing is lost and no two entries look the same.
 */
export function planImport(parsed: ParsedBackup, existing: readonly FiberType[], mode: ImportMode, choices: Readonly<Record<string, ClashChoice>> = {}): ImportPlan {
  const plan: ImportPlan = {
    mode,
    toWrite: [],
    toDelete: [],
    added: [],
    updated: [],
    unchanged: [],
    keptNewer: [],
    sameAsExisting: [],
    clashes: [],
    removed: [],
    rejected: parsed.rejected,
    records: [],
    totalInFile: parsed.totalInFile,
  };
  const positionAt = (i: number) => parsed.positions?.[i] ?? i + 1;
  const row = (i: number, r: FiberType, fate: PlannedRecord['fate'], words: string, clash?: NameClash) =>
    plan.records.push({ position: positionAt(i), name: r.name, fate, words, clash });

  if (mode === 'replace') {
    const incoming = new Set(parsed.valid.map((r) => r.id));
    const have = new Set(existing.map((r) => r.id));
    plan.removed = existing.filter((r) => !incoming.has(r.id)).map((r) => r.name);
    parsed.valid.forEach((r, i) => {
      plan.toWrite.push(r);
      const replacing = have.has(r.id);
      (replacing ? plan.updated : plan.added).push(r.name);
      row(i, r, 'write', replacing ? 'will replace the saved copy with the same id' : 'will be written');
    });
    return plan;
  }

  const byId = new Map(existing.map((r) => [r.id, r]));
  const bySignature = new Map(existing.map((r) => [contentSignature(r), r]));
  // Who holds each name once the import is done, and every name anyone has (for proposals).
  const nameHolder = new Map<string, { record: FiberType; inFile: boolean }>();
  for (const r of existing) if (typeof r.name === 'string' && !nameHolder.has(nameKeyOf(r.name))) nameHolder.set(nameKeyOf(r.name), { record: r, inFile: false });
  const taken = new Set<string>([...existing.filter((r) => typeof r.name === 'string').map((r) => nameKeyOf(r.name)), ...parsed.valid.map((r) => nameKeyOf(r.name))]);
  const deleted = new Set<string>();

  parsed.valid.forEach((r, i) => {
    const old = byId.get(r.id);
    if (old && !deleted.has(old.id)) {
      if (contentSignature(old) === contentSignature(r)) {
        plan.unchanged.push(r.name);
        row(i, r, 'unchanged', 'already saved, identical: nothing to do');
      } else if (r.updatedAt > old.updatedAt) {
        plan.toWrite.push(r);
        plan.updated.push(r.name);
        row(i, r, 'update', 'a newer copy of a saved type: will update it');
      } else {
        plan.keptNewer.push(r.name);
        row(i, r, 'kept-newer', 'the saved copy is as new or newer: kept as it is');
      }
      return;
    }
    const twin = bySignature.get(contentSignature(r));
    if (twin) {
      plan.sameAsExisting.push({ name: r.name, existingName: twin.name });
      row(i, r, 'duplicate', `the same fiber is already saved as “${twin.name}”: skipped`);
      return;
    }
    const key = nameKeyOf(r.name);
    const holder = nameHolder.get(key);
    if (holder && sameName(holder.record.name, r.name)) {
      const proposedName = proposeDistinctName(r.name, taken);
      taken.add(nameKeyOf(proposedName));
      let choice = choices[r.id] ?? 'keep-both';
      if (choice === 'replace' && holder.inFile) choice = 'keep-both';
      const clash: NameClash = {
        incoming: r,
        position: positionAt(i),
        existing: holder.record,
        existingInFile: holder.inFile,
        proposedName,
        differences: fieldChanges(holder.record, r, { ignoreName: true }),
        choice,
      };
      plan.clashes.push(clash);
      row(i, r, 'clash', '', clash);
      if (choice === 'keep-both') {
        const renamed: FiberType = { ...r, name: proposedName, nameKey: nameKeyOf(proposedName) };
        plan.toWrite.push(renamed);
        nameHolder.set(renamed.nameKey, { record: renamed, inFile: true });
        bySignature.set(contentSignature(renamed), renamed);
      } else if (choice === 'replace') {
        plan.toDelete.push(holder.record.id);
        deleted.add(holder.record.id);
        bySignature.delete(contentSignature(holder.record));
        plan.toWrite.push(r);
        nameHolder.set(key, { record: r, inFile: true });
        bySignature.set(contentSignature(r), r);
      }
      return;
    }
    plan.toWrite.push(r);
    plan.added.push(r.name);
    row(i, r, 'add', 'new: will be added');
    bySignature.set(contentSignature(r), r);
    nameHolder.set(key, { record: r, inFile: true });
  });
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
    if (plan.clashes.length) {
      const by = (c: ClashChoice) => plan.clashes.filter((x) => x.choice === c).length;
      lines.push(
        `${n(plan.clashes.length, 'type has', 'types have')} a name already used by a different fiber: choose for each below (now: ${by('keep-both')} kept under a new name, ${by('replace')} replacing the saved one, ${by('skip')} skipped).`,
      );
    }
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
  if (plan.mode === 'merge' && plan.toWrite.length === 0) return { ok: true, written: 0, message: 'Nothing to import: the library already has everything in the file, or every new type was skipped.' };
  try {
    await store.applyRecords(plan.toWrite, plan.mode, plan.toDelete);
    return { ok: true, written: plan.toWrite.length, message: `Imported: ${plan.toWrite.length} fiber type${plan.toWrite.length === 1 ? '' : 's'} written.` };
  } catch (e) {
    const why = e instanceof Error ? e.message : 'an unknown error';
    return { ok: false, written: 0, message: `The import failed and the library was left exactly as it was. Reason: ${why}` };
  }
}

// Names: what counts as the same name, and the distinct name proposed (also used by the store).
export { proposeDistinctName, sameName } from './names';
