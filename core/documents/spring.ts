/**
 * The kind-specific content of a document, chosen by the spring's kind. Writers never look at the kind:
 * a new kind adds a case here, and the same quote and traveller print it.
 */
import { analyseSpec } from '../calculate';
import type { SpringReport } from '../calculate';
import type { Settings } from '../settings/schema';
import type { Spec, SpringKind } from '../spec';
import { compressionDiagramFigure, compressionDrawingFigure, compressionFields } from './compression';
import type { Field, FigureModel } from './types';

export interface SpringContent {
  heading: string;
  fields: Field[];
  drawing: FigureModel;
  diagram: FigureModel;
  /** The analysis behind the content, in internal units. */
  report: SpringReport;
}

/** The kinds quotes and travellers can print so far (each needs its data block and drawings). */
export const documentKinds: readonly SpringKind[] = ['compression'];

export function springContent(spec: Spec, settings: Settings, title: string): SpringContent {
  if (spec.kind === 'compression') {
    const report = analyseSpec(spec);
    return {
      heading: 'Helical compression spring',
      fields: compressionFields(spec, report, settings),
      drawing: compressionDrawingFigure(spec, report, title),
      diagram: compressionDiagramFigure(report),
      report,
    };
  }
  throw new Error(`quotes and travellers do not cover ${spec.kind} springs yet (only ${documentKinds.join(', ')})`);
}
