import Database from 'better-sqlite3';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { migrate } from '../../../db';
import { tempDir } from './helpers';

const JOB = `INSERT INTO jobs (id, number, status, spec, revision, created_at, updated_at, kind, material, material_family, units, d,
  mean_diameter, free_length, active_coils, rate) VALUES (1, 'J-1', 'draft', '{}', 1, 'x', 'x', 'compression', 'm', 'f', 'metric', 1, 10, 40, 6, 3)`;
const QUOTE_COLUMNS = 'number, job_id, job_revision, issued_at, validity_days, currency, job, spec, settings, prices, quantity_breaks, document';
const quote = (verb: string, id: string, number: string, price: string) =>
  `${verb} INTO quotes (id, ${QUOTE_COLUMNS}) VALUES (${id}, '${number}', 1, 1, '2026-01-01T00:00:00Z', 30, 'USD', '{}', '{}', '{}', '${price}', '[]', '{}')`;
const revision = (verb: string, id: string, reason: string) =>
  `${verb} INTO job_revisions (id, job_id, revision, saved_at, reason, fields, spec) VALUES (${id}, 1, 1, 'x', '${reason}', '{}', '{}')`;

/** A store at version 3 with one issued quote and one revision, then brought to the latest schema. */
function storeWithQuote(recursiveTriggers: boolean): Database.Database {
  const db = new Database(join(tempDir(), 'm6.db'));
  migrate(db, 3);
  db.exec(JOB);
  db.exec(revision('INSERT', '1', 'created'));
  db.exec(quote('INSERT', '1', 'Q-1', '{"each":1.25}'));
  migrate(db);
  db.pragma(`recursive_triggers = ${recursiveTriggers ? 'ON' : 'OFF'}`);
  return db;
}

const stored = (db: Database.Database) => ({
  quotes: db.prepare('SELECT id, number, prices FROM quotes').all(),
  revisions: db.prepare('SELECT id, reason FROM job_revisions').all(),
});

describe('migration 0006 (an issued quote or a revision cannot be replaced)', () => {
  for (const recursive of [false, true]) {
    it(`refuses every REPLACE form over an issued quote (recursive triggers ${recursive ? 'on' : 'off'})`, () => {
      const db = storeWithQuote(recursive);
      const before = stored(db);
      for (const verb of ['INSERT OR REPLACE', 'REPLACE']) {
        // Same number under a new id, and the same id under a new number: both would delete the issued row.
        expect(() => db.exec(quote(verb, 'NULL', 'Q-1', '{"each":-5}'))).toThrow(/issued quote cannot be replaced/);
        expect(() => db.exec(quote(verb, '1', 'Q-9', '{"each":-5}'))).toThrow(/issued quote cannot be replaced/);
      }
      expect(() => db.exec(`${quote('INSERT', 'NULL', 'Q-1', '{"each":-5}')} ON CONFLICT (number) DO UPDATE SET prices = excluded.prices`))
        .toThrow(/issued quote cannot be replaced/);
      expect(() => db.exec("UPDATE OR REPLACE quotes SET number = 'Q-2'")).toThrow(/cannot be changed/);
      expect(stored(db)).toEqual(before);
      db.close();
    });

    it(`refuses every REPLACE form over a saved revision (recursive triggers ${recursive ? 'on' : 'off'})`, () => {
      const db = storeWithQuote(recursive);
      const before = stored(db);
      expect(() => db.exec(revision('INSERT OR REPLACE', 'NULL', 'forged'))).toThrow(/revision cannot be replaced/);
      expect(() => db.exec(revision('REPLACE', '1', 'forged'))).toThrow(/revision cannot be replaced/);
      expect(() => db.exec("UPDATE OR REPLACE job_revisions SET reason = 'forged'")).toThrow(/cannot be changed/);
      expect(stored(db)).toEqual(before);
      db.close();
    });
  }

  it('still lets new quotes and revisions in; an insert of a taken number is refused even with OR IGNORE', () => {
    const db = storeWithQuote(false);
    db.exec(quote('INSERT', 'NULL', 'Q-2', '{"each":1.5}'));
    db.exec(`INSERT INTO job_revisions (job_id, revision, saved_at, reason, fields, spec) VALUES (1, 2, 'x', 'saved', '{}', '{}')`);
    expect(() => db.exec(quote('INSERT OR IGNORE', 'NULL', 'Q-1', '{"each":-5}'))).toThrow(/cannot be replaced/);
    expect(() => db.exec(quote('INSERT', 'NULL', 'Q-1', '{"each":-5}'))).toThrow(/cannot be replaced/);
    expect(db.prepare('SELECT count(*) AS n FROM quotes').get()).toEqual({ n: 2 });
    expect(db.prepare("SELECT prices FROM quotes WHERE number = 'Q-1'").get()).toEqual({ prices: '{"each":1.25}' });
    db.close();
  });
});
