import type { CompressionDesign } from '../springs/compression/design';
import type { CompressionReport } from '../springs/compression/report';
import { endForms } from '../springs/compression/ends';
import type { Finish, Settings } from '../settings/schema';
import type { Operation, OperationSetting } from './types';
import { chooseMachine, coilerPiecesPerHour, machinePiecesPerHour } from './work-centre';

/** Job-level choices the routing depends on (from the spec's order fields). */
export interface RoutingChoices {
  directionOfWind: 'right' | 'left' | 'either';
  shotPeen: boolean;
  finish: Finish | null;
  bakeSpecification: string | null;
  startQuantity: number;
}

type Draft = Omit<Operation, 'sequence'>;

const scrapOf = (settings: Settings, key: string): number => (settings.costing.scrapPercentByOperation[key] ?? 0) / 100;

function machineOperation(
  settings: Settings, x: CompressionDesign, kind: Operation['kind'] & string, title: string,
  opSettings: OperationSetting[], piecesPerHour: (m: NonNullable<ReturnType<typeof chooseMachine>>) => number | null,
): Draft {
  const machine = kind === 'finish' || kind === 'bake' || kind === 'inspect' ? null : chooseMachine(settings.machines, kind, x.d);
  const manual = kind === 'pack' || kind === 'load-test' || kind === 'finish' || kind === 'bake' || kind === 'inspect';
  const notes = machine || manual ? [] : [`no ${kind} machine in the shop's list takes ${x.d.toFixed(2)} mm wire`];
  return {
    kind, title, workCentre: machine && { id: machine.id, name: machine.name }, outside: false, settings: opSettings,
    setupMinutes: machine?.setupMinutes ?? 0, piecesPerHour: machine ? piecesPerHour(machine) : null,
    batch: null, scrapFraction: scrapOf(settings, kind), notes,
  };
}

function coil(settings: Settings, x: CompressionDesign, r: CompressionReport, c: RoutingChoices): Draft {
  const coiledLength = r.setRemoval.required && r.setRemoval.coiledFreeLength !== null ? r.setRemoval.coiledFreeLength : r.freeLength;
  const op = machineOperation(settings, x, 'coil', 'Coil and cut off', [
    { label: 'Outside diameter', value: r.outerDiameter, quantity: 'length' },
    { label: 'Wire diameter', value: x.d, quantity: 'length' },
    { label: 'Total coils', value: r.totalCoils, quantity: 'count' },
    { label: 'Active coils', value: r.activeCoils, quantity: 'count' },
    { label: 'Pitch (active coils)', value: r.pitch, quantity: 'length' },
    { label: 'Ends', value: x.ends },
    { label: 'Direction of wind', value: c.directionOfWind },
    { label: 'Coiled free length', value: coiledLength, quantity: 'length' },
    { label: 'Wire per piece', value: r.wireLength, quantity: 'length' },
  ], (m) => coilerPiecesPerHour(m, r.wireLength));
  if (coiledLength > r.freeLength) op.notes.push('coiled long by the set-removal allowance: confirm on first pieces');
  const shift = x.wire.stressRelief.diameterChange;
  if (shift !== 'unknown') {
    op.notes.push(`the diameter ${shift} in stress relief: set the coiler ${shift === 'closes' ? 'over' : 'under'} size and check after the oven`);
  }
  return op;
}

function stressRelieve(settings: Settings, x: CompressionDesign, c: RoutingChoices): Draft {
  const op = machineOperation(settings, x, 'stress-relieve', 'Stress relieve', [
    { label: 'Temperature', value: x.wire.stressRelief.temperature, quantity: 'temperature' },
    { label: 'Time at temperature (min)', value: x.wire.stressRelief.minutes },
    { label: 'Coil diameter in the oven', value: x.wire.stressRelief.diameterChange },
  ], () => null);
  const oven = chooseMachine(settings.machines, 'stress-relieve', x.d);
  if (oven?.batch) {
    op.batch = { ...oven.batch, batches: Math.ceil(c.startQuantity / oven.batch.capacityPieces) };
  }
  op.notes.push('time is at temperature; add heat-up for batch loads');
  return op;
}

