// The standard categories, read-only, each value with its source; clone one into an editable type.
// A category's table is built when its row is opened: closed, the tables of every category were two
// thirds of the screen's elements, built on every visit before the saved types could be listed.
import { useState } from 'preact/hooks';
import { CATEGORY_PRESETS, type CategoryPreset } from '../../fibers/presets';
import { formatNumber } from '../../ui/format';

function values(p: CategoryPreset): [string, string, string][] {
  const rows: [string, string, string][] = [];
  if (p.coreDiameterUm) rows.push(['Core diameter', `${formatNumber(p.coreDiameterUm.value)} µm`, p.coreDiameterUm.source]);
  if (p.na) rows.push(['Numerical aperture', formatNumber(p.na.value), p.na.source]);
  if (p.gradedAlpha) rows.push(['Profile exponent α', formatNumber(p.gradedAlpha.value), p.gradedAlpha.source]);
  rows.push(['Cladding diameter', `${formatNumber(p.claddingDiameterUm.value)} µm`, p.claddingDiameterUm.source]);
  if (p.cutoffWavelengthNm) rows.push([`${p.cutoffKind === 'cable' ? 'Cable' : 'Fiber'} cutoff used`, `${formatNumber(p.cutoffWavelengthNm.value)} nm`, p.cutoffWavelengthNm.source]);
  if (p.mfdUm) rows.push([`MFD used, at ${p.mfdWavelengthNm} nm`, `${formatNumber(p.mfdUm.value)} µm`, p.mfdUm.source]);
  for (const a of p.attenuationDbPerKm) rows.push([`Attenuation at ${a.value.wavelengthNm} nm`, `≤ ${formatNumber(a.value.dbPerKm)} dB/km`, a.source]);
  for (const f of p.facts) rows.push([f.label, f.value, f.source]);
  return rows;
}

function PresetItem({ p, onClone }: { p: CategoryPreset; onClone: (p: CategoryPreset) => void }) {
  const [open, setOpen] = useState(false);
  return (
    <li>
      <details onToggle={(e) => setOpen((e.currentTarget as HTMLDetailsElement).open)}>
        <summary>
          {p.title} <span class="note">({p.standard})</span>
        </summary>
        {open && (
          <>
            <div class="table-wrap">
              <table>
                <thead>
                  <tr>
                    <th scope="col">Value</th>
                    <th scope="col">Category</th>
                    <th scope="col">Source</th>
                  </tr>
                </thead>
                <tbody>
                  {values(p).map(([k, v, s], i) => (
                    <tr key={i}>
                      <th scope="row">{k}</th>
                      <td>{v}</td>
                      <td>{s}</td>
                    </tr>
                  ))}
                </tbody>
              </table>
            </div>
            {p.notes.map((n, i) => (
              <p class="note" key={i}>
                {n}
              </p>
            ))}
            <button type="button" onClick={() => onClone(p)}>
              Clone {p.category} into my library
            </button>
          </>
        )}
      </details>
    </li>
  );
}

export function PresetList({ onClone }: { onClone: (p: CategoryPreset) => void }) {
  return (
    <ul class="preset-list">
      {CATEGORY_PRESETS.map((p) => (
        <PresetItem key={p.category} p={p} onClone={onClone} />
      ))}
    </ul>
  );
}
