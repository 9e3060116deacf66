import { parsePrintFile } from '../../core/documents';
import type { QuoteTermsInput } from '../../core/documents';
import type { Result } from '../../core/result';
import { StoreError, writeFileReplacing } from '../../db';
import { renderQuote, renderTraveller } from '../pdf';
import { draftQuote, travellerFor } from '../pdf/printing';
import type { Command } from './commands';
import { subcommandOf } from './commands';
import type { ParsedArgs } from './io';
import { InputError, readJson, requireOption, toJson } from './io';
import type { Caller } from './store-session';
import { intOption, jobRef, withStore } from './store-session';

function must<T>(result: Result<T>): T {
  if (!result.ok) throw new InputError(result.errors);
  return result.value;
}

/** Complete or not at all: a full disk leaves no 0-byte or half PDF behind. */
function write(file: string, pdf: Buffer): void {
  try {
    writeFileReplacing(file, pdf, '--out');
  } catch (e) {
    if (e instanceof StoreError) throw new InputError([e.toApiError()]);
    throw e;
  }
}

const printFile = (args: ParsedArgs, command: string) => {
  const file = args.positional[1];
  if (file === undefined) {
    throw new InputError([{ code: 'missing-argument', path: 'FILE', message: `${command} needs a spec or job FILE, or --job ID` }]);
  }
  return must(parsePrintFile(readJson(file)));
};

/** `--accept "reason"`: issue despite open errors or an incomplete price, the reason kept with the quote. */
function acceptOption(args: ParsedArgs): { accept?: string } {
  const reason = args.options.get('accept');
  if (reason === undefined) return {};
  if (typeof reason !== 'string') {
    throw new InputError([{ code: 'invalid-option', path: '--accept', message: '--accept needs the reason in quotes, e.g. --accept "customer agreed the stop"' }]);
  }
  return { accept: reason };
}

/** A text option given once, or nothing; a flag without its text is an error naming the option. */
function textOption(args: ParsedArgs, name: string): string | undefined {
  const v = args.options.get(name);
  if (v === undefined) return undefined;
  if (typeof v !== 'string') throw new InputError([{ code: 'invalid-option', path: `--${name}`, message: `--${name} needs its text, e.g. --${name} "…"` }]);
  return v;
}

/** The quote's own terms: --enquiry, --payment, --delivery, --packaging, --certificates "a; b", --estimator. */
function termsOption(args: ParsedArgs): { terms?: QuoteTermsInput } {
  const terms: QuoteTermsInput = {};
  const pairs = [['enquiry', 'enquiryReference'], ['payment', 'paymentTerms'], ['delivery', 'deliveryTerms'],
    ['packaging', 'packaging'], ['estimator', 'estimator']] as const;
  for (const [option, key] of pairs) {
    const v = textOption(args, option);
    if (v !== undefined) terms[key] = v;
  }
  const certificates = textOption(args, 'certificates');
  if (certificates !== undefined) terms.certificates = certificates.split(';').map((c) => c.trim()).filter(Boolean);
  return Object.keys(terms).length > 0 ? { terms } : {};
}

/** `--jobs ID,NUMBER,…`: the jobs of a quotation of several lines, each by id or job number, in line order. */
async function jobIdsOption(args: ParsedArgs, call: Caller): Promise<number[] | undefined> {
  const list = args.options.get('jobs');
  if (list === undefined) return undefined;
  const refs = typeof list === 'string' ? list.split(',').map((r) => r.trim()).filter((r) => r !== '') : [];
  if (refs.length === 0) {
    throw new InputError([{ code: 'invalid-option', path: '--jobs', message: '--jobs needs the jobs of the quotation, comma-separated, e.g. --jobs J-26-0004,J-26-0007' }]);
  }
  const ids: number[] = [];
  for (const ref of refs) ids.push((await call('getJob', jobRef(ref))).id);
  return ids;
}

