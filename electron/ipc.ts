import type { IpcMainInvokeEvent } from 'electron';
import { methodNames } from '../core/api';
import type { ApiResult } from '../core/api';
import { apiChannel } from '../core/api/method-names';
import { dispatch } from '../service/api/dispatch';
import type { Handlers } from '../service/api/dispatch';
import { isAppUrl } from './shell/origin';

/** The part of ipcMain used here, so tests hand in a recorder. */
export interface IpcMainLike {
  handle(channel: string, listener: (event: IpcMainInvokeEvent, ...args: unknown[]) => Promise<unknown>): void;
}

export type SenderCheck = (event: Pick<IpcMainInvokeEvent, 'senderFrame'>) => boolean;

/** A call counts only from a live frame showing app://coilwright; a disposed frame (null, or throwing) does not. */
export const isTrustedSender: SenderCheck = (event) => {
  try {
    const frame = event.senderFrame;
    return frame !== null && frame !== undefined && isAppUrl(frame.url);
  } catch {
    return false;
  }
};

export const untrustedSender = (channel: string): ApiResult<never> => ({
  ok: false,
  error: { code: 'untrusted-sender', message: `refused "${channel}": the call did not come from the Coilwright window`, path: '' },
});

export interface GuardOptions {
  isTrustedSender?: SenderCheck;
  onUnexpected?: (context: string, error: unknown) => void;
}

/**
 * Registers one channel whose every call is sender-checked and whose every outcome is a value. `extra` is
 * the call's second argument, for the channels that take one; the handler checks it as it checks `raw`.
 */
export function handleGuarded(
  ipcMain: IpcMainLike, channel: string, run: (raw: unknown, extra?: unknown) => Promise<ApiResult<unknown>>, options: GuardOptions = {},
): void {
  const trusted = options.isTrustedSender ?? isTrustedSender;
  ipcMain.handle(channel, async (event, raw, extra) => {
    if (!trusted(event)) return untrustedSender(channel);
    try {
      return await run(raw, extra);
    } catch (e) {
      options.onUnexpected?.(channel, e);
      return { ok: false, error: { code: 'unexpected', message: `${channel} failed: ${(e as Error).message}`, path: '' } };
    }
  });
}

/** One handler per contract method: sender check, then dispatch (zod parse, call, value). */
export function registerIpc(ipcMain: IpcMainLike, handlers: Handlers, options: GuardOptions = {}): void {
  for (const name of methodNames) {
    handleGuarded(ipcMain, apiChannel(name), (raw) => dispatch(handlers, name, raw, {
      onUnexpected: (method, error) => options.onUnexpected?.(`api:${method}`, error),
    }), options);
  }
}
