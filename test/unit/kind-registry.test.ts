import { describe, expect, it } from 'vitest';
import { analyseSpec, calculate } from '../../core/calculate';
import { kindEntryOf } from '../../core/kinds/registry';
import type { KindEntry } from '../../core/kinds/types';
import { planManufacture } from '../../core/process/plan';
import { defaultSettings } from '../../core/settings/schema';
import { parseSpec, specSchema, springKinds } from '../../core/spec';
import type { Spec, SpecInput, SpringKind } from '../../core/spec';
import { kindTerms } from '../../core/vocabulary';
import { drawbarExtension, lidTorsion, valveSpringMetric } from '../fixtures/specs';

const examples: Record<SpringKind, SpecInput> = { compression: valveSpringMetric, extension: drawbarExtension, torsion: lidTorsion };

function specOf(kind: SpringKind): Spec {
  const parsed = parseSpec(examples[kind]);
  if (!parsed.ok) throw new Error(JSON.stringify(parsed.errors));
  return parsed.value;
}

/** Every entry of the registry, by name, so a part added to KindEntry without a line here fails the list check below. */
const entryParts = [
  'schema', 'specErrors', 'specQuantities', 'design', 'analyse', 'review', 'reportQuantities', 'routing', 'inspection',
  'freeLengths', 'drawing', 'diagram', 'drawingOptions', 'document', 'shape',
] as const satisfies readonly (keyof KindEntry<SpringKind>)[];

describe('the kind registry has every entry for every kind', () => {
  it('lists the kinds the spec schema knows, and nothing else', () => {
    expect([...springKinds].sort()).toEqual(specSchema.options.map((o) => o.shape.kind.value).sort());
  });

  it.each(springKinds)('%s: every entry is present and does its part for an example spring', (kind) => {
    const entry = kindEntryOf(kind);
    expect(Object.keys(entry).sort()).toEqual([...entryParts].sort());
    const spec = specOf(kind);

    expect(entry.schema.safeParse(examples[kind]).success).toBe(true);
    expect(entry.specErrors(spec)).toEqual([]);
    expect(Object.keys(entry.specQuantities)).toContain('wireDiameter');

    const design = entry.design(spec);
    expect(design).toBeDefined();
    const report = entry.analyse(design!);
    expect(report.kind).toBe(kind);
    expect(Array.isArray(entry.review(design!, report))).toBe(true);
    expect(Object.keys(entry.reportQuantities)).toContain('wireDiameter');

    const plan = planManufacture(spec, defaultSettings(), 100);
    expect(plan.kind).toBe(kind);
    expect(plan.operations.length).toBeGreaterThan(0);
    expect(plan.inspection.characteristics.length).toBeGreaterThan(0);
    const lengths = entry.freeLengths(report);
    expect(lengths.coiled === null || lengths.coiled >= (lengths.finished ?? 0)).toBe(true);

    expect(entry.drawing(report, entry.drawingOptions(spec))).toMatch(/^<svg/);
    expect(entry.diagram(report, {})).toMatch(/^<svg/);
    expect(entry.document.heading).toMatch(/spring$/);
    expect(entry.document.diagramCaption).not.toBe('');
    expect(entry.document.fields(spec, report, defaultSettings()).length).toBeGreaterThan(5);

    expect(Number.isFinite(entry.shape.length(report))).toBe(true);
    expect(entry.shape.rate(report)).toBeGreaterThan(0);
    expect(kindTerms[kind].label).not.toBe('');
  });

  it('calculate and analyseSpec dispatch by kind through the registry', () => {
    for (const kind of springKinds) {
      const result = calculate(examples[kind]);
      expect(result.ok && result.value.kind).toBe(kind);
      expect(analyseSpec(specOf(kind)).kind).toBe(kind);
    }
  });

  it('compares each kind on its own length and rate: torsion on body length and rate per degree', () => {
    const torsion = kindEntryOf('torsion').shape;
    const report = analyseSpec(specOf('torsion'));
    expect(report.kind).toBe('torsion');
    if (report.kind !== 'torsion') return;
    expect(torsion.length(report)).toBe(report.bodyLength);
    expect(torsion.rate(report)).toBe(report.ratePerDegree);
    expect(torsion.rateQuantity).toBe('torqueRatePerDegree');
    expect(kindEntryOf('compression').shape.rateQuantity).toBe('rate');
  });
});

describe("the renderer's tables have every entry for every kind", () => {
  it.each(springKinds)('%s: draft part, form sections, key figures, stress bars and load rows', async (kind) => {
    const { kindDraftModels } = await import('../../renderer/model/kind-drafts');
    const { kindScreenOf } = await import('../../renderer/screens/workspace/kinds/kind-screens');
    const { draftFromSpec, draftToRaw } = await import('../../renderer/model/spec-draft');
    const model = kindDraftModels[kind];
    expect(Object.keys(model).sort()).toEqual(['empty', 'fromSpec', 'paths', 'toRaw']);
    const spec = specOf(kind);
    const draft = draftFromSpec(spec);
    expect(draft[kind]).toEqual(model.fromSpec(spec as never));
    expect(model.paths(model.empty() as never).length).toBeGreaterThan(3);
    expect(draftToRaw(draft).errors).toEqual([]);

    const screen = kindScreenOf(kind);
    expect(Object.keys(screen).sort()).toEqual(['Sections', 'loadRows', 'readouts', 'stressBars']);
    expect(screen.Sections).toBeDefined();
    const report = analyseSpec(spec);
    expect(screen.readouts(report as never).length).toBeGreaterThan(5);
    expect(screen.stressBars(report as never).length).toBeGreaterThan(0);
    expect(screen.loadRows(report as never).length).toBe(report.loads.length);
  });
});
