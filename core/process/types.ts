import type { Quantity } from '../units';
import type { MachineOperation } from '../settings/schema';

/** Operations a spring passes through; machine operations plus outside and manual ones. */
export type OperationKind = MachineOperation | 'finish' | 'bake' | 'inspect';

/** One setting the coiler setter or operator reads, with its quantity so it converts to the job's units. */
export interface OperationSetting {
  label: string;
  value: number | string;
  quantity?: Quantity;
}

export interface WorkCentre {
  id: string;
  name: string;
}

export interface Operation {
  sequence: number;
  kind: OperationKind;
  title: string;
  /** The shop's machine chosen for this operation (by operation and wire range); null when none fits. */
  workCentre: WorkCentre | null;
  /** Done by a vendor (plating, passivation, coating). */
  outside: boolean;
  settings: OperationSetting[];
  setupMinutes: number;
  /** Pieces per hour for piece-paced work; null for batch or outside work. */
  piecesPerHour: number | null;
  /** Batch work (ovens): pieces per batch and minutes per batch. */
  batch: { capacityPieces: number; cycleMinutes: number; batches: number } | null;
  /** Fraction of pieces lost at this operation. */
  scrapFraction: number;
  notes: string[];
}

export interface LotWire {
  startQuantity: number;
  /** Metres of wire for the lot, including setup scrap. */
  metres: number;
  kg: number;
}
