import { designFromRequirement } from '../../core/design';
import type { Command } from './commands';
import { InputError, readJson, toJson } from './io';
import { intOption, positional, withStore } from './store-session';
import { settingsFor } from './plan-commands';

function limitOf(args: Parameters<Command['run']>[0]): number {
  const limit = intOption(args, 'limit') ?? 10;
  if (!(limit >= 1 && limit <= 100)) throw new InputError([{ code: 'invalid-option', path: '--limit', message: '--limit must be from 1 to 100' }]);
  return limit;
}

export const designCommand: Command = {
  name: 'design',
  usage: 'design FILE|--job ID [--db DB] [--limit N]   springs that meet a requirement (a file, or the one kept with a job), cheapest first, each with its spec (JSON)',
  async run(args, out) {
    const limit = limitOf(args);
    const job = intOption(args, 'job');
    if (job !== undefined) {
      // Again with today's stock and prices: the requirement the job was designed from, through the store's API.
      await withStore(args, async (call) => {
        const kept = await call('jobRequirement', { jobId: job });
        out(toJson(await call('designSprings', { requirement: kept.requirement, limit })));
      });
      return;
    }
    const raw = readJson(positional(args, 0, 'FILE', 'design'));
    const answer = designFromRequirement(raw, settingsFor(args, false), limit);
    if (!answer.ok) throw new InputError(answer.errors);
    out(toJson(answer.value));
  },
};
