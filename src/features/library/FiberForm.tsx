// Add or edit one fiber type. Errors come from validate.ts, field by field; a type from its label
// shows what the mode engine derives from it (and any inconsistency) before it is saved.
import { useMemo, useState } from 'preact/hooks';
import { Choice, Field } from './Field';
import { draftToInput, type FiberDraft } from './draft';
import { CATEGORY_PRESETS } from '../../fibers/presets';
import { resolveLabel, resolveTyped } from '../../fibers/resolve';
import { NAME_MAX_CHARS, NOTES_MAX_CHARS, type FieldErrors } from '../../fibers/validate';
import type { FiberProfile, FiberType, FiberTypeInput } from '../../fibers/model';
import { errorText } from '../../ui/errorText';
import { FiberSummary } from '../../ui/FiberPicker';

/** Why a save did not happen, for the form to show beside its fields or as a choice to make. */
export interface SaveOutcome {
  errors?: FieldErrors;
  message?: string;
  /** Another saved type has this name: the person picks the proposed name, another name, or keeps it. */
  nameClash?: { existingName: string; existingDescription: string; proposedName: string };
  /** The type was changed elsewhere since this form opened: what changed, and the saved version. */
  conflict?: { current: FiberType; changes: string[] };
}

/** What the person decided after a warning. */
export interface SaveChoice {
  /** Keep a name another type already has, knowingly. */
  allowSameName?: boolean;
  /** Write over this saved version, knowingly (the version shown in the conflict). */
  overwrite?: FiberType;
}

export interface FiberFormProps {
  title: string;
  initial: FiberDraft;
  submitLabel: string;
  /** Resolves to undefined when saved, or to what stopped the save. */
  onSave: (input: FiberTypeInput, choice?: SaveChoice) => Promise<SaveOutcome | undefined>;
  /** After a conflict: reopen the form on the version saved elsewhere (this form's edits are dropped). */
  onLoadOther?: (current: FiberType) => void;
  onCancel: () => void;
}

const PROFILES: [FiberProfile, string][] = [
  ['step', 'Step-index (core diameter and NA)'],
  ['graded', 'Graded-index (core diameter, NA and α)'],
  ['label', 'From the label (cutoff and mode field diameter)'],
];

