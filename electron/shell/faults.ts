import type { Log } from './logging';

export interface FaultReporter {
  /** Logs an unexpected failure and tells the user once; the app keeps running. */
  report(context: string, error: unknown): void;
}

/** What the user reads: what happened, that their saved work is safe, and where the details are. */
export function faultMessage(error: unknown, logFile: string): string {
  const reason = error instanceof Error ? error.message : String(error);
  return `Coilwright ran into an unexpected problem: ${reason}\n\n`
    + 'Saved jobs are not affected. Check the last change you made before relying on it.\n\n'
    + `Details were written to ${logFile}`;
}

/**
 * Every failure is logged; only one dialog is on screen at a time, so a burst of the same failure
 * does not bury the window under dialogs.
 */
export function createFaultReporter(log: Log, show: (message: string) => Promise<unknown> | void): FaultReporter {
  let showing = false;
  return {
    report(context, error) {
      log.error(context, error);
      if (showing) return;
      showing = true;
      Promise.resolve()
        .then(() => show(faultMessage(error, log.file)))
        .catch((e: unknown) => log.error('fault-dialog', e))
        .finally(() => { showing = false; });
    },
  };
}
