// Shared, cached reads of small JSON endpoints (/api/me, /api/progress, a locked lesson's body)
// for client components: one request per key however many components read it, an update
// reaches all of them, and a read can refresh when the tab regains focus.
// Our own few lines instead of a data-fetching library: the header reads /api/me on every
// page, so whatever this module weighs is in the first load of every page, and the library we
// used before added about 5.5 KiB gzipped to it (npm run measure:first-load).
import { useCallback, useEffect, useSyncExternalStore } from "react";

export type RemoteSnapshot<T> = {
  data: T | undefined;
  error: unknown;
  /** No answer yet and a request on its way (or about to be sent). */
  isLoading: boolean;
};

type Fetcher<T> = (key: string) => Promise<T>;
type Entry = { snapshot: RemoteSnapshot<unknown>; listeners: Set<() => void>; fetcher?: Fetcher<unknown>; inflight?: Promise<void>; answeredAt: number };

/** A component mounting within this long of the last answer uses it instead of asking again. */
export const REUSE_ANSWER_MS = 2_000;
const LOADING: RemoteSnapshot<never> = Object.freeze({ data: undefined, error: undefined, isLoading: true });

const entries = new Map<string, Entry>();

function entryFor(key: string): Entry {
  let entry = entries.get(key);
  if (!entry) {
    entry = { snapshot: LOADING, listeners: new Set(), answeredAt: 0 };
    entries.set(key, entry);
  }
  return entry;
}

function publish(entry: Entry, snapshot: RemoteSnapshot<unknown>): void {
  entry.snapshot = snapshot;
  for (const listener of entry.listeners) listener();
}

/** Asks the endpoint again (one request in flight per key); the answer reaches every reader. */
export function revalidateRemote(key: string): Promise<void> {
  const entry = entryFor(key);
  const fetcher = entry.fetcher;
  if (!fetcher) return Promise.resolve();
  if (entry.inflight) return entry.inflight;
  if (entry.snapshot.data === undefined && !entry.snapshot.isLoading) publish(entry, { ...entry.snapshot, isLoading: true });
  entry.inflight = fetcher(key).then(
    (data) => publish(entry, { data, error: undefined, isLoading: false }),
    // A failed refresh keeps the last good answer beside the error.
    (error: unknown) => publish(entry, { data: entry.snapshot.data, error, isLoading: false }),
  );
  entry.inflight = entry.inflight.finally(() => {
    entry.inflight = undefined;
    entry.answeredAt = Date.now();
  });
  return entry.inflight;
}

/**
 * Changes what readers of `key` see. With a value (null included) it is shown at once, e.g.
 * null for /api/me after signing out; then, unless `revalidate: false`, the endpoint is asked.
 * Without a value it only asks again.
 */
export function mutateRemote<T>(key: string, ...args: [] | [data: T | null, options?: { revalidate?: boolean }]): Promise<void> {
  const entry = entryFor(key);
  if (args.length > 0) {
    publish(entry, { data: args[0], error: undefined, isLoading: false });
    entry.answeredAt = Date.now();
    if (args[1]?.revalidate === false) return Promise.resolve();
  }
  return revalidateRemote(key);
}

/** Registers how `key` is fetched (the first reader's fetcher is kept); exported for tests. */
export function registerFetcher<T>(key: string, fetcher: Fetcher<T>): void {
  const entry = entryFor(key);
  entry.fetcher ??= fetcher as Fetcher<unknown>;
}

/** Forgets every key (tests only). */
export function resetRemoteData(): void {
  entries.clear();
}

export function readRemoteSnapshot<T>(key: string): RemoteSnapshot<T> {
  return entryFor(key).snapshot as RemoteSnapshot<T>;
}

/** Reads `key` through `fetcher`; while the server renders (and during hydration) it is loading. */
export function useRemoteData<T>(key: string, fetcher: Fetcher<T>, { revalidateOnFocus = false } = {}) {
  registerFetcher(key, fetcher);
  const subscribe = useCallback(
    (listener: () => void) => {
      const { listeners } = entryFor(key);
      listeners.add(listener);
      return () => void listeners.delete(listener);
    },
    [key],
  );
  const snapshot = useSyncExternalStore(
    subscribe,
    () => readRemoteSnapshot<T>(key),
    () => LOADING as RemoteSnapshot<T>,
  );

  useEffect(() => {
    const entry = entryFor(key);
    if (entry.snapshot.data === undefined || Date.now() - entry.answeredAt > REUSE_ANSWER_MS) void revalidateRemote(key);
    if (!revalidateOnFocus) return;
    const onFocus = () => {
      if (document.visibilityState === "visible") void revalidateRemote(key);
    };
    window.addEventListener("focus", onFocus);
    document.addEventListener("visibilitychange", onFocus);
    return () => {
      window.removeEventListener("focus", onFocus);
      document.removeEventListener("visibilitychange", onFocus);
    };
  }, [key, revalidateOnFocus]);

  const mutate = useCallback((...args: [] | [data: T | null, options?: { revalidate?: boolean }]) => mutateRemote<T>(key, ...args), [key]);
  return { ...snapshot, mutate };
}
