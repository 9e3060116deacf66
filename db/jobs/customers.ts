import type { Customer } from '../../core/api/store';
import { customerInputSchema } from '../../core/api/store';
import { parseWith } from '../../core/validation';
import { StoreError, invalid, success } from '../errors';
import type { StoreResult } from '../errors';
import { inTransaction } from '../store';
import type { Store } from '../store';

/** Customers are matched by name without regard to case or spacing: "ACME  Ltd" is "Acme Ltd". */
export function customerKey(name: string): string {
  return name.trim().replace(/\s+/g, ' ').toLowerCase();
}

export interface CustomerRef {
  name: string;
  email?: string | undefined;
  phone?: string | undefined;
}

/** A customer as filed: its id, its name as written and its sort key (jobs.customer_key). */
export interface CustomerOnFile {
  id: number;
  name: string;
  key: string;
}

/** Finds a customer by name or adds one, as filed. Call inside the write's transaction. */
export function fileCustomer(store: Store, ref: CustomerRef): CustomerOnFile {
  const key = customerKey(ref.name);
  const found = store.sql('SELECT id, name FROM customers WHERE name_key = ?').get(key) as { id: number; name: string } | undefined;
  if (found) return { ...found, key };
  const now = store.now().toISOString();
  const name = ref.name.trim().replace(/\s+/g, ' ');
  const result = store.sql(`INSERT INTO customers (name, name_key, email, phone, created_at, updated_at)
                            VALUES (?, ?, ?, ?, ?, ?)`)
    .run(name, key, ref.email ?? '', ref.phone ?? '', now, now);
  return { id: Number(result.lastInsertRowid), name, key };
}

/** Finds a customer by name or adds one. Call inside the write's transaction. */
export function findOrAddCustomer(store: Store, ref: CustomerRef): number {
  return fileCustomer(store, ref).id;
}

/** The customer with this id, as filed; a missing one is refused on `path`. */
export function customerOnFile(store: Store, id: number, path: string): CustomerOnFile {
  const row = store.sql('SELECT id, name, name_key FROM customers WHERE id = ?').get(id) as { id: number; name: string; name_key: string } | undefined;
  if (row === undefined) throw new StoreError('not-found', `no customer with id ${id}`, path);
  return { id: row.id, name: row.name, key: row.name_key };
}

export function requireCustomer(store: Store, id: number, path: string): number {
  if (store.sql('SELECT 1 FROM customers WHERE id = ?').get(id) === undefined) {
    throw new StoreError('not-found', `no customer with id ${id}`, path);
  }
  return id;
}

/** The customer id a job save names: by id, by name (found or added), null to clear, undefined to keep. */
export function resolveCustomer(
  store: Store, given: { customer?: CustomerRef | null; customerId?: number }, path = 'customerId',
): number | null | undefined {
  if (given.customerId !== undefined) return requireCustomer(store, given.customerId, path);
  if (given.customer === null) return null;
  if (given.customer !== undefined) return findOrAddCustomer(store, given.customer);
  return undefined;
}

interface CustomerRow {
  id: number;
  name: string;
  contact: string;
  email: string;
  phone: string;
  address: string;
  payment_terms: string;
}

const CUSTOMER_COLUMNS = 'id, name, contact, email, phone, address, payment_terms';

function customerOfRow(row: CustomerRow): Customer {
  return {
    id: row.id, name: row.name, contact: row.contact, email: row.email, phone: row.phone,
    addressLines: row.address === '' ? [] : row.address.split('\n'), paymentTerms: row.payment_terms,
  };
}

export function listCustomers(store: Store): Customer[] {
  return (store.sql(`SELECT ${CUSTOMER_COLUMNS} FROM customers ORDER BY name_key`).all() as CustomerRow[]).map(customerOfRow);
}

export function getCustomer(store: Store, id: number): Customer | null {
  const row = store.sql(`SELECT ${CUSTOMER_COLUMNS} FROM customers WHERE id = ?`).get(id) as CustomerRow | undefined;
  return row ? customerOfRow(row) : null;
}

/** Adds a customer (no id) or edits one; a name another customer already has is refused on "name". */
export function saveCustomer(store: Store, raw: unknown): StoreResult<Customer> {
  const parsed = parseWith(customerInputSchema, raw);
  if (!parsed.ok) return invalid(parsed.errors);
  const c = parsed.value;
  const name = c.name.replace(/\s+/g, ' ');
  const key = customerKey(name);
  const address = c.addressLines.filter((l) => l !== '').join('\n');
  return attemptStore(() => {
    const id = inTransaction(store, () => {
      const other = store.sql('SELECT id FROM customers WHERE name_key = ?').get(key) as { id: number } | undefined;
      if (other && other.id !== c.id) throw new StoreError('duplicate-customer', `a customer named "${name}" is already on file`, 'name');
      const now = store.now().toISOString();
      if (c.id === undefined) {
        return Number(store.sql(`INSERT INTO customers (name, name_key, contact, email, phone, address, payment_terms, created_at, updated_at)
                                 VALUES (?, ?, ?, ?, ?, ?, ?, ?, ?)`)
          .run(name, key, c.contact, c.email, c.phone, address, c.paymentTerms, now, now).lastInsertRowid);
      }
      requireCustomer(store, c.id, 'id');
      store.sql(`UPDATE customers SET name = ?, name_key = ?, contact = ?, email = ?, phone = ?, address = ?, payment_terms = ?,
                 updated_at = ? WHERE id = ?`).run(name, key, c.contact, c.email, c.phone, address, c.paymentTerms, now, c.id);
      return c.id;
    });
    return success(getCustomer(store, id)!);
  });
}

function attemptStore<T>(fn: () => StoreResult<T>): StoreResult<T> {
  try {
    return fn();
  } catch (e) {
    if (e instanceof StoreError) return { ok: false, error: e.toApiError() };
    throw e;
  }
}
