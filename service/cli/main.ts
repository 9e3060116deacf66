import type { Command } from './commands';
import { EXIT, InputError, parseArgs, toJson } from './io';

/**
 * Each command's module loads when that command runs, so `calc` never loads the store, and only
 * `print` (and the store's print methods) load the PDF writers.
 */
const commands: Record<string, () => Promise<Command>> = {
  calc: async () => (await import('./engine-commands')).calcCommand,
  materials: async () => (await import('./engine-commands')).materialsCommand,
  sheet: async () => (await import('./plan-commands')).sheetCommand,
  price: async () => (await import('./plan-commands')).priceCommand,
  jobs: async () => (await import('./job-commands')).jobsCommand,
  customers: async () => (await import('./customer-commands')).customersCommand,
  db: async () => (await import('./db-commands')).dbCommand,
  demo: async () => (await import('./db-commands')).demoCommand,
  print: async () => (await import('./print-commands')).printCommand,
  design: async () => (await import('./design-commands')).designCommand,
  'first-off': async () => (await import('./first-off-commands')).firstOffCommand,
  'import-request': async () => (await import('./request-commands')).importRequestCommand,
};

async function usage(): Promise<string> {
  const all = await Promise.all(Object.values(commands).map((load) => load()));
  const { storeCheckHelp } = await import('./store-session');
  return ['usage: npm run -s cli -- <command> …', ...all.map((c) => `  ${c.usage}`), '', storeCheckHelp].join('\n');
}

/** Runs one command line; returns the exit code. Output and errors go through the given writers. */
export async function runCli(
  argv: string[],
  out: (text: string) => void = (t) => process.stdout.write(`${t}\n`),
  err: (text: string) => void = (t) => process.stderr.write(`${t}\n`),
): Promise<number> {
  const [name, ...rest] = argv;
  const load = name === undefined || !Object.hasOwn(commands, name) ? undefined : commands[name];
  if (!load) {
    err(await usage());
    return name === undefined || name === 'help' || name === '--help' ? EXIT.ok : EXIT.badInput;
  }
  try {
    const code = await (await load()).run(parseArgs(rest), out);
    return typeof code === 'number' ? code : EXIT.ok;
  } catch (e) {
    if (e instanceof InputError) {
      err(toJson({ errors: e.errors }));
      return EXIT.badInput;
    }
    err(toJson({ errors: [{ code: 'unexpected', path: '', message: (e as Error).message }] }));
    return EXIT.unexpected;
  }
}

const invokedDirectly = process.argv[1] !== undefined && /cli[\\/](main\.[cm]?[jt]s|cli\.cjs)$/.test(process.argv[1]);
if (invokedDirectly) {
  runCli(process.argv.slice(2)).then((code) => { process.exitCode = code; });
}
