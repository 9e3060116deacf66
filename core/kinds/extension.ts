/** The extension spring's entry in the kind registry. */
import { extensionFields } from '../documents/kinds';
import { extensionDrawing } from '../drawing/extension';
import { extensionLoadDiagram } from '../drawing/extension-load';
import { extensionInspection } from '../process/extension-inspection';
import { extensionRouting } from '../process/extension-routing';
import { reviewExtension } from '../review/extension';
import { extensionSpecQuantities, extensionSpecSchema } from '../spec/extension';
import { extensionSpecErrors } from '../spec/extension-rules';
import { analyseExtension } from '../springs/extension/analyse';
import { extensionDesign } from '../springs/extension/design';
import { extensionReportQuantities } from '../springs/extension/report';
import { kindEntry } from './types';
import { kindTerms } from '../vocabulary';

export const extensionKind = kindEntry({
  schema: extensionSpecSchema,
  specErrors: extensionSpecErrors,
  specQuantities: extensionSpecQuantities,
  design: extensionDesign,
  analyse: analyseExtension,
  review: reviewExtension,
  reportQuantities: extensionReportQuantities,
  routing: extensionRouting,
  inspection: extensionInspection,
  // Extension springs are coiled to their finished length: the coils close with initial tension, no set is removed.
  freeLengths: (r) => ({ coiled: r.freeLength, finished: r.freeLength }),
  drawing: extensionDrawing,
  diagram: extensionLoadDiagram,
  drawingOptions: (spec) => (spec.loopAngle === undefined ? {} : { loopPosition: { angle: spec.loopAngle, tolerance: spec.loopAngleTolerance } }),
  document: { ...kindTerms.extension.document, fields: extensionFields },
  shape: { length: (r) => r.freeLength, rate: (r) => r.rate, rateQuantity: 'rate', lengthNote: null },
});
