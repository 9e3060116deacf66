import type { PrintedDocument } from '../../core/documents';
import { renderQuote } from './quote-pdf';
import { renderTraveller } from './traveller-pdf';

/** Any document model to its PDF. */
export function renderDocument(model: PrintedDocument): Promise<Buffer> {
  return model.type === 'quote' ? renderQuote(model) : renderTraveller(model);
}