/** The quotation of stored jobs the options name (--jobs for several lines, --job for one), or null. */
async function issueRequest(args: ParsedArgs, call: Caller): Promise<{ jobId: number } | { jobIds: number[] } | null> {
  const jobIds = await jobIdsOption(args, call);
  const ref = args.options.get('job');
  if (jobIds !== undefined && ref !== undefined) {
    throw new InputError([{ code: 'invalid-option', path: '--jobs', message: 'give --job for one job or --jobs for several, not both' }]);
  }
  if (jobIds !== undefined) return { jobIds };
  return typeof ref === 'string' ? { jobId: (await call('getJob', jobRef(ref))).id } : null;
}

/** Stored jobs (--job, --jobs) go through the API, which issues their quotation; a file prints as a draft. */
async function printQuote(args: ParsedArgs, call: Caller): Promise<Record<string, unknown>> {
  const out = requireOption(args, 'out');
  const number = args.options.get('quote');
  if (typeof number === 'string') {
    const printed = await call('reprintQuote', { number });
    write(out, Buffer.from(printed.base64, 'base64'));
    return { file: out, quote: printed.reference, issued: false, reprint: true };
  }
  const request = await issueRequest(args, call);
  if (request !== null) {
    const printed = await call('printQuote', { ...request, ...acceptOption(args), ...termsOption(args) });
    write(out, Buffer.from(printed.base64, 'base64'));
    return { file: out, quote: printed.reference, issued: true, reprint: false };
  }
  const print = printFile(args, 'print quote');
  const { model, estimate } = draftQuote(print, await call('getSettings', {}), new Date(), termsOption(args));
  write(out, await renderQuote(model));
  return { file: out, quote: model.issue.number, issued: false, missing: estimate.missing };
}

async function printTraveller(args: ParsedArgs, call: Caller): Promise<Record<string, unknown>> {
  const out = requireOption(args, 'out');
  const quantity = intOption(args, 'quantity');
  const ref = args.options.get('job');
  if (typeof ref === 'string') {
    const jobId = (await call('getJob', jobRef(ref))).id;
    const customerOrder = textOption(args, 'order');
    const printed = await call('printTraveller', { jobId, ...(quantity === undefined ? {} : { quantity }), ...(customerOrder ? { customerOrder } : {}) });
    write(out, Buffer.from(printed.base64, 'base64'));
    return { file: out, job: printed.reference, findings: printed.findings };
  }
  const order = textOption(args, 'order');
  const print = { ...printFile(args, 'print traveller'), ...(order ? { purchaseOrder: order } : {}) };
  const model = must(travellerFor(print, await call('getSettings', {}), quantity, new Date()));
  write(out, await renderTraveller(model));
  return { file: out, job: print.number, quantity: quantity ?? print.orderQuantity ?? print.spec.quantities?.[0], findings: model.findings };
}

const subcommands: Record<string, (args: ParsedArgs, call: Caller) => Promise<Record<string, unknown>>> = {
  quote: printQuote,
  traveller: printTraveller,
};

export const printCommand: Command = {
  name: 'print',
  usage: [
    'print quote FILE|--job ID|--jobs ID,ID,… [--accept "reason"] --db DB --out x.pdf   quotation PDF; for stored jobs the',
    '  quotation is issued and kept, one line per job of --jobs (all of one customer); open errors or an incomplete price',
    '  on any line refuse the issue unless --accept gives the reason for accepting them',
    '  [--enquiry REF] [--payment TEXT] [--delivery TEXT] [--packaging TEXT] [--certificates "a; b"] [--estimator NAME]',
    '  state this quote\'s enquiry reference and terms (else the customer\'s and the shop\'s)',
    '  print quote --quote NUMBER --db DB --out x.pdf reprint an issued quote from its snapshot',
    '  print traveller FILE|--job ID [--quantity N] [--order NO] --db DB --out x.pdf   shop traveller PDF; --order: the customer\'s order number',
  ].join('\n'),
  async run(args, out) {
    const sub = subcommandOf('print', args, subcommands);
    out(toJson(await withStore(args, (call) => sub(args, call))));
  },
};
