/**
 * Per-prediction contributions of every feature (TreeSHAP) for a tree or tree ensemble: for each row and
 * output, φ_j such that expected + Σ_j φ_j equals the model's raw output (see `additiveModelOf` for what
 * the output is for each kind). The expected value is the model output averaged under the trees' cover
 * distribution.
 */
import { errors } from '../errors.js';
import { leafOf } from '../learn/flat-tree.js';
import type { ModelHeader } from '../learn/model.js';
import { rowSourceFor } from '../learn/tree/row-source.js';
import type { Frame } from '../table/frame.js';
import { additiveModelOf } from './additive-model.js';
import { addTreeShap, prepareShapTree } from './tree-shap.js';

/** Contributions for n rows, p features and K outputs. */
export interface Contributions {
  readonly features: readonly string[];
  /** Output names: class labels, or the target name. */
  readonly outputNames: readonly string[];
  /** What the outputs are (e.g. 'class probability', 'log-odds (raw score)'). */
  readonly outputMeaning: string;
  /** Frame rows explained, in order. */
  readonly rows: Int32Array;
  /** Expected value per output. */
  readonly expected: Float64Array;
  /** Per output k: the raw output of each explained row (length n), summed from the trees' leaves. */
  readonly outputs: readonly Float64Array[];
  /** Per output k: n × p contributions, row-major (row i, feature j at i·p + j). */
  readonly values: readonly Float64Array[];
}

/** Options for `contributionsOf`. */
export interface ShapOptions {
  /** Rows of the frame to explain. __Default:__ every row. */
  readonly rows?: ArrayLike<number>;
}

/**
 * TreeSHAP contributions of each feature to each row's output. The frame must be aligned to the model's
 * features (same columns, order and kinds). Cost grows with trees × leaves × depth² per row.
 * @param options `rows` __Default:__ every row.
 * @example
 * const c = contributionsOf(gb, test.features, { rows: [0, 1, 2] });
 * c.expected[0] + c.values[0].slice(0, p).reduce((a, b) => a + b); // === c.outputs[0][0]
 */
export function contributionsOf(model: ModelHeader, frame: Frame, options: ShapOptions = {}): Contributions {
  const form = additiveModelOf(model);
  const src = rowSourceFor(form.features, frame);
  const rows = Int32Array.from(options.rows ?? Array.from({ length: frame.nRows }, (_, i) => i));
  for (let i = 0; i < rows.length; i++) {
    const r = rows[i];
    if (!(Number.isInteger(r) && r >= 0 && r < frame.nRows)) throw errors.badOption('rows', r, `row numbers from 0 to ${frame.nRows - 1}`);
  }
  const p = form.features.length, K = form.nOutputs, n = rows.length;
  const trees = form.members.map((m) => ({ st: prepareShapTree(m.tree, m.values, m.width), at: m.at }));
  const expected = Float64Array.from(form.base);
  for (const { st, at } of trees) for (let k = 0; k < st.width; k++) expected[at + k] += st.expected[k];
  const values = Array.from({ length: K }, () => new Float64Array(n * p));
  const outputs = Array.from({ length: K }, () => new Float64Array(n));
  const phi = new Float64Array(p * K);
  for (let i = 0; i < n; i++) {
    phi.fill(0);
    for (const { st, at } of trees) addTreeShap(st, src, rows[i], phi, K, at);
    for (let k = 0; k < K; k++) {
      outputs[k][i] = form.base[k];
      for (let j = 0; j < p; j++) values[k][i * p + j] = phi[j * K + k];
    }
    for (const { st, at } of trees) {
      const leaf = leafOf(st.tree, src, rows[i]);
      for (let k = 0; k < st.width; k++) outputs[at + k][i] += st.values[leaf * st.width + k];
    }
  }
  return { features: form.features.map((f) => f.name), outputNames: form.outputNames, outputMeaning: form.outputMeaning, rows, expected, outputs, values };
}
