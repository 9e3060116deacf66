/** What a compression spring puts on a document: its data in trade terms. */
import { formatQuantity } from '../format';
import type { Settings } from '../settings/schema';
import type { CompressionSpec } from '../spec';
import type { CompressionReport } from '../springs/compression/report';
import { findGrade } from '../materials';
import { freeLengthText, orderFields } from './common';
import { piecesText, plainText, wordText } from './text';
import type { Field } from './types';

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
    { label: 'Wire Ø d', value: len(r.wireDiameter) },
    { label: 'Outside Ø De', value: len(r.outerDiameter) },
    { label: 'Inside Ø Di', value: len(r.innerDiameter) },
    { label: 'Free length L0', value: freeLengthText(len(r.freeLength), r.loads.some((l) => l.specifiedForce !== null)) },
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
