// A small seeded generator for the Latin hypercube: the same seed gives the
// same samples on every machine and in every shard. The core keeps no global
// randomness; a sweep names its seed.

/** Uniform numbers in [0, 1) from a 32-bit seed: a multiply-xorshift step over a Weyl sequence. */
export function seededRandom(seed: number): () => number {
  let state = seed >>> 0;
  return () => {
    state = (state + 0x6d2b79f5) >>> 0;
    let z = state;
    z = Math.imul(z ^ (z >>> 15), z | 1);
    z ^= z + Math.imul(z ^ (z >>> 7), z | 61);
    return ((z ^ (z >>> 14)) >>> 0) / 4294967296;
  };
}

/** 0..n-1 in an order drawn from the generator (Fisher-Yates). */
export function shuffledIndices(n: number, random: () => number): number[] {
  const out = Array.from({ length: n }, (_, i) => i);
  for (let i = n - 1; i > 0; i--) {
    const j = Math.floor(random() * (i + 1));
    [out[i], out[j]] = [out[j], out[i]];
  }
  return out;
}
