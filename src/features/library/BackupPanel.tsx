// Export the library to a backup file; import one with a preview (merge or replace) and a report.
// The preview lists every record of the file by name with what will happen to it; a record whose
// name is already saved for a different fiber gets a choice: keep both (under a proposed name),
// replace the saved one, or skip it.
import { useRef, useState } from 'preact/hooks';
import {
  applyImport,
  backupFileName,
  checkFileSize,
  describePlan,
  exportLibrary,
  planImport,
  readBackupBytes,
  type ClashChoice,
  type ImportMode,
  type NameClash,
  type ParsedBackup,
  type PlannedRecord,
} from '../../fibers/backup';
import type { FiberStore } from '../../fibers/db';
import type { FiberType } from '../../fibers/model';
import { APP_VERSION } from '../../app/version';

export interface BackupPanelProps {
  store: FiberStore | undefined;
  records: FiberType[];
}

/** Preview rows shown at first; a file of thousands lists the rest on request. */
const PREVIEW_ROWS = 100;

function download(text: string, name: string): void {
  const url = URL.createObjectURL(new Blob([text], { type: 'application/json' }));
  const a = document.createElement('a');
  a.href = url;
  a.download = name;
  document.body.appendChild(a);
  a.click();
  a.remove();
  setTimeout(() => URL.revokeObjectURL(url), 1000);
}

function clashLabel(c: NameClash): string {
  return `What to do with “${c.incoming.name}” (fiber type ${c.position} of the file)`;
}

function ClashRow({ row, clash, onChoose }: { row: PlannedRecord; clash: NameClash; onChoose: (id: string, c: ClashChoice) => void }) {
  const id = `import-choice-${row.position}`;
  return (
    <li class="import-clash">
      <p>
        <strong>“{clash.incoming.name}”</strong> is already the name of a different fiber {clash.existingInFile ? 'earlier in this file' : 'in the library'}
        {clash.differences.length ? '. The file’s differs in:' : '.'}
      </p>
      {clash.differences.length > 0 && (
        <ul class="import-differences">
          {clash.differences.map((d, i) => (
            <li key={i}>{d}</li>
          ))}
        </ul>
      )}
      <div class="field">
        <label for={id} class="visually-hidden">
          {clashLabel(clash)}
        </label>
        <select id={id} value={clash.choice} onChange={(e) => onChoose(clash.incoming.id, (e.currentTarget as HTMLSelectElement).value as ClashChoice)}>
          <option value="keep-both">Keep both: import it as “{clash.proposedName}”</option>
          {!clash.existingInFile && <option value="replace">Replace the saved “{clash.existing.name}” with this one</option>}
          <option value="skip">Skip it: keep only the saved one</option>
        </select>
      </div>
    </li>
  );
}

