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

async function jobId(call: Caller, text: string): Promise<number> {
  return (await call('getJob', jobRef(text))).id;
}

type Sub = (args: ParsedArgs, call: Caller) => Promise<unknown>;

const subcommands: Record<string, Sub> = {
  add: async (args, call) => call('createJob', jobFileInput(readJson(positional(args, 1, 'FILE', 'jobs add'))) as never),
  show: async (args, call) => call('getJob', jobRef(positional(args, 1, 'ID', 'jobs show'))),
  list: async (args, call) => {
    const status = args.options.get('status');
    const dates = dateRangeOption(args);
    return call('listJobs', {
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
    });
  },
  find: async (args, call) => call('findJobs', { text: args.positional.slice(1).join(' '), limit: intOption(args, 'limit') ?? 25 }),
  similar: async (args, call) => {
    const hits = await call('similarJobs', { spec: specOf(readJson(positional(args, 1, 'SPECFILE', 'jobs similar'))), limit: intOption(args, 'limit') ?? 10 });
    return hits.map(({ job, ...hit }) => ({ ...hit, customer: job.customer?.name ?? null, partNumber: job.partNumber, status: job.status }));
  },
  revisions: async (args, call) => call('jobRevisions', { id: await jobId(call, positional(args, 1, 'ID', 'jobs revisions')) }),
  quotes: async (args, call) => call('listQuotes', { jobId: await jobId(call, positional(args, 1, 'ID', 'jobs quotes')), limit: intOption(args, 'limit') ?? 50 }),
  status: async (args, call) => call('setJobStatus', {
    id: await jobId(call, positional(args, 1, 'ID', 'jobs status')), status: positional(args, 2, 'STATUS', 'jobs status') as JobStatus,
  }),
  copy: async (args, call) => call('copyJob', { id: await jobId(call, positional(args, 1, 'ID', 'jobs copy')) }),
  archive: async (args, call) => call('archiveJob', { id: await jobId(call, positional(args, 1, 'ID', 'jobs archive')), archived: !args.options.has('undo') }),
  delete: async (args, call) => call('deleteJob', { id: await jobId(call, positional(args, 1, 'ID', 'jobs delete')) }),
  undelete: async (args, call) => call('undoDeleteJob', { id: Number(positional(args, 1, 'ID', 'jobs undelete')) }),
  restore: async (args, call) => call('restoreRevision', {
    id: await jobId(call, positional(args, 1, 'ID', 'jobs restore')), revision: Number(positional(args, 2, 'REVISION', 'jobs restore')),
  }),
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
    const sub = subcommandOf('jobs', args, subcommands);
    out(toJson(await withStore(args, (call) => sub(args, call))));
  },
};