function grind(settings: Settings, x: CompressionDesign, r: CompressionReport): Draft {
  return machineOperation(settings, x, 'grind', 'Grind ends', [
    { label: 'Free length after grinding', value: r.setRemoval.required && r.setRemoval.coiledFreeLength !== null ? r.setRemoval.coiledFreeLength : r.freeLength, quantity: 'length' },
    { label: 'End tip thickness (about d/4)', value: x.d / 4, quantity: 'length' },
    { label: 'Entry gap over exit (¼–½ d)', value: `${(x.d / 4).toFixed(2)}–${(x.d / 2).toFixed(2)} mm` },
  ], machinePiecesPerHour);
}

function presetToSolid(settings: Settings, x: CompressionDesign, r: CompressionReport): Draft {
  const op = machineOperation(settings, x, 'set', 'Set removal (press to solid)', [
    { label: 'Press to', value: r.solidLength, quantity: 'length' },
    { label: 'Strokes', value: 3, quantity: 'count' },
    { label: 'Expected set', value: r.setRemoval.expectedSet ?? 0, quantity: 'length' },
    { label: 'Free length after set', value: r.freeLength, quantity: 'length' },
  ], machinePiecesPerHour);
  op.notes.push('stored energy: press in a guarded fixture');
  return op;
}

function peen(settings: Settings, x: CompressionDesign): Draft {
  const op = machineOperation(settings, x, 'shot-peen', 'Shot peen', [
    { label: 'Coverage', value: 'at least 90 %, inside diameter included' },
    { label: 'Post-peen bake', value: 'at most 250 °C (carbon steel) / 400 °C (stainless)' },
  ], machinePiecesPerHour);
  op.notes.push('intensity by Almen strip per the customer\'s specification (SAE J442/J443)');
  return op;
}

function finishOperations(x: CompressionDesign, c: RoutingChoices): Draft[] {
  const f = c.finish;
  if (!f) return [];
  const finish: Draft = {
    kind: 'finish', title: `Finish: ${f.name}`, workCentre: null, outside: true,
    settings: [{ label: 'Vendor', value: f.vendor || '(to be chosen)' }],
    setupMinutes: 0, piecesPerHour: null, batch: null, scrapFraction: 0, notes: [],
  };
  if (!f.electroplated) return [finish];
  finish.notes.push('stress relieve before plating; hydrogen embrittlement risk on high-strength wire');
  const bake: Draft = {
    kind: 'bake', title: 'Hydrogen-embrittlement relief bake', workCentre: null, outside: true,
    settings: [{ label: 'Bake specification', value: c.bakeSpecification ?? f.bakeSpecification ?? 'NOT NAMED — ask the customer' }],
    setupMinutes: 0, piecesPerHour: null, batch: null, scrapFraction: 0,
    notes: [`wire tensile strength ${x.wire.tensileStrength.toFixed(0)} MPa: start the bake within the specification's window after plating`],
  };
  return [finish, bake];
}

function inspect(settings: Settings, x: CompressionDesign): Draft {
  return machineOperation(settings, x, 'load-test', 'Inspect: loads and dimensions', [
    { label: 'Before measuring', value: 'compress once to solid' },
  ], machinePiecesPerHour);
}

/** The operations a compression spring needs, in shop order (shop-practice sequence: coil … inspect, pack). */
export function compressionRouting(settings: Settings, x: CompressionDesign, r: CompressionReport, c: RoutingChoices): Operation[] {
  const drafts: Draft[] = [coil(settings, x, r, c), stressRelieve(settings, x, c)];
  if (endForms[x.ends].ground) drafts.push(grind(settings, x, r));
  if (c.shotPeen) drafts.push(peen(settings, x));
  if (r.setRemoval.required) drafts.push(presetToSolid(settings, x, r));
  drafts.push(...finishOperations(x, c), inspect(settings, x));
  drafts.push(machineOperation(settings, x, 'pack', 'Pack and label', [], machinePiecesPerHour));
  return drafts.map((d, i) => ({ ...d, sequence: (i + 1) * 10 }));
}
