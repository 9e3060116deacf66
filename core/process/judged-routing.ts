import type { Finding } from '../result';
import type { JobJudgement } from '../quoting/judgement';
import type { Settings } from '../settings/schema';
import type { Operation, OperationOverride } from './types';

/** An operation the estimator took out of the routing, and why. */
export interface RemovedOperation {
  key: string;
  title: string;
  reason: string;
}

function addedOperation(settings: Settings, id: string, reason: string, path: string, findings: Finding[]): Operation | null {
  const extra = settings.extraOperations.find((e) => e.id === id);
  if (!extra) {
    findings.push({ code: 'unknown-extra-operation', severity: 'error', path,
      message: `the added operation "${id}" is not in the shop's list of extra operations`, fix: 'choose one from Shop settings → Extra operations' });
    return null;
  }
  return {
    sequence: 0, key: `extra:${extra.id}`, kind: 'extra', title: extra.name, workCentre: null, choice: null, outside: false,
    offers: [{ id: extra.id, name: extra.name, hourlyRate: extra.hourlyRate, setupMinutes: extra.setupMinutes,
      piecesPerHour: extra.piecesPerHour, batch: null, scrapFraction: 0, lotCost: null }],
    settings: [], setupMinutes: 0, piecesPerHour: null, batch: null, scrapFraction: 0, notes: [], overrides: [], addedBecause: reason,
  };
}

/**
 * The routing as the estimator has it for this job: operations removed, extra ones added before packing,
 * renumbered 10, 20, 30 …; keys stay as they were so overrides and cost lines keep their meaning.
 */
export function judgedOperations(operations: readonly Operation[], judgement: JobJudgement, settings: Settings, findings: Finding[]) {
  const removed: RemovedOperation[] = [];
  const kept = operations.filter((op) => {
    const o = judgement.routing.find((r) => r.operation === op.key && r.remove);
    if (o) removed.push({ key: op.key, title: op.title, reason: o.reason });
    return !o;
  });
  const added = judgement.added.flatMap((a, i) => addedOperation(settings, a.operation, a.reason, `judgement.added[${i}].operation`, findings) ?? []);
  const packAt = kept.findIndex((op) => op.kind === 'pack');
  const at = packAt < 0 ? kept.length : packAt;
  const all = [...kept.slice(0, at), ...added, ...kept.slice(at)].map((op, i) => ({ ...op, sequence: (i + 1) * 10 }));
  judgement.routing.forEach((o, i) => {
    const op = operations.find((x) => x.key === o.operation);
    if (op && o.machine && !op.offers.some((m) => m.id === o.machine)) {
      findings.push({ code: 'pinned-machine-cannot-run', severity: 'warning', path: `judgement.routing[${i}].machine`,
        message: `${op.title}: the pinned machine "${o.machine}" is not set up for it or does not take the wire; the cheapest machine that can is planned`,
        fix: 'pin a machine that takes the wire, or remove the pin' });
    }
    if (!op) {
      findings.push({ code: 'override-unknown-operation', severity: 'warning', path: `judgement.routing[${i}].operation`,
        message: `the routing has no operation "${o.operation}": its override does nothing`, fix: 'remove the override or name an operation of this routing' });
    }
  });
  return { operations: all, removed };
}

/** Machine pins by operation key, for the work-centre choice. */
export const pinsOf = (judgement: JobJudgement): Record<string, string> =>
  Object.fromEntries(judgement.routing.flatMap((o) => (o.machine ? [[o.operation, o.machine]] : [])));

/** Set-up, run rate and scrap as the estimator set them, each with the shop's figure beside it. */
export function withRunOverrides(operations: readonly Operation[], judgement: JobJudgement): Operation[] {
  return operations.map((op) => {
    const o = judgement.routing.find((r) => r.operation === op.key);
    if (!o) return op;
    const overrides: OperationOverride[] = [];
    const next: Operation = { ...op };
    if (o.machine && op.choice?.basis === 'pinned' && op.workCentre) {
      const best = op.offers.filter((x) => x.lotCost !== null).sort((a, b) => a.lotCost! - b.lotCost!)[0];
      overrides.push({ field: 'machine', value: op.workCentre.name, shopDefault: best?.name ?? null, reason: o.reason });
    }
    if (o.setupMinutes !== undefined) {
      overrides.push({ field: 'setupMinutes', value: o.setupMinutes, shopDefault: op.setupMinutes, reason: o.reason });
      next.setupMinutes = o.setupMinutes;
    }
    if (o.piecesPerHour !== undefined) {
      overrides.push({ field: 'piecesPerHour', value: o.piecesPerHour, shopDefault: op.piecesPerHour, reason: o.reason });
      next.piecesPerHour = o.piecesPerHour;
      next.batch = null;
    }
    if (o.scrapPercent !== undefined) {
      overrides.push({ field: 'scrapPercent', value: o.scrapPercent, shopDefault: op.scrapFraction * 100, reason: o.reason });
      next.scrapFraction = o.scrapPercent / 100;
    }
    return { ...next, overrides };
  });
}
