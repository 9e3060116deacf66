import type { Finding } from '../result';
import { formatQuantity, significant } from '../format';
import type { ExtensionDesign } from '../springs/extension/design';
import type { ExtensionReport } from '../springs/extension/report';
import { loopPositionTolerance } from '../tolerances';
import { add, fatigueFix, fatigueWords, NO_FATIGUE_DATA_FIX, noFatigueData, reviewIndex, reviewScope13906, reviewServiceTemperature } from './common';
import { hasSteelFatigueData } from '../springs/fatigue';
import type { Sink } from './common';
import { reviewLimits as lim } from './limits';

function reviewInitialTension(x: ExtensionDesign, r: ExtensionReport, out: Sink): void {
  const u = x.units;
  const { min, max } = r.initialTensionStressRange;
  const shown = formatQuantity(r.initialTensionStress, 'stress', u);
  const window = `${formatQuantity(min, 'stress', u)}–${formatQuantity(max, 'stress', u)}`;
  if (r.initialTensionProposed) {
    add(out, 'note', 'initial-tension-proposed', 'initialTension',
      `initial tension not given: ${formatQuantity(r.initialTension, 'force', u)} proposed (stress ${shown}, the centre of the preferred ${window} for index ${significant(r.springIndex)})`);
  } else if (r.initialTensionStress > max) {
    add(out, 'warning', 'initial-tension-too-high', 'initialTension',
      `initial-tension stress ${shown} is above the preferred ${window} for index ${significant(r.springIndex)}: hard to coil in and to hold (the window is a preferred range, not a limit)`,
      'lower the initial tension, or raise the index; otherwise confirm on first pieces');
  } else if (r.initialTensionStress < min) {
    add(out, 'warning', 'initial-tension-too-low', 'initialTension',
      `initial-tension stress ${shown} is below the preferred ${window}: the coils will not hold together reliably, and stress relief lowers it further`,
      'raise the initial tension, or accept an open-wound tolerance on it');
  }
}

function reviewStresses(x: ExtensionDesign, r: ExtensionReport, out: Sink): void {
  const u = x.units;
  const largest = r.loads.reduce<{ i: number; force: number }>((m, l, i) => (l.force > m.force ? { i, force: l.force } : m), { i: -1, force: r.initialTension });
  const path = largest.i >= 0 ? `loads[${largest.i}].length` : 'initialTension';
  const checks: [string, number, number, string][] = [
    ['body', r.bodyStress, r.allowables.body, 'body-stress-over-allowable'],
    ['hook torsion (section B)', r.hookTorsionStress, r.allowables.hookTorsion, 'hook-torsion-over-allowable'],
    ['hook bending (section A)', r.hookBendingStress, r.allowables.hookBending, 'hook-bending-over-allowable'],
  ];
  for (const [name, stress, allowable, code] of checks) {
    if (stress <= allowable) continue;
    add(out, 'error', code, path,
      `${name} stress ${formatQuantity(stress, 'stress', u)} at the largest load is over the allowable ${formatQuantity(allowable, 'stress', u)}`,
      'reduce the extension or the force, use heavier wire, or a larger hook bend radius');
  }
  if (r.governing !== 'body') {
    add(out, 'note', 'hook-governs', 'ends',
      `the hooks (${r.governing === 'hook-bending' ? 'bending at section A' : 'torsion at section B'}) reach their allowable before the body: safe to ${formatQuantity(r.maximumSafeLength, 'length', u)}`);
  }
}

/** A drawing length within 2 % of what the coils make is taken as agreeing (common practice). */
const DRAWING_LENGTH_MATCH = 0.02;

