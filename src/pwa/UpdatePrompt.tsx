// Offers a waiting new version; never reloads on its own, so nothing typed is lost.
import { useEffect, useState } from 'preact/hooks';
import { applyUpdate, onUpdateState, updateState } from './register';
import './UpdatePrompt.css';

export function UpdatePrompt() {
  const [state, setState] = useState(updateState);
  const [dismissed, setDismissed] = useState(false);
  useEffect(
    () =>
      onUpdateState((s) => {
        setState(s);
        setDismissed(false);
      }),
    [],
  );
  if (state === 'none' || dismissed) return null;
  return (
    <div class="update-prompt" role="status" aria-live="polite">
      <p>A new version is ready — reload to update.</p>
      <div class="update-prompt-actions">
        <button type="button" class="primary" onClick={applyUpdate}>Reload to update</button>
        <button type="button" onClick={() => setDismissed(true)}>Not now</button>
      </div>
    </div>
  );
}
