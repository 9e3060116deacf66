import type { CompressionDesign } from '../springs/compression/design';
import type { CompressionReport } from '../springs/compression/report';
import { endForms } from '../springs/compression/ends';
import type { Settings } from '../settings/schema';
import type { Operation } from './types';
import { coilerPiecesPerHour, machinePiecesPerHour } from './work-centre';
import type { Draft, RoutingChoices } from './operations';
import { finishOperations, inspect, machineOperation, pack, peen, sequenced, stressRelieve } from './operations';

function coil(settings: Settings, x: CompressionDesign, r: CompressionReport, c: RoutingChoices): Draft {
  const k = r.coiler;
  const op = machineOperation(settings, x, 'coil', 'Coil and cut off', [
    { label: 'Outside diameter', value: r.outerDiameter, quantity: 'length' },
    { label: 'Wire diameter', value: x.d, quantity: 'length' },
    { label: 'Total coils', value: k.totalCoils, quantity: 'count' },
    { label: 'Active coils', value: k.activeCoils, quantity: 'count' },
    lengthOrHeld('Pitch as coiled', k.pitch),
    { label: 'Ends', value: x.ends },
    { label: 'Direction of wind', value: c.directionOfWind },
    lengthOrHeld('Coiled free length', k.freeLength),
    { label: 'Wire per piece', value: k.wireLength, quantity: 'length' },
  ], (m) => coilerPiecesPerHour(m, k.wireLength));
  if (k.freeLength === null) op.notes.push('HOLD: no coiled free length within the set-removal limits; see the findings before coiling');
  else if (k.freeLength > r.freeLength) op.notes.push('coiled long by the set-removal allowance: confirm on first pieces');
  const shift = x.wire.stressRelief.diameterChange;
  if (shift !== 'unknown') {
    op.notes.push(`the diameter ${shift} in stress relief: set the coiler ${shift === 'closes' ? 'over' : 'under'} size and check after the oven`);
  }
  return op;
}

/** A length the floor reads, or a hold when the analysis found none within its limits (never a made-up number). */
function lengthOrHeld(label: string, value: number | null): Draft['settings'][number] {
  return value === null ? { label, value: 'not set: see findings' } : { label, value, quantity: 'length' };
}

function grind(settings: Settings, x: CompressionDesign, r: CompressionReport): Draft {
  return machineOperation(settings, x, 'grind', 'Grind ends', [
    lengthOrHeld('Free length after grinding', r.coiler.freeLength),
    { label: 'End tip thickness (about d/4)', value: x.d / 4, quantity: 'length' },
    { label: 'Entry gap over exit, from (¼ d)', value: x.d / 4, quantity: 'length' },
    { label: 'Entry gap over exit, to (½ d)', value: x.d / 2, quantity: 'length' },
  ], machinePiecesPerHour);
}

export { SET_STROKES } from '../springs/compression/set-removal';

function presetToSolid(settings: Settings, x: CompressionDesign, r: CompressionReport): Draft {
  const op = machineOperation(settings, x, 'set', 'Set removal (press to solid)', [
    { label: 'Press to', value: r.solidLength, quantity: 'length' },
    { label: 'Strokes', value: r.coiler.pressStrokes, quantity: 'count' },
    { label: 'Expected set', value: r.coiler.expectedSet, quantity: 'length' },
    { label: 'Free length after set', value: r.freeLength, quantity: 'length' },
  ], machinePiecesPerHour);
  op.notes.push('stored energy: press in a guarded fixture');
  return op;
}

/** The operations a compression spring needs, in shop order (shop-practice sequence: coil … inspect, pack). */
export function compressionRouting(settings: Settings, x: CompressionDesign, r: CompressionReport, c: RoutingChoices): Operation[] {
  const drafts: Draft[] = [coil(settings, x, r, c), stressRelieve(settings, x)];
  if (endForms[x.ends].ground) drafts.push(grind(settings, x, r));
  if (c.shotPeen) drafts.push(peen(settings, x));
  if (r.setRemoval.required) drafts.push(presetToSolid(settings, x, r));
  drafts.push(...finishOperations(x, c), inspect(settings, x), pack(settings, x));
  return sequenced(drafts);
}
