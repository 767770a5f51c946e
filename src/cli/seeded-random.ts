/**
 * mulberry32, a small public-domain 32-bit seeded generator: the same seed gives the same sequence on every run,
 * for reservoir sampling, demo data, test logs and benchmarks. Uniform in [0, 1) (T. Ettinger 2017; from memory).
 */
export function mulberry32(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}
