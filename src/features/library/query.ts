// The list's data path: search and order. Pure, so the bench can time it without a DOM.
//
// With a thousand saved types on a slow phone, the work per key must be small: everything that
// depends only on the records (the text searched, the two orders, whether a record passes the
// checks, the line describing it) is computed once when the records change (buildIndex); a key in
// Search then only filters a list already in order (search), and the screen renders one page of it.
import { nameKeyOf, type FiberType } from '../../fibers/model';
import { validateRecord } from '../../fibers/validate';
import { describeType } from './describe';

export type SortOrder = 'name' | 'recent';

/** A record with what the list needs of it, computed once per change of the library. */
export interface IndexedType {
  record: FiberType;
  /** Name key, category and notes, lower-cased: what a query's words are looked for in. */
  haystack: string;
  /** Fails the checks (a damaged or tampered record): listed with a warning, not described. */
  damaged: boolean;
  /** The one-line description shown under the name (empty when damaged). */
  description: string;
}

export interface LibraryIndex {
  byName: IndexedType[];
  byRecent: IndexedType[];
  size: number;
}

function byNameKey(a: IndexedType, b: IndexedType): number {
  const ka = a.record.nameKey ?? '';
  const kb = b.record.nameKey ?? '';
  const ia = a.record.id;
  const ib = b.record.id;
  return ka < kb ? -1 : ka > kb ? 1 : ia < ib ? -1 : ia > ib ? 1 : 0;
}

/** Builds the search text, checks, descriptions and both orders once; O(n log n), per change only. */
export function buildIndex(records: readonly FiberType[]): LibraryIndex {
  const items: IndexedType[] = records.map((r) => {
    const damaged = !validateRecord(r).ok;
    return {
      record: r,
      haystack: `${typeof r.nameKey === 'string' ? r.nameKey : ''} ${typeof r.category === 'string' ? r.category.toLowerCase() : ''} ${typeof r.notes === 'string' ? r.notes.toLowerCase() : ''}`,
      damaged,
      description: damaged ? '' : describeType(r),
    };
  });
  const byName = items.sort(byNameKey);
  const byRecent = [...byName].sort((a, b) => (b.record.updatedAt ?? 0) - (a.record.updatedAt ?? 0) || byNameKey(a, b));
  return { byName, byRecent, size: items.length };
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
