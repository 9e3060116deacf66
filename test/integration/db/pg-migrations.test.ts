import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { APPLICATION_ID, createJob, getQuote, openPgStore, reindexJobs, staleJobCount } from '../../../db';
import type { PgStore } from '../../../db';
import { SyncConnection, migratePg, pgSchemaVersion } from '../../../db/pg';
import { ENGINE_VERSION } from '../../../core/engine-version';
import { usePgCluster } from '../../support/pg-stores';
import { job, spec, value } from './helpers';

/**
 * Each numbered migration's own test on PostgreSQL, as migration-NNNN.test.ts holds it on SQLite: one throwaway
 * cluster for the whole file and a fresh database per migration (CREATE DATABASE is cheap; a cluster is not).
 * Each test migrates to the version before, puts in rows as that version wrote them, migrates, and checks that
 * the rows came through and that the new tables, columns, constraints and triggers do what SQLite's do.
 */
const pg = usePgCluster();

interface Database { c: SyncConnection; url: string }

/** A fresh database brought to `version` (0: empty, not yet a store). */
function databaseAt(version: number): Database {
  const url = pg.freshDatabase();
  const c = new SyncConnection(url);
  if (version > 0) migratePg(c, 'test', version);
  return { c, url };
}

/** Migrates and checks that it went from the version before straight to `to`. */
function up({ c }: Database, from: number, to: number): void {
  expect(migratePg(c, 'test', to)).toEqual({ from, to });
  expect(pgSchemaVersion(c)).toBe(to);
}

const rows = ({ c }: Database, sql: string, ...params: unknown[]) => c.query(sql, params).rows;
const run = ({ c }: Database, sql: string, ...params: unknown[]) => void c.query(sql, params);
const refused = (db: Database, sql: string, why: RegExp, ...params: unknown[]) => expect(() => db.c.query(sql, params), sql).toThrow(why);
const column = (db: Database, sql: string, ...params: unknown[]) => rows(db, sql, ...params).map((r) => Object.values(r)[0]);

/** Rows given their ids by hand: the identity moves past them, as the store's own writes would have. */
const moveIdentity = (db: Database, table: string) =>
  run(db, `SELECT setval(pg_get_serial_sequence('${table}', 'id'), (SELECT max(id) FROM ${table}))`);

/** Opens the database as a store (migrating it to the latest version) and closes it after `fn`. */
function asStore<T>(db: Database, fn: (store: PgStore) => T): T {
  db.c.close();
  const store = openPgStore(db.url, { author: 'Test desk' });
  try {
    return fn(store);
  } finally {
    store.close();
  }
}

const JOB = `INSERT INTO jobs (id, number, status, spec, revision, created_at, updated_at, kind, material, material_family, units, d,
  mean_diameter, free_length, active_coils, rate) VALUES ($1, $2, 'draft', '{}', 1, 'x', 'x', 'compression', 'm', 'f', 'metric', $3, 10, 40, 6, 3)`;
const REVISION = `INSERT INTO job_revisions (job_id, revision, saved_at, reason, fields, spec) VALUES ($1, $2, 'x', $3, '{}', '{}')`;
const QUOTE_COLUMNS = 'number, job_id, job_revision, issued_at, validity_days, currency, job, spec, settings, prices, quantity_breaks, document';
const QUOTE = `INSERT INTO quotes (${QUOTE_COLUMNS}) VALUES ($1, 1, 1, '2026-01-01T00:00:00Z', 30, 'USD', '{}', '{}', '{}', $2, '[]', '{}')`;

