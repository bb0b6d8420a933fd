// Small numeric helpers shared by the benchmarks and by tests that need a repeatable random rig.

/** Deterministic pseudo-random numbers in [0, 1) (mulberry32), so every run times or tests the same data. */
export function seededRandom(seed: number): () => number {
  return () => {
    seed = (seed + 0x6d2b79f5) | 0;
    let t = Math.imul(seed ^ (seed >>> 15), 1 | seed);
    t = (t + Math.imul(t ^ (t >>> 7), 61 | t)) ^ t;
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

/** Median, 95th percentile (nearest rank) and maximum of a set of timings. */
export function summarise(samples: number[]): { median: number; p95: number; max: number; best: number } {
  const t = [...samples].sort((a, b) => a - b);
  return {
    median: t[Math.floor(t.length / 2)],
    p95: t[Math.min(t.length - 1, Math.ceil(t.length * 0.95) - 1)],
    max: t[t.length - 1],
    best: t[0],
  };
}
