import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { methodNames } from '../../../core/api';
import { openStore } from '../../../db';
import { createService, dispatch } from '../../../service/api';
import { tempDir } from './helpers';

const nestedArrays = (levels: number): unknown => {
  let v: unknown = 1;
  for (let i = 0; i < levels; i++) v = [v];
  return v;
};

const nestedObjects = (levels: number): unknown => {
  let v: unknown = 1;
  for (let i = 0; i < levels; i++) v = { a: v };
  return v;
};

describe('hostile input through the service', () => {
  it('answers 3 KB of deep nesting in any field with a field error, never a thrown error', async () => {
    const service = createService(openStore(join(tempDir(), 'shop.db')));
    const deep = nestedArrays(1500);
    expect(JSON.stringify(deep).length).toBeLessThanOrEqual(3002);
    const unexpected: string[] = [];
    for (const name of methodNames) {
      for (const input of [{ spec: deep }, { jobId: 1, prices: deep, quantityBreaks: [], document: {} }, { settings: { shopProfile: nestedObjects(600) } }]) {
        const r = await dispatch(service.handlers, name, input, { onUnexpected: (m, e) => unexpected.push(`${m}: ${String(e)}`) });
        expect(r.ok, name).toBe(false);
        if (!r.ok) expect(r.error.path, `${name}: ${r.error.message}`).not.toBe('');
      }
    }
    expect(unexpected).toEqual([]);
    const r = await dispatch(service.handlers, 'issueQuote', { jobId: 1, prices: deep, quantityBreaks: [], document: {} });
    expect(r).toMatchObject({ ok: false, error: { code: 'input-too-deep', path: 'prices' } });
    service.close();
  });

  it('names the method whose input is wrong when no field can be named', async () => {
    const service = createService(openStore(join(tempDir(), 'shop.db')));
    for (const name of methodNames) {
      const r = await dispatch(service.handlers, name, [1, 2]);
      expect(r.ok).toBe(false);
      if (!r.ok && r.error.path === '') expect(r.error.message).toContain(`the input of ${name}`);
    }
    const job = await dispatch(service.handlers, 'getJob', { spec: 1 });
    expect(!job.ok && job.error.details).toContainEqual(expect.objectContaining({ path: 'spec', code: 'unknown-field' }));
    service.close();
  });
});
