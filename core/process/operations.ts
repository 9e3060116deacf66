import type { CoilBody } from '../springs/coil-body';
import type { Finish, Settings } from '../settings/schema';
import type { Operation, OperationSetting } from './types';
import { chooseMachine, machinePiecesPerHour } from './work-centre';
import { bakeGuidance } from '../finishing/bake';
import { formatQuantity } from '../format';

/** Operations every kind of spring shares: stress relief, peening, finishing and bake, inspection, packing. */
/** Job-level choices the routing depends on (from the spec's order fields). */
export interface RoutingChoices {
  directionOfWind: 'right' | 'left' | 'either';
  shotPeen: boolean;
  finish: Finish | null;
  bakeSpecification: string | null;
  startQuantity: number;
}

export type Draft = Omit<Operation, 'sequence'>;

const scrapOf = (settings: Settings, key: string): number => (settings.costing.scrapPercentByOperation[key] ?? 0) / 100;

export function machineOperation(
  settings: Settings, x: CoilBody, kind: Operation['kind'] & string, title: string,
  opSettings: OperationSetting[], piecesPerHour: (m: NonNullable<ReturnType<typeof chooseMachine>>) => number | null,
): Draft {
  const machine = kind === 'finish' || kind === 'bake' || kind === 'inspect' ? null : chooseMachine(settings.machines, kind, x.d);
  const manual = kind === 'pack' || kind === 'load-test' || kind === 'finish' || kind === 'bake' || kind === 'inspect';
  const notes = machine || manual ? [] : [`no ${kind} machine in the shop's list takes ${formatQuantity(x.d, 'length', x.units)} wire`];
  return {
    kind, title, workCentre: machine && { id: machine.id, name: machine.name }, outside: false, settings: opSettings,
    setupMinutes: machine?.setupMinutes ?? 0, piecesPerHour: machine ? piecesPerHour(machine) : null,
    batch: null, scrapFraction: scrapOf(settings, kind), notes,
  };
}

export function stressRelieve(settings: Settings, x: CoilBody, c: RoutingChoices): Draft {
  const op = machineOperation(settings, x, 'stress-relieve', 'Stress relieve', [
    { label: 'Temperature', value: x.wire.stressRelief.temperature, quantity: 'temperature' },
    { label: 'Time at temperature', value: x.wire.stressRelief.minutes, quantity: 'minutes' },
    { label: 'Coil diameter in the oven', value: x.wire.stressRelief.diameterChange },
  ], () => null);
  const oven = chooseMachine(settings.machines, 'stress-relieve', x.d);
  if (oven?.batch) {
    op.batch = { ...oven.batch, batches: Math.ceil(c.startQuantity / oven.batch.capacityPieces) };
  }
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

export function finishOperations(x: CoilBody, c: RoutingChoices): Draft[] {
  const f = c.finish;
  if (!f) return [];
  const finish: Draft = {
    kind: 'finish', title: `Finish: ${f.name}`, workCentre: null, outside: true,
    settings: [{ label: 'Vendor', value: f.vendor || '(to be chosen)' }],
    setupMinutes: 0, piecesPerHour: null, batch: null, scrapFraction: 0, notes: [],
  };
  if (!f.electroplated) return [finish];
  finish.notes.push('stress relieve before plating; hydrogen embrittlement risk on high-strength wire');
  const guidance = bakeGuidance(x.wire.tensileStrength);
  const bake: Draft = {
    kind: 'bake', title: 'Hydrogen-embrittlement relief bake', workCentre: null, outside: true,
    settings: [
      { label: 'Bake specification', value: c.bakeSpecification ?? 'NOT NAMED: ask the customer' },
      ...(guidance.ok ? guidance.value.map((g) => ({ label: `${g.title} says`, value: g.says })) : []),
    ],
    setupMinutes: 0, piecesPerHour: null, batch: null, scrapFraction: 0,
    notes: ['the tool lists what each specification says and never picks one: the named specification governs',
      'start the bake within the specification\'s window after plating'],
  };
  return [finish, bake];
}

export function inspect(settings: Settings, x: CoilBody, title = 'Inspect: loads and dimensions', first = 'compress once to solid'): Draft {
  return machineOperation(settings, x, 'load-test', title, [{ label: 'Before measuring', value: first }], machinePiecesPerHour);
}


export function pack(settings: Settings, x: CoilBody): Draft {
  return machineOperation(settings, x, 'pack', 'Pack and label', [], machinePiecesPerHour);
}

/** Numbers the operations 10, 20, 30 … as routings are usually numbered. */
export const sequenced = (drafts: Draft[]): Operation[] => drafts.map((d, i) => ({ ...d, sequence: (i + 1) * 10 }));
