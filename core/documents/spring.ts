/**
 * The kind-specific content of a document, from the kind registry. Writers never look at the kind: a new
 * kind's registry entry names its heading, caption and fields, and the same quote and traveller print it.
 */
import { analyseSpec } from '../calculate';
import type { SpringReport } from '../calculate';
import type { Settings } from '../settings/schema';
import type { Spec } from '../spec';
import { springDiagram, springDrawing, specDrawingOptions } from '../drawing';
import { kindEntryOf } from '../kinds/registry';
import { captions } from '../vocabulary';
import type { Field, FigureModel } from './types';

const DRAWING = { width: 520, height: 300 };
const DIAGRAM = { width: 480, height: 260 };

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
  const kind = kindEntryOf(spec.kind);
  return {
    heading: kind.document.heading,
    fields: kind.document.fields(spec, report, settings),
    drawing: { caption: captions.springDrawing, svg: springDrawing(report, { ...DRAWING, title, ...specDrawingOptions(spec) }), ...DRAWING },
    diagram: { caption: kind.document.diagramCaption, svg: springDiagram(report, DIAGRAM), ...DIAGRAM },
    report,
  };
}
