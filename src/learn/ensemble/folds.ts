/**
 * Seeded k-fold assignment for stacking's out-of-fold predictions; with class codes the folds are
 * stratified (each class's rows shuffled, then dealt round-robin), so every fold keeps the class mix
 * (Kohavi, R. (1995) "A study of cross-validation and bootstrap for accuracy estimation and model
 * selection", IJCAI, recommends stratified 10-fold).
 */
import { errors } from '../../errors.js';
import { shuffleInPlace, type Rng } from '../../util/rng.js';

/**
 * Fold index (0..k−1) of each of `n` rows.
 * @param codes class code per row for stratification, or null. __Default:__ null.
 * @example
 * assignFolds(10, 5, createRng(1)); // two rows in each fold
 */
export function assignFolds(n: number, k: number, rng: Rng, codes: Int32Array | null = null): Int32Array {
  if (!Number.isInteger(k) || k < 2) throw errors.badOption('folds', k, 'an integer >= 2');
  if (n < k) throw errors.badOption('folds', k, `at most the number of rows (${n})`);
  const fold = new Int32Array(n);
  const groups = new Map<number, number[]>();
  for (let i = 0; i < n; i++) {
    const g = codes ? codes[i] : 0;
    let list = groups.get(g);
    if (!list) { list = []; groups.set(g, list); }
    list.push(i);
  }
  let next = 0;
  for (const g of [...groups.keys()].sort((a, b) => a - b)) {
    const rows = shuffleInPlace(rng, groups.get(g) as number[]);
    for (const i of rows) { fold[i] = next; next = (next + 1) % k; }
  }
  return fold;
}
