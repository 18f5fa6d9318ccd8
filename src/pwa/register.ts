// Service-worker registration and the update hand-shake, through workbox-window.
// A new version never takes over by itself: it waits until the person accepts the
// prompt (UpdatePrompt.tsx), then the page reloads once into the new version.
import type { Workbox } from 'workbox-window';

/** 'waiting': a new version is installed and waits; 'active': another tab already switched. */
export type UpdateState = 'none' | 'waiting' | 'active';

let workbox: Workbox | undefined;
let state: UpdateState = 'none';
let accepted = false;
const listeners = new Set<(s: UpdateState) => void>();

function setState(next: UpdateState): void {
  state = next;
  for (const l of listeners) l(next);
}

export function updateState(): UpdateState {
  return state;
}

/** Subscribe to update-state changes; returns the unsubscribe function. */
export function onUpdateState(listener: (s: UpdateState) => void): () => void {
  listeners.add(listener);
  return () => listeners.delete(listener);
}

/** Registers /sw.js after the page has loaded (so registration never delays the first screen). */
export function registerServiceWorker(): void {
  if (import.meta.env.DEV || typeof navigator === 'undefined' || !('serviceWorker' in navigator)) return;
  const start = () => void register();
  if (document.readyState === 'complete') start();
  else window.addEventListener('load', start, { once: true });
}

async function register(): Promise<void> {
  const { Workbox } = await import('workbox-window');
  const base = import.meta.env.BASE_URL;
  const wb = new Workbox(`${base}sw.js`, { scope: base });
  workbox = wb;
  wb.addEventListener('waiting', () => setState('waiting'));
  wb.addEventListener('controlling', (event) => {
    if (accepted) window.location.reload();
    // Another tab accepted an update: this page runs old code under the new worker,
    // so offer the reload here too (still the person's choice).
    else if (event.isUpdate) setState('active');
  });
  try {
    await wb.register();
  } catch (err) {
    // Without a worker the app still runs online; say why in the console only.
    console.warn('Service worker registration failed; offline use is not available.', err);
    return;
  }
  // An app left open for days should still hear about updates when it comes back to view.
  document.addEventListener('visibilitychange', () => {
    if (document.visibilityState === 'visible') wb.update().catch(() => undefined);
  });
}

/** The person accepted the update: activate the waiting version, then reload once into it. */
export function applyUpdate(): void {
  accepted = true;
  if (state === 'waiting' && workbox) workbox.messageSkipWaiting();
  else window.location.reload();
}
