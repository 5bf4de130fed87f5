/**
 * Seeded pseudo-random numbers for reproducible Monte Carlo in the pure core (no Math.random, no clock).
 *
 * Generator: mulberry32 (Tommy Ettinger's 32-bit mixing generator, public domain, 2017; widely used
 * as a small seeded PRNG in JavaScript). Period 2³², ample for screening runs of a few thousand draws.
 * Normal deviates: Box–Muller transform (Box & Muller 1958, Ann. Math. Stat. 29, 610).
 */
export interface SeededRandom {
  /** Uniform deviate in [0, 1). */
  uniform(): number;
  /** Standard normal deviate (mean 0, standard deviation 1). */
  normal(): number;
}

/** Create a seeded generator; the same seed always gives the same sequence. */
export function createSeededRandom(seed: number): SeededRandom {
  let state = (Math.trunc(seed) >>> 0) ^ 0x9e3779b9;
  let spare: number | null = null;
  const uniform = (): number => {
    state = (state + 0x6d2b79f5) >>> 0;
    let t = state;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
  const normal = (): number => {
    if (spare !== null) {
      const s = spare;
      spare = null;
      return s;
    }
    let u1 = uniform();
    while (u1 <= 0) u1 = uniform();
    const u2 = uniform();
    const r = Math.sqrt(-2 * Math.log(u1));
    spare = r * Math.sin(2 * Math.PI * u2);
    return r * Math.cos(2 * Math.PI * u2);
  };
  return { uniform, normal };
}
