import { designFromRequirement, designPoint, meanDiameterGrid, meanDiameterRange, pointSpec, requirementMisses, wireChoices } from '../../core/design';
import { parseRequirement, requirementInternal } from '../../core/requirement';
import type { Requirement } from '../../core/requirement';
import { settingsSchema } from '../../core/settings/schema';
import type { Settings } from '../../core/settings/schema';
import { wireProperties } from '../../core/materials';
import { analyseSpec } from '../../core/calculate';
import { endForms } from '../../core/springs/compression/ends';
import { demoSettings } from '../../db/demo/shop';
import type { BenchRow, BenchSuite } from '../harness';
import { latencies } from '../harness';

/** DEMO DATA: an invented seat spring asked of every standard size in every grade, with all four end types. */
const raw = {
  kind: 'compression', units: 'metric', reference: 'DEMO bench requirement',
  envelope: { bore: 32, rod: 10, maxFreeLength: 120, maxSolidLength: 50 },
  function: { type: 'two-loads', loads: [{ length: 70, force: 150 }, { length: 55, force: 300 }] },
  duty: { type: 'cyclic', between: [70, 55], cycles: 2e6, peeningAllowed: false },
  choices: { wireSizes: 'preferred', ends: ['closed-ground', 'closed', 'open-ground', 'open'], quantities: [1000] },
};

function requirement(): Requirement {
  const r = parseRequirement(raw);
  if (!r.ok) throw new Error(JSON.stringify(r.errors));
  return r.value;
}

/** The same space with the full engine (spec, analysis, review, requirement check) at every grid point. */
function engineEverywhere(r: Requirement, settings: Settings): number {
  const req = requirementInternal(r);
  let feasible = 0;
  for (const wire of wireChoices(req, settings)) {
    const props = wireProperties(wire.grade.id, wire.d)!.props;
    const grid = meanDiameterGrid(meanDiameterRange(req, wire.d), settings.design.diameterStep);
    for (const ends of req.ends) {
      for (const D of grid) {
        const p = designPoint(req, props, wire.grade.id, wire.d, D, ends, endForms[ends].inactiveCoils, settings.design, false);
        if (requirementMisses(req, analyseSpec(pointSpec(r, p))).length === 0) feasible++;
      }
    }
  }
  return feasible;
}

export const designSuite: BenchSuite = {
  name: 'design',
  run(): BenchRow[] {
    const settings = settingsSchema.parse(demoSettings);
    const r = requirement();
    const first = designFromRequirement(raw, settings);
    if (!first.ok) throw new Error(JSON.stringify(first.errors));
    const s = first.value.searched;
    let sink = 0;
    const search = latencies(() => { const a = designFromRequirement(raw, settings); if (a.ok) sink += a.value.candidates.length; }, 40);
    const brute = latencies(() => { sink += engineEverywhere(r, settings); }, 5);
    if (sink === -1) console.log('');
    return [
      { suite: 'design', name: `space: ${s.wires} wires × 4 end types, ${s.points} diameter points`, value: s.points, unit: 'points' },
      { suite: 'design', name: 'whole search, ranked and costed (p50)', value: search.p50, unit: 'ms', target: '< 50', pass: search.p50 < 50 },
      { suite: 'design', name: 'whole search (p95)', value: search.p95, unit: 'ms' },
      { suite: 'design', name: 'full engine at every grid point (p50)', value: brute.p50, unit: 'ms' },
      { suite: 'design', name: 'speed-up over the full engine everywhere', value: brute.p50 / search.p50, unit: '×' },
      { suite: 'design', name: 'designs found / engine runs / costed', value: first.value.feasibleCount, unit: `found (${s.engineRuns} engine runs, ${s.costed} costed)` },
    ];
  },
};
