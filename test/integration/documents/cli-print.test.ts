import { spawnSync } from 'node:child_process';
import { mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createJob, getQuote, listQuotes, openStore, saveSettings } from '../../../db';
import { inchSpec, shop, valveSpec } from './fixtures';
import { pdfText, root } from './helpers';

const cli = (args: string[]) =>
  spawnSync(process.execPath, ['--import', 'tsx', 'service/cli/main.ts', ...args], { cwd: root, encoding: 'utf8' });

const isPdf = (file: string) => readFileSync(file).subarray(0, 5).toString() === '%PDF-';

describe('command line: print quote and print traveller', () => {
  let dir = '';
  let db = '';
  let jobNumber = '';

  beforeAll(() => {
    dir = mkdtempSync(join(tmpdir(), 'coilwright-print-'));
    db = join(dir, 'shop.db');
    const store = openStore(db);
    try {
      const settings = saveSettings(store, shop);
      if (!settings.ok) throw new Error(JSON.stringify(settings.error));
      const job = createJob(store, {
        customer: { name: 'Tamsin Test Devices (demo)', email: 'supply@tamsin.example' }, partNumber: 'TTD-INJ-1',
        drawingNumber: 'TT-1100', drawingRevision: 'E', orderQuantity: 800, leadTimeDays: 18, spec: valveSpec,
      });
      if (!job.ok) throw new Error(JSON.stringify(job.error));
      jobNumber = job.value.number;
    } finally {
      store.close();
    }
    writeFileSync(join(dir, 'job.json'), JSON.stringify({
      customer: { name: 'Redgate Test Racing (demo)' }, partNumber: 'RTR-VS-44', drawing: 'RT-44-01', revision: 'G',
      orderQuantity: 300, dueDate: '2026-06-30', spec: inchSpec,
    }));
    writeFileSync(join(dir, 'spec.json'), JSON.stringify(valveSpec));
    writeFileSync(join(dir, 'bad.json'), JSON.stringify({ ...valveSpec, wireDiameter: -2 }));
    writeFileSync(join(dir, 'bare.json'), JSON.stringify({ ...valveSpec, quantities: undefined }));
  });

  afterAll(() => rmSync(dir, { recursive: true, force: true }));

  it('prints a quote and a traveller from a job file (exit 0, a PDF) without touching the quotes', async () => {
    const quote = cli(['print', 'quote', join(dir, 'job.json'), '--db', db, '--out', join(dir, 'q.pdf')]);
    expect(quote.status, quote.stderr).toBe(0);
    expect(JSON.parse(quote.stdout)).toMatchObject({ quote: 'DRAFT', issued: false });
    expect(isPdf(join(dir, 'q.pdf'))).toBe(true);
    expect((await pdfText(readFileSync(join(dir, 'q.pdf')))).all).toContain('RT-44-01 rev. G');

    const traveller = cli(['print', 'traveller', join(dir, 'job.json'), '--db', db, '--out', join(dir, 't.pdf')]);
    expect(traveller.status, traveller.stderr).toBe(0);
    expect(JSON.parse(traveller.stdout).quantity).toBe(300);
    expect(isPdf(join(dir, 't.pdf'))).toBe(true);
    expect((await pdfText(readFileSync(join(dir, 't.pdf')))).all).toContain('Quantity ordered 300 pcs');
    const store = openStore(db);
    try {
      expect(listQuotes(store, {})).toEqual({ ok: true, value: [] });
    } finally {
      store.close();
    }
  });

  it('prints a traveller for a stored job, and issues its quote into the store with the document model', async () => {
    const t = cli(['print', 'traveller', '--job', jobNumber, '--db', db, '--out', join(dir, 'job-t.pdf')]);
    expect(t.status, t.stderr).toBe(0);
    expect((await pdfText(readFileSync(join(dir, 'job-t.pdf')))).all).toContain(`Job ${jobNumber}`);

    const q = cli(['print', 'quote', '--job', jobNumber, '--db', db, '--out', join(dir, 'job-q.pdf')]);
    expect(q.status, q.stderr).toBe(0);
    const out = JSON.parse(q.stdout);
    expect(out.issued).toBe(true);
    const store = openStore(db);
    try {
      const list = listQuotes(store, {});
      expect(list.ok && list.value.map((x) => x.number)).toEqual([out.quote]);
      const stored = getQuote(store, { number: out.quote });
      if (!stored.ok) throw new Error(JSON.stringify(stored.error));
      expect(stored.value.document).toMatchObject({ type: 'quote', lines: [{ prices: { currency: 'EUR' } }] });
    } finally {
      store.close();
    }
    const text = (await pdfText(readFileSync(join(dir, 'job-q.pdf')))).all;
    expect(text).toContain(`Quote no. ${out.quote}`);
    expect(text).toContain('supply@tamsin.example');

    const again = cli(['print', 'quote', '--quote', out.quote, '--db', db, '--out', join(dir, 'again.pdf')]);
    expect(again.status, again.stderr).toBe(0);
    expect(readFileSync(join(dir, 'again.pdf')).equals(readFileSync(join(dir, 'job-q.pdf')))).toBe(true);
  });

  it('exits 2 for a bad spec, naming the field, and for a traveller without a quantity', () => {
    const bad = cli(['print', 'quote', join(dir, 'bad.json'), '--db', db, '--out', join(dir, 'bad.pdf')]);
    expect(bad.status).toBe(2);
    expect(JSON.parse(bad.stderr).errors[0].path).toBe('wireDiameter');
    const bare = cli(['print', 'traveller', join(dir, 'bare.json'), '--db', db, '--out', join(dir, 'bare.pdf')]);
    expect(bare.status).toBe(2);
    expect(JSON.parse(bare.stderr).errors[0].path).toBe('orderQuantity');
    const withQuantity = cli(['print', 'traveller', join(dir, 'spec.json'), '--quantity', '40', '--db', db, '--out', join(dir, 'q40.pdf')]);
    expect(withQuantity.status, withQuantity.stderr).toBe(0);
  });

  it('exits 2 for an unknown job or quote and for a missing --out', () => {
    expect(cli(['print', 'traveller', '--job', 'J-99-9999', '--db', db, '--out', join(dir, 'x.pdf')]).status).toBe(2);
    expect(cli(['print', 'quote', '--quote', 'Q-99-9999', '--db', db, '--out', join(dir, 'x.pdf')]).status).toBe(2);
    expect(cli(['print', 'quote', join(dir, 'spec.json'), '--db', db]).status).toBe(2);
    expect(cli(['print', 'label', '--db', db]).status).toBe(2);
  });

  it('refuses to issue a quote with open errors unless --accept gives the reason, which the quote keeps', async () => {
    const store = openStore(db);
    let number = '';
    try {
      const created = createJob(store, { customer: { name: 'Tamsin Test Devices (demo)' }, partNumber: 'TTD-STOP-2',
        spec: { ...valveSpec, loads: [{ length: 5 }] } });
      if (!created.ok) throw new Error(JSON.stringify(created.error));
      number = created.value.number;
    } finally {
      store.close();
    }
    const refused = cli(['print', 'quote', '--job', number, '--db', db, '--out', join(dir, 'refused.pdf')]);
    expect(refused.status).toBe(2);
    const errors = JSON.parse(refused.stderr).errors;
    expect(errors[0]).toMatchObject({ code: 'issue-needs-decision', path: 'accept' });
    expect(errors[0].message).toContain('--accept "reason"');
    expect(errors.slice(1).map((e: { code: string }) => e.code)).toContain('working-length-below-solid');
    const issued = cli(['print', 'quote', '--job', number, '--accept', 'customer fits a stop; 5 mm is the stop height', '--db', db, '--out', join(dir, 'accepted.pdf')]);
    expect(issued.status, issued.stderr).toBe(0);
    const reopened = openStore(db);
    try {
      const quote = getQuote(reopened, { number: JSON.parse(issued.stdout).quote });
      expect(quote.ok && quote.value.decision?.reason).toBe('customer fits a stop; 5 mm is the stop height');
    } finally {
      reopened.close();
    }
    const text = (await pdfText(readFileSync(join(dir, 'accepted.pdf')))).all;
    expect(text).toContain('Accepted deviations from the drawing');
    expect(text).toContain('shorter than the spring\'s solid length');
  });

  it('issues one quotation for several jobs of a customer with --jobs, refused on an open error until --accept gives the reason', async () => {
    const store = openStore(db);
    const numbers: string[] = [];
    try {
      for (const [part, spec] of [['TTD-INJ-3', valveSpec], ['TTD-STOP-4', { ...valveSpec, loads: [{ length: 5 }] }]] as const) {
        const created = createJob(store, { customer: { name: 'Tamsin Test Devices (demo)' }, partNumber: part, orderQuantity: 400, spec });
        if (!created.ok) throw new Error(JSON.stringify(created.error));
        numbers.push(created.value.number);
      }
    } finally {
      store.close();
    }
    const jobs = `${jobNumber},${numbers.join(',')}`;
    const refused = cli(['print', 'quote', '--jobs', jobs, '--db', db, '--out', join(dir, 'lines-refused.pdf')]);
    expect(refused.status).toBe(2);
    const errors = JSON.parse(refused.stderr).errors;
    expect(errors[0].message).toContain(`open error on ${numbers[1]}`);
    expect(errors.slice(1)).toContainEqual(expect.objectContaining({ code: 'working-length-below-solid', path: 'jobIds[2].spec.loads[0].length' }));
    expect(cli(['print', 'quote', '--jobs', ',', '--db', db, '--out', join(dir, 'x.pdf')]).status).toBe(2);

    const issued = cli(['print', 'quote', '--jobs', jobs, '--accept', 'customer fits a stop on TTD-STOP-4', '--db', db, '--out', join(dir, 'lines.pdf')]);
    expect(issued.status, issued.stderr).toBe(0);
    const number = JSON.parse(issued.stdout).quote;
    const reopened = openStore(db);
    try {
      const quote = getQuote(reopened, { number });
      if (!quote.ok) throw new Error(JSON.stringify(quote.error));
      expect(quote.value.lines.map((l) => l.jobNumber)).toEqual([jobNumber, ...numbers]);
      expect(quote.value.decision?.reason).toBe('customer fits a stop on TTD-STOP-4');
      const history = listQuotes(reopened, { jobId: quote.value.lines[1]!.jobId });
      expect(history.ok && history.value.map((q) => q.number)).toEqual([number]);
    } finally {
      reopened.close();
    }
    const history = cli(['jobs', 'quotes', numbers[0]!, '--db', db]);
    expect(history.status, history.stderr).toBe(0);
    expect(JSON.parse(history.stdout)).toMatchObject([{ number, lines: [{ line: 1, jobNumber }, { line: 2, jobNumber: numbers[0] }, { line: 3 }] }]);
    const text = (await pdfText(readFileSync(join(dir, 'lines.pdf')))).all;
    expect(text).toContain('Item 3: TTD-STOP-4');
    expect(text).toContain('shorter than the spring\'s solid length');
    const again = cli(['print', 'quote', '--quote', number, '--db', db, '--out', join(dir, 'lines-again.pdf')]);
    expect(again.status, again.stderr).toBe(0);
    expect(readFileSync(join(dir, 'lines-again.pdf')).equals(readFileSync(join(dir, 'lines.pdf')))).toBe(true);
  });
});
