import type { Operation } from './types';
import type { WorkCentreOffer } from './work-centre';
import { chooseWorkCentre, lotCost } from './work-centre';

/**
 * Puts each machine operation on a work centre for a lot of `pieces`: every capable machine's lot cost is
 * worked out (set-up + run + the wire value of its scrap) and the cheapest is chosen, unless one is pinned.
 */
export function assignWorkCentres(
  operations: readonly Operation[], pieces: number, pieceValue: number, pins: Readonly<Record<string, string>> = {},
): Operation[] {
  return operations.map((op) => {
    if (op.offers.length === 0) return op;
    const offers: WorkCentreOffer[] = op.offers.map((o) => ({ ...o, lotCost: lotCost(o, pieces, pieceValue) }));
    const picked = chooseWorkCentre(offers, pins[op.key])!;
    const m = picked.chosen;
    return {
      ...op, offers, choice: picked.choice,
      workCentre: { id: m.id, name: m.name, hourlyRate: m.hourlyRate },
      setupMinutes: m.setupMinutes, piecesPerHour: m.piecesPerHour, scrapFraction: m.scrapFraction,
      batch: m.batch ? { ...m.batch, batches: Math.ceil(pieces / m.batch.capacityPieces) } : null,
    };
  });
}
