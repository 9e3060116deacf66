/** What a compression spring puts on a document: its data in trade terms and its two figures. */
import { compressionDrawing, loadDeflectionDiagram } from '../drawing';
import { formatQuantity } from '../format';
import type { Settings } from '../settings/schema';
import type { CompressionSpec } from '../spec';
import type { CompressionReport } from '../springs/compression/report';
import { findGrade } from '../materials';
import { orderFields } from './common';
import { piecesText, plainText, wordText } from './text';
import type { Field, FigureModel } from './types';

const DRAWING = { width: 520, height: 300 };
const DIAGRAM = { width: 480, height: 260 };

function loadFields(r: CompressionReport): Field[] {
  return r.loads.map((l, i) => {
    const at = formatQuantity(l.length, 'length', r.units);
    const label = `Load F${i + 1} at L${i + 1} = ${at}`;
    if (l.specifiedForce === null) return { label, value: `${formatQuantity(l.force, 'force', r.units)} (reference)` };
    const tolerance = l.tolerancePercent === null ? '' : ` ±${plainText(l.tolerancePercent, 1)} %`;
    return { label, value: `${formatQuantity(l.specifiedForce, 'force', r.units)}${tolerance}` };
  });
}

function dutyText(spec: CompressionSpec): string {
  if (spec.duty.type === 'static') return 'static';
  return `cyclic, ${piecesText(spec.duty.cycles)} cycles${spec.duty.peened ? ', shot peened' : ''}`;
}

/** The spring's data as a buyer and a setter read it, in the job's units. */
export function compressionFields(spec: CompressionSpec, r: CompressionReport, settings: Settings): Field[] {
  const len = (v: number) => formatQuantity(v, 'length', r.units);
  const grade = findGrade(spec.material);
  return [
    { label: 'Material', value: grade ? `${grade.name}` : spec.material },
    { label: 'Wire Ø d', value: len(r.outerDiameter - r.meanDiameter) },
    { label: 'Outside Ø De', value: len(r.outerDiameter) },
    { label: 'Inside Ø Di', value: len(r.innerDiameter) },
    { label: 'Free length L0', value: len(r.freeLength) },
    { label: 'Total coils nt', value: plainText(r.totalCoils) },
    { label: 'Active coils n', value: plainText(r.activeCoils) },
    { label: 'Ends', value: wordText(spec.ends) },
    ...loadFields(r),
    { label: 'Rate R', value: formatQuantity(r.rate, 'rate', r.units) },
    { label: 'Solid length Ls (max)', value: len(r.solidLength) },
    { label: 'Direction of wind', value: wordText(spec.directionOfWind ?? 'either') },
    { label: 'Duty', value: dutyText(spec) },
    ...orderFields(spec, settings),
  ];
}

export function compressionDrawingFigure(spec: CompressionSpec, r: CompressionReport, title: string): FigureModel {
  const svg = compressionDrawing(r, {
    ...DRAWING, title, ends: spec.ends, diameter: spec.innerDiameter !== undefined ? 'inner' : 'outer',
    directionOfWind: spec.directionOfWind ?? 'either',
  });
  return { caption: 'Spring drawing (dimensions at free length)', svg, ...DRAWING };
}

export function compressionDiagramFigure(r: CompressionReport): FigureModel {
  return { caption: 'Load–length diagram', svg: loadDeflectionDiagram(r, DIAGRAM), ...DIAGRAM };
}
