import type { JobStatus } from '../../core/api/store';
import type { Command } from './commands';
import { subcommandOf } from './commands';
import type { ParsedArgs } from './io';
import { InputError, readJson, toJson } from './io';
import type { Caller } from './store-session';
import { intOption, jobRef, positional, withStore } from './store-session';
import { dateRangeHelp, dateRangeOption } from './date-range-options';

/** The job file of `jobs add` says "drawing" and "revision" for the drawing number and its revision. */
function jobFileInput(raw: unknown): unknown {
  if (typeof raw !== 'object' || raw === null || Array.isArray(raw)) {
    throw new InputError([{ code: 'not-an-object', path: '', message: 'a job file must be a JSON object' }]);
  }
  const { drawing, revision, ...rest } = raw as Record<string, unknown>;
  return {
    ...rest,
    ...(drawing === undefined ? {} : { drawingNumber: drawing }),
    ...(revision === undefined ? {} : { drawingRevision: revision }),
  };
}

/** A spec file, or a job file (as for `jobs add`) whose spec is used. */
function specOf(raw: unknown): unknown {
  const isJobFile = typeof raw === 'object' && raw !== null && !('kind' in raw) && 'spec' in raw;
  return isJobFile ? (raw as { spec: unknown }).spec : raw;
}

/**
 * A subcommand in two steps: its arguments are read first, so a bad one is refused before the store opens (or is
 * created); what it returns then runs against the store.
 */
type Sub = (args: ParsedArgs) => (call: Caller) => Promise<unknown>;

const onJob = (args: ParsedArgs, name: string) => jobRef(positional(args, 1, 'ID', name));
const jobId = async (call: Caller, ref: ReturnType<typeof jobRef>): Promise<number> => (await call('getJob', ref)).id;

function listQuery(args: ParsedArgs) {
  const status = args.options.get('status');
  const dates = dateRangeOption(args);
  return {
    ...(dates ? { dates } : {}),
    ...(typeof status === 'string' ? { status: status.split(',') as JobStatus[] } : {}),
    ...(intOption(args, 'customer') !== undefined ? { customerId: intOption(args, 'customer') } : {}),
    ...(typeof args.options.get('kind') === 'string' ? { kind: args.options.get('kind') as string } : {}),
    ...(typeof args.options.get('sort') === 'string' ? { sort: args.options.get('sort') as never } : {}),
    ...(typeof args.options.get('material') === 'string' ? { material: args.options.get('material') as string } : {}),
    ...(typeof args.options.get('after') === 'string' ? { after: args.options.get('after') as string } : {}),
    ...(args.options.has('archived') ? { archived: true } : {}),
    limit: intOption(args, 'limit') ?? 50,
    offset: intOption(args, 'offset') ?? 0,
  };
}

const subcommands: Record<string, Sub> = {
  add: (args) => {
    const input = jobFileInput(readJson(positional(args, 1, 'FILE', 'jobs add')));
    return (call) => call('createJob', input as never);
  },
  show: (args) => {
    const ref = onJob(args, 'jobs show');
    return (call) => call('getJob', ref);
  },
  list: (args) => {
    const query = listQuery(args);
    return (call) => call('listJobs', query);
  },
  find: (args) => {
    const input = { text: args.positional.slice(1).join(' '), limit: intOption(args, 'limit') ?? 25 };
    return (call) => call('findJobs', input);
  },
  similar: (args) => {
    const input = { spec: specOf(readJson(positional(args, 1, 'SPECFILE', 'jobs similar'))), limit: intOption(args, 'limit') ?? 10 };
    return async (call) => {
      const hits = await call('similarJobs', input);
      return hits.map(({ job, ...hit }) => ({ ...hit, customer: job.customer?.name ?? null, partNumber: job.partNumber, status: job.status }));
    };
  },
  revisions: (args) => {
    const ref = onJob(args, 'jobs revisions');
    return async (call) => call('jobRevisions', { id: await jobId(call, ref) });
  },
  quotes: (args) => {
    const ref = onJob(args, 'jobs quotes');
    const limit = intOption(args, 'limit') ?? 50;
    return async (call) => call('listQuotes', { jobId: await jobId(call, ref), limit });
  },
  status: (args) => {
    const ref = onJob(args, 'jobs status');
    const status = positional(args, 2, 'STATUS', 'jobs status') as JobStatus;
    return async (call) => call('setJobStatus', { id: await jobId(call, ref), status });
  },
  copy: (args) => {
    const ref = onJob(args, 'jobs copy');
    return async (call) => call('copyJob', { id: await jobId(call, ref) });
  },
  archive: (args) => {
    const ref = onJob(args, 'jobs archive');
    const archived = !args.options.has('undo');
    return async (call) => call('archiveJob', { id: await jobId(call, ref), archived });
  },
  delete: (args) => {
    const ref = onJob(args, 'jobs delete');
    return async (call) => call('deleteJob', { id: await jobId(call, ref) });
  },
  undelete: (args) => {
    const id = Number(positional(args, 1, 'ID', 'jobs undelete'));
    return (call) => call('undoDeleteJob', { id });
  },
  restore: (args) => {
    const ref = onJob(args, 'jobs restore');
    const revision = Number(positional(args, 2, 'REVISION', 'jobs restore'));
    return async (call) => call('restoreRevision', { id: await jobId(call, ref), revision });
  },
};

export const jobsCommand: Command = {
  name: 'jobs',
  usage: [
    'jobs add FILE --db DB       store a job ({"customer":{"name":…},"partNumber":…,"drawing":…,"revision":…,"notes":…,"spec":{…}})',
    '  jobs show ID|NUMBER --db DB, jobs list [--status S[,S]] [--customer ID] [--kind K] [--sort number|updated|customer]',
    `  [--material ID] ${dateRangeHelp}`,
    '  [--limit N] [--offset N | --after NEXT] --db DB, jobs find TEXT --db DB, jobs similar SPECFILE [--limit N] --db DB,',
    '  jobs revisions ID --db DB, jobs status ID STATUS --db DB, jobs restore ID REVISION --db DB,',
    '  jobs copy ID|NUMBER --db DB (a new job from a past one), jobs archive ID|NUMBER [--undo] --db DB (jobs list --archived lists them),',
    '  jobs delete ID|NUMBER --db DB (a draft never quoted), jobs undelete ID --db DB (the id the deletion printed),',
    '  jobs quotes ID|NUMBER [--limit N] --db DB   every quotation the job is a line of, newest first, with its lines',
  ].join('\n'),
  async run(args, out) {
    const withArgs = subcommandOf('jobs', args, subcommands)(args);
    out(toJson(await withStore(args, withArgs)));
  },
};
