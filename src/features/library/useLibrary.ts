// The library screen's connection to the store: the records, kept current, and the store's state.
import { useEffect, useState } from 'preact/hooks';
import { getFiberStore, onStoreStatus, STATUS_TEXT, type FiberStore, type StoreStatus } from '../../fibers/db';
import type { FiberType } from '../../fibers/model';

export interface LibraryState {
  store: FiberStore | undefined;
  records: FiberType[] | undefined;
  status: StoreStatus | 'opening' | 'unavailable';
  /** Plain words for anything but "open". */
  statusText: string | undefined;
  reload: () => void;
}

export function useLibrary(): LibraryState {
  const [store, setStore] = useState<FiberStore | undefined>(undefined);
  const [records, setRecords] = useState<FiberType[] | undefined>(undefined);
  const [status, setStatus] = useState<LibraryState['status']>('opening');
  const [statusText, setStatusText] = useState<string | undefined>(undefined);
  const [tick, setTick] = useState(0);

  useEffect(() => {
    let live = true;
    let off: (() => void) | undefined;
    const offStatus = onStoreStatus((s, m) => {
      if (!live) return;
      setStatus(s);
      setStatusText(s === 'open' ? undefined : m);
    });
    getFiberStore().then(
      (s) => {
        if (!live) return;
        setStore(s);
        setStatus(s.state);
        setStatusText(s.state === 'open' ? undefined : STATUS_TEXT[s.state]);
        const load = () =>
          s.list().then(
            (all) => live && setRecords(all),
            (e: unknown) => {
              if (!live) return;
              setStatus(s.state === 'open' ? 'closed' : s.state);
              setStatusText(e instanceof Error ? e.message : String(e));
            },
          );
        off = s.subscribe(() => {
          if (s.state !== 'open') {
            setStatus(s.state);
            setStatusText(STATUS_TEXT[s.state]);
            return;
          }
          void load();
        });
        void load();
      },
      (e: unknown) => {
        if (!live) return;
        setStatus('unavailable');
        setStatusText(e instanceof Error ? e.message : 'The fiber library could not be opened in this browser.');
      },
    );
    return () => {
      live = false;
      off?.();
      offStatus();
    };
  }, [tick]);

  return { store, records, status, statusText, reload: () => setTick((t) => t + 1) };
}
