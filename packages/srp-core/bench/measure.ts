/**
 * Times `fn` (which performs `opsPerCall` operations per call) after a warm-up, repeating until
 * at least `minMs` have passed; prints and returns operations per second (best of 5 rounds).
 */
export function measure(label: string, opsPerCall: number, fn: () => void, minMs = 300): number {
  for (let i = 0; i < 2000; i += 1) fn(); // warm-up: let the JIT settle
  let best = 0;
  for (let round = 0; round < 5; round += 1) {
    let calls = 0;
    const start = performance.now();
    let elapsed = 0;
    while (elapsed < minMs) {
      for (let i = 0; i < 1000; i += 1) fn();
      calls += 1000;
      elapsed = performance.now() - start;
    }
    best = Math.max(best, (calls * opsPerCall) / (elapsed / 1000));
  }
  console.log(`${label}: ${(best / 1e6).toFixed(2)} million/s (${(1e9 / best).toFixed(1)} ns each, best of 5)`);
  return best;
}

const referenceSink = new Float64Array(1);

/**
 * A fixed arithmetic loop (ns per iteration): this machine's speed swings about 2× over minutes,
 * and printing this beside a figure tells a slow stretch from slow code.
 */
export function referenceLoopNs(): number {
  let acc = 0;
  const start = performance.now();
  for (let i = 0; i < 20_000_000; i += 1) acc += (i & 7) * 0.5;
  const ns = ((performance.now() - start) * 1e6) / 20_000_000;
  referenceSink[0] = referenceSink[0]! + acc;
  return ns;
}
