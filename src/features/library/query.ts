// The list's data path: search and order. Pure, so the bench can time it without a DOM.
import { nameKeyOf, type FiberType } from '../../fibers/model';

export type SortOrder = 'name' | 'recent';

/** Words of the query must all appear in the name, category or notes (case and spacing ignored). */
export function filterAndSort(records: readonly FiberType[], query: string, order: SortOrder = 'name'): FiberType[] {
  const words = nameKeyOf(query).split(' ').filter(Boolean);
  const hits = words.length === 0 ? [...records] : records.filter((r) => {
    const hay = `${r.nameKey ?? ''} ${(r.category ?? '').toLowerCase()} ${typeof r.notes === 'string' ? r.notes.toLowerCase() : ''}`;
    return words.every((w) => hay.includes(w));
  });
  return hits.sort(order === 'recent' ? (a, b) => b.updatedAt - a.updatedAt || cmp(a, b) : cmp);
}

function cmp(a: FiberType, b: FiberType): number {
  const ka = a.nameKey ?? '';
  const kb = b.nameKey ?? '';
  return ka < kb ? -1 : ka > kb ? 1 : a.id < b.id ? -1 : a.id > b.id ? 1 : 0;
}
