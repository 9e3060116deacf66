/** The compression spring's entry in the kind registry. */
import { compressionFields } from '../documents/compression';
import { compressionDrawing } from '../drawing/compression';
import { loadDeflectionDiagram } from '../drawing/load-deflection';
import { compressionInspection } from '../process/compression-inspection';
import { compressionRouting } from '../process/compression-routing';
import { reviewCompression } from '../review/compression';
import { compressionSpecQuantities, compressionSpecSchema } from '../spec/compression';
import { compressionSpecErrors } from '../spec/compression-rules';
import { analyseCompression } from '../springs/compression/analyse';
import { compressionDesign } from '../springs/compression/design';
import { compressionReportQuantities } from '../springs/compression/report';
import { kindEntry } from './types';
import { kindTerms } from '../vocabulary';

export const compressionKind = kindEntry({
  schema: compressionSpecSchema,
  specErrors: compressionSpecErrors,
  specQuantities: compressionSpecQuantities,
  design: compressionDesign,
  analyse: (x, settings) => analyseCompression(x, settings?.defaults.setRemovalMethod),
  review: reviewCompression,
  reportQuantities: compressionReportQuantities,
  routing: compressionRouting,
  inspection: compressionInspection,
  freeLengths: (r) => ({ coiled: r.coiler.freeLength, finished: r.freeLength }),
  drawing: compressionDrawing,
  diagram: loadDeflectionDiagram,
  drawingOptions: (spec) => ({
    ends: spec.ends, diameter: spec.innerDiameter !== undefined ? 'inner' : 'outer',
    directionOfWind: spec.directionOfWind ?? 'either',
  }),
  document: { ...kindTerms.compression.document, fields: compressionFields },
  shape: { length: (r) => r.freeLength, rate: (r) => r.rate, rateQuantity: 'rate', lengthNote: null },
});
