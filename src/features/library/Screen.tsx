// Fiber types: the saved library (list, search, add, edit, duplicate, delete with undo), the
// standard categories to clone, backup and restore, storage status, and the demo library.
import { useEffect, useRef, useState } from 'preact/hooks';
import { useLibrary } from './useLibrary';
import { SavedList } from './SavedList';
import { FiberForm, type SaveChoice, type SaveOutcome } from './FiberForm';
import { PresetList } from './PresetList';
import { BackupPanel } from './BackupPanel';
import { StoragePanel } from './StoragePanel';
import { describeType } from './describe';
import { askAfterSave } from './persistence';
import { draftFromPreset, draftFromRecord, emptyDraft, type FiberDraft } from './draft';
import { EditConflictError, InvalidRecordError, NameClashError } from '../../fibers/db';
import './library.css';
import { DEMO_TYPES, loadDemoLibrary } from '../../fibers/demo';
import { inputOf, type FiberType, type FiberTypeInput } from '../../fibers/model';
import { NAME_MAX_CHARS, validateRecord } from '../../fibers/validate';

/** An edit form carries the version it started from (`base`): saving checks it is still the saved one. */
type View = { kind: 'list' } | { kind: 'form'; title: string; submitLabel: string; draft: FiberDraft; editId?: string; base?: FiberType; key: number };

/** How long the undo offer stays after a delete. Common practice for undo bars. */
const UNDO_MS = 15_000;

export default function Screen() {
  const lib = useLibrary();
  const [view, setView] = useState<View>({ kind: 'list' });
  const [undo, setUndo] = useState<FiberType | undefined>(undefined);
  const [flash, setFlash] = useState<{ ok: boolean; text: string } | undefined>(undefined);
  const [busy, setBusy] = useState(false);
  const formKey = useRef(0);
  const undoTimer = useRef<ReturnType<typeof setTimeout> | undefined>(undefined);
  useEffect(() => () => clearTimeout(undoTimer.current), []);

  const store = lib.store && lib.status === 'open' ? lib.store : undefined;

  const openForm = (title: string, submitLabel: string, draft: FiberDraft, editId?: string, base?: FiberType) => {
    formKey.current += 1;
    setFlash(undefined);
    setView({ kind: 'form', title, submitLabel, draft, editId, base, key: formKey.current });
  };

  const save = async (input: FiberTypeInput, editId: string | undefined, base: FiberType | undefined, choice: SaveChoice = {}): Promise<SaveOutcome | undefined> => {
    if (!store) return { message: lib.statusText ?? 'The library is not open.' };
    const refuseSameName = !choice.allowSameName;
    try {
      const saved = editId
        ? await store.update(editId, input, Date.now(), { base: choice.overwrite ?? base, refuseSameName })
        : await store.add(input, Date.now(), { refuseSameName });
      setView({ kind: 'list' });
      setFlash({ ok: true, text: `Saved “${saved.name}”.` });
      askAfterSave();
      return undefined;
    } catch (e) {
      if (e instanceof InvalidRecordError) return { errors: e.errors, message: 'Not saved: check the fields marked below.' };
      if (e instanceof NameClashError) {
        return { nameClash: { existingName: e.existing.name, existingDescription: validateRecord(e.existing).ok ? describeType(e.existing) : 'a damaged record', proposedName: e.proposedName } };
      }
      if (e instanceof EditConflictError) return { conflict: { current: e.current, changes: e.changes } };
      return { message: e instanceof Error ? e.message : 'Not saved.' };
    }
  };

  const loadOther = (current: FiberType) => {
    openForm(`Edit “${typeof current.name === 'string' ? current.name : 'damaged record'}”`, 'Save changes', draftOf(current), current.id, current);
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
    openForm(`Edit “${typeof r.name === 'string' ? r.name : 'damaged record'}”`, 'Save changes', draftOf(r), r.id, r);
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
        <FiberForm
          key={view.key}
          title={view.title}
          submitLabel={view.submitLabel}
          initial={view.draft}
          onSave={(input, choice) => save(input, view.editId, view.base, choice)}
          onLoadOther={loadOther}
          onCancel={() => setView({ kind: 'list' })}
        />
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
          {lib.records === undefined ? (
            lib.status === 'unavailable' ? <p class="note">No saved types can be shown.</p> : <p class="loading">Opening the library…</p>
          ) : (
            <SavedList records={lib.records} onEdit={edit} onDuplicate={duplicate} onDelete={remove} busy={busy || !store} />
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

/** The form's draft for a saved record; a damaged one (fails validation) opens with whatever fields it still has, to be repaired. */
function draftOf(r: FiberType): FiberDraft {
  return validateRecord(r).ok ? draftFromRecord(r) : draftFromRecord({ ...emptyDraftRecord(), ...inputOfLoose(r), id: r.id } as FiberType);
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
