import type { ParsedArgs } from './io';
import { InputError } from './io';

/** One CLI command: prints its result to stdout, throws InputError for bad input; may answer its own exit code (a batch). */
export interface Command {
  name: string;
  usage: string;
  run(args: ParsedArgs, out: (text: string) => void): Promise<void | number> | void | number;
}

/** The subcommand named by the first word after the command, or an input error listing the ones there are. */
export function subcommandOf<T>(command: string, args: ParsedArgs, subcommands: Record<string, T>): T {
  const name = args.positional[0];
  if (name !== undefined && Object.hasOwn(subcommands, name)) return subcommands[name]!;
  throw new InputError([{ code: 'unknown-command', path: command, message: `${command} needs one of: ${Object.keys(subcommands).join(', ')}` }]);
}
