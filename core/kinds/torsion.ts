/** The torsion spring's entry in the kind registry. */
import { torsionFields } from '../documents/kinds';
import { torqueAngleDiagram } from '../drawing/torque-angle';
import { torsionDrawing } from '../drawing/torsion';
import { torsionInspection } from '../process/torsion-inspection';
import { torsionRouting } from '../process/torsion-routing';
import { reviewTorsion } from '../review/torsion';
import { torsionSpecQuantities, torsionSpecSchema } from '../spec/torsion';
import { torsionSpecErrors } from '../spec/torsion-rules';
import { analyseTorsion } from '../springs/torsion/analyse';
import { torsionDesign } from '../springs/torsion/design';
import { torsionReportQuantities } from '../springs/torsion/report';
import { kindEntry } from './types';
import { kindTerms } from '../vocabulary';

export const torsionKind = kindEntry({
  schema: torsionSpecSchema,
  specErrors: torsionSpecErrors,
  specQuantities: torsionSpecQuantities,
  design: torsionDesign,
  analyse: analyseTorsion,
  review: reviewTorsion,
  reportQuantities: torsionReportQuantities,
  routing: torsionRouting,
  inspection: torsionInspection,
  freeLengths: () => ({ coiled: null, finished: null }),
  drawing: torsionDrawing,
  diagram: torqueAngleDiagram,
  drawingOptions: (spec) => ({
    freeAngle: spec.freeAngle, freeAngleTolerance: spec.freeAngleTolerance, legForms: [spec.legs[0].form, spec.legs[1].form],
  }),
  document: { ...kindTerms.torsion.document, fields: torsionFields },
  // A torsion spring has no free length to compare: its body length and its rate per degree stand in.
  shape: { length: (r) => r.bodyLength, rate: (r) => r.ratePerDegree, rateQuantity: 'torqueRatePerDegree', lengthNote: 'body' },
});
