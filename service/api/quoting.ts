import type { ApiResult } from '../../core/api';
import type { Quote } from '../../core/api/store';
import { estimateCost } from '../../core/costing/estimate';
import type { QuoteDocument, QuoteTermsInput } from '../../core/documents';
import { planManufacture } from '../../core/process/plan';
import type { IssueDecision, IssueProblem } from '../../core/quoting/problems';
import { issueProblems, problemSummary } from '../../core/quoting/problems';
import { getJob, getSettings, keepWorkingRevision, listCustomers, recordQuote } from '../../db';
import type { Store } from '../../db';
import { draftQuote, issuedQuoteDocument, jobPricing, storedPrintJob } from '../pdf/printing';

export interface IssueRequest {
  jobId: number;
  validityDays?: number | undefined;
  /** The estimator's reason for issuing despite the problems named; required when there are any. */
  accept?: string | undefined;
  terms?: QuoteTermsInput | undefined;
}

/** Refused: the quote has problems and no decision was given. Every problem is in `details`. */
function needsDecision(problems: IssueProblem[]): ApiResult<never> {
  return { ok: false, error: {
    code: 'issue-needs-decision', path: 'accept',
    message: `the quote has ${problems.length} open problem${problems.length === 1 ? '' : 's'} (${problemSummary(problems)}): ` +
      'issue it with a reason for accepting them (accept; on the command line --accept "reason"), or put them right first',
    details: problems.map((p) => ({ code: p.code, message: p.message, path: p.path })),
  } };
}

/**
 * Issues a quote for a stored job. The service prices it with the store's settings and builds the document;
 * open error findings or gaps in the price need the estimator's reason, which the snapshot keeps.
 */
export function issueJobQuote(store: Store, request: IssueRequest, now: Date): ApiResult<{ quote: Quote; model: QuoteDocument }> {
  // An issue ends the job's working session: the quote is priced from a permanent revision.
  const kept = keepWorkingRevision(store, { id: request.jobId, reason: 'issued' });
  if (!kept.ok) return { ok: false, error: { ...kept.error, path: 'jobId' } };
  const job = getJob(store, request.jobId);
  if (!job.ok) return { ok: false, error: { ...job.error, path: 'jobId' } };
  const settings = getSettings(store);
  if (!settings.ok) return settings;
  const print = storedPrintJob(job.value, listCustomers(store));
  const estimate = estimateCost(print.spec, settings.value, undefined, jobPricing(print));
  const findings = planManufacture(print.spec, settings.value, estimate.breaks[0]!.quantity, print.judgement).findings;
  const problems = issueProblems(print.spec, findings, estimate);
  if (problems.length > 0 && request.accept === undefined) return needsDecision(problems);
  const decision: IssueDecision | null = problems.length > 0 ? { reason: request.accept!, problems } : null;
  const exceptions = problems.flatMap((p) => (p.customerText === null ? [] : [p.customerText]));
  const validityDays = request.validityDays ?? settings.value.defaults.quoteValidityDays;
  const { model } = draftQuote(print, settings.value, now, { estimate, exceptions, validityDays, ...(request.terms ? { terms: request.terms } : {}) });
  const quote = recordQuote(store, {
    jobId: job.value.id, jobRevision: job.value.revision, validityDays, prices: JSON.parse(JSON.stringify(estimate)),
    quantityBreaks: estimate.breaks.map((b) => b.quantity), document: JSON.parse(JSON.stringify(model)), decision,
  });
  if (!quote.ok) return quote;
  const issued = issuedQuoteDocument(quote.value);
  if (!issued.ok) return { ok: false, error: { code: issued.errors[0]!.code, message: issued.errors[0]!.message, path: issued.errors[0]!.path } };
  return { ok: true, value: { quote: quote.value, model: issued.value } };
}
