import { writeFileSync } from 'node:fs';
import type { Job } from '../../core/api/store';
import { estimateCost } from '../../core/costing/estimate';
import type { CostEstimate } from '../../core/costing/types';
import {
  parsePrintFile, parseQuoteDocument, printableKind, quoteDocument, travellerDocument, travellerQuantity, withQuoteIssue,
} from '../../core/documents';
import type { PrintJob, QuoteDocument } from '../../core/documents';
import type { Result } from '../../core/result';
import type { Settings } from '../../core/settings/schema';
import { renderQuote, renderTraveller } from '../documents';
import type { Command } from './commands';
import type { ParsedArgs } from './io';
import { InputError, readJson, requireOption, toJson } from './io';
import type { Caller } from './store-session';
import { intOption, jobRef, withStore } from './store-session';

function must<T>(result: Result<T>): T {
  if (!result.ok) throw new InputError(result.errors);
  return result.value;
}

async function storedJob(call: Caller, ref: string): Promise<{ job: Job; print: PrintJob }> {
  const job = await call('getJob', jobRef(ref));
  const customer = job.customer && (await call('listCustomers', {})).find((c) => c.id === job.customer!.id);
  return {
    job,
    print: must(printableKind({
      number: job.number, customerName: job.customer?.name ?? null,
      customerLines: customer ? [customer.email, customer.phone].filter(Boolean) : [],
      partNumber: job.partNumber, drawingNumber: job.drawingNumber, drawingRevision: job.drawingRevision,
      orderQuantity: job.orderQuantity, dueDate: job.dueDate, leadTimeDays: job.leadTimeDays, spec: job.spec,
    }, 'spec.kind')),
  };
}

/** The job a document is for: a stored one with --job ID|NUMBER, or the spec or job file given. */
async function printJob(args: ParsedArgs, call: Caller, command: string): Promise<{ job: Job | null; print: PrintJob }> {
  const ref = args.options.get('job');
  if (typeof ref === 'string') return storedJob(call, ref);
  const file = args.positional[1];
  if (file === undefined) {
    throw new InputError([{ code: 'missing-argument', path: 'FILE', message: `${command} needs a spec or job FILE, or --job ID` }]);
  }
  return { job: null, print: must(parsePrintFile(readJson(file))) };
}

function write(file: string, pdf: Buffer): void {
  try {
    writeFileSync(file, pdf);
  } catch (e) {
    throw new InputError([{ code: 'unwritable-file', path: '--out', message: `${file}: cannot be written (${(e as NodeJS.ErrnoException).code ?? (e as Error).message})` }]);
  }
}

function draftQuote(print: PrintJob, settings: Settings, estimate: CostEstimate): QuoteDocument {
  return quoteDocument({
    spec: print.spec, settings, estimate, issuedAt: new Date().toISOString(), validityDays: settings.defaults.quoteValidityDays,
    job: print,
  });
}

/** A stored job's quote is issued: the store keeps the estimate and the document model, immutable. */
async function issue(call: Caller, job: Job, draft: QuoteDocument, estimate: CostEstimate): Promise<QuoteDocument> {
  const quote = await call('issueQuote', {
    jobId: job.id, validityDays: draft.issue.validityDays, prices: JSON.parse(JSON.stringify(estimate)),
    quantityBreaks: estimate.breaks.map((b) => b.quantity), document: JSON.parse(JSON.stringify(draft)),
  });
  return withQuoteIssue(draft, quote);
}

/** A quote already issued prints from its snapshot alone, whatever the prices are today. */
async function reprint(call: Caller, number: string): Promise<QuoteDocument> {
  const quote = await call('getQuote', { number });
  return withQuoteIssue(must(parseQuoteDocument(quote.document)), quote);
}

async function printQuote(args: ParsedArgs, call: Caller): Promise<Record<string, unknown>> {
  const out = requireOption(args, 'out');
  const stored = args.options.get('quote');
  if (typeof stored === 'string') {
    const model = await reprint(call, stored);
    write(out, await renderQuote(model));
    return { file: out, quote: model.issue.number, reprint: true };
  }
  const { job, print } = await printJob(args, call, 'print quote');
  const settings = await call('getSettings', {});
  const estimate = estimateCost(print.spec, settings);
  const draft = draftQuote(print, settings, estimate);
  const model = job ? await issue(call, job, draft, estimate) : draft;
  write(out, await renderQuote(model));
  return { file: out, quote: model.issue.number, issued: job !== null, missing: estimate.missing };
}

async function printTraveller(args: ParsedArgs, call: Caller): Promise<Record<string, unknown>> {
  const out = requireOption(args, 'out');
  const { print } = await printJob(args, call, 'print traveller');
  const quantity = must(travellerQuantity(print, intOption(args, 'quantity')));
  const settings = await call('getSettings', {});
  const model = travellerDocument({
    spec: print.spec, settings, printedAt: new Date().toISOString(),
    job: { ...print, orderQuantity: quantity },
  });
  write(out, await renderTraveller(model));
  return { file: out, job: print.number, quantity, findings: model.findings };
}

const subcommands: Record<string, (args: ParsedArgs, call: Caller) => Promise<Record<string, unknown>>> = {
  quote: printQuote,
  traveller: printTraveller,
};

export const printCommand: Command = {
  name: 'print',
  usage: [
    'print quote FILE|--job ID --db DB --out x.pdf   quotation PDF; for a stored job the quote is issued and kept',
    '  print quote --quote NUMBER --db DB --out x.pdf reprint an issued quote from its snapshot',
    '  print traveller FILE|--job ID [--quantity N] --db DB --out x.pdf   shop traveller PDF',
  ].join('\n'),
  async run(args, out) {
    const name = args.positional[0];
    const sub = name === undefined ? undefined : subcommands[name];
    if (!sub) throw new InputError([{ code: 'unknown-command', path: 'print', message: `print needs one of: ${Object.keys(subcommands).join(', ')}` }]);
    out(toJson(await withStore(args, (call) => sub(args, call))));
  },
};