export function FiberForm({ title, initial, submitLabel, onSave, onLoadOther, onCancel }: FiberFormProps) {
  const [d, setD] = useState<FiberDraft>(initial);
  const [tried, setTried] = useState(false);
  const [saveErrors, setSaveErrors] = useState<FieldErrors>({});
  const [message, setMessage] = useState<string | undefined>(undefined);
  const [nameClash, setNameClash] = useState<SaveOutcome['nameClash']>(undefined);
  const [conflict, setConflict] = useState<SaveOutcome['conflict']>(undefined);
  const [busy, setBusy] = useState(false);
  const set = <K extends keyof FiberDraft>(k: K, v: FiberDraft[K]) => setD((old) => ({ ...old, [k]: v }));

  const parsed = useMemo(() => draftToInput(d), [d]);
  const errors: FieldErrors = tried ? { ...parsed.errors, ...saveErrors } : {};

  // What the calculators will use, derived live (label → mode engine). Thin: resolve.ts does the work.
  const derived = useMemo(() => {
    const f = parsed.input;
    if (!f) return undefined;
    try {
      if (f.profile === 'label') {
        return {
          fiber: resolveLabel({
            cutoffWavelengthNm: f.cutoffWavelengthNm!,
            cutoffKind: f.cutoffKind!,
            mfdUm: f.mfdUm!,
            mfdWavelengthNm: f.mfdWavelengthNm!,
            coreDiameterUm: f.coreDiameterUm,
            claddingDiameterUm: f.claddingDiameterUm,
            name: f.name,
          }),
        };
      }
      if (f.na !== undefined) return { fiber: resolveTyped({ profile: f.profile, gradedAlpha: f.gradedAlpha, coreDiameterUm: f.coreDiameterUm!, na: f.na, claddingDiameterUm: f.claddingDiameterUm }) };
      return undefined;
    } catch (e) {
      return { error: errorText(e) };
    }
  }, [parsed.input]);

  const attempt = async (input: FiberTypeInput | undefined, choice?: SaveChoice) => {
    setTried(true);
    setSaveErrors({});
    setMessage(undefined);
    setNameClash(undefined);
    setConflict(undefined);
    if (!input) {
      setMessage('Not saved: check the fields marked below.');
      return;
    }
    setBusy(true);
    const res = await onSave(input, choice);
    setBusy(false);
    if (!res) return;
    setSaveErrors(res.errors ?? {});
    setNameClash(res.nameClash);
    setConflict(res.conflict);
    if (!res.nameClash && !res.conflict) setMessage(res.message ?? 'Not saved.');
  };

  const submit = (e: Event) => {
    e.preventDefault();
    void attempt(parsed.input);
  };

  const saveAsProposed = (proposedName: string) => {
    const next = { ...d, name: proposedName };
    setD(next);
    void attempt(draftToInput(next).input);
  };

  const isLabel = d.profile === 'label';
  const usesCore = !isLabel;
  const att = d.attenuation;
  return (
    <form class="fiber-form" onSubmit={submit} noValidate aria-labelledby="fiber-form-title">
      <h3 id="fiber-form-title">{title}</h3>
      {message && (
        <p class="status status-error" role="alert">
          {message}
        </p>
      )}
      {conflict && (
        <div class="status status-error edit-conflict" role="alert">
          <p>
            Not saved: “{conflict.current.name}” was changed in another tab (or by an import) after you opened it here
            {conflict.changes.length ? ':' : ', though its values are the same.'}
          </p>
          {conflict.changes.length > 0 && (
            <ul>
              {conflict.changes.map((c, i) => (
                <li key={i}>{c}</li>
              ))}
            </ul>
          )}
          <p>Your edits are still in the form below. Load the other version (your edits here are dropped), or save yours over it knowingly.</p>
          <div class="row">
            <button type="button" disabled={busy} onClick={() => onLoadOther?.(conflict.current)}>
              Load the other version
            </button>
            <button type="button" disabled={busy} onClick={() => void attempt(parsed.input, { overwrite: conflict.current })}>
              Save mine over it
            </button>
          </div>
        </div>
      )}
      {nameClash && (
        <div class="status verdict-warn name-clash" role="alert">
          <p>
            Not saved yet: a fiber type is already saved as “{nameClash.existingName}” ({nameClash.existingDescription}). Two entries with the same name cannot be told
            apart in the list or in the calculators' pickers. Save it under another name, change the name below, or keep the same name on purpose.
          </p>
          <div class="row">
            <button type="button" disabled={busy} onClick={() => saveAsProposed(nameClash.proposedName)}>
              Save as “{nameClash.proposedName}”
            </button>
            <button type="button" disabled={busy} onClick={() => void attempt(parsed.input, { allowSameName: true })}>
              Save with the same name anyway
            </button>
          </div>
        </div>
      )}
      <div class="form">
        <Field id="ff-name" label="Name" inputMode="text" maxLength={NAME_MAX_CHARS + 20} value={d.name} onInput={(v) => set('name', v)} error={errors.name} help="Your own name for it, e.g. the drum or job it belongs to." />
        <Choice id="ff-profile" label="Index profile" value={d.profile} options={PROFILES} onChange={(v) => set('profile', v)} error={errors.profile} />
        <Field id="ff-core" label={isLabel ? 'Core diameter (optional, from the label)' : 'Core diameter'} unit="µm" value={d.coreDiameter} onInput={(v) => set('coreDiameter', v)} error={errors.coreDiameterUm} />
        <Field id="ff-cladding" label="Cladding diameter" unit="µm" value={d.claddingDiameter} onInput={(v) => set('claddingDiameter', v)} error={errors.claddingDiameterUm} />
        {d.profile === 'graded' && <Field id="ff-alpha" label="Profile exponent α" unit="(no unit)" value={d.gradedAlpha} onInput={(v) => set('gradedAlpha', v)} error={errors.gradedAlpha} help="About 2 for OM1 to OM5 multimode." />}
        {usesCore && (
          <Choice id="ff-guidance" label="Guidance given as" value={d.guidance} options={[['na', 'Numerical aperture (NA)'], ['indices', 'Core and cladding refractive indices']]} onChange={(v) => set('guidance', v)} />
        )}
        {usesCore && d.guidance === 'na' && <Field id="ff-na" label="Numerical aperture (NA)" unit="(no unit)" value={d.na} onInput={(v) => set('na', v)} error={errors.na} />}
        {usesCore && d.guidance === 'indices' && (
          <>
            <Field id="ff-n1" label="Core refractive index" unit="(no unit)" value={d.coreIndex} onInput={(v) => set('coreIndex', v)} error={errors.coreIndex} />
            <Field id="ff-n2" label="Cladding refractive index" unit="(no unit)" value={d.claddingIndex} onInput={(v) => set('claddingIndex', v)} error={errors.claddingIndex} />
          </>
        )}
        <Field id="ff-cutoff" label={isLabel ? 'Cutoff wavelength' : 'Cutoff wavelength (optional)'} unit="nm" value={d.cutoffWavelength} onInput={(v) => set('cutoffWavelength', v)} error={errors.cutoffWavelengthNm} />
        <Choice
          id="ff-cutoff-kind"
          label="Which cutoff"
          value={d.cutoffKind}
          options={[['', '—'], ['cable', 'Cable cutoff (λcc)'], ['fiber', 'Fiber cutoff (λc)']]}
          onChange={(v) => set('cutoffKind', v)}
          error={errors.cutoffKind}
        />
        <Field id="ff-mfd" label={isLabel ? 'Mode field diameter' : 'Mode field diameter (optional)'} unit="µm" value={d.mfd} onInput={(v) => set('mfd', v)} error={errors.mfdUm} />
        <Field id="ff-mfd-wl" label="MFD measured at" unit="nm" value={d.mfdWavelength} onInput={(v) => set('mfdWavelength', v)} error={errors.mfdWavelengthNm} />
        <Choice
          id="ff-category"
          label="Standard category (optional)"
          value={d.category}
          options={[['', 'None'], ...CATEGORY_PRESETS.map((p): [string, string] => [p.category, p.category])]}
          onChange={(v) => set('category', v)}
          error={errors.category}
        />
      </div>
      <fieldset class="attenuation-rows">
        <legend>Attenuation at the wavelengths in use</legend>
        {att.length === 0 && <p class="note">None given.</p>}
        {att.map((row, i) => (
          <div class="row" key={i}>
            <Field id={`ff-att-wl-${i}`} label={`Wavelength ${i + 1}`} unit="nm" value={row.wavelength} onInput={(v) => set('attenuation', att.map((r, j) => (j === i ? { ...r, wavelength: v } : r)))} />
            <Field id={`ff-att-db-${i}`} label={`Attenuation ${i + 1}`} unit="dB/km" value={row.dbPerKm} onInput={(v) => set('attenuation', att.map((r, j) => (j === i ? { ...r, dbPerKm: v } : r)))} />
            <button type="button" onClick={() => set('attenuation', att.filter((_, j) => j !== i))}>
              Remove row {i + 1}
            </button>
          </div>
        ))}
        <button type="button" onClick={() => set('attenuation', [...att, { wavelength: '', dbPerKm: '' }])}>
          Add a wavelength
        </button>
        {errors.attenuation && (
          <p class="field-error" role="alert">
            <span aria-hidden="true">⚠ </span>
            {errors.attenuation}
          </p>
        )}
      </fieldset>
      <Field id="ff-notes" label="Notes" inputMode="text" multiline maxLength={NOTES_MAX_CHARS + 100} value={d.notes} onInput={(v) => set('notes', v)} error={errors.notes} />
      <section class="derived" aria-live="polite" aria-label="What the calculators will use">
        <h4>What the calculators will use</h4>
        {derived?.fiber && <FiberSummary fiber={derived.fiber} />}
        {derived?.error && (
          <p class="verdict-warn">
            <span aria-hidden="true">⚠ </span>
            {derived.error}
          </p>
        )}
        {!derived && <p class="note">Complete the fields to see the values derived from them.</p>}
      </section>
      <div class="row">
        <button type="submit" disabled={busy}>
          {submitLabel}
        </button>
        <button type="button" onClick={onCancel}>
          Cancel
        </button>
      </div>
    </form>
  );
}
