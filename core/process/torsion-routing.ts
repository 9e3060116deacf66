import type { TorsionDesign } from '../springs/torsion/design';
import type { TorsionReport } from '../springs/torsion/report';
import type { Settings } from '../settings/schema';
import type { Operation } from './types';
import { coilerPiecesPerHour, machinePiecesPerHour } from './work-centre';
import type { Draft, RoutingChoices } from './operations';
import { finishOperations, inspect, machineOperation, pack, sequenced, stressRelieve } from './operations';
import { TORSION_TOLERANCE_SOURCE } from './torsion-inspection';
import { legFormTerms } from '../vocabulary';
import { formatQuantity } from '../format';

function coil(settings: Settings, x: TorsionDesign, r: TorsionReport): Draft {
  return machineOperation(settings, x, 'coil', 'Coil with legs', [
    { label: 'Outside diameter', value: r.outerDiameter, quantity: 'length' },
    { label: 'Wire diameter', value: x.d, quantity: 'length' },
    { label: 'Body coils', value: r.bodyCoils, quantity: 'count' },
    { label: 'Direction of wind', value: x.windDirection },
    { label: 'Leg 1', value: r.legLengths[0], quantity: 'length' },
    { label: 'Leg 2', value: r.legLengths[1], quantity: 'length' },
    { label: 'Free angle between legs', value: x.freeAngle === null ? 'as drawn' : `${x.freeAngle}°` },
    { label: 'Wire per piece', value: r.wireLength, quantity: 'length' },
  ], (m) => coilerPiecesPerHour(m, r.wireLength));
}

function formLegs(settings: Settings, x: TorsionDesign): Draft {
  return machineOperation(settings, x, 'leg-form', 'Form legs', x.legs.map((leg, i) => ({
    label: `Leg ${i + 1}`, value: `${legFormTerms[leg.form].long}${leg.bendRadius === null ? '' : `, bend radius ${formatQuantity(leg.bendRadius, 'length', x.units)}`}`,
  })), machinePiecesPerHour);
}

/** The operations a torsion spring needs: coil with legs, leg forming, stress relief, finish, torque test. */
export function torsionRouting(settings: Settings, x: TorsionDesign, r: TorsionReport, c: RoutingChoices): Operation[] {
  const drafts: Draft[] = [coil(settings, x, r)];
  if (x.legs.some((l) => l.form !== 'tangent')) drafts.push(formLegs(settings, x));
  drafts.push(stressRelieve(settings, x), ...finishOperations(x, c));
  const test = inspect(settings, x, 'Torque test at angle, free-angle check', 'wind once to the largest working angle on an arbor');
  test.notes.push(`limits not on the drawing are ${TORSION_TOLERANCE_SOURCE}`);
  drafts.push(test, pack(settings, x));
  return sequenced(drafts);
}
