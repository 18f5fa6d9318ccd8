// Whether the browser protects the library from automatic clean-up, in one plain sentence, with the
// space used, the button to ask for protection, and the reminder that a backup is the real copy.
import { useState } from 'preact/hooks';
import { askForPersistence, usePersistence } from './persistence';

function size(bytes: number | undefined): string {
  if (bytes === undefined) return '—';
  if (bytes < 1024 * 1024) return `${Math.round(bytes / 1024)} kB`;
  if (bytes < 1024 ** 3) return `${(bytes / (1024 * 1024)).toFixed(1)} MB`;
  return `${(bytes / 1024 ** 3).toFixed(1)} GB`;
}

export function StoragePanel() {
  const info = usePersistence();
  const [asking, setAsking] = useState(false);
  const ask = async () => {
    setAsking(true);
    await askForPersistence();
    setAsking(false);
  };
  if (!info) return <p class="note">Checking storage…</p>;
  return (
    <div class="storage" data-persistence={info.state}>
      <p class={info.state === 'granted' ? 'verdict-ok' : 'verdict-warn'} role="status">
        {info.state === 'granted' ? '✓ ' : '⚠ '}
        {info.message}
      </p>
      {info.usageBytes !== undefined && (
        <p class="note">
          This app uses {size(info.usageBytes)} of the {size(info.quotaBytes)} the browser allows it.
        </p>
      )}
      {info.state === 'not-granted' && (
        <button type="button" disabled={asking} onClick={ask}>
          Ask the browser to keep the library
        </button>
      )}
    </div>
  );
}
