import { writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { archiveJob, createJob, exportJobs, getJob, importJobs, listJobs } from '../../../db';
import { csvField, parseCsv, unguarded } from '../../../db/exchange/csv';
import type { SqliteStore as Store } from '../../../db';
import { job, spec, tempDir, tempStore, value } from './helpers';

function count(store: Store): number {
  return (store.db.prepare('SELECT (SELECT count(*) FROM jobs) + (SELECT count(*) FROM customers) + (SELECT count(*) FROM job_revisions) AS n').get() as { n: number }).n;
}

function seeded(): Store {
  const store = tempStore();
  value(createJob(store, job({ notes: 'line one\nline two, with "quotes"' })));
  value(createJob(store, job({ customer: { name: 'Marlow Hydraulics', email: 'buy@marlow.example' }, status: 'ordered', orderQuantity: 250, dueDate: '2026-09-30' }, { units: 'inch', wireDiameter: 0.08, outerDiameter: 0.8, freeLength: 2, material: 'astm-a228' })));
  return store;
}

describe('export and import', () => {
  it('round-trips jobs through the JSON document into another store', () => {
    const source = seeded();
    const exported = value(exportJobs(source, {}));
    const doc = JSON.parse(exported.text!);
    expect(doc).toMatchObject({ format: 'coilwright-jobs', version: 2 });
    expect(doc.jobs).toHaveLength(2);
    const target = tempStore();
    const result = value(importJobs(target, { text: exported.text! }));
    expect(result.imported.map((j) => j.number)).toEqual(['J-26-0001', 'J-26-0002']);
    const back = value(exportJobs(target, {}));
    const strip = (d: { jobs: unknown[] }) => d.jobs;
    expect(strip(JSON.parse(back.text!))).toEqual(strip(doc));
    expect(value(listJobs(target, { status: 'ordered' })).jobs[0]!.customer!.name).toBe('Marlow Hydraulics');
  });

  it('refuses numbers already in the store unless asked to renumber', () => {
    const store = seeded();
    const text = value(exportJobs(store, {})).text!;
    const refused = importJobs(store, { text });
    expect(refused).toMatchObject({ ok: false, error: { code: 'duplicate-number', path: 'jobs[0].number' } });
    expect(value(importJobs(store, { text, renumber: true })).imported.map((j) => j.number)).toEqual(['J-26-0003', 'J-26-0004']);
  });

  it('writes nothing when a record in the middle is bad, and names the record and field', () => {
    const store = seeded();
    const before = count(store);
    const doc = {
      format: 'coilwright-jobs', version: 1,
      jobs: [job({ partNumber: 'OK-1' }), job({ partNumber: 'OK-2' }), job({ partNumber: 'BAD' }, { totalCoils: 1.5 }), job({ status: 'shipped' }), job({ partNumber: 'OK-3' })],
    };
    const result = importJobs(store, { text: JSON.stringify(doc) });
    expect(result.ok).toBe(false);
    if (result.ok) return;
    expect(result.error.message).toMatch(/^2 record\(s\) are not valid, nothing was imported/);
    expect(result.error.details!.map((e) => e.path)).toEqual(['jobs[2].spec.totalCoils', 'jobs[3].status']);
    expect(count(store)).toBe(before);
  });

  it('exports the job list as CSV and imports it back, reporting bad lines by line number', () => {
    const source = seeded();
    const csv = value(exportJobs(source, { format: 'csv' })).text!;
    const records = parseCsv(csv);
    expect(records).toHaveLength(3);
    expect(records[0]!.fields.slice(0, 5)).toEqual(['number', 'customer', 'customerEmail', 'customerPhone', 'partNumber']);
    expect(records[1]!.fields[8]).toBe('line one\nline two, with "quotes"');
    expect(records[2]!.line).toBe(4);
    const target = tempStore();
    expect(value(importJobs(target, { text: csv, format: 'csv' })).imported).toHaveLength(2);
    const dir = tempDir();
    const broken = csv.replace('""wireDiameter"":0.08', '""wireDiameter"":""thick""');
    expect(broken).not.toBe(csv);
    writeFileSync(join(dir, 'jobs.csv'), broken);
    const refused = importJobs(tempStore(), { file: join(dir, 'jobs.csv') });
    expect(refused).toMatchObject({ ok: false, error: { path: 'lines[4].spec.wireDiameter' } });
  });

  it('shows in the CSV which jobs are archived, and reads it back', () => {
    const source = seeded();
    const archived = value(archiveJob(source, { id: 2, archived: true }));
    const csv = value(exportJobs(source, { format: 'csv' })).text!;
    const [header, listed, gone] = parseCsv(csv).map((r) => r.fields);
    const column = header!.indexOf('archivedAt');
    expect(header!.slice(column - 2, column + 2)).toEqual(['createdAt', 'updatedAt', 'archivedAt', 'kind']);
    expect([listed![column], gone![column]]).toEqual(['', archived.archivedAt]);
    const target = tempStore();
    value(importJobs(target, { text: csv, format: 'csv' }));
    expect([value(getJob(target, { number: 'J-26-0001' })).archivedAt, value(getJob(target, { number: 'J-26-0002' })).archivedAt]).toEqual([null, archived.archivedAt]);
  });

  it('names an unknown format or version', () => {
    const store = tempStore();
    const newer = importJobs(store, { text: JSON.stringify({ format: 'coilwright-jobs', version: 3, jobs: [] }) });
    expect(newer).toMatchObject({ ok: false, error: { code: 'unknown-version', path: 'version' } });
    expect(!newer.ok && newer.error.message).toMatch(/version 3 is not one this Coilwright reads \(1 and 2\): a newer Coilwright wrote it/);
    expect(importJobs(store, { text: JSON.stringify({ format: 'coilwright-jobs', version: 0, jobs: [] }) }))
      .toMatchObject({ ok: false, error: { code: 'unknown-version', path: 'version' } });
    expect(importJobs(store, { text: '{ nope' })).toMatchObject({ ok: false, error: { code: 'invalid-json' } });
    expect(importJobs(store, { text: JSON.stringify({ format: 'coilwright-jobs', version: 1, jobs: [{ spec: spec(), extra: 1 }] }) }))
      .toMatchObject({ ok: false, error: { code: 'unknown-field', path: 'jobs[0].extra' } });
  });
});

describe('CSV and spreadsheets', () => {
  it('writes text a spreadsheet would run as a formula behind an apostrophe, and reads it back unchanged', () => {
    const guarded = csvField('=HYPERLINK("http://x")');
    expect(guarded.startsWith('"\'=')).toBe(true);
    expect(unguarded(parseCsv(guarded)[0]!.fields[0]!)).toBe('=HYPERLINK("http://x")');
    expect(csvField(-5)).toBe('-5');
    expect(unguarded("'plain")).toBe("'plain");
  });

  // OWASP "CSV Injection" guidance (common practice): spreadsheets skip leading blanks and line feeds and
  // read the fullwidth signs as formula starts too, so those are guarded like a plain "=".
  it.each([' =1+1', '\n=1+1', '\r\n=cmd', '＝1+1', '＋1', '－1', '＠SUM(A1)', '\u3000=1'])('guards %j and reads it back unchanged', (text) => {
    const written = csvField(text);
    expect(parseCsv(written)[0]!.fields[0]!.startsWith("'")).toBe(true);
    expect(unguarded(parseCsv(written)[0]!.fields[0]!)).toBe(text);
  });

  it('keeps text that starts with an apostrophe, and the customer e-mail and phone, through a CSV round trip', () => {
    const source = tempStore();
    value(createJob(source, job({ partNumber: "'=not a formula", notes: "'quoted", customer: { name: 'Ardent Gate Co. (demo)', email: 'parts@ardent.example', phone: '+44 20 7946 0000' } })));
    const csv = value(exportJobs(source, { format: 'csv' })).text!;
    const target = tempStore();
    value(importJobs(target, { text: csv, format: 'csv' }));
    const back = JSON.parse(value(exportJobs(target, {})).text!).jobs[0];
    expect(back.partNumber).toBe("'=not a formula");
    expect(back.notes).toBe("'quoted");
    expect(back.customer).toEqual({ name: 'Ardent Gate Co. (demo)', email: 'parts@ardent.example', phone: '+44 20 7946 0000' });
  });
});
