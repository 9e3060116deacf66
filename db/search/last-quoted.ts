import type { LastQuotedPrice } from '../../core/api/store';
import type { Store } from '../store';

const LAST_QUOTE_SQL = 'SELECT number, issued_at, currency, prices FROM quotes WHERE job_id = ? ORDER BY issued_at DESC, id DESC LIMIT 1';

interface PricedBreak { quantity: number; unitPrice: number }

/** The break nearest the quantity (by ratio: 900 is nearer 1000 than 500); the first break with no quantity. */
export function nearestBreak(breaks: readonly PricedBreak[], quantity: number | null): PricedBreak | undefined {
  if (quantity === null) return breaks[0];
  let best: PricedBreak | undefined;
  for (const b of breaks) {
    if (!best || Math.abs(Math.log(b.quantity / quantity)) < Math.abs(Math.log(best.quantity / quantity))) best = b;
  }
  return best;
}

const isBreak = (b: unknown): b is PricedBreak => typeof b === 'object' && b !== null
  && Number.isFinite((b as PricedBreak).quantity) && (b as PricedBreak).quantity > 0 && Number.isFinite((b as PricedBreak).unitPrice);

/** The job's newest issued quote, read at the break nearest the quantity; null when it was never quoted. */
export function lastQuotedPrice(store: Store, jobId: number, quantity: number | null): LastQuotedPrice | null {
  const row = store.sql(LAST_QUOTE_SQL).get(jobId) as { number: string; issued_at: string; currency: string; prices: string } | undefined;
  if (!row) return null;
  const prices = JSON.parse(row.prices) as { breaks?: unknown[] };
  const at = nearestBreak((prices.breaks ?? []).filter(isBreak), quantity);
  return at ? { quoteNumber: row.number, issuedAt: row.issued_at, quantity: at.quantity, unitPrice: at.unitPrice, currency: row.currency } : null;
}
