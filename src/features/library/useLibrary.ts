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

interface Loading {
  store: Promise<FiberStore>;
  records: Promise<FiberType[]>;
  /** The last status reported while opening (blocked, open…), before the screen listens. */
  status?: [StoreStatus, string];
  /** A change (here or in another tab) reported after the first read started: read again. */
  changedSince: boolean;
  /** Stops the early listeners once the screen's own are attached. */
  stop(): void;
}

/** Opens the store and reads its records, listening meanwhile for status changes and changes. */
function openAndList(): Loading {
  const loading: Loading = { store: getFiberStore(), records: Promise.resolve([]), changedSince: false, stop: () => undefined };
  const offStatus = onStoreStatus((s, m) => void (loading.status = [s, m]));
  let offChange: (() => void) | undefined;
  let stopped = false;
  loading.records = loading.store.then((s) => {
    if (!stopped) offChange = s.subscribe(() => void (loading.changedSince = true));
    return s.list();
  });
  loading.records.catch(() => undefined); // handled where it is used; never an unhandled rejection
  loading.stop = () => {
    stopped = true;
    offStatus();
    offChange?.();
  };
  return loading;
}

export function useLibrary(): LibraryState {
  // Opening and reading start during the first render, not in the effect: effects run after the
  // first paint, which on a slow phone comes hundreds of milliseconds later, and a thousand records
  // take as long again to read. The effect then only attaches to what is already under way.
  const [early] = useState(openAndList);
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
    const first = tick === 0 ? early : openAndList();
    if (first.status && first.status[0] !== 'open') {
      setStatus(first.status[0]);
      setStatusText(first.status[1]);
    }
    first.store.then(
      (s) => {
        if (!live) return;
        setStore(s);
        setStatus(s.state);
        setStatusText(s.state === 'open' ? undefined : STATUS_TEXT[s.state]);
        first.stop();
        let initial: Promise<FiberType[]> | undefined = first.changedSince ? undefined : first.records;
        const load = () => {
          const reading = initial ?? s.list();
          initial = undefined;
          return reading.then(
            (all) => live && setRecords(all),
            (e: unknown) => {
              if (!live) return;
              setStatus(s.state === 'open' ? 'closed' : s.state);
              setStatusText(e instanceof Error ? e.message : String(e));
            },
          );
        };
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
        first.stop();
        if (!live) return;
        setStatus('unavailable');
        setStatusText(e instanceof Error ? e.message : 'The fiber library could not be opened in this browser.');
      },
    );
    return () => {
      live = false;
      first.stop();
      off?.();
      offStatus();
    };
  }, [tick]);

  return { store, records, status, statusText, reload: () => setTick((t) => t + 1) };
}
