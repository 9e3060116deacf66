/** One entry for the drawing and the diagram of a spring of any kind, for the UI and the documents. */
import type { SpringReport } from '../calculate';
import type { Spec } from '../spec';
import type { ChartSize } from './chart';
import type { CompressionDrawingOptions } from './compression';
import { compressionDrawing } from './compression';
import type { ExtensionDrawingOptions } from './extension';
import { extensionDrawing } from './extension';
import { extensionLoadDiagram } from './extension-load';
import type { LoadDeflectionOptions } from './load-deflection';
import { loadDeflectionDiagram } from './load-deflection';
import { torqueAngleDiagram } from './torque-angle';
import type { TorsionDrawingOptions } from './torsion';
import { torsionDrawing } from './torsion';

/** Every kind's options; each drawing reads its own and the shared size and title. */
export type SpringDrawingOptions = CompressionDrawingOptions & ExtensionDrawingOptions & TorsionDrawingOptions;

/** Against length or deflection for compression and extension springs; a torsion spring's is always its angle. */
export type SpringDiagramOptions = ChartSize & Pick<LoadDeflectionOptions, 'abscissa'>;

/** `report` in internal units, as `analyseSpec` gives it. */
export function springDrawing(report: SpringReport, options: SpringDrawingOptions = {}): string {
  switch (report.kind) {
    case 'compression': return compressionDrawing(report, options);
    case 'extension': return extensionDrawing(report, options);
    case 'torsion': return torsionDrawing(report, options);
  }
}

/** Force against length (compression, extension) or torque against angle (torsion). */
export function springDiagram(report: SpringReport, options: SpringDiagramOptions = {}): string {
  switch (report.kind) {
    case 'compression': return loadDeflectionDiagram(report, options);
    case 'extension': return extensionLoadDiagram(report, options);
    case 'torsion': return torqueAngleDiagram(report, options);
  }
}

/** What the drawing takes from the spec rather than the report: end forms, diameter asked for, leg and loop data. */
export function specDrawingOptions(spec: Spec): SpringDrawingOptions {
  switch (spec.kind) {
    case 'compression':
      return {
        ends: spec.ends, diameter: spec.innerDiameter !== undefined ? 'inner' : 'outer',
        directionOfWind: spec.directionOfWind ?? 'either',
      };
    case 'extension':
      return spec.loopAngle === undefined ? {} : { loopPosition: { angle: spec.loopAngle, tolerance: spec.loopAngleTolerance } };
    case 'torsion':
      return {
        freeAngle: spec.freeAngle, freeAngleTolerance: spec.freeAngleTolerance,
        legForms: [spec.legs[0].form, spec.legs[1].form],
      };
  }
}
