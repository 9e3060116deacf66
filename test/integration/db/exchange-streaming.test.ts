import { spawn } from 'node:child_process';
import { existsSync, readFileSync, readdirSync, writeFileSync } from 'node:fs';
import { join, resolve } from 'node:path';
import { describe, expect, it } from 'vitest';
import { calculate } from '../../../core/calculate';
import { findGrade } from '../../../core/materials/catalog';
import { createJob, exportJobs, exportJobsToFile, importJobs, importJobsFromFile, openStore } from '../../../db';
import type { SqliteStore, Store } from '../../../db';
import { parseCsv } from '../../../db/exchange/csv';
import { JsonListSplitter } from '../../../db/exchange/json-list';
import { job, tempDir, tempStore, value } from './helpers';

/** Every row of the tables an import writes to. */
const contents = (store: Store) => ['jobs', 'job_revisions', 'customers', 'first_off_records', 'settings']
  .map((table) => store.sql(`SELECT * FROM ${table} ORDER BY 1`).all());

const jobCount = (store: Store) => (store.sql('SELECT count(*) AS n FROM jobs').get() as { n: number }).n;

/** A DEMO inch job as a US shop would enter it (invented part). */
const inchJob = job({ partNumber: '=SUM(A1:A9)', notes: '+1 from the customer (demo)' }, {
  units: 'inch', material: 'astm-a228', wireDiameter: 0.0625, outerDiameter: 0.75, totalCoils: 12, freeLength: 2.25,
  loads: [{ length: 1.5, force: 10 }, { length: 1.25 }],
});

function csvCells(store: Store): Record<string, string> {
  const [header, first] = parseCsv(value(exportJobs(store, { format: 'csv' })).text!);
  return Object.fromEntries(header!.fields.map((name, i) => [name, first!.fields[i]!]));
}

describe('the CSV job list for people', () => {
  it('writes an inch job in inches at the trade precision, the grade name beside its id, formulas guarded', () => {
    const store = tempStore();
    value(createJob(store, inchJob));
    const cells = csvCells(store);
    expect(cells.units).toBe('inch');
    // Lengths to 0.001 in (common trade practice; core/format.ts lengthDecimals).
    expect(cells['spec.wireDiameter (mm | in)']).toBe('0.063');
    expect(cells['spec.outerDiameter (mm | in)']).toBe('0.750');
    expect(cells['spec.freeLength (mm | in)']).toBe('2.250');
    // Each load's field in one cell, in load order; the second load asks no force.
    expect(cells['spec.loads.length (mm | in)']).toBe('1.500; 1.250');
    expect(cells['spec.loads.force (N | lbf)']).toBe('10.0; ');
    expect(cells.material).toBe('astm-a228');
    expect(cells.materialName).toBe(findGrade('astm-a228')!.name);
    expect(cells.partNumber).toBe("'=SUM(A1:A9)");
    expect(cells.notes).toBe("'+1 from the customer (demo)");
    // The rate in lbf/in to three significant digits, as the engine's own report gives it in the job's units.
    const calculated = calculate(inchJob.spec);
    if (!calculated.ok) throw new Error(JSON.stringify(calculated.errors));
    const report = calculated.value as { rate: number };
    const rate = cells[Object.keys(cells).find((k) => k.startsWith('rate ('))!]!;
    expect(rate).toMatch(/^\d+(\.\d+)?$/);
    expect(rate.replace('.', '').replace(/^0+/, '').length).toBeLessThanOrEqual(3);
    expect(Number(rate)).toBeCloseTo(report.rate, -Math.floor(Math.log10(report.rate)) + 1);
    for (const [name, cell] of Object.entries(cells)) {
      if (name !== 'spec' && name !== 'judgement' && /^-?\d/.test(cell)) expect(cell, name).not.toMatch(/\d\.\d{4,}/);
    }
  });

  it('imports back exactly what it wrote: the spec column is the source, the rounded columns are for reading', () => {
    const source = tempStore();
    value(createJob(source, inchJob));
    value(createJob(source, job({ status: 'ordered' })));
    const target = tempStore();
    value(importJobs(target, { text: value(exportJobs(source, { format: 'csv' })).text!, format: 'csv' }));
    const jobsOf = (s: Store) => JSON.parse(value(exportJobs(s, {})).text!).jobs;
    expect(jobsOf(target)).toEqual(jobsOf(source));
  });
});

