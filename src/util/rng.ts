/**
 * Seeded pseudo-random numbers for every random choice in coppice.
 *
 * Algorithm: xoshiro128** 1.1 (Blackman & Vigna, "Scrambled linear pseudorandom number generators",
 * ACM TOMS 47(4), 2021), a 128-bit state generator with 32-bit output. The state is filled from the
 * seed with SplitMix32 (a 32-bit variant of Steele, Lea & Flood, "Fast splittable pseudorandom number
 * generators", OOPSLA 2014), so any integer seed, including 0, gives a well-mixed state.
 *
 * `derive(seed, ...ids)` gives an independent stream for a sub-task (tree i, fold k) that depends only on
 * the seed and the ids — never on the order work is scheduled — so results do not depend on worker count.
 */
export interface Rng {
  /** Seed this generator was created from (recorded with models). */
  readonly seed: number;
  /** Uniform 32-bit unsigned integer. */
  nextU32(): number;
  /** Uniform double in [0, 1) with 53 random bits. */
  next(): number;
  /** Uniform integer in [0, n). */
  int(n: number): number;
  /** Standard normal deviate (Marsaglia polar method). */
  normal(): number;
}

function splitmix32(state: { s: number }): number {
  state.s = (state.s + 0x9e3779b9) | 0;
  let z = state.s;
  z = Math.imul(z ^ (z >>> 16), 0x85ebca6b);
  z = Math.imul(z ^ (z >>> 13), 0xc2b2ae35);
  return (z ^ (z >>> 16)) >>> 0;
}

/**
 * Hash a seed and a list of ids into a new 32-bit seed (order-sensitive).
 * @example
 * deriveSeed(42, 3) === deriveSeed(42, 3); // true: tree 3 of a run seeded 42
 */
export function deriveSeed(seed: number, ...ids: number[]): number {
  const st = { s: seed | 0 };
  let h = splitmix32(st);
  for (const id of ids) {
    st.s = (h ^ Math.imul(id | 0, 0x27d4eb2d)) | 0;
    h = splitmix32(st);
  }
  return h >>> 0;
}

/**
 * Create a seeded generator.
 * @example
 * const rng = createRng(42);
 * rng.int(10); // same value on every run
 */
export function createRng(seed: number): Rng {
  if (!Number.isFinite(seed)) throw new RangeError(`seed must be a finite number, got ${seed}`);
  const st = { s: Math.trunc(seed) | 0 };
  let a = splitmix32(st), b = splitmix32(st), c = splitmix32(st), d = splitmix32(st);
  if ((a | b | c | d) === 0) a = 1;
  let spare: number | null = null;
  const nextU32 = (): number => {
    const result = Math.imul(rotl(Math.imul(b, 5), 7), 9) >>> 0;
    const t = b << 9;
    c ^= a; d ^= b; b ^= c; a ^= d;
    c ^= t;
    d = rotl(d, 11);
    return result;
  };
  const next = (): number => (nextU32() * 2097152 + (nextU32() >>> 11)) / 9007199254740992;
  return {
    seed: Math.trunc(seed),
    nextU32,
    next,
    int(n: number): number {
      if (!(n >= 1)) throw new RangeError(`int(n) needs n >= 1, got ${n}`);
      return Math.floor(next() * n);
    },
    normal(): number {
      if (spare !== null) { const s = spare; spare = null; return s; }
      let u: number, v: number, s: number;
      do { u = 2 * next() - 1; v = 2 * next() - 1; s = u * u + v * v; } while (s >= 1 || s === 0);
      const m = Math.sqrt((-2 * Math.log(s)) / s);
      spare = v * m;
      return u * m;
    },
  };
}

function rotl(x: number, k: number): number {
  return (x << k) | (x >>> (32 - k));
}

/**
 * A generator for sub-task `ids` of a run seeded with `seed`: the same whatever order tasks run in.
 * @example
 * const rngTree7 = derive(42, 7); // tree 7 of a forest seeded 42, on any worker
 */
export function derive(seed: number, ...ids: number[]): Rng {
  return createRng(deriveSeed(seed, ...ids));
}

/**
 * Fisher–Yates shuffle in place (Durstenfeld's variant); returns the array.
 * @example
 * shuffleInPlace(createRng(1), [1, 2, 3, 4]); // a permutation, the same for seed 1 every time
 */
export function shuffleInPlace<T extends { length: number; [i: number]: any }>(rng: Rng, a: T): T {
  for (let i = a.length - 1; i > 0; i--) {
    const j = rng.int(i + 1);
    const t = a[i]; a[i] = a[j]; a[j] = t;
  }
  return a;
}
