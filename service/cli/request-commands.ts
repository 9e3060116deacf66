import { readFileSync } from 'node:fs';
import { basename } from 'node:path';
import type { RequestPreviewResult } from '../../core/api';
import { requestMappingSchema } from '../../core/api';
import { previewRequestSheet } from '../../core/request-sheet';
import { parseWith } from '../../core/validation';
import { readRequestFile } from '../request-sheet/read';
import type { Command } from './commands';
import type { ParsedArgs } from './io';
import { InputError, readJson, requireOption, toJson } from './io';
import { positional, raise, withStore } from './store-session';

const bad = (path: string, message: string, code = 'invalid-option'): InputError => new InputError([{ code, path, message }]);

function choice<T extends string>(args: ParsedArgs, name: string, values: readonly T[]): T | undefined {
  const v = args.options.get(name);
  if (v === undefined) return undefined;
  if (typeof v !== 'string' || !values.includes(v as T)) throw bad(`--${name}`, `--${name} is one of ${values.join(', ')}`);
  return v as T;
}

/** A mapping file: {"columns":[{"header":"OD","field":"outerDiameter"},…],"units":…,"decimalMark":…}. */
function mappingFile(file: string, args: ParsedArgs) {
  const raw = readJson(file) as Record<string, unknown>;
  const filled = { units: choice(args, 'units', ['metric', 'inch']) ?? 'metric', decimalMark: choice(args, 'decimal-mark', ['.', ',']) ?? '.', ...raw };
  const parsed = parseWith(requestMappingSchema, filled);
  if (!parsed.ok) throw new InputError(parsed.errors.map((e) => ({ ...e, path: `--mapping ${e.path}` })));
  return parsed.value;
}

function skipRows(args: ParsedArgs): number[] | undefined {
  const v = args.options.get('skip');
  if (v === undefined) return undefined;
  if (typeof v !== 'string' || !/^\d+(,\d+)*$/.test(v)) throw bad('--skip', '--skip takes sheet row numbers, e.g. --skip 7,12');
  return v.split(',').map(Number);
}

function fixes(args: ParsedArgs): Record<string, string> | undefined {
  const v = args.options.get('fixes');
  if (v === undefined) return undefined;
  if (typeof v !== 'string') throw bad('--fixes', '--fixes names a JSON file of cell references and texts, e.g. {"E8":"1,5"}');
  return readJson(v) as Record<string, string>;
}

async function readSheet(file: string) {
  let bytes: Buffer;
  try {
    bytes = readFileSync(file);
  } catch (e) {
    throw bad('FILE', `${file}: cannot be read (${(e as NodeJS.ErrnoException).code ?? (e as Error).message})`, 'unreadable-file');
  }
  const sheet = await readRequestFile(basename(file), bytes);
  if (!sheet.ok) raise(sheet.error);
  return sheet.value;
}

/** What the import is told besides the sheet: from the options. */
function requestOptions(args: ParsedArgs) {
  const mapping = args.options.get('mapping');
  const guess = args.options.get('guess') === true;
  if (typeof mapping === 'string' && guess) throw bad('--mapping', 'give --mapping FILE or --guess, not both');
  return {
    customer: requireOption(args, 'customer'),
    ...(typeof mapping === 'string' ? { mapping: mappingFile(mapping, args) } : {}),
    useSavedMapping: !guess,
    units: choice(args, 'units', ['metric', 'inch']),
    decimalMark: choice(args, 'decimal-mark', ['.', ',']),
    fixes: fixes(args),
    skip: skipRows(args),
  };
}

/** A preview's JSON without each ready row's draft job (--jobs keeps them). */
const shown = (preview: RequestPreviewResult, args: ParsedArgs) =>
  args.options.has('jobs') ? preview : { ...preview, rows: preview.rows.map(({ job: _job, ...row }) => row) };

export const importRequestCommand: Command = {
  name: 'import-request',
  usage: [
    'import-request FILE --customer NAME [--mapping FILE | --guess] [--units metric|inch] [--decimal-mark .|,] [--reference REF]',
    '  [--skip 7,12] [--fixes FIXES.json] [--dry-run] [--jobs] --db DB   a customer\'s request sheet (CSV or XLSX, one spring per row) as draft',
    '  jobs under one enquiry; prints the preview (every cell that does not read, by reference); --dry-run previews only (no --db needed',
    '  with --guess or --mapping); without --mapping or --guess the customer\'s saved mapping applies',
  ].join('\n'),
  async run(args, out) {
    const file = positional(args, 0, 'FILE', 'import-request');
    const sheet = await readSheet(file);
    const options = requestOptions(args);
    const dryRun = args.options.get('dry-run') === true;
    if (dryRun && typeof args.options.get('db') !== 'string') {
      const preview = previewRequestSheet(sheet, { given: options.mapping, units: options.units, decimalMark: options.decimalMark, fixes: options.fixes, skip: options.skip });
      out(toJson(shown({ ...preview, savedMapping: false }, args)));
      return;
    }
    await withStore(args, async (call) => {
      const preview = await call('previewRequestSheet', { sheet, ...options, includeJobs: args.options.has('jobs') });
      if (!options.mapping && options.useSavedMapping && !preview.savedMapping) {
        throw bad('--mapping', `no mapping is kept for ${options.customer} yet: give --mapping FILE or --guess`, 'no-saved-mapping');
      }
      // A refused import still shows the preview, so every marked cell is there to fix.
      if (dryRun || preview.counts.error > 0 || preview.mappingErrors.length > 0) out(toJson(shown(preview, args)));
      if (dryRun) return;
      const reference = typeof args.options.get('reference') === 'string' ? String(args.options.get('reference')) : basename(file).replace(/\.[^.]+$/, '');
      const imported = await call('importRequestSheet', { sheet, ...options, reference });
      out(toJson(imported));
    });
  },
};
