import type { ParsedArgs } from './io';

/** One CLI command: prints its result to stdout, throws InputError for bad input. */
export interface Command {
  name: string;
  usage: string;
  run(args: ParsedArgs, out: (text: string) => void): Promise<void> | void;
}
