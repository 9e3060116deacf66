import { mkdtempSync, rmSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { afterAll, beforeAll, describe, expect, it, vi } from 'vitest';
import { methodNames } from '../../core/api';
import { apiChannel } from '../../core/api/method-names';
import { openStore } from '../../db';
import { isTrustedSender, registerIpc } from '../../electron/ipc';
import type { IpcMainLike } from '../../electron/ipc';
import { createService } from '../../service/api';
import type { Handlers, Service } from '../../service/api';
import { valveSpringMetric } from '../fixtures/specs';
import { ipcEvent } from './electron-mock';

type Handler = (event: unknown, ...args: unknown[]) => Promise<unknown>;

function recorder() {
  const handlers = new Map<string, Handler>();
  const ipcMain: IpcMainLike = { handle: (channel, listener) => void handlers.set(channel, listener as Handler) };
  const call = (channel: string, event: unknown, input?: unknown) => handlers.get(channel)!(event, input);
  return { ipcMain, handlers, call };
}

let dir: string;
let service: Service;
const trusted = ipcEvent('app://coilwright/index.html');

beforeAll(() => {
  dir = mkdtempSync(path.join(os.tmpdir(), 'cw-ipc-'));
  service = createService(openStore(path.join(dir, 'shop.db')));
});
afterAll(() => {
  service.close();
  rmSync(dir, { recursive: true, force: true });
});

describe('isTrustedSender', () => {
  it('accepts only a live frame on app://coilwright', () => {
    expect(isTrustedSender(trusted as never)).toBe(true);
    expect(isTrustedSender(ipcEvent('app://coilwright/jobs/3') as never)).toBe(true);
    for (const url of [null, 'https://evil.example/', 'app://coilwright.evil/', 'app://other/', 'file:///index.html', 'about:blank', '']) {
      expect(isTrustedSender(ipcEvent(url) as never), String(url)).toBe(false);
    }
  });

  it('treats a disposed frame (its getter throws) as untrusted', () => {
    const event = { get senderFrame(): never { throw new Error('Render frame was disposed'); } };
    expect(isTrustedSender(event as never)).toBe(false);
  });
});

describe('registerIpc', () => {
  it('registers one channel per contract method and nothing else', () => {
    const { ipcMain, handlers } = recorder();
    registerIpc(ipcMain, service.handlers);
    expect([...handlers.keys()]).toEqual(methodNames.map(apiChannel));
  });

  it('refuses a call from a gone (null) frame or a foreign origin, without running the method', async () => {
    const { ipcMain, call } = recorder();
    const calculate = vi.fn();
    registerIpc(ipcMain, { ...service.handlers, calculate } as unknown as Handlers);
    for (const event of [ipcEvent(null), ipcEvent('https://evil.example/'), ipcEvent('app://coilwright.evil/index.html')]) {
      const result = await call('api:calculate', event, { spec: valveSpringMetric });
      expect(result).toEqual({ ok: false, error: expect.objectContaining({ code: 'untrusted-sender', path: '' }) });
    }
    expect(calculate).not.toHaveBeenCalled();
  });

  it('turns a bad payload into a zod error value naming the field', async () => {
    const { ipcMain, call } = recorder();
    registerIpc(ipcMain, service.handlers);
    const result = await call('api:manufacturingPlan', trusted, { spec: valveSpringMetric, orderQuantity: 0 }) as
      { ok: false; error: { code: string; path: string; details: unknown[] } };
    expect(result.ok).toBe(false);
    expect(result.error.path).toBe('orderQuantity');
    expect(result.error.code).toBe('invalid-too-small');
    const extra = await call('api:listGrades', trusted, { sneaky: true }) as { ok: boolean; error: { code: string } };
    expect(extra).toMatchObject({ ok: false, error: { code: 'unknown-field' } });
    const notAnObject = await call('api:getJob', trusted, 'J-1') as { ok: boolean };
    expect(notAnObject.ok).toBe(false);
  });

  it('answers a trusted call with the method’s value', async () => {
    const { ipcMain, call } = recorder();
    registerIpc(ipcMain, service.handlers);
    const result = await call('api:calculate', trusted, { spec: valveSpringMetric }) as { ok: boolean; value: { kind: string; wireDiameter: number } };
    expect(result.ok).toBe(true);
    expect(result.value.kind).toBe('compression');
    expect(result.value.wireDiameter).toBe(2);
  });

  it('reports a failing handler and still answers with a value', async () => {
    const { ipcMain, call } = recorder();
    const onUnexpected = vi.fn();
    const broken = { ...service.handlers, listGrades: () => { throw new Error('disk on fire'); } } as unknown as Handlers;
    registerIpc(ipcMain, broken, { onUnexpected });
    const result = await call('api:listGrades', trusted, {});
    expect(result).toEqual({ ok: false, error: { code: 'unexpected', message: 'listGrades failed: disk on fire', path: '' } });
    expect(onUnexpected).toHaveBeenCalledWith('api:listGrades', expect.any(Error));
  });

  it('uses the sender check it is given', async () => {
    const { ipcMain, call } = recorder();
    registerIpc(ipcMain, service.handlers, { isTrustedSender: () => false });
    expect(await call('api:listGrades', trusted, {})).toMatchObject({ ok: false, error: { code: 'untrusted-sender' } });
  });
});
