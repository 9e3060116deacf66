/** What extension and torsion springs put on a document: their data in trade terms. */
import { formatQuantity } from '../format';
import type { Settings } from '../settings/schema';
import type { ExtensionSpec, TorsionSpec } from '../spec';
import type { ExtensionReport } from '../springs/extension/report';
import type { TorsionReport } from '../springs/torsion/report';
import { extensionEndTerms, legFormTerms, loadDirectionTerms } from '../vocabulary';
import { findGrade } from '../materials';
import { freeLengthText, orderFields } from './common';
import { piecesText, plainText, wordText } from './text';
import type { Field } from './types';

const tolerance = (percent: number | null) => (percent === null ? '' : ` ±${plainText(percent, 1)} %`);

function dutyText(spec: ExtensionSpec | TorsionSpec): string {
  if (spec.duty.type === 'static') return 'static';
  return `cyclic, ${piecesText(spec.duty.cycles)} cycles${spec.duty.peened ? ', shot peened' : ''}`;
}

const materialName = (id: string) => findGrade(id)?.name ?? id;

export function extensionFields(spec: ExtensionSpec, r: ExtensionReport, settings: Settings): Field[] {
  const len = (v: number) => formatQuantity(v, 'length', r.units);
  const force = (v: number) => formatQuantity(v, 'force', r.units);
  return [
    { label: 'Material', value: materialName(spec.material) },
    { label: 'Wire Ø d', value: len(r.wireDiameter) },
    { label: 'Outside Ø De', value: len(r.outerDiameter) },
    { label: 'Body coils Nb', value: plainText(r.bodyCoils) },
    { label: 'Ends', value: r.ends.map((e) => extensionEndTerms[e].long).join(' / ') },
    { label: 'Free length inside ends L0', value: freeLengthText(len(r.specifiedFreeLength ?? r.freeLength), r.loads.some((l) => l.specifiedForce !== null)) },
    { label: 'Initial tension F0', value: `${force(r.initialTension)}${r.initialTensionProposed ? ' (proposed)' : ''}` },
    ...r.loads.map((l, i) => ({
      label: `Load F${i + 1} at L${i + 1} = ${len(l.length)}`,
      value: l.specifiedForce === null ? `${force(l.force)} (reference)` : `${force(l.specifiedForce)}${tolerance(l.tolerancePercent)}`,
    })),
    { label: 'Rate R', value: formatQuantity(r.rate, 'rate', r.units) },
    { label: 'Maximum safe length', value: len(r.maximumSafeLength) },
    { label: 'Relative loop position', value: spec.loopAngle === undefined ? 'as drawn' : `${plainText(spec.loopAngle, 0)}°` },
    { label: 'Mechanical stop', value: spec.mechanicalStop ? 'in the assembly' : 'none noted' },
    { label: 'Duty', value: dutyText(spec) },
    ...orderFields(spec, settings),
  ];
}

export function torsionFields(spec: TorsionSpec, r: TorsionReport, settings: Settings): Field[] {
  const len = (v: number) => formatQuantity(v, 'length', r.units);
  const torque = (v: number) => formatQuantity(v, 'torque', r.units);
  return [
    { label: 'Material', value: materialName(spec.material) },
    { label: 'Wire Ø d', value: len(r.wireDiameter) },
    { label: 'Outside Ø De', value: len(r.outerDiameter) },
    { label: 'Body coils Nb', value: plainText(r.bodyCoils) },
    { label: 'Legs', value: spec.legs.map((l) => `${len(l.length)} ${legFormTerms[l.form].long}`).join(' / ') },
    { label: 'Free angle', value: spec.freeAngle === undefined ? 'as drawn' : `${plainText(spec.freeAngle, 0)}°${spec.freeAngleTolerance ? ` ±${plainText(spec.freeAngleTolerance, 1)}°` : ''}` },
    { label: 'Direction of wind', value: wordText(spec.windDirection) },
    { label: 'Loaded', value: loadDirectionTerms[spec.loadDirection].long },
    ...r.loads.map((l) => ({
      label: `Torque at ${plainText(l.angle, 1)}°`,
      value: l.specifiedTorque === null ? `${torque(l.torque)} (reference)` : `${torque(l.specifiedTorque)}${tolerance(l.tolerancePercent)}`,
    })),
    { label: 'Rate per degree', value: formatQuantity(r.ratePerDegree, 'torqueRatePerDegree', r.units) },
    { label: 'Arbor Ø', value: r.arborDiameter === null ? 'not given' : len(r.arborDiameter) },
    { label: 'Inside Ø at the largest angle', value: len(r.insideDiameterAtLoad) },
    { label: 'Tolerances', value: 'as stated on the drawing; otherwise our usual torsion-spring tolerances' },
    { label: 'Duty', value: dutyText(spec) },
    ...orderFields(spec, settings),
  ];
}
