import type { Machine, MachineOperation } from '../settings/schema';

/** Machines set up for the operation whose wire range takes the wire, in the shop's own order. */
export function capableMachines(machines: readonly Machine[], operation: MachineOperation, d: number): Machine[] {
  return machines.filter((m) => m.operation === operation && d >= m.wireRange.min && d <= m.wireRange.max);
}

/**
 * Pieces per hour of a coiler: the wire feed over the developed length, capped by the cut-off rate,
 * rounded to whole pieces so the figure on the plan is the figure charged.
 */
export function coilerPiecesPerHour(machine: Machine, wireLengthMm: number): number | null {
  const model = machine.speedModel;
  if (!model) return null;
  const byFeed = (model.feedMetresPerMinute * 1000) / wireLengthMm;
  return Math.max(1, Math.round(60 * Math.min(byFeed, model.maxPiecesPerMinute)));
}

/** Pieces per hour of a piece-paced machine other than a coiler: its own rate, else its speed model's piece cap. */
export function machinePiecesPerHour(machine: Machine): number | null {
  if (machine.piecesPerHour !== undefined) return machine.piecesPerHour;
  return machine.speedModel ? Math.round(60 * machine.speedModel.maxPiecesPerMinute) : null;
}

/** What one capable machine would do for the lot: its run model and what the lot would cost on it. */
export interface WorkCentreOffer {
  id: string;
  name: string;
  hourlyRate: number;
  setupMinutes: number;
  /** Pieces per hour for piece-paced work; null for batch work or a machine with no run model. */
  piecesPerHour: number | null;
  batch: { capacityPieces: number; cycleMinutes: number } | null;
  scrapFraction: number;
  /** Set-up + run + scrapped material for the lot; null when the machine has no run model. */
  lotCost: number | null;
}

/** Why the plan runs an operation where it does, and what the next-best machine would have cost. */
export interface WorkCentreChoice {
  basis: 'lowest lot cost' | 'only machine' | 'pinned' | 'no run model';
  lotCost: number | null;
  runnerUp: { id: string; name: string; lotCost: number } | null;
  /** Runner-up's lot cost less the chosen one's (positive: the choice saves this much). */
  difference: number | null;
}

const round2 = (v: number) => Math.round(v * 100) / 100;

/** Hours a lot takes on a machine: run time by pieces per hour, or whole batches by cycle time. */
export function runHours(offer: Pick<WorkCentreOffer, 'piecesPerHour' | 'batch'>, pieces: number): number | null {
  if (offer.batch) return (Math.ceil(pieces / offer.batch.capacityPieces) * offer.batch.cycleMinutes) / 60;
  if (offer.piecesPerHour) return pieces / offer.piecesPerHour;
  return null;
}

/** Set-up + run + the material value of the pieces it scraps: the lot cost machines are compared on. */
export function lotCost(offer: Omit<WorkCentreOffer, 'lotCost'>, pieces: number, pieceValue: number): number | null {
  const hours = runHours(offer, pieces);
  if (hours === null) return null;
  const setup = (offer.setupMinutes / 60) * offer.hourlyRate;
  return round2(setup + hours * offer.hourlyRate + pieces * offer.scrapFraction * pieceValue);
}

/**
 * The planner's pick: the pinned machine when one is pinned and capable, else the capable machine with the
 * lowest lot cost (ties keep the shop's order); a machine with no run model only when nothing else fits.
 */
export function chooseWorkCentre(offers: readonly WorkCentreOffer[], pinned?: string): { chosen: WorkCentreOffer; choice: WorkCentreChoice } | null {
  if (offers.length === 0) return null;
  const costed = offers.filter((o) => o.lotCost !== null).sort((a, b) => a.lotCost! - b.lotCost!);
  const pin = pinned === undefined ? undefined : offers.find((o) => o.id === pinned);
  const chosen = pin ?? costed[0] ?? offers[0]!;
  const others = costed.filter((o) => o !== chosen);
  const next = others[0];
  const runnerUp = next ? { id: next.id, name: next.name, lotCost: next.lotCost! } : null;
  const basis = pin ? 'pinned' : chosen.lotCost === null ? 'no run model' : offers.length === 1 ? 'only machine' : 'lowest lot cost';
  const difference = runnerUp && chosen.lotCost !== null ? round2(runnerUp.lotCost - chosen.lotCost) : null;
  return { chosen, choice: { basis, lotCost: chosen.lotCost, runnerUp, difference } };
}
