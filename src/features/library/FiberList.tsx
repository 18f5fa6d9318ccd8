// The saved types as a list, one page at a time. Names and notes are rendered as text nodes only,
// never as markup. With a thousand types only a page of rows is in the document: building and
// diffing a thousand rows per key is what made Search slow on a phone.
import type { FiberType } from '../../fibers/model';
import { PAGE_ROWS, rowFacts, type IndexedType } from './query';

export { describeType } from './describe';

export interface FiberListProps {
  items: readonly IndexedType[];
  /** How many of `items` to show (the screen grows it by PAGE_ROWS). */
  shownRows: number;
  onShowMore: () => void;
  onEdit: (r: FiberType) => void;
  onDuplicate: (r: FiberType) => void;
  onDelete: (r: FiberType) => void;
  busy?: boolean;
}

interface RowProps {
  item: IndexedType;
  onEdit: (r: FiberType) => void;
  onDuplicate: (r: FiberType) => void;
  onDelete: (r: FiberType) => void;
  busy?: boolean;
}

function Row({ item, onEdit, onDuplicate, onDelete, busy }: RowProps) {
  const r = item.record;
  const { damaged, description } = rowFacts(r);
  return (
    <li class="fiber-item" data-fiber-id={r.id}>
      <p class="fiber-name">
        <strong>{typeof r.name === 'string' ? r.name : '(no name)'}</strong>
      </p>
      <p class="fiber-desc">{damaged ? 'This record is damaged (it fails the checks); edit it to repair it, or delete it.' : description}</p>
      {typeof r.notes === 'string' && r.notes !== '' && <p class="fiber-notes note">{r.notes}</p>}
      <div class="row">
        <button type="button" disabled={busy} onClick={() => onEdit(r)} aria-label={`Edit ${r.name}`}>
          Edit
        </button>
        <button type="button" disabled={busy || damaged} onClick={() => onDuplicate(r)} aria-label={`Duplicate ${r.name}`}>
          Duplicate
        </button>
        <button type="button" disabled={busy} onClick={() => onDelete(r)} aria-label={`Delete ${r.name}`}>
          Delete
        </button>
      </div>
    </li>
  );
}

export function FiberList({ items, shownRows, onShowMore, onEdit, onDuplicate, onDelete, busy }: FiberListProps) {
  if (items.length === 0) return <p class="note">No fiber types match.</p>;
  const shown = items.length > shownRows ? items.slice(0, shownRows) : items;
  const rest = items.length - shown.length;
  return (
    <>
      <ul class="fiber-list" aria-label="Saved fiber types">
        {shown.map((t) => (
          <Row key={t.record.id} item={t} onEdit={onEdit} onDuplicate={onDuplicate} onDelete={onDelete} busy={busy} />
        ))}
      </ul>
      {rest > 0 && (
        <p class="row library-more">
          <button type="button" onClick={onShowMore}>
            Show {Math.min(PAGE_ROWS, rest)} more
          </button>
          <span class="note">
            {shown.length} of {items.length} shown; Search finds any of them.
          </span>
        </p>
      )}
    </>
  );
}
