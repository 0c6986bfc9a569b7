/**
 * Held-out error of a sequence of nested subtrees, accumulated row by row so a standard error can be
 * given: at evaluation point k a row is predicted by the first node on its path that is collapsed at
 * `alphas[k]` (collapseAt <= alpha), else by its leaf.
 *
 * Standard error of the mean weighted loss: sqrt(v / N) with v the weighted variance of the per-row
 * losses and N the number of rows (for 0/1 loss with unit weights this is Breiman et al. 1984's
 * sqrt(R(1 − R)/N), §3.4.3 / §11.5).
 */
import type { NodeLosses } from './node-losses.js';

export class StepErrors {
  private readonly sumW: Float64Array;
  private readonly sumL: Float64Array;
  private readonly sumL2: Float64Array;
  private rows = 0;

  constructor(readonly nSteps: number) {
    this.sumW = new Float64Array(nSteps);
    this.sumL = new Float64Array(nSteps);
    this.sumL2 = new Float64Array(nSteps);
  }

  /** Add every row of `losses` (rows with a missing target or zero weight are skipped). */
  add(losses: NodeLosses, collapseAt: Float64Array, alphas: readonly number[]): void {
    const n = losses.rowWeight.length;
    for (let i = 0; i < n; i++) {
      const w = losses.rowWeight[i];
      if (!(w > 0)) continue;
      const path = losses.path(i);
      this.rows++;
      for (let k = 0; k < this.nSteps; k++) {
        let node = path[path.length - 1];
        for (const p of path) if (collapseAt[p] <= alphas[k]) { node = p; break; }
        const l = losses.loss(node, i);
        this.sumW[k] += w; this.sumL[k] += w * l; this.sumL2[k] += w * l * l;
      }
    }
  }

  /** Mean weighted loss per step. */
  errors(): number[] {
    return Array.from(this.sumL, (s, k) => (this.sumW[k] > 0 ? s / this.sumW[k] : NaN));
  }

  /** Standard error of each mean. */
  standardErrors(): number[] {
    return Array.from(this.sumL, (s, k) => {
      const w = this.sumW[k];
      if (!(w > 0) || this.rows === 0) return NaN;
      const m = s / w;
      return Math.sqrt(Math.max(0, this.sumL2[k] / w - m * m) / this.rows);
    });
  }
}
