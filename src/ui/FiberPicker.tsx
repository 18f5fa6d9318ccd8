// One way to pick a fiber on every screen: a standard category, a saved type, typed values
// (core diameter + NA), or label values. The hook returns the resolved fiber, the reason there is
// none, and the element to place in the form. Resolution itself lives in src/fibers/resolve.ts.
import type { JSX } from 'preact';
import { useEffect, useMemo, useState } from 'preact/hooks';
import { NumberField } from './NumberField';
import { useQuantity } from './useQuantity';
import { errorText } from './errorText';
import { formatNumber, formatQuantity } from './format';
import { presetsOfKinds, findPreset, type FiberKind } from '../fibers/presets';
import { kindOfSaved, resolveLabel, resolvePreset, resolveSaved, resolveTyped } from '../fibers/resolve';
import type { ResolvedFiber } from '../fibers/resolved';
import type { FiberType } from '../fibers/model';
import { validateRecord } from '../fibers/validate';

export interface FiberPickerOptions {
  /** Stable id, unique on the screen: names the fields and the remembered choice. */
  id: string;
  label: string;
  kinds: FiberKind[];
  defaultCategory: string;
  /** A short name for the one-line summary once chosen ("Sending"); the label if not given. */
  shortLabel?: string;
  /** Where the fiber comes from on first use (before the person chooses); a standard category if not given. */
  defaultSource?: Source;
}

export interface FiberPickerState {
  fiber: ResolvedFiber | undefined;
  error: string | undefined;
  element: JSX.Element;
}

export type Source = 'category' | 'saved' | 'typed' | 'label';

/** What is remembered per picker id. Texts are kept as typed so a reload shows the same field. */
interface PickerMemory {
  source: Source;
  category: string;
  savedId?: string;
  profile: 'step' | 'graded';
  coreText: string;
  naText: string;
  alphaText: string;
  cutoffText: string;
  cutoffKind: 'fiber' | 'cable';
  mfdText: string;
  mfdWlText: string;
}

const MEMORY_PREFIX = 'modewright.fiberPicker.';

function loadMemory(id: string): Partial<PickerMemory> {
  try {
    const raw = globalThis.localStorage?.getItem(MEMORY_PREFIX + id);
    if (!raw) return {};
    const m: unknown = JSON.parse(raw);
    return m && typeof m === 'object' ? (m as Partial<PickerMemory>) : {};
  } catch {
    // Private mode or a damaged entry: start from the defaults, never fail the screen.
    return {};
  }
}

function saveMemory(id: string, m: PickerMemory): void {
  try {
    globalThis.localStorage?.setItem(MEMORY_PREFIX + id, JSON.stringify(m));
  } catch {
    // Storage full or refused: the choice is simply not remembered.
  }
}

function str(v: unknown, fallback: string): string {
  return typeof v === 'string' && v.length <= 64 ? v : fallback;
}

/** The saved types, kept current when the library changes (here or in another tab). */
export function useSavedFiberTypes(): { types: FiberType[] | undefined; error: string | undefined } {
  const [types, setTypes] = useState<FiberType[] | undefined>(undefined);
  const [error, setError] = useState<string | undefined>(undefined);
  useEffect(() => {
    let live = true;
    let off: (() => void) | undefined;
    // The store (and the IndexedDB wrapper under it) loads after the screen: a calculator opens on a
    // standard category, and its first answer need not wait for the library code.
    import('../fibers/db')
      .then(({ getFiberStore }) => getFiberStore())
      .then((store) => {
        const load = () =>
          store.list().then(
            (all) => live && setTypes(all.filter((r) => validateRecord(r).ok)),
            (e: unknown) => live && setError(e instanceof Error ? e.message : String(e)),
          );
        off = store.subscribe(() => void load());
        return load();
      })
      .catch((e: unknown) => live && setError(e instanceof Error ? e.message : String(e)));
    return () => {
      live = false;
      off?.();
    };
  }, []);
  return { types, error };
}

