import type { Spec, SpringKind } from '../../core/spec';
import { SPEC_VERSION } from '../../core/spec/versions';
import type { UnitSystem } from '../../core/units';
import type { CompressionDraft } from './compression-draft';
import { compressionFromSpec, compressionPaths, compressionRaw, convertCompression, emptyCompression } from './compression-draft';
import { compact, convertText, RawBuilder } from './convert';
import type { ExtensionDraft } from './extension-draft';
import { convertExtension, emptyExtension, extensionFromSpec, extensionPaths, extensionRaw } from './extension-draft';
import { numberText, parseList } from './numbers';
import type { KindRaw } from './rows';
import type { TorsionDraft } from './torsion-draft';
import { convertTorsion, emptyTorsion, torsionFromSpec, torsionPaths, torsionRaw } from './torsion-draft';

export type DiameterGiven = 'outerDiameter' | 'innerDiameter' | 'meanDiameter';

export interface OrderDraft {
  quantities: string;
  toleranceGrade: '' | '1' | '2' | '3';
  finish: string;
  bakeSpecification: string;
  aql: string;
  directionOfWind: '' | 'right' | 'left' | 'either';
  shotPeen: '' | 'yes' | 'no';
  temperatureMin: string;
  temperatureMax: string;
}

export interface OverridesDraft {
  shearModulus: string;
  elasticModulus: string;
  tensileStrength: string;
  density: string;
}

/**
 * The spec as the estimator types it: every number is text until it parses, so nothing typed is lost.
 * Each kind keeps its own part, so switching the kind and back loses nothing either.
 */
export interface SpecDraft {
  kind: SpringKind;
  units: UnitSystem;
  material: string;
  wireDiameter: string;
  diameterGiven: DiameterGiven;
  diameter: string;
  compression: CompressionDraft;
  extension: ExtensionDraft;
  torsion: TorsionDraft;
  overrides: OverridesDraft;
  order: OrderDraft;
  notes: string;
}

export function emptySpecDraft(units: UnitSystem, toleranceGrade: 1 | 2 | 3 | null = null): SpecDraft {
  return {
    kind: 'compression', units, material: '', wireDiameter: '', diameterGiven: 'outerDiameter', diameter: '',
    compression: emptyCompression(), extension: emptyExtension(), torsion: emptyTorsion(),
    overrides: { shearModulus: '', elasticModulus: '', tensileStrength: '', density: '' },
    order: {
      quantities: '', toleranceGrade: toleranceGrade === null ? '' : (String(toleranceGrade) as '1'), finish: '',
      bakeSpecification: '', aql: '', directionOfWind: '', shotPeen: '', temperatureMin: '', temperatureMax: '',
    },
    notes: '',
  };
}

export function draftFromSpec(s: Spec): SpecDraft {
  const o = s.materialOverrides;
  const diameterGiven: DiameterGiven = s.outerDiameter !== undefined ? 'outerDiameter' : s.innerDiameter !== undefined ? 'innerDiameter' : 'meanDiameter';
  return {
    kind: s.kind, units: s.units, material: s.material, wireDiameter: numberText(s.wireDiameter),
    diameterGiven, diameter: numberText(s[diameterGiven]),
    compression: s.kind === 'compression' ? compressionFromSpec(s) : emptyCompression(),
    extension: s.kind === 'extension' ? extensionFromSpec(s) : emptyExtension(),
    torsion: s.kind === 'torsion' ? torsionFromSpec(s) : emptyTorsion(),
    overrides: {
      shearModulus: numberText(o?.shearModulus), elasticModulus: numberText(o?.elasticModulus),
      tensileStrength: numberText(o?.tensileStrength), density: numberText(o?.density),
    },
    order: {
      quantities: (s.quantities ?? []).join(', '),
      toleranceGrade: s.toleranceGrade === undefined ? '' : (String(s.toleranceGrade) as '1'),
      finish: s.finish ?? '', bakeSpecification: s.bakeSpecification ?? '', aql: numberText(s.aql),
      directionOfWind: s.directionOfWind ?? '', shotPeen: s.shotPeen === undefined ? '' : s.shotPeen ? 'yes' : 'no',
      temperatureMin: numberText(s.serviceTemperature?.min), temperatureMax: numberText(s.serviceTemperature?.max),
    },
    notes: s.notes ?? '',
  };
}