describe('reading a JSON document a piece at a time', () => {
  it('hands out the items of the jobs list whatever the layout and wherever the pieces break', () => {
    const doc = JSON.stringify({ format: 'coilwright-jobs', jobs: [{ notes: 'a } ] " \\ [ {', loads: [{ length: 1 }] }, 5, 's,]', [1, 2], null], tail: { jobs: [9] }, version: 1 }, null, 1);
    const expected = JSON.parse(doc);
    for (const size of [1, 2, 3, 7, 64, doc.length]) {
      const splitter = new JsonListSplitter('jobs');
      const items: unknown[] = [];
      for (let i = 0; i < doc.length; i += size) items.push(...splitter.feed(doc.slice(i, i + size)).map((t) => JSON.parse(t)));
      expect(items, `pieces of ${size}`).toEqual(expected.jobs);
      expect(JSON.parse(splitter.rest())).toEqual({ ...expected, jobs: [] });
    }
  });
});

describe('export and import through files, streamed', () => {
  function seeded(count: number): Store {
    const store = tempStore();
    for (let i = 0; i < count; i++) value(createJob(store, job({ partNumber: `STR-${i}` }, { freeLength: 40 + (i % 20) })));
    return store;
  }

  it('round-trips JSON and CSV files into another store, reporting progress to the whole', async () => {
    const source = seeded(1200);
    const dir = tempDir();
    for (const format of ['json', 'csv'] as const) {
      const file = join(dir, `jobs.${format}`);
      const seen: [number, number][] = [];
      const exported = value(await exportJobsToFile(source, { format, file }, { onProgress: (d, t) => seen.push([d, t]) }));
      expect(exported.count).toBe(1200);
      expect(seen.at(-1)).toEqual([1200, 1200]);
      expect(seen.length).toBeGreaterThan(2);
      const target = tempStore();
      const bytes: number[] = [];
      const imported = value(await importJobsFromFile(target, { file }, { onProgress: (d) => bytes.push(d) }));
      expect(imported.imported).toHaveLength(1200);
      expect(bytes.at(-1)).toBe(readFileSync(file).length);
      expect(JSON.parse(value(exportJobs(target, {})).text!).jobs).toEqual(JSON.parse(value(exportJobs(source, {})).text!).jobs);
    }
  });

  it('a cancelled export leaves no file, a cancelled import leaves the store as it was', async () => {
    const source = seeded(1200);
    const dir = tempDir();
    const file = join(dir, 'jobs.json');
    const stop = new AbortController();
    const cancelledExport = await exportJobsToFile(source, { file }, { signal: stop.signal, onProgress: (d) => { if (d > 0) stop.abort(); } });
    expect(cancelledExport).toMatchObject({ ok: false, error: { code: 'cancelled' } });
    expect(readdirSync(dir)).toEqual([]);
    value(await exportJobsToFile(source, { file }));
    const target = seeded(3);
    const before = contents(target);
    const halt = new AbortController();
    const cancelledImport = await importJobsFromFile(target, { file }, { signal: halt.signal, onProgress: (d, t) => { if (d < t) halt.abort(); } });
    expect(cancelledImport).toMatchObject({ ok: false, error: { code: 'cancelled' } });
    expect(contents(target)).toEqual(before);
  });

  it('names every bad record of a streamed file and imports none of them', async () => {
    const dir = tempDir();
    const file = join(dir, 'jobs.json');
    const jobs = Array.from({ length: 50 }, (_, i) => job({ partNumber: `B-${i}` }, i === 7 ? { totalCoils: 1.5 } : i === 40 ? { wireDiameter: 'thick' } : {}));
    writeFileSync(file, JSON.stringify({ format: 'coilwright-jobs', version: 1, jobs }));
    const store = tempStore();
    const refused = await importJobsFromFile(store, { file });
    expect(refused).toMatchObject({ ok: false, error: { message: expect.stringMatching(/^2 record\(s\) are not valid, nothing was imported/) } });
    expect(!refused.ok && refused.error.details!.map((e) => e.path)).toEqual(['jobs[7].spec.totalCoils', 'jobs[40].spec.wireDiameter']);
    expect(jobCount(store)).toBe(0);
  });
});

