// Seeded source of uniform doubles on [0, 1) and standard normal deviates N(0, 1).
// Source: xoroshiro128+ (Blackman & Vigna, "Scrambled linear pseudorandom number generators",
// 2018) as provided by pure-rand; normals by the Box–Muller transform (Box & Muller, "A note
// on the generation of random normal deviates", Ann. Math. Stat. 29, 1958).
// Stopping rule: none (an endless stream); the state lives in the object the caller holds.

import { xoroshiro128plus, xoroshiro128plusFromState } from "pure-rand/generator/xoroshiro128plus";
import { uniformFloat64 } from "pure-rand/distribution/uniformFloat64";
import type { JumpableRandomGenerator } from "pure-rand/types/JumpableRandomGenerator";

/** A caller-owned random stream. Two streams built from the same seed give identical values. */
export interface Rng {
  /** Uniform double in [0, 1), a multiple of 2⁻⁵³. */
  uniform(): number;
  /** Standard normal deviate (mean 0, variance 1). */
  normal(): number;
  /** Uniform integer in [0, 2³²), e.g. to seed a child stream. */
  uint32(): number;
  /** Independent copy that continues with exactly the same values. */
  clone(): Rng;
}

/** Outputs discarded after seeding: the seeded state (−1, ~seed, seed, 0) is low in entropy. */
const WARM_UP_DRAWS = 32;

/**
 * Creates a stream from an integer seed. Seeds are used modulo 2³² (pure-rand keeps 32 bits).
 * @throws Error if the seed is not a safe integer.
 */
export function createRng(seed: number): Rng {
  if (!Number.isSafeInteger(seed)) {
    throw new Error(`createRng: seed must be a safe integer (got ${seed})`);
  }
  const generator = xoroshiro128plus(seed | 0);
  for (let i = 0; i < WARM_UP_DRAWS; i++) generator.next();
  return wrap(generator, null);
}

function wrap(generator: JumpableRandomGenerator, spareNormal: number | null): Rng {
  let spare = spareNormal;
  const uniform = (): number => uniformFloat64(generator);
  return {
    uniform,
    normal(): number {
      if (spare !== null) {
        const z = spare;
        spare = null;
        return z;
      }
      const u1 = 1 - uniform(); // u1 ∈ (0, 1], so ln u1 is finite
      const u2 = uniform();
      const radius = Math.sqrt(-2 * Math.log(u1)); // r = √(−2 ln u1)
      const angleRad = 2 * Math.PI * u2; // θ = 2π u2
      spare = radius * Math.sin(angleRad); // z1 = r sin θ, kept for the next call
      return radius * Math.cos(angleRad); // z0 = r cos θ
    },
    uint32(): number {
      return generator.next() >>> 0;
    },
    clone(): Rng {
      return wrap(xoroshiro128plusFromState(generator.getState()), spare);
    },
  };
}
