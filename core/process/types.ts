import type { Quantity } from '../units';
import type { MachineOperation } from '../settings/schema';
import type { WorkCentreChoice, WorkCentreOffer } from './work-centre';
import type { WireStockCheck } from './wire-stock';

/** Operations a spring passes through; machine operations plus outside and manual ones. */
export type OperationKind = MachineOperation | 'finish' | 'bake' | 'inspect' | 'extra';

/** One of the estimator's overrides on an operation, with the shop's default beside it. */
export interface OperationOverride {
  field: 'machine' | 'setupMinutes' | 'piecesPerHour' | 'scrapPercent';
  value: number | string;
  /** What the shop's settings and the lot-cost rule would have used; null when there was nothing to use. */
  shopDefault: number | string | null;
  reason: string;
}

/** One setting the coiler setter or operator reads, with its quantity so it converts to the job's units. */
export interface OperationSetting {
  label: string;
  value: number | string;
  quantity?: Quantity;
}

export interface WorkCentre {
  id: string;
  name: string;
  hourlyRate: number;
}

export interface Operation {
  sequence: number;
  /** Stable within the routing (the kind, with "#2" for a second of a kind): cost lines and overrides refer to it. */
  key: string;
  kind: OperationKind;
  title: string;
  /** The shop's machine chosen for this operation (lowest lot cost among those that take the wire); null when none fits. */
  workCentre: WorkCentre | null;
  /** Why that machine, the runner-up and what choosing it saves; null for manual and outside work. */
  choice: WorkCentreChoice | null;
  /** Every machine that can take the work, with its run model and lot cost. */
  offers: WorkCentreOffer[];
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
  /** The estimator's overrides on this job, each with the shop default and the reason. */
  overrides: OperationOverride[];
  /** Added by the estimator from the shop's extra operations: why. */
  addedBecause?: string;
}

export interface LotWire {
  startQuantity: number;
  /** Metres of wire for the lot, including setup scrap. */
  metres: number;
  kg: number;
  /** The lot's wire against the shop's stock list. */
  stock: WireStockCheck;
}
