import { performance } from 'node:perf_hooks';

/** Milliseconds spent in each step of a pass, added up over its batches (the benchmark prints them). */
export type Timings = Record<string, number>;

/** Runs `work` and adds its duration to `timings[step]`, when a timings object was given. */
export async function timed<T>(timings: Timings | undefined, step: string, work: () => Promise<T> | T): Promise<T> {
  if (!timings) return work();
  const started = performance.now();
  try {
    return await work();
  } finally {
    timings[step] = (timings[step] ?? 0) + performance.now() - started;
  }
}