describe('PostgreSQL: each migration carries the rows of the version before and adds what SQLite\'s does', () => {
  it('0001 (jobs): marks the database, creates the job tables, checks status, types, keys and keeps revisions', () => {
    const db = databaseAt(0);
    up(db, 0, 1);
    expect(column(db, 'SELECT application_id FROM coilwright_store')).toEqual([APPLICATION_ID]);
    expect(column(db, `SELECT table_name FROM information_schema.tables WHERE table_schema = current_schema() ORDER BY table_name`))
      .toEqual(['attachments', 'coilwright_store', 'customers', 'job_revisions', 'jobs', 'settings']);
    const insert = `INSERT INTO jobs (number, customer_id, status, spec, revision, created_at, updated_at, kind, material, material_family,
      units, d, mean_diameter, free_length, active_coils, rate) VALUES ($1, $2, $3, '{}', 1, 'x', 'x', 'compression', 'm', 'f', 'metric', $4, 10, 40, 6, 3)`;
    refused(db, insert, /check constraint/, 'J-1', null, 'shipped', 1);
    refused(db, insert, /foreign key/, 'J-1', 999, 'draft', 1);
    refused(db, insert, /invalid input syntax for type double precision/, 'J-1', null, 'draft', 'thick');
    refused(db, insert.replace("'{}', 1", "'not json', 1"), /check constraint/, 'J-1', null, 'draft', 1);
    run(db, insert, 'J-1', null, 'draft', 1.5);
    refused(db, insert, /duplicate key/, 'J-1', null, 'draft', 1.5);
    const id = column(db, 'SELECT id FROM jobs')[0];
    run(db, REVISION, id, 1, 'created');
    refused(db, "UPDATE job_revisions SET reason = 'edited'", /cannot be changed/);
    refused(db, 'DELETE FROM job_revisions', /cannot be deleted/);
    db.c.close();
  });

  it('0002 (search): indexes jobs written before it, then keeps text and shape in step by triggers', () => {
    const db = databaseAt(1);
    const job = `INSERT INTO jobs (id, number, customer_id, part_number, notes, status, spec, revision, created_at, updated_at, kind, material,
      material_family, units, d, mean_diameter, free_length, active_coils, rate)
      VALUES ($1, $2, 1, $3, $4, 'draft', '{"notes":"from the spec"}', 1, 'x', 'x', 'compression', 'm', 'f', 'metric', $5, 10, 40, 6, 3)`;
    run(db, "INSERT INTO customers (id, name, name_key, created_at, updated_at) VALUES (1, 'Ashdown Valves', 'ashdown valves', 'x', 'x')");
    run(db, job, 1, 'J-1', 'AV-7', 'old job', 1.5);
    up(db, 1, 2);
    const text = (q: string) => column(db, "SELECT id FROM job_text WHERE document @@ to_tsquery('simple', $1) ORDER BY id", q);
    expect(text('ashdown')).toEqual([1]);
    expect(text('spec')).toEqual([1]);
    run(db, job, 2, 'J-2', 'AV-8', 'new job', 3);
    expect(text('av:*')).toEqual([1, 2]);
    run(db, "UPDATE customers SET name = 'Birchwood Valves' WHERE id = 1");
    expect(text('birchwood')).toEqual([1, 2]);
    expect(text('ashdown')).toEqual([]);
    run(db, 'UPDATE jobs SET d = 2.5 WHERE id = 2');
    expect(rows(db, 'SELECT id, d_min, d FROM job_shape ORDER BY id')).toEqual([{ id: 1, d_min: 1.5, d: 1.5 }, { id: 2, d_min: 2.5, d: 2.5 }]);
    run(db, 'DELETE FROM jobs WHERE id = 2');
    expect(text('av:*')).toEqual([1]);
    expect(column(db, 'SELECT count(*) FROM job_shape')).toEqual([1]);
    db.c.close();
  });

  it('0003 (quotes): the job comes through; an issued quote can be neither changed nor deleted and names a job', () => {
    const db = databaseAt(2);
    run(db, JOB, 1, 'J-1', 1);
    up(db, 2, 3);
    expect(column(db, 'SELECT number FROM jobs')).toEqual(['J-1']);
    run(db, QUOTE, 'Q-1', '{}');
    refused(db, "UPDATE quotes SET currency = 'EUR'", /cannot be changed/);
    refused(db, 'DELETE FROM quotes', /cannot be deleted/);
    refused(db, `INSERT INTO quotes (${QUOTE_COLUMNS}) VALUES ('Q-2', 9, 1, 'x', 30, 'USD', '{}', '{}', '{}', '{}', '[]', '{}')`, /foreign key/);
    db.c.close();
  });

  it('0004 (first-off records): records tied to a job revision, checked by the table, never changed, found by their index', () => {
    const db = databaseAt(3);
    run(db, JOB, 1, 'J-1', 3);
    run(db, REVISION, 1, 1, 'created');
    up(db, 3, 4);
    const record = `INSERT INTO first_off_records (job_id, job_revision, units, coiled_free_length, free_length_after_set, outer_diameter,
      forces, measured_on, measured_by, recorded_at) VALUES ($1, $2, 'metric', $3, $4, 24, '[{"length":40,"force":150}]', '2026-05-04', 'R. Demo', 'x')`;
    run(db, record, 1, 1, 61.5, 60.1);
    expect(column(db, 'SELECT count(*) FROM first_off_records')).toEqual([1]);
    refused(db, record, /foreign key/, 1, 2, 61.5, 60.1);
    refused(db, record, /foreign key/, 9, 1, 61.5, 60.1);
    refused(db, record, /check constraint/, 1, 1, 60, 61);
    refused(db, record, /check constraint/, 1, 1, -1, -2);
    refused(db, record.replace("'[{", "'{").replace("}]'", "}'"), /check constraint/, 1, 1, 61.5, 60.1);
    refused(db, "UPDATE first_off_records SET measured_by = 'someone else'", /cannot be changed/);
    run(db, 'SET enable_seqscan = off');
    const plan = column(db, 'EXPLAIN SELECT * FROM first_off_records WHERE job_id = 1 ORDER BY measured_on').join('\n');
    expect(plan).toMatch(/first_off_by_job/);
    db.c.close();
  });

  it('0005 (shape engine): rows from before are "not known" and re-indexed; rows written after carry this engine', () => {
    const db = databaseAt(4);
    run(db, `INSERT INTO jobs (id, number, status, spec, revision, created_at, updated_at, kind, material, material_family, units, d,
      mean_diameter, free_length, active_coils, rate) VALUES (1, 'J-1', 'draft', $1, 1, 'x', 'x', 'compression', 'en10270-1-sh', 'f', 'metric',
      2, 18, 50, 8, 99)`, JSON.stringify(spec()));
    moveIdentity(db, 'jobs');
    up(db, 4, 5);
    expect(column(db, 'SELECT shape_engine FROM jobs')).toEqual([null]);
    refused(db, 'UPDATE jobs SET shape_engine = 0 WHERE id = 1', /check constraint/);
    asStore(db, (store) => {
      const created = value(createJob(store, job({}, { freeLength: 60 })));
      const engines = () => store.sql('SELECT id, shape_engine AS engine FROM jobs ORDER BY id').all();
      expect(engines()).toEqual([{ id: 1, engine: null }, { id: created.id, engine: ENGINE_VERSION }]);
      expect(staleJobCount(store)).toBe(1);
      expect(value(reindexJobs(store, {}))).toMatchObject({ checked: 1, reindexed: 1, changed: 1 });
      expect(engines()).toEqual([{ id: 1, engine: ENGINE_VERSION }, { id: created.id, engine: ENGINE_VERSION }]);
      // The wrong rate the old row carried is recomputed from its spec: now the same spring as the new job at its free length.
      expect(store.sql('SELECT rate FROM jobs WHERE id = 1').get()).not.toEqual({ rate: 99 });
    });
  });

  it('0006 (issued rows are never replaced): an upsert over an issued quote or a revision is refused, a taken number never lands', () => {
    const db = databaseAt(3);
    run(db, JOB, 1, 'J-1', 1);
    run(db, REVISION, 1, 1, 'created');
    run(db, QUOTE, 'Q-1', '{"each":1.25}');
    up(db, 3, 6);
    const stored = () => ({ quotes: rows(db, 'SELECT id, number, prices FROM quotes ORDER BY id'), revisions: rows(db, 'SELECT id, reason FROM job_revisions ORDER BY id') });
    const before = stored();
    refused(db, `${QUOTE} ON CONFLICT (number) DO UPDATE SET prices = excluded.prices`, /cannot be changed/, 'Q-1', '{"each":-5}');
    refused(db, QUOTE, /duplicate key/, 'Q-1', '{"each":-5}');
    refused(db, `${REVISION} ON CONFLICT (job_id, revision) DO UPDATE SET reason = excluded.reason`, /cannot be changed/, 1, 1, 'forged');
    refused(db, REVISION, /duplicate key/, 1, 1, 'forged');
    // PostgreSQL's form of INSERT OR IGNORE leaves the issued row as it was.
    run(db, `${QUOTE} ON CONFLICT DO NOTHING`, 'Q-1', '{"each":-5}');
    expect(stored()).toEqual(before);
    run(db, QUOTE, 'Q-2', '{"each":1.5}');
    run(db, REVISION, 1, 2, 'saved');
    expect(column(db, "SELECT prices FROM quotes WHERE number = 'Q-1'")).toEqual(['{"each":1.25}']);
    expect(column(db, 'SELECT count(*) FROM quotes')).toEqual([2]);
    db.c.close();
  });

  it('0007 (estimating): the settings a store has become its first version, kept; acceptance rows name a job and a version', () => {
    const db = databaseAt(3);
    run(db, `INSERT INTO settings (key, value, updated_at) VALUES ('costing', '{"marginPercent":31}', 'x'), ('defaults', '{"currency":"EUR"}', 'x')`);
    run(db, JOB, 1, 'J-1', 1);
    up(db, 3, 7);
    const versions = column(db, 'SELECT settings FROM settings_versions') as string[];
    expect(versions.map((s) => JSON.parse(s) as unknown)).toEqual([{ costing: { marginPercent: 31 }, defaults: { currency: 'EUR' } }]);
    refused(db, "UPDATE settings_versions SET settings = '{}'", /cannot be changed/);
    refused(db, 'DELETE FROM settings_versions', /cannot be deleted/);
    refused(db, "INSERT INTO job_cost_acceptance (job_id, settings_version, accepted_at) VALUES (9, 1, 'x')", /foreign key/);
    refused(db, "INSERT INTO job_cost_acceptance (job_id, settings_version, accepted_at) VALUES (1, 9, 'x')", /foreign key/);
    expect(column(db, 'SELECT judgement FROM jobs')).toEqual(['{}']);
    refused(db, "UPDATE jobs SET judgement = 'not json'", /check constraint/);
    db.c.close();
    const empty = databaseAt(7);
    expect(column(empty, 'SELECT count(*) FROM settings_versions')).toEqual([0]);
    empty.c.close();
  });

  it('0008 (job requirements): kept with a job revision, unique per revision, never changed', () => {
    const db = databaseAt(3);
    run(db, JOB, 1, 'J-1', 1);
    up(db, 3, 8);
    const requirement = 'INSERT INTO job_requirements (job_id, job_revision, saved_at, requirement) VALUES ($1, $2, $3, $4)';
    run(db, requirement, 1, 1, 'x', '{"kind":"compression"}');
    refused(db, "UPDATE job_requirements SET requirement = '{}'", /cannot be changed/);
    refused(db, requirement, /duplicate key/, 1, 1, 'y', '{}');
    refused(db, requirement, /foreign key/, 9, 1, 'y', '{}');
    refused(db, requirement, /check constraint/, 1, 2, 'y', 'not json');
    db.c.close();
  });

  it('0009 (list and shape indexes): fills customer keys, counts and each kind\'s shape for jobs before it, then keeps them in step', () => {
    const db = databaseAt(3);
    const job = `INSERT INTO jobs (id, number, customer_id, status, spec, revision, created_at, updated_at, kind, material,
      material_family, units, d, mean_diameter, free_length, active_coils, rate) VALUES ($1, $2, $3, $4, '{}', 1, 'x', 'x', $5, 'm', 'f', 'metric', 2, 18, 50, 8, 3)`;
    run(db, "INSERT INTO customers (id, name, name_key, created_at, updated_at) VALUES (1, 'Quarry Gates', 'quarry gates', 'x', 'x')");
    run(db, job, 1, 'J-1', 1, 'draft', 'compression');
    run(db, job, 2, 'J-2', null, 'draft', 'torsion');
    up(db, 3, 9);
    const keys = () => rows(db, 'SELECT id, customer_key FROM jobs ORDER BY id');
    const counts = () => rows(db, 'SELECT status, kind, n FROM job_counts WHERE n > 0 ORDER BY status, kind');
    const shape = () => ['compression', 'extension', 'torsion'].map((kind) => column(db, `SELECT id FROM job_shape_${kind} ORDER BY id`));
    expect(keys()).toEqual([{ id: 1, customer_key: 'quarry gates' }, { id: 2, customer_key: '' }]);
    expect(counts()).toEqual([{ status: 'draft', kind: 'compression', n: 1 }, { status: 'draft', kind: 'torsion', n: 1 }]);
    expect(shape()).toEqual([[1], [], [2]]);
    run(db, job, 3, 'J-3', 1, 'quoted', 'extension');
    run(db, "UPDATE jobs SET status = 'quoted' WHERE id = 1");
    run(db, 'UPDATE jobs SET customer_id = 1 WHERE id = 2');
    run(db, "UPDATE customers SET name = 'Ridge Gates', name_key = 'ridge gates' WHERE id = 1");
    run(db, 'DELETE FROM jobs WHERE id = 3');
    expect(keys()).toEqual([{ id: 1, customer_key: 'ridge gates' }, { id: 2, customer_key: 'ridge gates' }]);
    expect(counts()).toEqual([{ status: 'draft', kind: 'torsion', n: 1 }, { status: 'quoted', kind: 'compression', n: 1 }]);
    expect(shape()).toEqual([[1], [], [2]]);
    run(db, "UPDATE jobs SET kind = 'extension' WHERE id = 1");
    expect(shape()).toEqual([[], [1], [2]]);
    db.c.close();
  });

  it('0010 (quotation lines): a quote issued before lines gets its one line, the lines are closed, and it reads as a quotation', () => {
    const fixture = JSON.parse(readFileSync(join(__dirname, 'fixtures', 'quote-schema-9.json'), 'utf8')) as
      { schemaVersion: number; rows: Record<string, Record<string, unknown>[]> };
    expect(fixture.schemaVersion).toBe(9);
    const db = databaseAt(9);
    for (const table of ['customers', 'jobs', 'job_revisions', 'settings', 'quotes']) {
      for (const row of fixture.rows[table]!) {
        const names = Object.keys(row);
        run(db, `INSERT INTO ${table} (${names.join(', ')}) VALUES (${names.map((_, i) => `$${i + 1}`).join(', ')})`, ...Object.values(row));
      }
    }
    for (const table of ['customers', 'jobs', 'job_revisions', 'quotes']) moveIdentity(db, table);
    up(db, 9, 10);
    const quote = fixture.rows.quotes![0]!;
    expect(rows(db, 'SELECT * FROM quote_lines')).toEqual([{ quote_id: quote.id, line: 1, job_id: quote.job_id, job_revision: quote.job_revision,
      job: quote.job, spec: quote.spec, prices: quote.prices, quantity_breaks: quote.quantity_breaks }]);
    expect(column(db, 'SELECT line_count FROM quotes')).toEqual([1]);
    refused(db, "UPDATE quote_lines SET prices = '{}'", /cannot be changed/);
    refused(db, 'DELETE FROM quote_lines', /cannot be deleted/);
    const line = `INSERT INTO quote_lines (quote_id, line, job_id, job_revision, job, spec, prices, quantity_breaks) VALUES ($1, $2, $3, 1, '{}', '{}', '{}', '[]')`;
    refused(db, `${line} ON CONFLICT (quote_id, line) DO UPDATE SET prices = excluded.prices`, /cannot be changed/, quote.id, 1, quote.job_id);
    refused(db, line, /lines it was issued with/, quote.id, 2, quote.job_id);
    refused(db, 'UPDATE quotes SET line_count = 2', /cannot be changed/);
    expect(column(db, 'SELECT count(*) FROM quote_lines')).toEqual([1]);
    asStore(db, (store) => {
      const read = value(getQuote(store, { number: quote.number as string }));
      expect(read.lines.map((l) => [l.line, l.jobId, l.jobNumber, l.partNumber])).toEqual([[1, quote.job_id, 'J-26-0001', 'FG-100']]);
      expect(read.lines[0]!.spec).toEqual(read.spec);
    });
  });

  it('0011 (customer details): customers from before keep their details, with an empty contact, address and terms', () => {
    const db = databaseAt(9);
    run(db, `INSERT INTO customers (id, name, name_key, email, phone, created_at, updated_at)
             VALUES (1, 'Demo Harrow Gates', 'demo harrow gates', 'buyer@harrow.example', '555 0101', 'x', 'x')`);
    up(db, 9, 11);
    expect(rows(db, 'SELECT name, email, contact, address, payment_terms FROM customers')).toEqual([
      { name: 'Demo Harrow Gates', email: 'buyer@harrow.example', contact: '', address: '', payment_terms: '' },
    ]);
    refused(db, 'UPDATE customers SET contact = NULL', /null value/);
    db.c.close();
  });

  it('0012 (enquiries): enquiries tied to customers and jobs, one mapping per customer; jobs and customers come through', () => {
    const db = databaseAt(9);
    run(db, "INSERT INTO customers (id, name, name_key, email, phone, created_at, updated_at) VALUES (1, 'Demo Co', 'demo co', '', '', 'x', 'x')");
    run(db, `INSERT INTO jobs (id, number, status, spec, revision, created_at, updated_at, kind, material, material_family, units, d,
      mean_diameter, free_length, active_coils, rate, customer_id) VALUES (1, 'J-1', 'draft', '{}', 1, 'x', 'x', 'compression', 'm', 'f', 'metric', 1, 10, 40, 6, 3, 1)`);
    up(db, 9, 12);
    expect(rows(db, 'SELECT number, customer_id FROM jobs')).toEqual([{ number: 'J-1', customer_id: 1 }]);
    run(db, "INSERT INTO enquiries (id, customer_id, reference, source, received_at) VALUES (1, 1, 'RFQ-7', 'sheet.csv', 'x')");
    run(db, 'INSERT INTO enquiry_jobs (enquiry_id, job_id, sheet_row) VALUES (1, 1, 2)');
    moveIdentity(db, 'enquiries');
    expect(column(db, 'SELECT j.number FROM enquiry_jobs x JOIN jobs j ON j.id = x.job_id WHERE x.enquiry_id = 1')).toEqual(['J-1']);
    refused(db, "INSERT INTO enquiries (customer_id, reference, received_at) VALUES (9, 'R', 'x')", /foreign key/);
    refused(db, "INSERT INTO enquiries (customer_id, reference, received_at) VALUES (1, '  ', 'x')", /check constraint/);
    refused(db, 'INSERT INTO enquiry_jobs (enquiry_id, job_id, sheet_row) VALUES (1, 1, 3)', /duplicate key/);
    run(db, `INSERT INTO request_mappings (customer_id, mapping, saved_at) VALUES (1, '{"columns":[]}', 'x')`);
    refused(db, "INSERT INTO request_mappings (customer_id, mapping, saved_at) VALUES (1, '{}', 'y')", /duplicate key/);
    refused(db, "UPDATE request_mappings SET mapping = 'not json'", /check constraint/);
    db.c.close();
  });

  it('0013 (working revisions): the history comes through unchanged; one open session per job, of a job that exists', () => {
    const db = databaseAt(9);
    run(db, `INSERT INTO jobs (id, number, status, spec, revision, created_at, updated_at, kind, material, material_family, units, d,
      mean_diameter, free_length, active_coils, rate) VALUES (1, 'J-1', 'draft', '{}', 2, 'x', 'x', 'compression', 'm', 'f', 'metric', 1, 10, 40, 6, 3)`);
    run(db, REVISION, 1, 1, 'created');
    run(db, REVISION, 1, 2, 'saved');
    const history = () => rows(db, 'SELECT * FROM job_revisions ORDER BY revision');
    const before = history();
    up(db, 9, 13);
    expect(history()).toEqual(before);
    const session = 'INSERT INTO job_working_revisions (job_id, base_revision, opened_at, saved_at) VALUES ($1, $2, $3, $3)';
    run(db, session, 1, 2, 'a');
    expect(rows(db, 'SELECT saves FROM job_working_revisions')).toEqual([{ saves: 1 }]);
    refused(db, session, /duplicate key/, 1, 2, 'b');
    refused(db, session, /foreign key/, 9, 1, 'b');
    refused(db, session, /check constraint/, 1, 0, 'c');
    refused(db, "UPDATE job_revisions SET reason = 'x'", /cannot be changed/);
    db.c.close();
  });

  it('0014 (lineage, archive, spring words): jobs from before get their words and counts; revisions go only with a removed job', () => {
    const db = databaseAt(9);
    const job = `INSERT INTO jobs (id, number, customer_id, status, spec, revision, created_at, updated_at, kind, material,
      material_family, units, d, mean_diameter, free_length, active_coils, rate)
      VALUES ($1, $2, NULL, $3, $4, 1, 'x', 'x', 'compression', 'astm-a228', 'cold-drawn-carbon', $5, $6, $7, 50, 8, 3)`;
    const inchSpec = JSON.stringify({ kind: 'compression', units: 'inch', material: 'astm-a228', wireDiameter: 0.063, outerDiameter: 0.5, freeLength: 1.5 });
    const metricSpec = JSON.stringify({ kind: 'compression', units: 'metric', material: 'en10270-1-sh', wireDiameter: 1.6, meanDiameter: 12 });
    run(db, job, 1, 'J-1', 'draft', inchSpec, 'inch', 1.6002, 11.1);
    run(db, job, 2, 'J-2', 'quoted', metricSpec, 'metric', 1.6, 12);
    run(db, REVISION, 1, 1, 'created');
    up(db, 9, 14);
    const words = column(db, 'SELECT search_words FROM jobs ORDER BY id') as string[];
    expect(words[0]).toContain('Music wire');
    expect(words[0]).toContain('d 0.063');
    expect(words[1]).toContain('d 1.6');
    expect(words[1]).toContain('OD 13.6'); // 12 + 1.6: the outside diameter from the row, in the job's units
    expect(column(db, 'SELECT spring FROM job_text ORDER BY id')).toEqual(words);
    expect(column(db, "SELECT id FROM job_text WHERE document @@ phraseto_tsquery('simple', 'music wire') ORDER BY id")).toEqual([1]);
    const counts = () => rows(db, 'SELECT archived, status, n FROM job_counts WHERE n > 0 ORDER BY archived, status');
    expect(counts()).toEqual([{ archived: 0, status: 'draft', n: 1 }, { archived: 0, status: 'quoted', n: 1 }]);
    run(db, "UPDATE jobs SET archived_at = '2026-03-01T00:00:00Z' WHERE id = 2");
    expect(counts()).toEqual([{ archived: 0, status: 'draft', n: 1 }, { archived: 1, status: 'quoted', n: 1 }]);
    refused(db, 'DELETE FROM job_revisions WHERE job_id = 1', /history/);
    run(db, "INSERT INTO deleted_jobs (job_id, number, deleted_at, removing, snapshot) VALUES (1, 'J-1', 'x', 0, '{}')");
    refused(db, 'DELETE FROM job_revisions WHERE job_id = 1', /history/);
    run(db, 'UPDATE deleted_jobs SET removing = 1 WHERE job_id = 1');
    run(db, 'DELETE FROM job_revisions WHERE job_id = 1');
    expect(column(db, 'SELECT count(*) FROM job_revisions')).toEqual([0]);
    refused(db, 'INSERT INTO job_copies (copy_id, source_id, copied_at) VALUES (1, 9, $1)', /foreign key/, 'x');
    db.c.close();
  });

  it('0015 (who made it): revisions, quotes and records from before read "" (not recorded); made_by is history too', () => {
    const db = databaseAt(14);
    run(db, JOB, 1, 'J-1', 1);
    run(db, REVISION, 1, 1, 'created');
    run(db, QUOTE, 'Q-1', '{}');
    run(db, `INSERT INTO first_off_records (job_id, job_revision, units, coiled_free_length, free_length_after_set, outer_diameter, forces,
      measured_on, measured_by, recorded_at) VALUES (1, 1, 'metric', 51, 50, 22, '[]', '2026-01-04', 'Cora', 'x')`);
    up(db, 14, 15);
    for (const table of ['job_revisions', 'quotes', 'first_off_records']) expect(column(db, `SELECT made_by FROM ${table}`), table).toEqual(['']);
    refused(db, "UPDATE quotes SET made_by = 'forged'", /cannot be changed/);
    refused(db, "UPDATE job_revisions SET made_by = 'forged'", /cannot be changed/);
    db.c.close();
  });
});
