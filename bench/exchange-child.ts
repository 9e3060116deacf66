// The export or import the store suite measures, as its own small program: its peak memory is the
// exchange's, not the bench's (see bench/suites/exchange.ts).
import { exchangeChild } from './suites/exchange-child';

void exchangeChild(process.argv.slice(2)).catch((e: Error) => {
  process.stderr.write(`${e.message}\n`);
  process.exitCode = 1;
});
