import { designFromRequirement } from '../../core/design';
import type { Command } from './commands';
import { InputError, readJson, toJson } from './io';
import { intOption, positional } from './store-session';
import { settingsFor } from './plan-commands';

export const designCommand: Command = {
  name: 'design',
  usage: 'design FILE [--db DB] [--limit N]   springs that meet a requirement file, cheapest first, each with its spec (JSON)',
  run(args, out) {
    const raw = readJson(positional(args, 0, 'FILE', 'design'));
    const limit = intOption(args, 'limit') ?? 10;
    if (!(limit >= 1 && limit <= 100)) throw new InputError([{ code: 'invalid-option', path: '--limit', message: '--limit must be from 1 to 100' }]);
    const answer = designFromRequirement(raw, settingsFor(args, false), limit);
    if (!answer.ok) throw new InputError(answer.errors);
    out(toJson(answer.value));
  },
};
