import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { createDemoShop, openStore } from '../../../db';
import { createService, dispatch } from '../../../service/api';
import type { Service } from '../../../service/api';

describe('printing through the API (what the app\'s Print menu calls)', () => {
  const dir = mkdtempSync(join(tmpdir(), 'coilwright-print-api-'));
  let service: Service;
  let jobId: number;

  beforeAll(async () => {
    const store = openStore(join(dir, 'shop.db'));
    createDemoShop(store);
    service = createService(store);
    const page = await dispatch(service.handlers, 'listJobs', { kind: 'compression', limit: 1 });
    if (!page.ok) throw new Error(page.error.message);
    jobId = (page.value as { jobs: { id: number }[] }).jobs[0]!.id;
  });
  afterAll(() => {
    service.close();
    rmSync(dir, { recursive: true, force: true });
  });

  const pdfOf = (result: Awaited<ReturnType<typeof dispatch>>) => {
    if (!result.ok) throw new Error(JSON.stringify(result.error));
    return result.value as { base64: string; fileName: string; reference: string };
  };

  it('prints a traveller for a stored job as a PDF', async () => {
    const printed = pdfOf(await dispatch(service.handlers, 'printTraveller', { jobId, quantity: 500 }));
    expect(Buffer.from(printed.base64, 'base64').subarray(0, 5).toString()).toBe('%PDF-');
    expect(printed.fileName).toMatch(/^traveller-.+\.pdf$/);
  });

  it('issues a quote, keeps it, and reprints it to the same bytes', async () => {
    const before = await dispatch(service.handlers, 'listQuotes', { jobId });
    const issued = pdfOf(await dispatch(service.handlers, 'printQuote', { jobId, accept: 'stress at solid within 0.2 % of the allowable: customer fits a stop' }));
    const after = await dispatch(service.handlers, 'listQuotes', { jobId });
    expect((after as { value: unknown[] }).value.length).toBe((before as { value: unknown[] }).value.length + 1);
    const again = pdfOf(await dispatch(service.handlers, 'reprintQuote', { number: issued.reference }));
    expect(again.base64).toBe(issued.base64);
  });

  it('answers an unknown job or quote with an error value naming the field', async () => {
    const missing = await dispatch(service.handlers, 'printTraveller', { jobId: 999_999 });
    expect(missing).toMatchObject({ ok: false, error: { code: 'not-found' } });
    const bad = await dispatch(service.handlers, 'printQuote', { jobId: 'one' });
    expect(bad).toMatchObject({ ok: false, error: { path: 'jobId' } });
    const noQuote = await dispatch(service.handlers, 'reprintQuote', { number: 'Q-00-9999' });
    expect(noQuote).toMatchObject({ ok: false, error: { code: 'not-found', path: 'number' } });
  });
});