export function BackupPanel({ store, records }: BackupPanelProps) {
  const [parsed, setParsed] = useState<ParsedBackup | undefined>(undefined);
  const [fileName, setFileName] = useState('');
  const [mode, setMode] = useState<ImportMode>('merge');
  const [choices, setChoices] = useState<Record<string, ClashChoice>>({});
  const [previewRows, setPreviewRows] = useState(PREVIEW_ROWS);
  const [message, setMessage] = useState<{ ok: boolean; text: string } | undefined>(undefined);
  const [busy, setBusy] = useState(false);
  const fileInput = useRef<HTMLInputElement>(null);

  const plan = parsed ? planImport(parsed, records, mode, choices) : undefined;

  const choose = async (e: Event) => {
    const input = e.currentTarget as HTMLInputElement;
    const file = input.files?.[0];
    input.value = '';
    setParsed(undefined);
    setMessage(undefined);
    setChoices({});
    setPreviewRows(PREVIEW_ROWS);
    if (!file) return;
    setFileName(file.name);
    const tooBig = checkFileSize(file.size);
    if (tooBig) return setMessage({ ok: false, text: tooBig.reason });
    let bytes: Uint8Array;
    try {
      bytes = new Uint8Array(await file.arrayBuffer());
    } catch {
      return setMessage({ ok: false, text: 'The file could not be read. Nothing was imported.' });
    }
    // Strict UTF-8: a file in another encoding is refused in words, never imported with garbled names.
    const res = readBackupBytes(bytes);
    if (!res.ok) return setMessage({ ok: false, text: res.reason });
    setParsed(res);
  };

  const confirm = async () => {
    if (!store || !plan) return;
    setBusy(true);
    const res = await applyImport(store, plan);
    setBusy(false);
    setParsed(undefined);
    const skipped = plan.rejected.length ? ` ${plan.rejected.length} type${plan.rejected.length === 1 ? ' was' : 's were'} not imported (invalid).` : '';
    setMessage({ ok: res.ok, text: res.message + (res.ok ? skipped : '') });
    fileInput.current?.focus();
  };

  const setChoice = (id: string, c: ClashChoice) => setChoices((old) => ({ ...old, [id]: c }));
  const rows = plan?.records ?? [];
  const clashRows = rows.filter((r) => r.clash);
  const otherRows = rows.filter((r) => !r.clash);
  const n = (k: number) => `${k} type${k === 1 ? '' : 's'}`;

  return (
    <div class="backup">
      <p>
        A backup is a file you keep somewhere else (a computer, another phone). On this phone the library is the only copy: export a backup now and then.
      </p>
      <div class="row">
        <button type="button" disabled={!store} onClick={() => download(exportLibrary(records, { appVersion: APP_VERSION }), backupFileName())}>
          Export a backup ({records.length} type{records.length === 1 ? '' : 's'})
        </button>
        {/* The browser's own file control varies by browser and does not fit a phone's width: it is hidden
            from sight (still focusable, still the control the label names), and its label is the button. */}
        <label class={`library-file-button${!store || busy ? ' is-disabled' : ''}`}>
          <input ref={fileInput} class="library-file-input" type="file" accept="application/json,.json" disabled={!store || busy} onChange={choose} />
          <span>Import a backup…</span>
        </label>
      </div>
      {message && (
        <p class={`status ${message.ok ? 'verdict-ok' : 'verdict-bad'}`} role="status">
          {message.ok ? '✓ ' : '✗ '}
          {message.text}
        </p>
      )}
      {parsed && plan && (
        <section class="import-preview" aria-labelledby="import-preview-title">
          <h3 id="import-preview-title">Before importing “{fileName}”</h3>
          <fieldset>
            <legend>How to import</legend>
            <label>
              <input type="radio" name="import-mode" checked={mode === 'merge'} onChange={() => setMode('merge')} /> Merge: add to the library, keep what is there
            </label>
            <label>
              <input type="radio" name="import-mode" checked={mode === 'replace'} onChange={() => setMode('replace')} /> Replace: the library becomes exactly the file
            </label>
          </fieldset>
          <ul>
            {describePlan(plan).map((l, i) => (
              <li key={i}>{l}</li>
            ))}
          </ul>
          {rows.length > 0 && (
            <>
              <h4>The file’s fiber types</h4>
              <ol class="import-records">
                {clashRows.map((r) => (
                  <ClashRow key={`c${r.position}`} row={r} clash={r.clash!} onChoose={setChoice} />
                ))}
                {otherRows.slice(0, previewRows).map((r) => (
                  <li key={`r${r.position}`} class={`import-${r.fate}`}>
                    “{r.name}”: {r.words}
                  </li>
                ))}
              </ol>
              {otherRows.length > previewRows && (
                <p class="row">
                  <button type="button" onClick={() => setPreviewRows(otherRows.length)}>
                    List all {otherRows.length} ({otherRows.length - previewRows} more)
                  </button>
                </p>
              )}
            </>
          )}
          {plan.sameAsExisting.length > 0 && (
            <details>
              <summary>Duplicates skipped</summary>
              <ul>
                {plan.sameAsExisting.map((d, i) => (
                  <li key={i}>
                    {d.name} — already saved as {d.existingName}
                  </li>
                ))}
              </ul>
            </details>
          )}
          {plan.mode === 'replace' && plan.removed.length > 0 && (
            <details>
              <summary>Will be removed</summary>
              <ul>
                {plan.removed.map((name, i) => (
                  <li key={i}>{name}</li>
                ))}
              </ul>
            </details>
          )}
          {plan.rejected.length > 0 && (
            <details open>
              <summary>Cannot be imported</summary>
              <ul>
                {plan.rejected.map((r) => (
                  <li key={r.position}>
                    Fiber type {r.position}
                    {r.name !== undefined ? ` (“${r.name}”)` : ''}: {r.problems.join(' ')}
                  </li>
                ))}
              </ul>
            </details>
          )}
          {plan.toDelete.length > 0 && <p class="verdict-warn">{n(plan.toDelete.length)} now saved will be replaced by the file’s, as chosen above.</p>}
          <div class="row">
            <button type="button" disabled={busy || (plan.toWrite.length === 0 && plan.mode === 'merge')} onClick={confirm}>
              {plan.mode === 'replace' ? `Replace the library with ${n(plan.toWrite.length)}` : `Import ${n(plan.toWrite.length)}`}
            </button>
            <button type="button" onClick={() => setParsed(undefined)}>
              Cancel
            </button>
          </div>
        </section>
      )}
    </div>
  );
}
