import { designFromRequirement, designPoint, standardWireSizes, meanDiameterGrid, meanDiameterRange, pointSpec, requirementMisses, wireChoices } from '../../core/design';
import { parseRequirement, requirementInternal } from '../../core/requirement';
import type { CompressionRequirement } from '../../core/requirement';
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

function requirement(): CompressionRequirement {
  const r = parseRequirement(raw);
  if (!r.ok || r.value.kind !== 'compression') throw new Error(JSON.stringify(r));
  return r.value;
}

/** The same space with the full engine (spec, analysis, review, requirement check) at every grid point. */
function engineEverywhere(r: CompressionRequirement, settings: Settings): number {
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

/** Mean CPU time (user + system) of one call after a warm-up, so other programs on the machine do not count. */
function cpuMilliseconds(fn: () => void, count: number): number {
  for (let i = 0; i < 3; i++) fn();
  const start = process.cpuUsage();
  for (let i = 0; i < count; i++) fn();
  const used = process.cpuUsage(start);
  return (used.user + used.system) / 1000 / count;
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
    const searchOnce = () => { const a = designFromRequirement(raw, settings); if (a.ok) sink += a.value.candidates.length; };
    const search = latencies(searchOnce, 40);
    const searchCpu = cpuMilliseconds(searchOnce, 40);
    const bruteOnce = () => { sink += engineEverywhere(r, settings); };
    const brute = latencies(bruteOnce, 3);
    const bruteCpu = cpuMilliseconds(bruteOnce, 3);
    if (sink === -1) console.log('');
    return [
      { suite: 'design', name: `space: ${s.wires} grade × size pairs (${standardWireSizes.sizes.length} sizes, every grade) × 4 end types; ${s.points} diameter points walked`, value: s.points, unit: 'points' },
      { suite: 'design', name: 'whole search, ranked and costed: CPU time on one core', value: searchCpu, unit: 'ms', target: '< 50', pass: searchCpu < 50 },
      { suite: 'design', name: 'whole search, wall clock (p50, shared machine)', value: search.p50, unit: 'ms' },
      { suite: 'design', name: 'full engine at every grid point of the envelope: CPU time', value: bruteCpu, unit: 'ms' },
      { suite: 'design', name: 'full engine everywhere, wall clock (p50)', value: brute.p50, unit: 'ms' },
      { suite: 'design', name: 'speed-up over the full engine everywhere (CPU)', value: bruteCpu / searchCpu, unit: '×' },
      { suite: 'design', name: 'designs found / engine runs / costed', value: first.value.feasibleCount, unit: `found (${s.engineRuns} engine runs, ${s.costed} costed)` },
    ];
  },
};
