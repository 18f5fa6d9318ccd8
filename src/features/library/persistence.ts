// Whether the browser protects the library from automatic clean-up, shared by the screen's parts:
// the storage panel shows it, and the first save of a page visit asks the browser for protection
// (navigator.storage.persist), so a person who never opens the storage section is covered too.
import { useEffect, useState } from 'preact/hooks';
import { persistenceStatus, requestPersistence, type PersistenceInfo } from '../../fibers/db';

let current: PersistenceInfo | undefined;
let askedAfterSave = false;
const listeners = new Set<(i: PersistenceInfo) => void>();

function set(i: PersistenceInfo): PersistenceInfo {
  current = i;
  for (const l of [...listeners]) l(i);
  return i;
}

/** The current protection, checked without asking on first use, kept current after each request. */
export function usePersistence(): PersistenceInfo | undefined {
  const [info, setInfo] = useState<PersistenceInfo | undefined>(current);
  useEffect(() => {
    listeners.add(setInfo);
    if (!current) void persistenceStatus().then(set);
    return () => void listeners.delete(setInfo);
  }, []);
  return info;
}

/** Asks the browser for persistent storage now (the panel's button). */
export function askForPersistence(): Promise<PersistenceInfo> {
  return requestPersistence().then(set);
}

/**
 * After a type is saved: asks once per page visit, unless already protected. Browsers decide by
 * themselves (Chromium from how the site is used, others by a prompt); asking again on every save
 * would change nothing and could prompt again.
 */
export function askAfterSave(): void {
  if (askedAfterSave || current?.state === 'granted') return;
  askedAfterSave = true;
  void askForPersistence();
}
