import { useState } from 'react';
import type { ApiResult } from '../../../core/api';

export type CallState<T> =
  | { state: 'idle' }
  | { state: 'running'; label: string }
  | { state: 'done'; value: T }
  | { state: 'failed'; message: string; path: string };

/** One long call at a time, with what it is doing while it runs and its outcome after. */
export function useLongCall<T>() {
  const [call, setCall] = useState<CallState<T>>({ state: 'idle' });
  const run = async (label: string, start: () => Promise<ApiResult<T>>): Promise<T | null> => {
    setCall({ state: 'running', label });
    const r = await start();
    setCall(r.ok ? { state: 'done', value: r.value } : { state: 'failed', message: r.error.message, path: r.error.path });
    return r.ok ? r.value : null;
  };
  return { call, run, running: call.state === 'running' };
}
