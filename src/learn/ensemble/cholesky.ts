/**
 * Solve A x = b for a symmetric positive-definite A by the Cholesky factorisation A = L Lᵀ
 * (Golub & Van Loan, Matrix Computations, 4th ed., Algorithm 4.2.1), then two triangular solves.
 * Used by the stacking combiners (ridge normal equations, Newton steps).
 */
import { errors } from '../../errors.js';

/**
 * Solve `A x = b`; `A` is d×d row-major and is not modified. Throws when A is not positive definite.
 * @example
 * solveCholesky(Float64Array.of(4, 2, 2, 3), Float64Array.of(2, 1), 2); // [0.5, 0]
 */
export function solveCholesky(A: Float64Array, b: Float64Array, d: number): Float64Array {
  const L = new Float64Array(d * d);
  for (let j = 0; j < d; j++) {
    let s = A[j * d + j];
    for (let k = 0; k < j; k++) s -= L[j * d + k] * L[j * d + k];
    if (!(s > 0)) throw errors.notSupported('A combiner system that is not positive definite (add ridge)');
    const ljj = Math.sqrt(s);
    L[j * d + j] = ljj;
    for (let i = j + 1; i < d; i++) {
      let t = A[i * d + j];
      for (let k = 0; k < j; k++) t -= L[i * d + k] * L[j * d + k];
      L[i * d + j] = t / ljj;
    }
  }
  const z = new Float64Array(d);
  for (let i = 0; i < d; i++) {
    let s = b[i];
    for (let k = 0; k < i; k++) s -= L[i * d + k] * z[k];
    z[i] = s / L[i * d + i];
  }
  const x = new Float64Array(d);
  for (let i = d - 1; i >= 0; i--) {
    let s = z[i];
    for (let k = i + 1; k < d; k++) s -= L[k * d + i] * x[k];
    x[i] = s / L[i * d + i];
  }
  return x;
}
