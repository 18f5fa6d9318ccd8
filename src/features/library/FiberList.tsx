// The saved types as a list. Names and notes are rendered as text nodes only, never as markup.
import type { FiberType } from '../../fibers/model';
import { validateRecord } from '../../fibers/validate';
import { formatNumber } from '../../ui/format';

export function describeType(r: FiberType): string {
  const parts: string[] = [];
  if (r.profile === 'label') {
    parts.push(`from label: ${r.cutoffKind ?? '?'} cutoff ${formatNumber(r.cutoffWavelengthNm)} nm, MFD ${formatNumber(r.mfdUm)} µm at ${formatNumber(r.mfdWavelengthNm)} nm`);
  } else {
    const guide = r.na !== undefined ? `NA ${formatNumber(r.na)}` : `indices ${formatNumber(r.coreIndex, 6)} / ${formatNumber(r.claddingIndex, 6)}`;
    parts.push(`${r.profile === 'graded' ? `graded-index α = ${formatNumber(r.gradedAlpha)}` : 'step-index'}, core ${formatNumber(r.coreDiameterUm)} µm, ${guide}`);
  }
  parts.push(`cladding ${formatNumber(r.claddingDiameterUm)} µm`);
  if (r.category) parts.push(r.category);
  return parts.join(' · ');
}

export interface FiberListProps {
  records: FiberType[];
  onEdit: (r: FiberType) => void;
  onDuplicate: (r: FiberType) => void;
  onDelete: (r: FiberType) => void;
  busy?: boolean;
}

export function FiberList({ records, onEdit, onDuplicate, onDelete, busy }: FiberListProps) {
  if (records.length === 0) return <p class="note">No fiber types match.</p>;
  return (
    <ul class="fiber-list" aria-label="Saved fiber types">
      {records.map((r) => {
        const damaged = !validateRecord(r).ok;
        return (
          <li key={r.id} class="fiber-item" data-fiber-id={r.id}>
            <p class="fiber-name">
              <strong>{typeof r.name === 'string' ? r.name : '(no name)'}</strong>
            </p>
            <p class="fiber-desc">{damaged ? 'This record is damaged (it fails the checks); edit it to repair it, or delete it.' : describeType(r)}</p>
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
      })}
    </ul>
  );
}
