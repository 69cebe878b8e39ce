/** Test fixture for runPool: a kernel imported with a .js suffix, to prove the TypeScript worker loads its own imports. */
export function squareKernel(x: number, busy_ms: number): number {
  const until = performance.now() + busy_ms;
  while (performance.now() < until) {
    // busy wait: stands in for a shot's computation
  }
  if (x < 0) throw new RangeError(`negative input ${x}`);
  return x * x;
}
