import { useCallback, useEffect, useRef, useState } from 'react';
import type { ApiError, ApiResult } from '../../core/api';

export type Query<T> =
  | { state: 'idle' | 'loading'; value: T | null; error: null }
  | { state: 'ok'; value: T; error: null }
  | { state: 'error'; value: T | null; error: ApiError };

/**
 * Runs an API call when its key changes (and on `reload`); answers to an older key are dropped, and the
 * last value stays on screen while the next one loads. A null key means "nothing to ask yet".
 */
export function useQuery<T>(key: string | null, run: () => Promise<ApiResult<T>>, delayMs = 0): Query<T> & { reload(): void } {
  const [query, setQuery] = useState<Query<T>>({ state: 'idle', value: null, error: null });
  const [tick, setTick] = useState(0);
  const runRef = useRef(run);
  runRef.current = run;
  useEffect(() => {
    if (key === null) return;
    let live = true;
    setQuery((q) => ({ state: 'loading', value: q.value, error: null }));
    const timer = setTimeout(() => {
      void runRef.current().then((r) => {
        if (!live) return;
        setQuery((q) => (r.ok ? { state: 'ok', value: r.value, error: null } : { state: 'error', value: q.value, error: r.error }));
      });
    }, delayMs);
    return () => {
      live = false;
      clearTimeout(timer);
    };
  }, [key, tick, delayMs]);
  const reload = useCallback(() => setTick((t) => t + 1), []);
  return { ...query, reload };
}
