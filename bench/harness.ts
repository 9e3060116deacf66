/** A measured number with the target it is held to (targets come from the project's issues). */
export interface BenchRow {
  suite: string;
  name: string;
  value: number;
  unit: string;
  target?: string;
  pass?: boolean;
}

export interface BenchSuite {
  name: string;
  /** Left out of a plain `npm run bench`; run by naming it (e.g. the million-job store). */
  onlyWhenAsked?: boolean;
  run(): Promise<BenchRow[]> | BenchRow[];
}

/** Runs fn repeatedly for about `ms` milliseconds (after a warm-up) and returns calls per second. */
export function throughput(fn: (i: number) => void, ms = 1000): number {
  for (let i = 0; i < 2000; i++) fn(i);
  let calls = 0;
  const start = performance.now();
  let now = start;
  while (now - start < ms) {
    for (let i = 0; i < 1000; i++) fn(calls + i);
    calls += 1000;
    now = performance.now();
  }
  return (calls * 1000) / (now - start);
}

/** Times each call and returns percentiles in milliseconds. */
export function latencies(fn: (i: number) => void, count: number): { p50: number; p95: number; max: number } {
  const times: number[] = [];
  for (let i = 0; i < count; i++) {
    const t0 = performance.now();
    fn(i);
    times.push(performance.now() - t0);
  }
  times.sort((a, b) => a - b);
  const at = (q: number) => times[Math.min(times.length - 1, Math.floor(q * times.length))]!;
  return { p50: at(0.5), p95: at(0.95), max: times[times.length - 1]! };
}
