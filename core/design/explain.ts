import type { UnitSystem } from '../units';

type RequirementInternal = { units: UnitSystem };
import type { Quantity } from '../units';
import { fromInternal, unitSymbol } from '../units';
import { significant } from '../format';
import { findGrade } from '../materials';
import type { Closest } from './closest';
import type { Miss } from './misses';
import { limitLabels } from './misses';
import type { Infeasibility, LimitMiss } from './types';

const shown = (v: number, q: Quantity, req: RequirementInternal) => (q === 'temperature' ? v : fromInternal(v, q, req.units));

export function limitMiss(m: Miss, req: RequirementInternal): LimitMiss {
  const value = shown(m.value, m.quantity, req);
  const bound = shown(m.bound, m.quantity, req);
  const unit = unitSymbol(m.quantity, req.units);
  const by = Math.abs(value - bound);
  const byPercent = (100 * Math.abs(m.value - m.bound)) / Math.max(Math.abs(m.bound), 1e-12);
  const label = limitLabels[m.limit];
  const u = unit ? ` ${unit}` : '';
  const message = m.note ?? (m.sense === 'max'
    ? `${label}: ${significant(value)}${u} is over the limit ${significant(bound)}${u} by ${significant(by)}${u} (${significant(byPercent, 2)} %)`
    : `${label}: ${significant(value)}${u} is under the limit ${significant(bound)}${u} by ${significant(by)}${u} (${significant(byPercent, 2)} %)`);
  return { limit: m.limit, label, path: m.path, value, bound, unit, by, byPercent, message };
}

function worst(misses: readonly Miss[]): Miss {
  let w = misses[0]!;
  for (const m of misses) if (m.relative > w.relative) w = m;
  return w;
}

/** The answer when no design meets the requirement: the binding limit at the closest point, by how much it misses. */
export function explainInfeasible(req: RequirementInternal, closest: Closest, wires: number, source: string): Infeasibility {
  const limitsHit = [...closest.counts.entries()].sort((a, b) => b[1] - a[1])
    .map(([limit, points]) => ({ limit, label: limitLabels[limit], points }));
  if (wires === 0 || closest.misses.length === 0) {
    const binding: LimitMiss = {
      limit: 'no-wire', label: limitLabels['no-wire'], path: 'choices', value: 0, bound: 1, unit: '', by: 1, byPercent: 100,
      message: source === 'stock' ? 'no wire in the shop\'s stock is of an allowed grade: add stock, allow more grades, or search the standard sizes (choices.wireSizes "priced" or "preferred")'
        : 'no standard wire size of an allowed grade is available: allow more grades or families',
    };
    return { message: `No design: ${binding.message}.`, binding, closest: null, limitsHit };
  }
  const misses = closest.misses.map((m) => limitMiss(m, req));
  const binding = limitMiss(worst(closest.misses), req);
  const p = closest.point;
  const wire = p ? { grade: p.grade, d: p.d } : { grade: closest.wire!.grade.id, d: closest.wire!.d };
  const gradeName = findGrade(wire.grade)?.name ?? wire.grade;
  const d = significant(fromInternal(wire.d, 'length', req.units));
  const where = p
    ? `${gradeName} ${d} ${unitSymbol('length', req.units)} wire, ${p.ends} ends, mean diameter ${significant(fromInternal(p.D, 'length', req.units))} ${unitSymbol('length', req.units)}`
    : `${gradeName} ${d} ${unitSymbol('length', req.units)} wire`;
  const most = limitsHit.slice(0, 3).map((l) => `${l.label} (${l.points})`).join(', ');
  return {
    message: `No design meets the requirement. The binding limit is the ${binding.label}. Closest: ${where}: ${misses.map((m) => m.message).join('; ')}. `
      + `Limits that ruled out the most designs tried: ${most}.`,
    binding,
    closest: {
      material: wire.grade, wireDiameter: fromInternal(wire.d, 'length', req.units),
      meanDiameter: p ? fromInternal(p.D, 'length', req.units) : null, ends: p?.ends ?? null, misses,
    },
    limitsHit,
  };
}
