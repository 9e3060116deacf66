import type { Command } from './commands';
import { calcCommand, materialsCommand } from './engine-commands';
import { jobsCommand } from './job-commands';
import { dbCommand, demoCommand } from './db-commands';
import { priceCommand, sheetCommand } from './plan-commands';
import { printCommand } from './print-commands';
import { designCommand } from './design-commands';
import { EXIT, InputError, parseArgs, toJson } from './io';

const commands: Command[] = [calcCommand, materialsCommand, sheetCommand, priceCommand, jobsCommand, dbCommand, demoCommand, printCommand, designCommand];

function usage(): string {
  return ['usage: npm run -s cli -- <command> …', ...commands.map((c) => `  ${c.usage}`)].join('\n');
}

/** Runs one command line; returns the exit code. Output and errors go through the given writers. */
export async function runCli(
  argv: string[],
  out: (text: string) => void = (t) => process.stdout.write(`${t}\n`),
  err: (text: string) => void = (t) => process.stderr.write(`${t}\n`),
): Promise<number> {
  const [name, ...rest] = argv;
  const command = commands.find((c) => c.name === name);
  if (!command) {
    err(usage());
    return name === undefined || name === 'help' || name === '--help' ? EXIT.ok : EXIT.badInput;
  }
  try {
    await command.run(parseArgs(rest), out);
    return EXIT.ok;
  } catch (e) {
    if (e instanceof InputError) {
      err(toJson({ errors: e.errors }));
      return EXIT.badInput;
    }
    err(toJson({ errors: [{ code: 'unexpected', path: '', message: (e as Error).message }] }));
    return EXIT.unexpected;
  }
}

const invokedDirectly = process.argv[1] !== undefined && /cli[\\/]main\.[cm]?[jt]s$/.test(process.argv[1]);
if (invokedDirectly) {
  runCli(process.argv.slice(2)).then((code) => { process.exitCode = code; });
}
