import type { Customer } from '../../core/api/store';
import { StoreError } from '../errors';
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

/** Finds a customer by name or adds one. Call inside the write's transaction. */
export function findOrAddCustomer(store: Store, ref: CustomerRef): number {
  const key = customerKey(ref.name);
  const found = store.sql('SELECT id FROM customers WHERE name_key = ?').get(key) as { id: number } | undefined;
  if (found) return found.id;
  const now = store.now().toISOString();
  const result = store.sql(`INSERT INTO customers (name, name_key, email, phone, created_at, updated_at)
                            VALUES (?, ?, ?, ?, ?, ?)`)
    .run(ref.name.trim().replace(/\s+/g, ' '), key, ref.email ?? '', ref.phone ?? '', now, now);
  return Number(result.lastInsertRowid);
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

export function listCustomers(store: Store): Customer[] {
  return store.sql('SELECT id, name, email, phone FROM customers ORDER BY name_key').all() as Customer[];
}
