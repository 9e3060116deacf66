import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { methodNames } from '../../../core/api';
import { openStore } from '../../../db';
import { createService, dispatch } from '../../../service/api';
import { job, spec, tempDir, value } from './helpers';

describe('store service', () => {
  it('answers every method of the contract', () => {
    const service = createService(openStore(join(tempDir(), 'shop.db')));
    expect(Object.keys(service.handlers).sort()).toEqual([...methodNames].sort());
    service.close();
  });

  it('returns values for good and bad input alike, naming the field', async () => {
    const service = createService(openStore(join(tempDir(), 'shop.db')));
    const created = await dispatch(service.handlers, 'createJob', job());
    expect(created).toMatchObject({ ok: true, value: { number: 'J-26-0001' } });
    const bad = await dispatch(service.handlers, 'createJob', job({}, { ends: 'hooked' }));
    expect(bad).toMatchObject({ ok: false, error: { path: 'spec.ends' } });
    const unknown = await dispatch(service.handlers, 'listJobs', { colour: 'red' });
    expect(unknown).toMatchObject({ ok: false, error: { path: 'colour', code: 'unknown-field' } });
    const page = await dispatch(service.handlers, 'listJobs', {});
    expect(page).toMatchObject({ ok: true, value: { total: 1 } });
    service.close();
  });

  it('takes no file path through any contract method: backups, restores and file exchange are the host\'s', async () => {
    const service = createService(openStore(join(tempDir(), 'shop.db')));
    expect(methodNames).not.toContain('backup');
    expect(methodNames).not.toContain('restore');
    for (const [name, input] of [
      ['exportJobs', { file: '/etc/cron.d/x' }], ['importJobs', { file: '/etc/passwd' }], ['backup', { file: '/tmp/x.db' }], ['restore', { file: '/tmp/x.db' }],
    ] as const) {
      const r = await dispatch(service.handlers, name, input);
      expect(r.ok, name).toBe(false);
      expect(!r.ok && r.error.code, name).toMatch(/unknown-field|unknown-method|invalid/);
      expect(!r.ok && r.error.message, name).not.toMatch(/root:|cron/);
    }
    service.close();
  });

  it('keeps its connection and reads the restored rows after a restore', async () => {
    const dir = tempDir();
    const service = createService(openStore(join(dir, 'shop.db')));
    await dispatch(service.handlers, 'createJob', job({ partNumber: 'KEPT' }));
    expect(await service.files.run('backup', { file: join(dir, 'b.db') })).toMatchObject({ ok: true });
    await dispatch(service.handlers, 'createJob', job({ partNumber: 'UNDONE' }));
    const before = service.store();
    expect(await service.files.run('restore', { file: join(dir, 'b.db') })).toMatchObject({ ok: true });
    expect(service.store()).toBe(before);
    const page = await dispatch(service.handlers, 'listJobs', {});
    expect(page.ok && (page.value as { jobs: { partNumber: string }[] }).jobs.map((j) => j.partNumber)).toEqual(['KEPT']);
    service.close();
  });
  it('calculates with the open store\'s set-removal routing, the one its plans use', async () => {
    const service = createService(openStore(join(tempDir(), 'shop.db')));
    const before = await dispatch(service.handlers, 'calculate', { spec: spec() });
    expect(before.ok && (before.value as { setRemoval: { governedBy: string } }).setRemoval.governedBy).toBe('stricter');
    const settings = value(await dispatch(service.handlers, 'getSettings', {})) as { defaults: Record<string, unknown> };
    const saved = await dispatch(service.handlers, 'saveSettings', { settings: { ...settings, defaults: { ...settings.defaults, setRemovalMethod: 'handbook' } } });
    expect(saved.ok).toBe(true);
    const after = await dispatch(service.handlers, 'calculate', { spec: spec() });
    expect(after.ok && (after.value as { setRemoval: { governedBy: string } }).setRemoval.governedBy).toBe('handbook');
    service.close();
  });
});
