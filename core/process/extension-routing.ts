import type { ExtensionDesign } from '../springs/extension/design';
import type { ExtensionReport } from '../springs/extension/report';
import { extensionEnds } from '../springs/extension/ends';
import { formatQuantity } from '../format';
import { extensionEndTerms } from '../vocabulary';
import type { Settings } from '../settings/schema';
import type { Operation } from './types';
import { coilerPiecesPerHour, machinePiecesPerHour } from './work-centre';
import type { Draft, RoutingChoices } from './operations';
import { finishOperations, inspect, machineOperation, pack, sequenced, stressRelieve } from './operations';

const endText = (x: ExtensionDesign, i: 0 | 1): string => {
  const e = x.ends[i];
  return `${extensionEndTerms[e.form].short}${e.extension > 0 ? `, straight ${formatQuantity(e.extension, 'length', x.units)}` : ''}`;
};

function coil(settings: Settings, x: ExtensionDesign, r: ExtensionReport, c: RoutingChoices, loopsOnCoiler: boolean): Draft {
  const op = machineOperation(settings, x, 'coil', loopsOnCoiler ? 'Coil close-wound with loops' : 'Coil close-wound', [
    { label: 'Outside diameter', value: r.outerDiameter, quantity: 'length' },
    { label: 'Wire diameter', value: x.d, quantity: 'length' },
    { label: 'Body coils', value: r.bodyCoils, quantity: 'count' },
    { label: 'Initial tension (after stress relief)', value: r.initialTension, quantity: 'force' },
    { label: 'Direction of wind', value: c.directionOfWind },
    { label: 'End 1', value: endText(x, 0) },
    { label: 'End 2', value: endText(x, 1) },
    { label: 'Loop position', value: x.loopAngle === null ? 'as drawn' : `${x.loopAngle}°` },
    { label: 'Wire per piece', value: r.wireLength, quantity: 'length' },
  ], (m) => coilerPiecesPerHour(m, r.wireLength));
  op.notes.push('stress relief lowers the initial tension: coil with a little more and set from the first pieces after the oven');
  return op;
}

function formLoops(settings: Settings, x: ExtensionDesign, r: ExtensionReport): Draft {
  return machineOperation(settings, x, 'loop-form', 'Form loops', [
    { label: 'End 1', value: endText(x, 0) },
    { label: 'End 2', value: endText(x, 1) },
    { label: 'Loop inside height', value: r.loopHeights[0], quantity: 'length' },
    { label: 'Side-bend radius', value: r.hookBendRadius, quantity: 'length' },
  ], machinePiecesPerHour);
}

/** The operations an extension spring needs: coil with initial tension, loops, stress relief, finish, load test. No grinding. */
export function extensionRouting(settings: Settings, x: ExtensionDesign, r: ExtensionReport, c: RoutingChoices): Operation[] {
  const loopsOnCoiler = extensionEnds[x.ends[0].form].formedOnCoiler && extensionEnds[x.ends[1].form].formedOnCoiler;
  const drafts: Draft[] = [coil(settings, x, r, c, loopsOnCoiler)];
  if (!loopsOnCoiler) drafts.push(formLoops(settings, x, r));
  drafts.push(stressRelieve(settings, x));
  const finish = finishOperations(x, c);
  if (finish[0]) finish[0].notes.push('never stretch extension springs for plating: plating between opened coils raises the embrittlement risk');
  drafts.push(...finish, inspect(settings, x, 'Load test at length', 'extend once to the largest working length'), pack(settings, x));
  return sequenced(drafts);
}
