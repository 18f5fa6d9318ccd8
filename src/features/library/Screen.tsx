// Fiber types: the saved library (list, search, add, edit, duplicate, delete with undo), the
// standard categories to clone, backup and restore, storage status, and the demo library.
import { useEffect, useMemo, useRef, useState } from 'preact/hooks';
import { useLibrary } from './useLibrary';
import { FiberList } from './FiberList';
import { FiberForm } from './FiberForm';
import { PresetList } from './PresetList';
import { BackupPanel } from './BackupPanel';
import { StoragePanel } from './StoragePanel';
import { filterAndSort, type SortOrder } from './query';
import { draftFromPreset, draftFromRecord, emptyDraft, type FiberDraft } from './draft';
import { InvalidRecordError } from '../../fibers/db';
import { DEMO_TYPES, loadDemoLibrary } from '../../fibers/demo';
import { inputOf, type FiberType, type FiberTypeInput } from '../../fibers/model';
import { NAME_MAX_CHARS, validateRecord } from '../../fibers/validate';

type View = { kind: 'list' } | { kind: 'form'; title: string; submitLabel: string; draft: FiberDraft; editId?: string; key: number };

/** How long the undo offer stays after a delete. Common practice for undo bars. */
const UNDO_MS = 15_000;

export default function Screen() {
  const lib = useLibrary();
  const [query, setQuery] = useState('');
  const [order, setOrder] = useState<SortOrder>('name');
  const [view, setView] = useState<View>({ kind: 'list' });
  const [undo, setUndo] = useState<FiberType | undefined>(undefined);
  const [flash, setFlash] = useState<{ ok: boolean; text: string } | undefined>(undefined);
  const [busy, setBusy] = useState(false);
  const formKey = useRef(0);
  const undoTimer = useRef<ReturnType<typeof setTimeout> | undefined>(undefined);
  useEffect(() => () => clearTimeout(undoTimer.current), []);

  const shown = useMemo(() => (lib.records ? filterAndSort(lib.records, query, order) : []), [lib.records, query, order]);
  const store = lib.store && lib.status === 'open' ? lib.store : undefined;

  const openForm = (title: string, submitLabel: string, draft: FiberDraft, editId?: string) => {
    formKey.current += 1;
    setFlash(undefined);
    setView({ kind: 'form', title, submitLabel, draft, editId, key: formKey.current });
  };

  const save = async (input: FiberTypeInput, editId?: string) => {
    if (!store) return { message: lib.statusText ?? 'The library is not open.' };
    try {
      const saved = editId ? await store.update(editId, input) : await store.add(input);
      setView({ kind: 'list' });
      setFlash({ ok: true, text: `Saved “${saved.name}”.` });
      return undefined;
    } catch (e) {
      if (e instanceof InvalidRecordError) return { errors: e.errors, message: 'Not saved: check the fields marked below.' };
      return { message: e instanceof Error ? e.message : 'Not saved.' };
    }
  };

  const remove = async (r: FiberType) => {
    if (!store) return;
    setBusy(true);
    try {
      const gone = await store.delete(r.id);
      clearTimeout(undoTimer.current);
      setUndo(gone);
      setFlash(undefined);
      undoTimer.current = setTimeout(() => setUndo(undefined), UNDO_MS);
    } catch (e) {
      setFlash({ ok: false, text: e instanceof Error ? e.message : 'Not deleted.' });
    } finally {
      setBusy(false);
    }
  };

  const undoDelete = async () => {
    if (!store || !undo) return;
    try {
      await store.restore(undo);
      setFlash({ ok: true, text: `Restored “${undo.name}”.` });
    } catch (e) {
      setFlash({ ok: false, text: e instanceof Error ? e.message : 'Could not restore.' });
    }
    clearTimeout(undoTimer.current);
    setUndo(undefined);
  };

  const duplicate = (r: FiberType) => {
    const d = draftFromRecord(r);
    d.name = `${r.name} (copy)`.slice(0, NAME_MAX_CHARS);
    openForm(`Duplicate of “${r.name}”`, 'Save the copy', d);
  };

  const edit = (r: FiberType) => {
    // A damaged record (fails validation) opens with whatever fields it still has, to be repaired.
    const d = validateRecord(r).ok ? draftFromRecord(r) : draftFromRecord({ ...emptyDraftRecord(), ...inputOfLoose(r), id: r.id } as FiberType);
    openForm(`Edit “${typeof r.name === 'string' ? r.name : 'damaged record'}”`, 'Save changes', d, r.id);
  };

  const loadDemo = async () => {
    if (!store) return;
    setBusy(true);
    const res = await loadDemoLibrary(store);
    setBusy(false);
    setFlash({ ok: res.ok, text: res.ok ? (res.written ? `Demo library loaded: ${res.written} invented fiber types added.` : 'The demo types are already in the library.') : res.message });
  };

  return (
    <div class="library">
      {lib.statusText && (
        <div class="status status-error" role="alert" data-store-status={lib.status}>
          <p>{lib.statusText}</p>
          {(lib.status === 'closed-for-upgrade' || lib.status === 'terminated') && (
            <button type="button" onClick={() => location.reload()}>
              Reload this page
            </button>
          )}
        </div>
      )}

      {view.kind === 'form' ? (
        <FiberForm key={view.key} title={view.title} submitLabel={view.submitLabel} initial={view.draft} onSave={(input) => save(input, view.editId)} onCancel={() => setView({ kind: 'list' })} />
      ) : (
        <section aria-labelledby="lib-saved">
          <h2 id="lib-saved">Saved fiber types</h2>
          {flash && (
            <p class={`status ${flash.ok ? 'verdict-ok' : 'verdict-bad'}`} role="status">
              {flash.ok ? '✓ ' : '✗ '}
              {flash.text}
            </p>
          )}
          {undo && (
            <p class="status undo-bar" role="status">
              Deleted “{undo.name}”.{' '}
              <button type="button" onClick={undoDelete}>
                Undo
              </button>
            </p>
          )}
          <div class="row">
            <button type="button" disabled={!store} onClick={() => openForm('New fiber type', 'Save', emptyDraft('step'))}>
              Add a fiber type
            </button>
            <button type="button" disabled={!store} onClick={() => openForm('New fiber type from its label', 'Save', emptyDraft('label'))}>
              Enter from a label
            </button>
          </div>
          <div class="form">
            <div class="field">
              <label for="lib-search">Search</label>
              <input id="lib-search" type="search" value={query} maxLength={80} onInput={(e) => setQuery((e.currentTarget as HTMLInputElement).value)} />
            </div>
            <div class="field">
              <label for="lib-order">Order</label>
              <select id="lib-order" value={order} onChange={(e) => setOrder((e.currentTarget as HTMLSelectElement).value as SortOrder)}>
                <option value="name">By name</option>
                <option value="recent">Most recently changed first</option>
              </select>
            </div>
          </div>
          {lib.records === undefined ? (
            lib.status === 'unavailable' ? <p class="note">No saved types can be shown.</p> : <p class="loading">Opening the library…</p>
          ) : lib.records.length === 0 ? (
            <p class="note">No fiber types saved yet. Add one, clone a standard category below, or load the demo library.</p>
          ) : (
            <>
              <p class="note" aria-live="polite">
                {shown.length === lib.records.length ? `${lib.records.length} saved.` : `${shown.length} of ${lib.records.length} match.`}
              </p>
              <FiberList records={shown} onEdit={edit} onDuplicate={duplicate} onDelete={remove} busy={busy || !store} />
            </>
          )}
        </section>
      )}

      <section aria-labelledby="lib-presets">
        <h2 id="lib-presets">Standard categories</h2>
        <p class="note">Read-only category values with their sources. Clone one to save an editable type of your own.</p>
        <PresetList onClone={(p) => openForm(`New fiber type from ${p.category}`, 'Save', draftFromPreset(p))} />
      </section>

      <section aria-labelledby="lib-backup">
        <h2 id="lib-backup">Backup and restore</h2>
        <BackupPanel store={store} records={lib.records ?? []} />
      </section>

      <section aria-labelledby="lib-storage">
        <h2 id="lib-storage">Storage on this device</h2>
        <StoragePanel />
      </section>

      <section aria-labelledby="lib-demo">
        <h2 id="lib-demo">Demo library</h2>
        <p>
          Adds {DEMO_TYPES.length} invented fiber types from a made-up network (the Corrow Fen ring) to try the calculators with. They are marked
          “Demo” and can be deleted like any other.
        </p>
        <button type="button" disabled={!store || busy} onClick={loadDemo}>
          Load the demo library
        </button>
      </section>
    </div>
  );
}

function emptyDraftRecord(): Partial<FiberTypeInput> {
  return { name: '', profile: 'step', claddingDiameterUm: 125, attenuation: [], notes: '' };
}

/** The well-typed fields of a damaged record, so the form can open on them. */
function inputOfLoose(r: FiberType): Partial<FiberTypeInput> {
  const out: Record<string, unknown> = {};
  const src = inputOf(r) as unknown as Record<string, unknown>;
  for (const [k, v] of Object.entries(src)) {
    if (k === 'attenuation') out[k] = Array.isArray(v) ? v.filter((a) => a && typeof a.wavelengthNm === 'number' && typeof a.dbPerKm === 'number') : [];
    else if (k === 'name' || k === 'notes' || k === 'category' || k === 'cutoffKind') {
      if (typeof v === 'string') out[k] = v;
    } else if (k === 'profile') {
      if (v === 'step' || v === 'graded' || v === 'label') out[k] = v;
    } else if (typeof v === 'number' && Number.isFinite(v)) out[k] = v;
  }
  return out as Partial<FiberTypeInput>;
}