function reviewGeometry(x: ExtensionDesign, r: ExtensionReport, out: Sink): void {
  const u = x.units;
  r.loads.forEach((l, i) => {
    if (l.length <= r.freeLength) {
      add(out, 'error', 'load-length-not-above-free-length', `loads[${i}].length`,
        `length ${formatQuantity(l.length, 'length', u)} is not longer than the free length inside the ends ${formatQuantity(r.freeLength, 'length', u)}`,
        'give lengths inside the ends, longer than the free length');
    }
    if (l.withinTolerance === false && l.specifiedForce !== null) {
      add(out, 'error', 'load-outside-tolerance', `loads[${i}].force`,
        `force at ${formatQuantity(l.length, 'length', u)} is ${formatQuantity(l.force, 'force', u)}; the drawing asks ${formatQuantity(l.specifiedForce, 'force', u)} ±${l.tolerancePercent} %`,
        'adjust the body coils or the initial tension');
    }
  });
  if (x.duty.type === 'cyclic') {
    x.duty.between.forEach((length, i) => {
      if (length > r.freeLength) return;
      add(out, 'error', 'duty-length-not-above-free-length', `duty.between[${i}]`,
        `working length ${formatQuantity(length, 'length', u)} is not longer than the free length inside the ends ${formatQuantity(r.freeLength, 'length', u)}: a close-wound spring does not cycle there`,
        'give working lengths inside the ends, longer than the free length');
    });
  }
  if (r.specifiedFreeLength !== null && Math.abs(r.specifiedFreeLength - r.freeLength) > DRAWING_LENGTH_MATCH * r.freeLength) {
    add(out, 'warning', 'free-length-mismatch', 'freeLength',
      `the drawing's free length ${formatQuantity(r.specifiedFreeLength, 'length', u)} differs from the ${formatQuantity(r.freeLength, 'length', u)} the body and ends make`,
      'change the body coils or the loop heights, or make the free length a reference dimension');
  }
  if (x.specifiedBodyLength !== null && Math.abs(x.specifiedBodyLength - r.bodyLength) > DRAWING_LENGTH_MATCH * r.bodyLength) {
    add(out, 'warning', 'body-length-mismatch', 'bodyLength',
      `the drawing's body length ${formatQuantity(x.specifiedBodyLength, 'length', u)} differs from (Nb + 1)·d = ${formatQuantity(r.bodyLength, 'length', u)}`,
      `${(x.specifiedBodyLength / x.d - 1).toFixed(1)} body coils give that body length close-wound`);
  }
  x.ends.forEach((end, i) => {
    if (!end.bendRadiusAssumed && end.bendRadius < lim.minimumHookBendRadius * x.d) {
      add(out, 'warning', 'hook-bend-tight', `ends[${i}].bendRadius`,
        `hook bend radius ${formatQuantity(end.bendRadius, 'length', u)} is under ${lim.minimumHookBendRadius}·d: the hook is highly stressed and may crack`,
        'open the bend radius');
    }
  });
  if (r.hookBendRadiusAssumed) {
    add(out, 'note', 'hook-bend-assumed', 'ends',
      `hook side-bend radius not given: ${formatQuantity(r.hookBendRadius, 'length', u)} (2·d) assumed for the hook stress`);
  }
}

function reviewUse(x: ExtensionDesign, r: ExtensionReport, out: Sink): void {
  if (!x.mechanicalStop) {
    add(out, 'warning', 'no-mechanical-stop', 'mechanicalStop',
      `no mechanical stop noted: an extension spring can be pulled past its safe length (${formatQuantity(r.maximumSafeLength, 'length', x.units)}) and fail at the hook`,
      'ask the customer for a stop in the assembly and note it on the drawing');
  }
  const loop = loopPositionTolerance({ totalCoils: x.nb });
  if (x.loopAngleTolerance !== null && loop.ok && x.loopAngleTolerance < loop.value) {
    add(out, 'warning', 'loop-position-tight', 'loopAngleTolerance',
      `loop position ±${x.loopAngleTolerance}° is tighter than the ±${significant(loop.value)}° the trade holds at ${significant(x.nb)} coils`,
      'accept the trade tolerance, or price for sorting');
  }
  if (x.duty.type === 'cyclic') {
    add(out, 'warning', 'cyclic-extension', 'duty',
      'extension springs in cyclic duty fail at the hooks, which cannot be shot peened: EN 13906-2 advises against it where avoidable',
      'prefer a compression spring in a drawbar, or derate the hook stresses');
    if (!hasSteelFatigueData(x.wire.family)) {
      add(out, 'warning', 'no-fatigue-data', 'duty', noFatigueData(x.wire.gradeName), NO_FATIGUE_DATA_FIX);
      return;
    }
    const f = r.fatigue;
    if (f && f.verdict !== 'pass') {
      add(out, f.verdict === 'fail' ? 'error' : 'warning', `fatigue-${f.verdict}`, 'duty', `body ${fatigueWords(f, x.units)}`, fatigueFix(f, ''));
    }
  }
}

/** The maker's review of an extension spring. */
export function reviewExtension(x: ExtensionDesign, r: ExtensionReport): Finding[] {
  const out: Finding[] = [...x.wireFindings];
  reviewIndex(x, r.springIndex, out);
  reviewInitialTension(x, r, out);
  reviewStresses(x, r, out);
  reviewGeometry(x, r, out);
  reviewUse(x, r, out);
  reviewScope13906(x, r.springIndex, r.activeCoils, 'EN 13906-2', out);
  reviewServiceTemperature(x, out);
  return out;
}
