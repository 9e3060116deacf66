import type { CoilBody } from '../springs/coil-body';
import type { Finish, Machine, MachineOperation, Settings } from '../settings/schema';
import type { Operation, OperationSetting } from './types';
import type { WorkCentreOffer } from './work-centre';
import { capableMachines, machinePiecesPerHour } from './work-centre';
import { bakeGuidance, parseBakeCondition, parseBakeSpecification } from '../finishing/bake';
import { formatQuantity } from '../format';
import type { UnitSystem } from '../units';

/** Operations every kind of spring shares: stress relief, peening, finishing and bake, inspection, packing. */
/** Job-level choices the routing depends on (from the spec's order fields). */
export interface RoutingChoices {
  directionOfWind: 'right' | 'left' | 'either';
  shotPeen: boolean;
  finish: Finish | null;
  bakeSpecification: string | null;
}

export type Draft = Omit<Operation, 'sequence' | 'key' | 'overrides'>;

const scrapOf = (settings: Settings, key: string): number => (settings.costing.scrapPercentByOperation[key] ?? 0) / 100;

const MANUAL: ReadonlySet<Operation['kind']> = new Set(['pack', 'load-test', 'finish', 'bake', 'inspect']);

/** What each capable machine would do: its run model; lot costs are filled in once the lot is known. */
function offersFor(settings: Settings, kind: MachineOperation, d: number, piecesPerHour: (m: Machine) => number | null): WorkCentreOffer[] {
  return capableMachines(settings.machines, kind, d).map((m) => ({
    id: m.id, name: m.name, hourlyRate: m.hourlyRate, setupMinutes: m.setupMinutes,
    piecesPerHour: m.batch ? null : piecesPerHour(m),
    batch: m.batch ? { capacityPieces: m.batch.capacityPieces, cycleMinutes: m.batch.cycleMinutes } : null,
    scrapFraction: m.scrapPercent !== undefined ? m.scrapPercent / 100 : scrapOf(settings, kind), lotCost: null,
  }));
}

export function machineOperation(
  settings: Settings, x: CoilBody, kind: Operation['kind'] & string, title: string,
  opSettings: OperationSetting[], piecesPerHour: (m: Machine) => number | null,
): Draft {
  const machineKind = kind === 'finish' || kind === 'bake' || kind === 'inspect' || kind === 'extra' ? null : kind;
  const offers = machineKind ? offersFor(settings, machineKind, x.d, piecesPerHour) : [];
  const notes = offers.length > 0 || MANUAL.has(kind) ? [] : [`no ${kind} machine in the shop's list takes ${formatQuantity(x.d, 'length', x.units)} wire`];
  return {
    kind, title, workCentre: null, choice: null, offers, outside: false, settings: opSettings,
    setupMinutes: 0, piecesPerHour: null, batch: null, scrapFraction: scrapOf(settings, kind), notes,
  };
}

export function stressRelieve(settings: Settings, x: CoilBody): Draft {
  const op = machineOperation(settings, x, 'stress-relieve', 'Stress relieve', [
    { label: 'Temperature', value: x.wire.stressRelief.temperature, quantity: 'temperature' },
    { label: 'Time at temperature', value: x.wire.stressRelief.minutes, quantity: 'minutes' },
    { label: 'Coil diameter in the oven', value: x.wire.stressRelief.diameterChange },
  ], () => null);
  op.notes.push('time is at temperature; add heat-up for batch loads');
  return op;
}

export function peen(settings: Settings, x: CoilBody): Draft {
  const op = machineOperation(settings, x, 'shot-peen', 'Shot peen', [
    { label: 'Coverage', value: 'at least 90 %, inside diameter included' },
    { label: 'Post-peen bake', value: 'at most 250 °C (carbon steel) / 400 °C (stainless)' },
  ], machinePiecesPerHour);
  op.notes.push('intensity by Almen strip per the customer\'s specification (SAE J442/J443)');
  return op;
}

/**
 * The finish, and after electroplating the hydrogen-relief bake: one instruction, the named specification's bake.
 * What the other specifications say stays on the screen; the plater's paper carries only the one that governs.
 */
export function finishOperations(x: CoilBody, c: RoutingChoices): Draft[] {
  const f = c.finish;
  if (!f) return [];
  const finish: Draft = {
    kind: 'finish', title: `Finish: ${f.name}`, workCentre: null, choice: null, offers: [], outside: !f.inHouse,
    settings: f.inHouse ? [] : [{ label: 'Vendor', value: f.vendor || '(to be chosen)' }],
    setupMinutes: 0, piecesPerHour: null, batch: null, scrapFraction: 0, notes: [],
  };
  if (!f.electroplated) return [finish];
  finish.notes.push('stress relieve before plating; hydrogen embrittlement risk on high-strength wire');
  const bake: Draft = {
    kind: 'bake', title: 'Hydrogen-embrittlement relief bake', workCentre: null, choice: null, offers: [], outside: !f.inHouse,
    settings: [{ label: 'Bake', value: bakeInstruction(x.wire.tensileStrength, c.bakeSpecification, x.units) }],
    setupMinutes: 0, piecesPerHour: null, batch: null, scrapFraction: 0,
    notes: ['start the bake within the specification\'s window after plating'],
  };
  return [finish, bake];
}

/** The bake as the order writes it, else what the named specification says for this wire's strength. */
export function bakeInstruction(tensileStrength: number, named: string | null, units: UnitSystem = 'metric'): string {
  if (named === null) return 'NOT NAMED: hold the lot until the customer names the specification';
  const text = named.trim();
  if (parseBakeCondition(text)) return text;
  const id = parseBakeSpecification(text);
  const guidance = bakeGuidance(tensileStrength, { units });
  const says = id && guidance.ok ? guidance.value.find((g) => g.spec === id)?.says : undefined;
  return says ? `${text}: ${says}` : `as ${text} requires`;
}

export function inspect(settings: Settings, x: CoilBody, title = 'Inspect: loads and dimensions', first = 'compress once to solid'): Draft {
  return machineOperation(settings, x, 'load-test', title, [{ label: 'Before measuring', value: first }], machinePiecesPerHour);
}


export function pack(settings: Settings, x: CoilBody): Draft {
  return machineOperation(settings, x, 'pack', 'Pack and label', [], machinePiecesPerHour);
}

/** Numbers the operations 10, 20, 30 … as routings are usually numbered, and keys each by its kind. */
export function sequenced(drafts: Draft[]): Operation[] {
  const seen = new Map<string, number>();
  return drafts.map((d, i) => {
    const n = (seen.get(d.kind) ?? 0) + 1;
    seen.set(d.kind, n);
    return { ...d, sequence: (i + 1) * 10, key: n === 1 ? d.kind : `${d.kind}#${n}`, overrides: [] };
  });
}
