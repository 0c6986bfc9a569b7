import { errors } from '../../errors.js';
import type { Predictions } from '../../learn/model.js';

/**
 * Predicted labels and probabilities re-expressed in the target's class order. Models fitted on a fold
 * keep the full class list, so this is usually the identity; it matters when a model knows the classes in
 * another order or only some of them (missing classes get probability 0).
 */
export function alignClasses(
  targetClasses: readonly string[], predictions: Predictions,
): { labels: Int32Array; proba: Float64Array } {
  const n = predictions.n, kp = predictions.classes.length, kt = targetClasses.length;
  const same = kp === kt && predictions.classes.every((c, j) => c === targetClasses[j]);
  if (same) return { labels: Int32Array.from(predictions.value), proba: predictions.proba };
  const to = predictions.classes.map((c) => {
    const j = targetClasses.indexOf(c);
    if (j < 0) throw errors.schemaMismatch(`predicted class ${JSON.stringify(c)} is not a class of the target`);
    return j;
  });
  const labels = Int32Array.from(predictions.value, (v) => to[v]);
  const proba = new Float64Array(n * kt);
  if (predictions.proba.length === n * kp) {
    for (let i = 0; i < n; i++) for (let j = 0; j < kp; j++) proba[i * kt + to[j]] = predictions.proba[i * kp + j];
  }
  return { labels, proba };
}
