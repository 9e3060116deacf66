import type Database from 'better-sqlite3';

/**
 * What a quotation prints about its customer besides the name: the person to write to, the postal address
 * (one line per row of text) and the payment terms agreed with that customer ('' = the shop's default).
 */
export function updateToVersion0011(db: Database.Database): void {
  db.exec(`
    ALTER TABLE customers ADD COLUMN contact TEXT NOT NULL DEFAULT '';
    ALTER TABLE customers ADD COLUMN address TEXT NOT NULL DEFAULT '';
    ALTER TABLE customers ADD COLUMN payment_terms TEXT NOT NULL DEFAULT '';
  `);
}
