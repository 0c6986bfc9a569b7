export { createRng, derive, deriveSeed, shuffleInPlace } from './rng.js';
export type { Rng } from './rng.js';
