// Export the library to a backup file; import one with a preview (merge or replace) and a report.
import { useState } from 'preact/hooks';
import { applyImport, backupFileName, checkFileSize, describePlan, exportLibrary, planImport, readBackup, type ImportMode, type ParsedBackup } from '../../fibers/backup';
import type { FiberStore } from '../../fibers/db';
import type { FiberType } from '../../fibers/model';
import { APP_VERSION } from '../../app/version';

export interface BackupPanelProps {
  store: FiberStore | undefined;
  records: FiberType[];
}

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

export function BackupPanel({ store, records }: BackupPanelProps) {
  const [parsed, setParsed] = useState<ParsedBackup | undefined>(undefined);
  const [fileName, setFileName] = useState('');
  const [mode, setMode] = useState<ImportMode>('merge');
  const [message, setMessage] = useState<{ ok: boolean; text: string } | undefined>(undefined);
  const [busy, setBusy] = useState(false);

  const plan = parsed ? planImport(parsed, records, mode) : undefined;

  const choose = async (e: Event) => {
    const input = e.currentTarget as HTMLInputElement;
    const file = input.files?.[0];
    input.value = '';
    setParsed(undefined);
    setMessage(undefined);
    if (!file) return;
    setFileName(file.name);
    const tooBig = checkFileSize(file.size);
    if (tooBig) return setMessage({ ok: false, text: tooBig.reason });
    let text: string;
    try {
      text = await file.text();
    } catch {
      return setMessage({ ok: false, text: 'The file could not be read. Nothing was imported.' });
    }
    const res = readBackup(text);
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
  };

  return (
    <div class="backup">
      <p>
        A backup is a file you keep somewhere else (a computer, another phone). On this phone the library is the only copy.
      </p>
      <div class="row">
        <button type="button" disabled={!store} onClick={() => download(exportLibrary(records, { appVersion: APP_VERSION }), backupFileName())}>
          Export a backup ({records.length} type{records.length === 1 ? '' : 's'})
        </button>
        <label class="file-button">
          Import a backup…
          <input type="file" accept="application/json,.json" disabled={!store || busy} onChange={choose} />
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
                {plan.removed.map((n, i) => (
                  <li key={i}>{n}</li>
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
          <div class="row">
            <button type="button" disabled={busy || (plan.toWrite.length === 0 && plan.mode === 'merge')} onClick={confirm}>
              {plan.mode === 'replace' ? `Replace the library with ${plan.toWrite.length} type${plan.toWrite.length === 1 ? '' : 's'}` : `Import ${plan.toWrite.length} type${plan.toWrite.length === 1 ? '' : 's'}`}
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
