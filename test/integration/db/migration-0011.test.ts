import Database from 'better-sqlite3';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { listCustomers, migrate, openStore, saveCustomer } from '../../../db';
import { tempDir } from './helpers';

describe('migration 0011 (customer details)', () => {
  it('keeps the customers written before it, with an empty contact, address and payment terms', () => {
    const db = new Database(join(tempDir(), 'm11.db'));
    migrate(db, 9);
    db.exec(`INSERT INTO customers (id, name, name_key, email, phone, created_at, updated_at)
             VALUES (1, 'Demo Harrow Gates', 'demo harrow gates', 'buyer@harrow.example', '555 0101', 'x', 'x')`);
    expect(migrate(db, 11)).toEqual({ from: 9, to: 11 });
    expect(db.prepare('SELECT name, email, contact, address, payment_terms FROM customers').all()).toEqual([
      { name: 'Demo Harrow Gates', email: 'buyer@harrow.example', contact: '', address: '', payment_terms: '' },
    ]);
    db.close();
  });

  it('adds and edits a customer with its contact, address and terms; a second customer of the same name is refused on "name"', () => {
    const store = openStore(join(tempDir(), 'c.db'));
    const added = saveCustomer(store, {
      name: 'Demo  Harrow Gates', contact: 'R. Okafor, purchasing', email: 'buyer@harrow.example', phone: '555 0101',
      addressLines: ['4 Mill Lane', 'Demo Town DT1 2AB'], paymentTerms: '30 days from invoice',
    });
    expect(added.ok).toBe(true);
    if (!added.ok) return;
    expect(added.value).toMatchObject({ name: 'Demo Harrow Gates', addressLines: ['4 Mill Lane', 'Demo Town DT1 2AB'] });
    const edited = saveCustomer(store, { ...added.value, addressLines: ['4 Mill Lane', '', 'Demo Town DT1 2AB'], paymentTerms: '' });
    expect(edited.ok && edited.value).toMatchObject({ id: added.value.id, addressLines: ['4 Mill Lane', 'Demo Town DT1 2AB'], paymentTerms: '' });
    const twin = saveCustomer(store, { name: 'demo harrow gates' });
    expect(twin.ok ? null : twin.error).toMatchObject({ code: 'duplicate-customer', path: 'name' });
    const badMail = saveCustomer(store, { name: 'Demo Other', email: 'not a mail' });
    expect(badMail.ok ? null : badMail.error.path).toBe('email');
    const missing = saveCustomer(store, { id: 999, name: 'Demo Nobody' });
    expect(missing.ok ? null : missing.error).toMatchObject({ code: 'not-found', path: 'id' });
    expect(listCustomers(store).map((c) => c.name)).toEqual(['Demo Harrow Gates']);
    store.close();
  });
});
