// Search, order and the list of saved types, with their own state: a key in Search re-renders this
// part only, not the rest of the library screen (categories, backup, storage), which on a slow phone
// cost more than the list itself.
import { useMemo, useState } from 'preact/hooks';
import { FiberList } from './FiberList';
import { buildIndex, PAGE_ROWS, search, type SortOrder } from './query';
import type { FiberType } from '../../fibers/model';

export interface SavedListProps {
  records: FiberType[];
  onEdit: (r: FiberType) => void;
  onDuplicate: (r: FiberType) => void;
  onDelete: (r: FiberType) => void;
  busy?: boolean;
}

export function SavedList({ records, onEdit, onDuplicate, onDelete, busy }: SavedListProps) {
  const [query, setQuery] = useState('');
  const [order, setOrder] = useState<SortOrder>('name');
  const [shownRows, setShownRows] = useState(PAGE_ROWS);
  // The index is rebuilt only when the library changes; a key in Search filters it (no sort, no
  // per-row checks), and only a page of rows is rendered.
  const index = useMemo(() => buildIndex(records), [records]);
  const shown = useMemo(() => search(index, query, order), [index, query, order]);
  return (
    <>
      <div class="form">
        <div class="field">
          <label for="lib-search">Search</label>
          <input
            id="lib-search"
            type="search"
            value={query}
            maxLength={80}
            onInput={(e) => {
              setQuery((e.currentTarget as HTMLInputElement).value);
              setShownRows(PAGE_ROWS);
            }}
          />
        </div>
        <div class="field">
          <label for="lib-order">Order</label>
          <select
            id="lib-order"
            value={order}
            onChange={(e) => {
              setOrder((e.currentTarget as HTMLSelectElement).value as SortOrder);
              setShownRows(PAGE_ROWS);
            }}
          >
            <option value="name">By name</option>
            <option value="recent">Most recently changed first</option>
          </select>
        </div>
      </div>
      {records.length === 0 ? (
        <p class="note">No fiber types saved yet. Add one, clone a standard category below, or load the demo library.</p>
      ) : (
        <>
          <p id="lib-count" class="note" aria-live="polite">
            {query.trim() === '' ? `${records.length} saved.` : `${shown.length} of ${records.length} match.`}
          </p>
          <FiberList
            items={shown}
            shownRows={shownRows}
            onShowMore={() => setShownRows((n) => n + PAGE_ROWS)}
            onEdit={onEdit}
            onDuplicate={onDuplicate}
            onDelete={onDelete}
            busy={busy}
          />
        </>
      )}
    </>
  );
}
