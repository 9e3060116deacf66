import Database from 'better-sqlite3';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { migrate, schemaVersion } from '../../../db';
import { tempDir } from './helpers';

describe('migration 0012 (enquiries and request-sheet mappings)', () => {
  it('adds enquiries tied to customers and jobs, and a mapping per customer; jobs and customers come through', () => {
    const db = new Database(join(tempDir(), 'm12.db'));
    migrate(db, 9);
    db.exec(`INSERT INTO customers (id, name, name_key, email, phone, created_at, updated_at) VALUES (1, 'Demo Co', 'demo co', '', '', 'x', 'x')`);
    db.exec(`INSERT INTO jobs (id, number, status, spec, revision, created_at, updated_at, kind, material, material_family, units, d,
      mean_diameter, free_length, active_coils, rate, customer_id) VALUES (1, 'J-1', 'draft', '{}', 1, 'x', 'x', 'compression', 'm', 'f', 'metric', 1, 10, 40, 6, 3, 1)`);
    const before = schemaVersion(db);
    expect(migrate(db, 12).from).toBe(before);
    expect(schemaVersion(db)).toBeGreaterThanOrEqual(12);
    expect(db.prepare('SELECT number, customer_id FROM jobs').get()).toEqual({ number: 'J-1', customer_id: 1 });
    db.exec(`INSERT INTO enquiries (id, customer_id, reference, source, received_at) VALUES (1, 1, 'RFQ-7', 'sheet.csv', 'x')`);
    db.exec('INSERT INTO enquiry_jobs (enquiry_id, job_id, sheet_row) VALUES (1, 1, 2)');
    expect(db.prepare('SELECT j.number FROM enquiry_jobs x JOIN jobs j ON j.id = x.job_id WHERE x.enquiry_id = 1').get()).toEqual({ number: 'J-1' });
    expect(() => db.exec("INSERT INTO enquiries (customer_id, reference, received_at) VALUES (9, 'R', 'x')")).toThrow(/FOREIGN KEY/);
    expect(() => db.exec("INSERT INTO enquiries (customer_id, reference, received_at) VALUES (1, '  ', 'x')")).toThrow(/CHECK/);
    expect(() => db.exec('INSERT INTO enquiry_jobs (enquiry_id, job_id, sheet_row) VALUES (1, 1, 3)')).toThrow(/UNIQUE|PRIMARY/);
    db.exec(`INSERT INTO request_mappings (customer_id, mapping, saved_at) VALUES (1, '{"columns":[]}', 'x')`);
    expect(() => db.exec("INSERT INTO request_mappings (customer_id, mapping, saved_at) VALUES (1, '{}', 'y')")).toThrow(/UNIQUE|PRIMARY/);
    expect(() => db.exec("UPDATE request_mappings SET mapping = 'not json'")).toThrow(/CHECK/);
    db.close();
  });
});
