import { useRef, useState } from 'react';
import type { ApiResult } from '../../../core/api';

export type CallState<T> =
  | { state: 'idle' }
  | { state: 'running'; label: string; done: number; total: number; cancellable: boolean }
  | { state: 'done'; value: T }
  | { state: 'failed'; message: string; path: string };

/** What a long call is handed: where to say how far it is, and the signal of its Cancel button. */
export interface LongCallControl {
  onProgress(done: number, total: number): void;
  signal: AbortSignal;
}

/**
 * One long call at a time, with what it is doing while it runs (how far, when the call says) and its
 * outcome after. A call that takes the control offers Cancel; `cancel()` aborts its signal.
 */
export function useLongCall<T>() {
  const [call, setCall] = useState<CallState<T>>({ state: 'idle' });
  const controller = useRef<AbortController | null>(null);
  const run = async (label: string, start: (control: LongCallControl) => Promise<ApiResult<T>>, cancellable = false): Promise<T | null> => {
    const abort = new AbortController();
    controller.current = abort;
    setCall({ state: 'running', label, done: 0, total: 0, cancellable });
    const onProgress = (done: number, total: number) => {
      if (!abort.signal.aborted) setCall({ state: 'running', label, done, total, cancellable });
    };
    const r = await start({ onProgress, signal: abort.signal });
    controller.current = null;
    setCall(r.ok ? { state: 'done', value: r.value } : { state: 'failed', message: r.error.message, path: r.error.path });
    return r.ok ? r.value : null;
  };
  const cancel = () => controller.current?.abort();
  return { call, run, cancel, running: call.state === 'running' };
}