/** Every entered value in the other unit system; text that is not a number stays as typed. */
export function convertDraft(d: SpecDraft, to: UnitSystem): SpecDraft {
  const from = d.units;
  if (from === to) return d;
  const c = (t: string, q: Parameters<typeof convertText>[1]) => convertText(t, q, from, to);
  return {
    ...d, units: to, wireDiameter: c(d.wireDiameter, 'length'), diameter: c(d.diameter, 'length'),
    compression: convertCompression(d.compression, from, to), extension: convertExtension(d.extension, from, to),
    torsion: convertTorsion(d.torsion, from, to),
    overrides: {
      shearModulus: c(d.overrides.shearModulus, 'stress'), elasticModulus: c(d.overrides.elasticModulus, 'stress'),
      tensileStrength: c(d.overrides.tensileStrength, 'stress'), density: c(d.overrides.density, 'density'),
    },
    order: { ...d.order, temperatureMin: c(d.order.temperatureMin, 'temperature'), temperatureMax: c(d.order.temperatureMax, 'temperature') },
  };
}

function overridesRaw(o: OverridesDraft, b: RawBuilder): Record<string, unknown> | undefined {
  const out = compact({
    shearModulus: b.number('materialOverrides.shearModulus', o.shearModulus),
    elasticModulus: b.number('materialOverrides.elasticModulus', o.elasticModulus),
    tensileStrength: b.number('materialOverrides.tensileStrength', o.tensileStrength),
    density: b.number('materialOverrides.density', o.density),
  });
  return Object.keys(out).length > 0 ? out : undefined;
}

function orderRaw(o: OrderDraft, b: RawBuilder): Record<string, unknown> {
  const list = parseList(o.quantities);
  if (!list.ok) b.errors.push({ code: 'not-a-number', path: 'quantities', message: list.message });
  const min = b.number('serviceTemperature.min', o.temperatureMin);
  const max = b.number('serviceTemperature.max', o.temperatureMax);
  const text = (t: string) => (t.trim() === '' ? undefined : t.trim());
  return compact({
    quantities: list.ok && list.value.length > 0 ? list.value : undefined,
    toleranceGrade: o.toleranceGrade === '' ? undefined : Number(o.toleranceGrade),
    finish: o.finish === '' || o.finish === 'none' ? undefined : o.finish,
    bakeSpecification: text(o.bakeSpecification),
    aql: b.number('aql', o.aql),
    directionOfWind: o.directionOfWind === '' ? undefined : o.directionOfWind,
    shotPeen: o.shotPeen === '' ? undefined : o.shotPeen === 'yes',
    serviceTemperature: min === undefined && max === undefined ? undefined : { min, max },
  });
}

export interface DraftRaw extends KindRaw {
  /** Errors found before the schema sees the spec: text where a number belongs, required fields left empty. */
  errors: { code: string; path: string; message: string }[];
}

function kindRaw(d: SpecDraft, b: RawBuilder): KindRaw {
  switch (d.kind) {
    case 'compression': return compressionRaw(d.compression, b);
    case 'extension': return extensionRaw(d.extension, b);
    case 'torsion': return torsionRaw(d.torsion, b);
  }
}

export function draftToRaw(d: SpecDraft): DraftRaw {
  const b = new RawBuilder();
  const kind = kindRaw(d, b);
  const raw = compact({
    version: SPEC_VERSION, kind: d.kind, units: d.units, material: d.material === '' ? undefined : d.material,
    wireDiameter: b.required('wireDiameter', d.wireDiameter, 'a wire diameter'),
    [d.diameterGiven]: b.required(d.diameterGiven, d.diameter, 'a coil diameter'),
    ...kind.raw,
    materialOverrides: overridesRaw(d.overrides, b),
    notes: d.notes.trim() === '' ? undefined : d.notes,
    ...orderRaw(d.order, b),
  });
  if (d.material === '') b.errors.push({ code: 'required', path: 'material', message: 'choose a wire grade' });
  return { raw, formPath: kind.formPath, errors: b.errors };
}

function kindPaths(d: SpecDraft): string[] {
  switch (d.kind) {
    case 'compression': return compressionPaths(d.compression);
    case 'extension': return extensionPaths(d.extension);
    case 'torsion': return torsionPaths(d.torsion);
  }
}

/** The spec paths the form has a field for, in reading order. */
export function draftPaths(d: SpecDraft): string[] {
  return [
    'kind', 'units', 'material', 'wireDiameter', d.diameterGiven, ...kindPaths(d),
    'materialOverrides.shearModulus', 'materialOverrides.elasticModulus', 'materialOverrides.tensileStrength',
    'materialOverrides.density', 'quantities', 'toleranceGrade', 'finish', 'bakeSpecification', 'aql',
    'shotPeen', 'serviceTemperature.min', 'serviceTemperature.max', 'notes',
  ];
}
