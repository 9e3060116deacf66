import { readFileSync } from 'node:fs';

/** Exit codes of the command line: 0 done (a report may carry error findings), 2 bad input, 1 unexpected. */
export const EXIT = { ok: 0, unexpected: 1, badInput: 2 } as const;

export class InputError extends Error {
  constructor(readonly errors: { code: string; message: string; path: string }[]) {
    super(errors.map((e) => `${e.path || '(spec)'}: ${e.message}`).join('; '));
  }
}

/** Reads a JSON file, or standard input for "-". Bad JSON is an input error naming the file. */
export function readJson(file: string): unknown {
  let text: string;
  try {
    text = file === '-' ? readFileSync(0, 'utf8') : readFileSync(file, 'utf8');
  } catch (e) {
    throw new InputError([{ code: 'unreadable-file', path: '', message: `${file}: cannot be read (${(e as NodeJS.ErrnoException).code ?? (e as Error).message})` }]);
  }
  try {
    return JSON.parse(text);
  } catch (e) {
    throw new InputError([{ code: 'invalid-json', path: '', message: `${file}: not valid JSON (${(e as Error).message})` }]);
  }
}

/** JSON with non-finite numbers (an unbounded safety factor, an unreachable length) written as null. */
export function toJson(value: unknown): string {
  return JSON.stringify(value, (_k, v) => (typeof v === 'number' && !Number.isFinite(v) ? null : v), 2);
}

export interface ParsedArgs {
  positional: string[];
  options: Map<string, string | true>;
}

/** `--name value` and `--flag`; everything else positional. */
export function parseArgs(argv: string[]): ParsedArgs {
  const positional: string[] = [];
  const options = new Map<string, string | true>();
  for (let i = 0; i < argv.length; i++) {
    const a = argv[i]!;
    if (a.startsWith('--') && a.length > 2) {
      const next = argv[i + 1];
      if (next !== undefined && !next.startsWith('--')) {
        options.set(a.slice(2), next);
        i++;
      } else options.set(a.slice(2), true);
    } else positional.push(a);
  }
  return { positional, options };
}

export function requireOption(args: ParsedArgs, name: string): string {
  const v = args.options.get(name);
  if (typeof v !== 'string') throw new InputError([{ code: 'missing-option', path: `--${name}`, message: `--${name} is required` }]);
  return v;
}
