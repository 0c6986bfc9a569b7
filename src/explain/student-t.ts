/**
 * Quantiles of Student's t distribution with an integer number of degrees of freedom, for the intervals
 * around repeated measurements (permutation importance).
 *
 * P(|T| ≤ t) has a closed form for integer ν (Abramowitz & Stegun (1964) "Handbook of Mathematical
 * Functions", 26.7.3 and 26.7.4), with θ = atan(t / √ν):
 * - ν odd:  (2/π)·(θ + sin θ·(cos θ + (2/3)cos³θ + … + (2·4⋯(ν−3))/(1·3⋯(ν−2))·cos^(ν−2) θ)), the bracket empty for ν = 1;
 * - ν even: sin θ·(1 + (1/2)cos²θ + (1·3)/(2·4)cos⁴θ + … + (1·3⋯(ν−3))/(2·4⋯(ν−2))·cos^(ν−2) θ).
 * The quantile is found by bisection on that increasing function.
 */
import { errors } from '../errors.js';

/**
 * P(|T| ≤ t) for Student's t with ν degrees of freedom (t ≥ 0).
 * @example
 * studentTwoSided(1, 1); // 0.5 (the Cauchy case)
 */
export function studentTwoSided(t: number, nu: number): number {
  const theta = Math.atan(t / Math.sqrt(nu));
  const s = Math.sin(theta), c = Math.cos(theta), c2 = c * c;
  if (nu % 2 === 1) {
    if (nu === 1) return (2 / Math.PI) * theta;
    let term = c, sum = c;
    for (let k = 3; k <= nu - 2; k += 2) { term *= (c2 * (k - 1)) / k; sum += term; }
    return (2 / Math.PI) * (theta + s * sum);
  }
  let term = 1, sum = 1;
  for (let k = 2; k <= nu - 2; k += 2) { term *= (c2 * (k - 1)) / k; sum += term; }
  return s * sum;
}

/**
 * The t such that P(|T| ≤ t) = `level` (so t is the (1 + level)/2 quantile), ν a positive integer.
 * @example
 * studentQuantile(0.95, 4); // 2.776…
 */
export function studentQuantile(level: number, nu: number): number {
  if (!(level > 0 && level < 1)) throw errors.badOption('level', level, 'a number strictly between 0 and 1');
  if (!(Number.isInteger(nu) && nu >= 1)) throw errors.badOption('degrees of freedom', nu, 'an integer >= 1');
  let lo = 0, hi = 1;
  while (studentTwoSided(hi, nu) < level) hi *= 2;
  for (let i = 0; i < 200 && hi - lo > 1e-13 * hi; i++) {
    const mid = (lo + hi) / 2;
    if (studentTwoSided(mid, nu) < level) lo = mid; else hi = mid;
  }
  return (lo + hi) / 2;
}
