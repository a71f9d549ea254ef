/** Seeded pseudo-random numbers for reproducible demo data (not for anything secret). */

/** mulberry32: a small 32-bit generator; returns uniform numbers in [0, 1). */
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

/** Standard normal deviates from a uniform source (Box–Muller, one value per call). */
export function normalFrom(uniform: () => number): () => number {
  return () => {
    const u1 = 1 - uniform(); // (0, 1]: keeps the log finite
    const u2 = uniform();
    return Math.sqrt(-2 * Math.log(u1)) * Math.cos(2 * Math.PI * u2);
  };
}

/** 32-bit FNV-1a hash of a string, so each file can get its own seed independent of order. */
export function hashSeed(text: string): number {
  let h = 0x811c9dc5;
  for (let i = 0; i < text.length; i++) {
    h ^= text.charCodeAt(i);
    h = Math.imul(h, 0x01000193);
  }
  return h >>> 0;
}
