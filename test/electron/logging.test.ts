import { existsSync, mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { createFaultReporter, faultMessage } from '../../electron/shell/faults';
import { createLog } from '../../electron/shell/logging';

let dir: string;
beforeEach(() => { dir = mkdtempSync(path.join(os.tmpdir(), 'cw-log-')); });
afterEach(() => rmSync(dir, { recursive: true, force: true }));

const clock = () => new Date('2026-03-04T05:06:07.000Z');

describe('the log file', () => {
  it('creates logs/coilwright.log and appends stamped lines with the stack', () => {
    const log = createLog(path.join(dir, 'logs'), clock);
    log.info('first-run', 'demo shop created');
    log.error('api:calculate', new Error('boom'));
    const text = readFileSync(path.join(dir, 'logs', 'coilwright.log'), 'utf8');
    expect(text).toMatch(/^2026-03-04T05:06:07.000Z INFO \[first-run\] demo shop created\n/);
    expect(text).toContain('ERROR [api:calculate] Error: boom\n    at ');
  });

  it('moves a large log aside and starts a new one', () => {
    const logs = path.join(dir, 'logs');
    const log = createLog(logs, clock);
    log.info('x', 'seed');
    writeFileSync(log.file, 'x'.repeat(1_000_001));
    log.info('x', 'after');
    expect(readFileSync(log.file, 'utf8')).toMatch(/INFO \[x\] after\n$/);
    expect(existsSync(path.join(logs, 'coilwright.1.log'))).toBe(true);
  });

  it('never throws when the folder cannot be written', () => {
    const blocker = path.join(dir, 'file');
    writeFileSync(blocker, '');
    const log = createLog(path.join(blocker, 'logs'));
    expect(() => log.error('x', new Error('y'))).not.toThrow();
  });
});

describe('the fault reporter', () => {
  it('logs every failure but shows one dialog at a time', async () => {
    const log = createLog(path.join(dir, 'logs'), clock);
    let close: () => void = () => undefined;
    const show = vi.fn((_message: string) => new Promise<void>((resolve) => { close = resolve; }));
    const faults = createFaultReporter(log, show);
    faults.report('main', new Error('first'));
    faults.report('main', new Error('second'));
    await vi.waitFor(() => expect(show).toHaveBeenCalledTimes(1));
    expect(show.mock.calls[0]![0]).toContain('first');
    close();
    await new Promise((r) => setTimeout(r, 0));
    faults.report('main', new Error('third'));
    await vi.waitFor(() => expect(show).toHaveBeenCalledTimes(2));
    const text = readFileSync(log.file, 'utf8');
    expect(text.match(/ERROR \[main\]/g)).toHaveLength(3);
  });

  it('keeps going when the dialog itself fails', async () => {
    const log = createLog(path.join(dir, 'logs'), clock);
    const faults = createFaultReporter(log, () => Promise.reject(new Error('no display')));
    faults.report('main', new Error('first'));
    await vi.waitFor(() => expect(readFileSync(log.file, 'utf8')).toContain('[fault-dialog] Error: no display'));
  });

  it('tells the user where the details are', () => {
    expect(faultMessage(new Error('disk full'), '/u/logs/coilwright.log')).toMatch(/disk full[\s\S]*\/u\/logs\/coilwright\.log/);
  });
});
