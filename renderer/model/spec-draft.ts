import { kindEntryOf } from '../../core/kinds/registry';
import type { Spec, SpringKind } from '../../core/spec';
import { springKinds } from '../../core/spec';
import type { QuantityMap, UnitSystem } from '../../core/units';
import { quantityAt } from '../../core/units';
import type { Understood } from './convert';
import { compact, convertTexts, RawBuilder } from './convert';
import type { KindDraftModel, KindDrafts } from './kind-drafts';
import { emptyKindDrafts, kindDraftModels } from './kind-drafts';
import { SPEC_VERSION } from '../../core/spec/versions';
import { listText, numberText, parseList } from './numbers';
import type { KindRaw } from './rows';

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
export interface SpecDraft extends KindDrafts {
  kind: SpringKind;
  units: UnitSystem;
  material: string;
  wireDiameter: string;
  diameterGiven: DiameterGiven;
  diameter: string;
  overrides: OverridesDraft;
  order: OrderDraft;
  notes: string;
}

/** The draft model of the chosen kind; the kind's part of the draft is the one `d.kind` names. */
function modelOf<K extends SpringKind>(kind: K): KindDraftModel<K> {
  return kindDraftModels[kind];
}

export function emptySpecDraft(units: UnitSystem, toleranceGrade: 1 | 2 | 3 | null = null): SpecDraft {
  return {
    kind: 'compression', units, material: '', wireDiameter: '', diameterGiven: 'outerDiameter', diameter: '',
    ...emptyKindDrafts(),
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
    ...emptyKindDrafts(), [s.kind]: modelOf(s.kind).fromSpec(s),
    overrides: {
      shearModulus: numberText(o?.shearModulus), elasticModulus: numberText(o?.elasticModulus),
      tensileStrength: numberText(o?.tensileStrength), density: numberText(o?.density),
    },
    order: {
      quantities: listText(s.quantities ?? []),
      toleranceGrade: s.toleranceGrade === undefined ? '' : (String(s.toleranceGrade) as '1'),
      finish: s.finish ?? '', bakeSpecification: s.bakeSpecification ?? '', aql: numberText(s.aql),
      directionOfWind: s.directionOfWind ?? '', shotPeen: s.shotPeen === undefined ? '' : s.shotPeen ? 'yes' : 'no',
      temperatureMin: numberText(s.serviceTemperature?.min), temperatureMax: numberText(s.serviceTemperature?.max),
    },
    notes: s.notes ?? '',
  };
}

/** The common fields of the draft as the spec's quantity map names them (the draft keeps a few under its own names). */
function commonDraftQuantities(spec: QuantityMap, d: SpecDraft): QuantityMap {
  const at = (path: string) => quantityAt(spec, path) ?? 'count';
  return {
    wireDiameter: at('wireDiameter'), diameter: at(d.diameterGiven), overrides: spec.materialOverrides ?? {},
    order: { temperatureMin: at('serviceTemperature.min'), temperatureMax: at('serviceTemperature.max') },
  };
}

/**
 * Every entered value in the other unit system, each field by the quantity core declares for it in the
 * kind's spec (every kind's part converts, so switching kind after units loses nothing); text that is not
 * a number stays as typed.
 */
export function convertDraft(d: SpecDraft, to: UnitSystem): SpecDraft {
  const from = d.units;
  if (from === to) return d;
  const kinds = Object.fromEntries(springKinds.map((k) => [k, convertTexts(d[k], kindEntryOf(k).specQuantities, from, to)])) as unknown as KindDrafts;
  return { ...convertTexts(d, commonDraftQuantities(kindEntryOf(d.kind).specQuantities, d), from, to), ...kinds, units: to };
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
  if (!list.ok) b.errors.push({ code: list.code, path: 'quantities', message: `break ${list.item + 1}: ${list.message}` });
  else if (list.understood.length > 0) b.understood.push({ path: 'quantities', message: list.understood.join('; ') });
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
  /** What the reader understood of fields typed other than as plain numbers ("read "2 000" as 2000 pcs"). */
  understood: Understood[];
}

function kindRaw(d: SpecDraft, b: RawBuilder): KindRaw {
  return modelOf(d.kind).toRaw(d[d.kind], b);
}

export function draftToRaw(d: SpecDraft): DraftRaw {
  const b = new RawBuilder(d.units, kindEntryOf(d.kind).specQuantities);
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
  return { raw, formPath: kind.formPath, errors: b.errors, understood: b.understood };
}

function kindPaths(d: SpecDraft): string[] {
  return modelOf(d.kind).paths(d[d.kind]);
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
