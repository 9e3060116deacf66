import type { Machine, MachineOperation } from '../settings/schema';

/**
 * The machine a planner would pick: one set up for the operation whose wire range takes the wire,
 * the lowest hourly rate first (ties keep the shop's own order).
 */
export function chooseMachine(machines: readonly Machine[], operation: MachineOperation, d: number): Machine | null {
  let best: Machine | null = null;
  for (const m of machines) {
    if (m.operation !== operation || d < m.wireRange.min || d > m.wireRange.max) continue;
    if (best === null || m.hourlyRate < best.hourlyRate) best = m;
  }
  return best;
}

/** Pieces per hour of a coiler: the wire feed over the developed length, capped by the cut-off rate. */
export function coilerPiecesPerHour(machine: Machine, wireLengthMm: number): number | null {
  const model = machine.speedModel;
  if (!model) return null;
  const byFeed = (model.feedMetresPerMinute * 1000) / wireLengthMm;
  return 60 * Math.min(byFeed, model.maxPiecesPerMinute);
}

/** Pieces per hour of a piece-paced machine other than a coiler (its speed model's piece cap). */
export function machinePiecesPerHour(machine: Machine): number | null {
  return machine.speedModel ? 60 * machine.speedModel.maxPiecesPerMinute : null;
}
