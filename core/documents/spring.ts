/**
 * The kind-specific content of a document, chosen by the spring's kind. Writers never look at the kind:
 * a new kind adds a case here, and the same quote and traveller print it.
 */
import { analyseSpec } from '../calculate';
import type { SpringReport } from '../calculate';
import type { Settings } from '../settings/schema';
import type { Spec, SpringKind } from '../spec';
import { springDiagram, springDrawing, specDrawingOptions } from '../drawing';
import { compressionFields } from './compression';
import { extensionFields, torsionFields } from './kinds';
import type { Field, FigureModel } from './types';

const DRAWING = { width: 520, height: 300 };
const DIAGRAM = { width: 480, height: 260 };

const headings: Record<SpringKind, string> = {
  compression: 'Helical compression spring',
  extension: 'Helical extension spring',
  torsion: 'Helical torsion spring',
};

const diagramCaptions: Record<SpringKind, string> = {
  compression: 'Load–length diagram',
  extension: 'Load–length diagram (lengths inside the ends)',
  torsion: 'Torque–angle diagram',
};

function fieldsFor(spec: Spec, report: SpringReport, settings: Settings): Field[] {
  if (spec.kind === 'compression' && report.kind === 'compression') return compressionFields(spec, report, settings);
  if (spec.kind === 'extension' && report.kind === 'extension') return extensionFields(spec, report, settings);
  if (spec.kind === 'torsion' && report.kind === 'torsion') return torsionFields(spec, report, settings);
  throw new Error(`report of kind ${report.kind} for a ${spec.kind} spec`);
}

export interface SpringContent {
  heading: string;
  fields: Field[];
  drawing: FigureModel;
  diagram: FigureModel;
  /** The analysis behind the content, in internal units. */
  report: SpringReport;
}

export function springContent(spec: Spec, settings: Settings, title: string): SpringContent {
  const report = analyseSpec(spec);
  return {
    heading: headings[spec.kind],
    fields: fieldsFor(spec, report, settings),
    drawing: { caption: 'Spring drawing (dimensions at free position)', svg: springDrawing(report, { ...DRAWING, title, ...specDrawingOptions(spec) }), ...DRAWING },
    diagram: { caption: diagramCaptions[spec.kind], svg: springDiagram(report, DIAGRAM), ...DIAGRAM },
    report,
  };
}
