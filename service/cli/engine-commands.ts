import { calculate } from '../../core/calculate';
import { gradeSummaries } from '../../core/materials';
import type { Command } from './commands';
import { InputError, readJson, toJson } from './io';

/** The report of one spec, or its field errors as an input error. */
function reportOf(raw: unknown): unknown {
  const result = calculate(raw);
  if (!result.ok) throw new InputError(result.errors);
  return result.value;
}

export const calcCommand: Command = {
  name: 'calc',
  usage: [
    'calc FILE|-            analyse and review a spring spec; prints the report as JSON',
    '  calc --batch FILE|-    many specs (a JSON list, JSON lines, or a CSV with one spec a line under field-path headers):',
    '                         one JSON line each, {spec, line?, ok, result} or {spec, line?, ok: false, errors}; exit 2 if any failed',
  ].join('\n'),
  run(args, out) {
    if (args.options.has('batch')) return import('./batch').then(({ runBatch }) => runBatch(args, out, reportOf));
    const file = args.positional[0];
    if (!file) throw new InputError([{ code: 'missing-file', path: 'FILE', message: 'calc needs a spec file, or - for standard input' }]);
    out(toJson(reportOf(readJson(file))));
  },
};

export const materialsCommand: Command = {
  name: 'materials',
  usage: 'materials              list the wire grades with their size and temperature ranges',
  run(_args, out) {
    out(toJson(gradeSummaries()));
  },
};
