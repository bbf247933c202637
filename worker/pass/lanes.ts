/**
 * Runs `lane` `count` times side by side (each takes work from a shared list until it is empty) and
 * waits for every one to stop, so nothing is left writing behind the caller; then rethrows the
 * first failure, if any.
 */
export async function inLanes(count: number, lane: () => Promise<void>): Promise<void> {
  const outcomes = await Promise.allSettled(Array.from({ length: Math.max(1, count) }, lane));
  const failure = outcomes.find((o): o is PromiseRejectedResult => o.status === 'rejected');
  if (failure) throw failure.reason;
}