export function useFiberPicker(opts: FiberPickerOptions): FiberPickerState {
  const { id, label, kinds, defaultCategory, defaultSource = 'category', shortLabel = label } = opts;
  const presets = useMemo(() => presetsOfKinds(kinds), [kinds.join(',')]);
  const allowsSingleMode = kinds.includes('single-mode');
  const mmOnly = !allowsSingleMode;
  const [memory] = useState(() => loadMemory(id));

  const validCategory = (c: unknown) => typeof c === 'string' && presets.some((p) => p.category === c);
  const rememberedSource = memory.source;
  const [source, setSource] = useState<Source>(
    rememberedSource === 'typed' || rememberedSource === 'category' || rememberedSource === 'saved' || (rememberedSource === 'label' && allowsSingleMode)
      ? rememberedSource
      : defaultSource === 'label' && !allowsSingleMode
        ? 'category'
        : defaultSource,
  );
  /** Open while the person is choosing; folded to one line once a fiber is chosen. Undefined: not toggled by hand. */
  const [openByHand, setOpenByHand] = useState<boolean | undefined>(undefined);
  const [category, setCategory] = useState<string>(
    validCategory(memory.category) ? memory.category! : validCategory(defaultCategory) ? defaultCategory : presets[0]?.category ?? '',
  );
  const [profile, setProfile] = useState<'step' | 'graded'>(
    memory.profile === 'step' || memory.profile === 'graded' ? memory.profile : mmOnly ? 'graded' : 'step',
  );
  const [savedId, setSavedId] = useState<string>(typeof memory.savedId === 'string' ? memory.savedId : '');
  const savedAll = useSavedFiberTypes();
  const saved = useMemo(() => {
    const fits = (t: FiberType) => {
      const k = kindOfSaved(t);
      return k === undefined || kinds.includes(k);
    };
    return { error: savedAll.error, types: savedAll.types?.filter(fits) };
  }, [savedAll.types, savedAll.error, kinds.join(',')]);
  const [cutoffKind, setCutoffKind] = useState<'fiber' | 'cable'>(memory.cutoffKind === 'fiber' ? 'fiber' : 'cable');
  const core = useQuantity(`${id}-coreDiameterUm`, 'size', str(memory.coreText, mmOnly ? '50' : '8.2'));
  const na = useQuantity(`${id}-na`, 'plain', str(memory.naText, mmOnly ? '0.2' : '0.14'));
  const alpha = useQuantity(`${id}-gradedAlpha`, 'plain', str(memory.alphaText, '2'));
  const cutoff = useQuantity(`${id}-cutoffWavelengthNm`, 'wavelength', str(memory.cutoffText, '1260'));
  const mfd = useQuantity(`${id}-mfdUm`, 'size', str(memory.mfdText, '9.2'));
  const mfdWl = useQuantity(`${id}-mfdWavelengthNm`, 'wavelength', str(memory.mfdWlText, '1310'));

  useEffect(() => {
    saveMemory(id, {
      source,
      category,
      savedId,
      profile,
      coreText: core.text,
      naText: na.text,
      alphaText: alpha.text,
      cutoffText: cutoff.text,
      cutoffKind,
      mfdText: mfd.text,
      mfdWlText: mfdWl.text,
    });
  }, [id, source, category, savedId, profile, core.text, na.text, alpha.text, cutoff.text, cutoffKind, mfd.text, mfdWl.text]);

  const resolved = useMemo((): { fiber?: ResolvedFiber; error?: string } => {
    try {
      if (source === 'category') {
        const p = findPreset(category);
        if (!p) return { error: 'Choose a fiber category.' };
        return { fiber: resolvePreset(p) };
      }
      if (source === 'typed') {
        if (core.error || na.error || (profile === 'graded' && alpha.error)) return { error: 'Check the fiber values marked above.' };
        return { fiber: resolveTyped({ profile, coreDiameterUm: core.value!, na: na.value!, gradedAlpha: alpha.value }, `${id}-`) };
      }
      if (source === 'label') {
        if (cutoff.error || mfd.error || mfdWl.error) return { error: 'Check the label values marked above.' };
        return {
          fiber: resolveLabel({ cutoffWavelengthNm: cutoff.value!, cutoffKind, mfdUm: mfd.value!, mfdWavelengthNm: mfdWl.value! }, `${id}-`),
        };
      }
      if (saved.error) return { error: saved.error };
      if (!saved.types) return { error: 'Loading the saved fiber types…' };
      const r = saved.types.find((t) => t.id === savedId) ?? saved.types[0];
      if (!r) return { error: 'No fiber types are saved yet: add one on the Fiber types screen, or choose another way.' };
      return { fiber: resolveSaved(r) };
    } catch (e) {
      return { error: errorText(e) };
    }
  }, [saved.types, saved.error, savedId, source, category, profile, core.value, core.error, na.value, na.error, alpha.value, alpha.error, cutoff.value, cutoff.error, cutoffKind, mfd.value, mfd.error, mfdWl.value, mfdWl.error, id]);

  const selId = `${id}-source`;
  const open = openByHand ?? !resolved.fiber;
  // Made again only when what it shows changes: a key typed in another field of the screen re-renders the
  // screen, and the picker's selects, options and summary would otherwise be compared anew on every key.
  const element = useMemo(() => (
    <details
      class="fiber-picker"
      open={open}
      onToggle={(e) => {
        const now = (e.currentTarget as HTMLDetailsElement).open;
        if (now !== open) setOpenByHand(now);
      }}
    >
      <summary class="picker-summary">
        <span class="picker-line">
          <strong>{shortLabel}:</strong> <span class="user-text">{resolved.fiber ? resolved.fiber.name : 'not chosen yet'}</span>
        </span>
        <span class="picker-change">{open ? 'Done' : 'Change'}</span>
      </summary>
      <div class="picker-body" role="group" aria-label={label}>
      <div class="field">
        <label for={selId}>Fiber from</label>
        <select id={selId} value={source} onChange={(e) => setSource((e.currentTarget as HTMLSelectElement).value as Source)}>
          <option value="category">A standard category</option>
          <option value="saved">A saved fiber type</option>
          <option value="typed">Typed values (core diameter and NA)</option>
          {allowsSingleMode && <option value="label">A label (cutoff and mode field diameter)</option>}
        </select>
      </div>
      {source === 'category' && (
        <div class="field">
          <label for={`${id}-category`}>Category</label>
          <select id={`${id}-category`} value={category} onChange={(e) => setCategory((e.currentTarget as HTMLSelectElement).value)}>
            {presets.map((p) => (
              <option key={p.category} value={p.category}>
                {p.title}
              </option>
            ))}
          </select>
        </div>
      )}
      {source === 'saved' && saved.types && saved.types.length > 0 && (
        <div class="field">
          <label for={`${id}-saved`}>Saved type</label>
          <select id={`${id}-saved`} value={saved.types.some((t) => t.id === savedId) ? savedId : saved.types[0].id} onChange={(e) => setSavedId((e.currentTarget as HTMLSelectElement).value)}>
            {saved.types.map((t) => (
              <option key={t.id} value={t.id}>
                {t.name}
              </option>
            ))}
          </select>
        </div>
      )}
      {source === 'typed' && (
        <div class="form">
          <NumberField q={core} label="Core diameter" unit="µm" quickPicks={mmOnly ? [50, 62.5] : [8.2, 50, 62.5]} />
          <NumberField q={na} label="Numerical aperture (NA)" unit="(no unit)" />
          <div class="field">
            <label for={`${id}-profile`}>Index profile</label>
            <select id={`${id}-profile`} value={profile} onChange={(e) => setProfile((e.currentTarget as HTMLSelectElement).value as 'step' | 'graded')}>
              <option value="step">Step-index</option>
              <option value="graded">Graded-index</option>
            </select>
          </div>
          {profile === 'graded' && <NumberField q={alpha} label="Profile exponent α" unit="(no unit)" help="About 2 for OM1 to OM5 multimode." />}
        </div>
      )}
      {source === 'label' && (
        <div class="form">
          <NumberField q={cutoff} label="Cutoff wavelength" unit="nm" quickPicks={[1260, 1450, 1530]} />
          <div class="field">
            <label for={`${id}-cutoffKind`}>The label gives</label>
            <select id={`${id}-cutoffKind`} value={cutoffKind} onChange={(e) => setCutoffKind((e.currentTarget as HTMLSelectElement).value as 'fiber' | 'cable')}>
              <option value="cable">Cable cutoff (λcc)</option>
              <option value="fiber">Fiber cutoff (λc)</option>
            </select>
          </div>
          <NumberField q={mfd} label="Mode field diameter" unit="µm" />
          <NumberField q={mfdWl} label="MFD measured at" unit="nm" quickPicks={[1310, 1550]} />
        </div>
      )}
      {resolved.fiber && <FiberSummary fiber={resolved.fiber} />}
      {resolved.error && (
        <p class="field-error" role="alert">
          <span aria-hidden="true">⚠ </span>
          {resolved.error}
        </p>
      )}
      </div>
    </details>
  ), [open, shortLabel, label, resolved, source, presets, saved, category, profile, cutoffKind, core.text, na.text, alpha.text, cutoff.text, mfd.text, mfdWl.text, allowsSingleMode, mmOnly, id]);
  return { fiber: resolved.fiber, error: resolved.error, element };
}

/** The resolved numbers in one line, so the person sees what the calculator will use. */
export function FiberSummary({ fiber }: { fiber: ResolvedFiber }) {
  const profile = fiber.profile === 'graded' ? `graded-index, α = ${formatNumber(fiber.gradedAlpha)}` : 'step-index';
  return (
    <div class="note fiber-summary">
      <p>
        Uses: core diameter <span class="num">{formatQuantity(fiber.coreRadiusUm * 2, 'µm')}</span>, NA <span class="num">{formatNumber(fiber.na)}</span>,{' '}
        {profile}, cladding <span class="num">{formatQuantity(fiber.claddingDiameterUm, 'µm')}</span>.
      </p>
      {fiber.notes.length > 0 && (
        // Folded: on a phone the derivation would push the inputs below the fold; trainers open it.
        <details>
          <summary>Where these numbers come from</summary>
          <ul>
            {fiber.notes.map((n, i) => (
              <li key={i}>{n}</li>
            ))}
          </ul>
        </details>
      )}
    </div>
  );
}
