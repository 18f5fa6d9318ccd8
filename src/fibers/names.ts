// Names a person can tell apart. Two names are "the same" when they are equal once case, spacing and
// compatible characters are ignored (nameKeyOf): such a pair looks identical in the list and in every
// calculator's picker. Used on import (backup.ts planImport) and on add and rename (db.ts, inside the
// write transaction).
import { nameKeyOf, type FiberType } from './model';
import { NAME_MAX_CHARS } from './validate';

/** True when two names would be confused in a list. */
export function sameName(a: string, b: string): boolean {
  return nameKeyOf(a) === nameKeyOf(b);
}

/**
 * A distinct name to offer instead: the name followed by " (2)", " (3)"… — the first whose key is not
 * in `takenKeys` — cut to fit the name limit.
 */
export function proposeDistinctName(name: string, takenKeys: ReadonlySet<string>): string {
  const base = name.normalize('NFC').trim();
  for (let k = 2; ; k++) {
    const suffix = ` (${k})`;
    const candidate = base.length + suffix.length > NAME_MAX_CHARS ? base.slice(0, NAME_MAX_CHARS - suffix.length).trimEnd() + suffix : base + suffix;
    if (!takenKeys.has(nameKeyOf(candidate))) return candidate;
  }
}

/**
 * The one order of the library: by name key, then names that fold to the same key ("Tray 7",
 * "tray 7") by the name as written, then by id — never by chance. Used by the store's list and by
 * the screen's index, so both show the same order.
 */
export function compareByName(a: Pick<FiberType, 'nameKey' | 'name' | 'id'>, b: Pick<FiberType, 'nameKey' | 'name' | 'id'>): number {
  const ka = a.nameKey ?? '';
  const kb = b.nameKey ?? '';
  if (ka !== kb) return ka < kb ? -1 : 1;
  if (a.name !== b.name) return a.name < b.name ? -1 : 1;
  return a.id < b.id ? -1 : a.id > b.id ? 1 : 0;
}
