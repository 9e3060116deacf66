import type { ApiError, ApiResult } from '../../core/api';
import type { Job, Quote } from '../../core/api/store';
import { estimateCost } from '../../core/costing/estimate';
import type { CostEstimate } from '../../core/costing/types';
import type { PrintJob, QuoteDocument, QuoteTermsInput } from '../../core/documents';
import { planManufacture } from '../../core/process/plan';
import type { IssueDecision, IssueProblem } from '../../core/quoting/problems';
import { issueProblems, problemSummary } from '../../core/quoting/problems';
import type { Settings } from '../../core/settings/schema';
import { getJob, getSettings, keepWorkingRevision, listCustomers, recordQuotation } from '../../db';
import type { Store } from '../../db';
import { draftQuotation, issuedQuoteDocument, jobPricing, storedPrintJob } from '../pdf/printing';

export interface IssueRequest {
  /** One job: a one-line quotation. */
  jobId?: number | undefined;
  /** Several jobs of one customer, one line each in this order. */
  jobIds?: number[] | undefined;
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
    details: problems.map((p) => ({ code: p.code, message: p.job ? `${p.job}: ${p.message}` : p.message, path: p.path })),
  } };
}

interface PricedLine {
  job: Job;
  print: PrintJob;
  estimate: CostEstimate;
  problems: IssueProblem[];
}

/** One line priced with the store's settings, and what stands in the way of quoting it. */
function priceLine(job: Job, print: PrintJob, settings: Settings): PricedLine {
  const estimate = estimateCost(print.spec, settings, undefined, jobPricing(print));
  const findings = planManufacture(print.spec, settings, estimate.breaks[0]!.quantity, print.judgement).findings;
  return { job, print, estimate, problems: issueProblems(print.spec, findings, estimate) };
}

/** How the request names the i-th job: `jobId` for one, `jobIds[i]` for several. */
const jobPath = (request: IssueRequest, i: number) => (request.jobIds === undefined ? 'jobId' : `jobIds[${i}]`);

/** A quotation goes to one customer: every line's job is the first line's customer's. */
function otherCustomer(lines: readonly PricedLine[], request: IssueRequest): ApiError | null {
  const first = lines[0]!.job;
  const i = lines.findIndex((l) => (l.job.customer?.id ?? null) !== (first.customer?.id ?? null));
  if (i < 0) return null;
  const name = (j: Job) => (j.customer ? `"${j.customer.name}"` : 'no customer');
  return { code: 'quote-customers-differ', path: jobPath(request, i),
    message: `a quotation is for one customer: job ${first.number} is for ${name(first)}, job ${lines[i]!.job.number} for ${name(lines[i]!.job)}` };
}

/** Each problem named with its line's job and path when the quotation has several lines. */
function problemsOf(lines: readonly PricedLine[], request: IssueRequest): IssueProblem[] {
  if (request.jobIds === undefined) return lines[0]!.problems;
  return lines.flatMap((l, i) => l.problems.map((p) => ({ ...p, job: l.job.number, path: `${jobPath(request, i)}.${p.path}` })));
}

function pricedLines(store: Store, request: IssueRequest, settings: Settings): ApiResult<PricedLine[]> {
  const ids = request.jobIds ?? (request.jobId === undefined ? [] : [request.jobId]);
  if (ids.length === 0) return { ok: false, error: { code: 'invalid-input', path: 'jobIds', message: 'name the job (jobId) or the jobs of the quotation (jobIds)' } };
  const customers = listCustomers(store);
  const lines: PricedLine[] = [];
  for (const [i, id] of ids.entries()) {
    // An issue ends each job's working session: every line is priced from a permanent revision.
    const kept = keepWorkingRevision(store, { id, reason: 'issued' });
    if (!kept.ok) return { ok: false, error: { ...kept.error, path: jobPath(request, i) } };
    const job = getJob(store, id);
    if (!job.ok) return { ok: false, error: { ...job.error, path: jobPath(request, i) } };
    lines.push(priceLine(job.value, storedPrintJob(job.value, customers), settings));
  }
  const differs = otherCustomer(lines, request);
  return differs ? { ok: false, error: differs } : { ok: true, value: lines };
}

/**
 * Issues a quotation for stored jobs, one line per job. The service prices every line with the store's
 * settings and builds the document; open error findings or gaps in the price on any line need the
 * estimator's reason, which the snapshot keeps with every problem it accepted.
 */
export function issueQuotation(store: Store, request: IssueRequest, now: Date): ApiResult<{ quote: Quote; model: QuoteDocument }> {
  const settings = getSettings(store);
  if (!settings.ok) return settings;
  const lines = pricedLines(store, request, settings.value);
  if (!lines.ok) return lines;
  const problems = problemsOf(lines.value, request);
  if (problems.length > 0 && request.accept === undefined) return needsDecision(problems);
  const decision: IssueDecision | null = problems.length > 0 ? { reason: request.accept!, problems } : null;
  const validityDays = request.validityDays ?? settings.value.defaults.quoteValidityDays;
  const { model } = draftQuotation(lines.value.map((l) => ({
    print: l.print, estimate: l.estimate, exceptions: l.problems.flatMap((p) => (p.customerText === null ? [] : [p.customerText])),
  })), settings.value, now, { validityDays, ...(request.terms ? { terms: request.terms } : {}) });
  const quote = recordQuotation(store, {
    lines: lines.value.map((l) => ({
      jobId: l.job.id, jobRevision: l.job.revision, prices: JSON.parse(JSON.stringify(l.estimate)), quantityBreaks: l.estimate.breaks.map((b) => b.quantity),
    })),
    validityDays, document: JSON.parse(JSON.stringify(model)), decision,
  });
  if (!quote.ok) return quote;
  const issued = issuedQuoteDocument(quote.value);
  if (!issued.ok) return { ok: false, error: { code: issued.errors[0]!.code, message: issued.errors[0]!.message, path: issued.errors[0]!.path } };
  return { ok: true, value: { quote: quote.value, model: issued.value } };
}
