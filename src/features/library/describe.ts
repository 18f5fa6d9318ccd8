// The one line under a saved type's name in the list: profile, core, guidance, cladding, category.
import type { FiberType } from '../../fibers/model';
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
