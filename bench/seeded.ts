/** mulberry32: a small seeded generator (public domain), so every run times the same values. */
export function seeded(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

let sink = 0;

/**
 * Best ns per call of `call(i)` over several timed batches after a warm-up; `i` counts the
 * calls, so a case can take a different input each time.
 */
export function bestNsPerCall(call: (i: number) => unknown[][], batch = 20000, rounds = 7): number {
  for (let i = 0; i < batch; i++) sink += call(i).length;
  let best = Infinity;
  for (let r = 0; r < rounds; r++) {
    const t0 = process.hrtime.bigint();
    for (let i = 0; i < batch; i++) sink += call(i).length;
    const ns = Number(process.hrtime.bigint() - t0) / batch;
    if (ns < best) best = ns;
  }
  if (sink === -1) console.log(sink);
  return best;
}
