import type { RequestMapping } from '../../core/request-sheet';
import { requestMappingSchema } from '../../core/request-sheet';
import { customerKey } from '../jobs/customers';
import type { Store } from '../store';

/** The mapping last used for this customer's request sheets; undefined when none was kept (or it no longer reads). */
export function savedRequestMapping(store: Store, customerName: string): RequestMapping | undefined {
  const row = store.sql(`SELECT m.mapping FROM request_mappings m JOIN customers c ON c.id = m.customer_id WHERE c.name_key = ?`)
    .get(customerKey(customerName)) as { mapping: string } | undefined;
  if (!row) return undefined;
  const parsed = requestMappingSchema.safeParse(JSON.parse(row.mapping));
  return parsed.success ? parsed.data : undefined;
}

/** Keeps the mapping for the customer, replacing the one before. Inside the import's transaction. */
export function keepRequestMapping(store: Store, customerId: number, mapping: RequestMapping): void {
  store.sql(`INSERT INTO request_mappings (customer_id, mapping, saved_at) VALUES (?, ?, ?)
             ON CONFLICT (customer_id) DO UPDATE SET mapping = excluded.mapping, saved_at = excluded.saved_at`)
    .run(customerId, JSON.stringify(mapping), store.now().toISOString());
}
