/** PDF writers for the document models of core/documents (Node side only: pdfkit, svg-to-pdfkit, qrcode). */
export { renderQuote } from './quote-pdf';
export { renderTraveller } from './traveller-pdf';
export { renderDocument } from './render';
export { PAPER } from './page';
export { fontDirectory, useFontDirectory } from './fonts';
