/** One entry for the drawing and the diagram of a spring of any kind, for the UI and the documents. */
import type { SpringReport } from '../kinds/types';
import { kindEntryOf } from '../kinds/registry';
import type { Spec } from '../spec';
import type { ChartSize } from './chart';
import type { CompressionDrawingOptions } from './compression';
import type { ExtensionDrawingOptions } from './extension';
import type { LoadDeflectionOptions } from './load-deflection';
import type { TorsionDrawingOptions } from './torsion';

/** Every kind's options; each drawing reads its own and the shared size and title. */
export type SpringDrawingOptions = CompressionDrawingOptions & ExtensionDrawingOptions & TorsionDrawingOptions;

/** Against length or deflection for compression and extension springs; a torsion spring's is always its angle. */
export type SpringDiagramOptions = ChartSize & Pick<LoadDeflectionOptions, 'abscissa'>;

/** `report` in internal units, as `analyseSpec` gives it. */
export function springDrawing(report: SpringReport, options: SpringDrawingOptions = {}): string {
  return kindEntryOf(report.kind).drawing(report, options);
}

/** Force against length (compression, extension) or torque against angle (torsion). */
export function springDiagram(report: SpringReport, options: SpringDiagramOptions = {}): string {
  return kindEntryOf(report.kind).diagram(report, options);
}

/** What the drawing takes from the spec rather than the report: end forms, diameter asked for, leg and loop data. */
export function specDrawingOptions(spec: Spec): SpringDrawingOptions {
  return kindEntryOf(spec.kind).drawingOptions(spec);
}
