/** Drawings and diagrams as SVG strings, for the UI to show and the PDF writer to embed. */
export { compressionDrawing } from './compression';
export type { CompressionDrawingOptions } from './compression';
export type { WindDirection } from './compression-data';
export { loadDeflectionDiagram } from './load-deflection';
export type { LoadDeflectionOptions } from './load-deflection';
export { goodmanDiagram } from './goodman';
export { priceCurve, priceText } from './price';
export type { PricePoint } from './price';
export type { ChartSize } from './chart';
export { linearScale, linearTicks, logScale, logTicks, niceStep } from './axes';
export type { Scale } from './axes';
export { escapeXml, num } from './svg';
