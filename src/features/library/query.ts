// The list's data path: search and order. Pure, so the bench can time it without a DOM.
//
// With a thousand saved types on a slow phone, the work per key must be small: what depends only on
// the records (the text searched, the order by name) is computed once when the records change
// (buildIndex); a key in Search then only filters a list already in order (search), and the screen
// renders one page of it. What only a shown row needs (its checks and its line of description) is
// computed when the row is first shown and kept (rowFacts), so opening the screen does not check
// and describe a thousand records to show fifty.
import { nameKeyOf, type FiberType } from '../../fibers/model';
import { validateRecord } from '../../fibers/validate';
import { compareByName } from '../../fibers/names';
import { describeType } from './describe';

export type SortOrder = 'name' | 'recent';

/** Rows shown at first and added by each "Show more": a screenful or two on a phone. */
export const PAGE_ROWS = 25;

/** A record with what a search needs of it, computed once per change of the library. */
export interface IndexedType {
  record: FiberType;
  /** Name key, category and notes, lower-cased: what a query's words are looked for in. */
  haystack: string;
}

export interface LibraryIndex {
  byName: IndexedType[];
  /** Built on first use: most people never change the order. */
  readonly byRecent: IndexedType[];
  size: number;
}

export interface RowFacts {
  /** Fails the checks (a damaged or tampered record): listed with a warning, not described. */
  damaged: boolean;
  /** The one-line description shown under the name (empty when damaged). */
  description: string;
}

// Records are never changed in place (every change from the store is a new object), so the facts of
// a record object stay true for as long as it lives.
const FACTS = new WeakMap<FiberType, RowFacts>();

/** The checks and the description of one record, computed on first use and kept. */
export function rowFacts(r: FiberType): RowFacts {
  let f = FACTS.get(r);
  if (!f) {
    const damaged = !validateRecord(r).ok;
    f = { damaged, description: damaged ? '' : describeType(r) };
    FACTS.set(r, f);
  }
  return f;
}

function byNameKey(a: IndexedType, b: IndexedType): number {
  return compareByName(a.record, b.record);
}

/** Builds the search text and the order by name once, per change of the library only. */
export function buildIndex(records: readonly FiberType[]): LibraryIndex {
  const items: IndexedType[] = records.map((r) => ({
    record: r,
    haystack: `${typeof r.nameKey === 'string' ? r.nameKey : ''} ${typeof r.category === 'string' ? r.category.toLowerCase() : ''} ${typeof r.notes === 'string' ? r.notes.toLowerCase() : ''}`,
  }));
  // The store lists by name already: this sort only confirms the order (linear on sorted input).
  const byName = items.sort(byNameKey);
  let byRecent: IndexedType[] | undefined;
  return {
    byName,
    get byRecent() {
      byRecent ??= [...byName].sort((a, b) => (b.record.updatedAt ?? 0) - (a.record.updatedAt ?? 0) || byNameKey(a, b));
      return byRecent;
    },
    size: items.length,
  };
}

/** The words of a query: normalised like names, so "  DRUM   12 " finds "Drum 12". */
export function queryWords(query: string): string[] {
  return nameKeyOf(query).split(' ').filter(Boolean);
}

/**
 * The records whose name, category or notes contain every word of the query (case and spacing
 * ignored), in the chosen order. Filters an already ordered list: no sorting per key.
 */
export function search(index: LibraryIndex, query: string, order: SortOrder = 'name'): IndexedType[] {
  const list = order === 'recent' ? index.byRecent : index.byName;
  const words = queryWords(query);
  if (words.length === 0) return list;
  return list.filter((t) => words.every((w) => t.haystack.includes(w)));
}

/** The records of `search`, for callers that only want the records (the bench, older callers). */
export function filterAndSort(records: readonly FiberType[], query: string, order: SortOrder = 'name'): FiberType[] {
  return search(buildIndex(records), query, order).map((t) => t.record);
}
