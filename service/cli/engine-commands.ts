import { calculate } from '../../core/calculate';
import { gradeSummaries } from '../../core/materials';
import type { Command } from './commands';
import { InputError, readJson, toJson } from './io';

export const calcCommand: Command = {
  name: 'calc',
  usage: 'calc FILE|-            analyse and review a spring spec; prints the report as JSON',
  run(args, out) {
    const file = args.positional[0];
    if (!file) throw new InputError([{ code: 'missing-file', path: 'FILE', message: 'calc needs a spec file, or - for standard input' }]);
    const result = calculate(readJson(file));
    if (!result.ok) throw new InputError(result.errors);
    out(toJson(result.value));
  },
};

export const materialsCommand: Command = {
  name: 'materials',
  usage: 'materials              list the wire grades with their size and temperature ranges',
  run(_args, out) {
    out(toJson(gradeSummaries()));
  },
};