const root = resolve(__dirname, '../../..');
const importer = join(root, 'test/integration/db/fixtures/slow-import.ts');

/** Starts the importer and kills it with SIGKILL once it has read between a fifth and four fifths of the file. */
function importAndKill(storeFile: string, jobsFile: string): Promise<number> {
  return new Promise((done, fail) => {
    const child = spawn(process.execPath, ['--import', 'tsx', importer, storeFile, jobsFile], { cwd: root, stdio: ['ignore', 'pipe', 'pipe'] });
    let said = '';
    let killedAt = 0;
    child.stdout.setEncoding('utf8').on('data', (chunk: string) => {
      said += chunk;
      for (const [, d, t] of said.matchAll(/progress (\d+) (\d+)\n/g)) {
        const share = Number(d) / Number(t);
        if (killedAt === 0 && share > 0.2 && share < 0.8) {
          killedAt = share;
          child.kill('SIGKILL');
        }
      }
    });
    child.on('error', fail);
    child.on('close', (_code, signal) => (signal === 'SIGKILL' ? done(killedAt) : fail(new Error(`the import ended on its own: ${said.slice(-200)}`))));
  });
}

describe('an import killed half-way', () => {
  it('leaves the store exactly as it was (SIGKILL during the transaction)', async () => {
    const source = tempStore();
    for (let i = 0; i < 400; i++) value(createJob(source, job({ partNumber: `K-${i}`, notes: 'n'.repeat(300) })));
    const dir = tempDir();
    const file = join(dir, 'jobs.json');
    const doc = JSON.parse(value(exportJobs(source, {})).text!);
    // Many copies of the same jobs (renumbered on import): a file that takes a while to import.
    doc.jobs = Array.from({ length: 40 }, () => doc.jobs).flat();
    writeFileSync(file, JSON.stringify(doc, null, 1));
    const storeFile = join(dir, 'shop.db');
    const store = openStore(storeFile);
    for (let i = 0; i < 3; i++) value(createJob(store, job({ partNumber: `KEEP-${i}` })));
    const numbers = store.db.prepare('SELECT number FROM jobs ORDER BY number').all();
    // By the time it is killed the import has set its search upkeep aside (triggers and list indexes dropped
    // inside its transaction): the schema must come back whole.
    const schemaOf = (s: SqliteStore) =>
      s.db.prepare("SELECT type, name, sql FROM sqlite_master WHERE name NOT LIKE 'sqlite_stat%' ORDER BY name").all();
    const schema = schemaOf(store);
    store.close();
    const killedAt = await importAndKill(storeFile, file);
    expect(killedAt).toBeGreaterThan(0.2);
    const after = openStore(storeFile);
    try {
      expect(after.db.pragma('integrity_check', { simple: true })).toBe('ok');
      expect(after.db.prepare('SELECT number FROM jobs ORDER BY number').all()).toEqual(numbers);
      expect(jobCount(after)).toBe(3);
      expect((after.db.prepare('SELECT count(*) AS n FROM job_revisions').get() as { n: number }).n).toBe(3);
      expect(schemaOf(after)).toEqual(schema);
      expect((after.db.prepare("SELECT count(*) AS n FROM job_text WHERE job_text MATCH 'part_number : keep*'").get() as { n: number }).n).toBe(3);
      expect(existsSync(storeFile)).toBe(true);
      // The store takes the next import as if nothing had happened.
      const small = join(dir, 'small.json');
      writeFileSync(small, JSON.stringify({ ...doc, jobs: doc.jobs.slice(0, 2) }));
      expect(value(await importJobsFromFile(after, { file: small, renumber: true })).imported.map((j) => j.number)).toEqual(['J-26-0004', 'J-26-0005']);
      expect((after.db.prepare("SELECT count(*) AS n FROM job_text WHERE job_text MATCH 'part_number : k*'").get() as { n: number }).n).toBe(5);
    } finally {
      after.close();
    }
  }, 60_000);
});
