/**
 * The round loop of gradient boosting (the algorithm is described in boosting.ts), written to keep the
 * per-round work outside the tree grower small: every n-sized buffer is allocated once per fit, the
 * grow task is built once (same frame object every round, so the histogram engine's binned cache hits
 * and binning happens once per fit), residuals, leaf denominators and the training loss come from one
 * pass over the rows where the loss offers it (`fusedTerms`: logistic, Poisson, squared error — the pass
 * at the end of a round prepares the next one), scores of training rows are updated from the grower's `leafOfRow`
 * (only rows left out of a round — subsampling or zero weight — are routed through the tree), and
 * watched-set scores are updated by routing only the watched rows.
 */
import type { Frame } from '../../table/frame.js';
import { derive } from '../../util/rng.js';
import { leafOf, type FlatTree, type RowSource } from '../flat-tree.js';
import type { GrowTask } from '../grow-task.js';
import type { BoostingSettings } from './boosting-options.js';
import { growEnsembleTree } from './engine.js';
import { refreshInnerValues } from './inner-values.js';
import { createLeafScratch, ratioLeafValues, setLeafValues } from './leaf-values.js';
import type { Loss } from './loss/loss.js';
import { newtonResponse } from './newton-response.js';
import { drawSubsampleMask } from './subsample.js';
import { addTreeValues } from './tree-sum.js';
import type { WatchSet } from './watch-set.js';
import { rowSourceOf } from '../tree/row-source.js';

/** What the loop needs: the loss, targets, weights (class weights applied), features and settings. */
export interface BoostInput {
  readonly loss: Loss;
  readonly y: Float64Array;
  readonly w: Float64Array;
  readonly frame: Frame;
  readonly watch: WatchSet | null;
  readonly initial: Float64Array;
  readonly settings: BoostingSettings;
}

/** What the loop produced (every round run, before early stopping truncates). */
export interface BoostRun {
  readonly trees: FlatTree[];
  readonly steps: number[];
  readonly trainLoss: number[];
  readonly watchLoss: number[];
  readonly best: number;
}

/**
 * Run the boosting rounds of `input.settings`.
 * @example
 * const run = runBoostingRounds({ loss, y, w, frame, watch: null, initial: loss.initial(y, w), settings });
 */
export function runBoostingRounds(input: BoostInput): BoostRun {
  const { loss, y, w, frame, watch, initial, settings: s } = input;
  const n = frame.nRows, K = loss.nOutputs;
  const src = rowSourceOf(frame);
  const F = new Float64Array(n * K), Fw = new Float64Array(watch ? watch.n * K : 0);
  for (let i = 0; i < n; i++) F.set(initial, i * K);
  if (watch) for (let i = 0; i < watch.n; i++) Fw.set(initial, i * K);
  // buffers reused by every round
  const r = new Float64Array(n), scratch = createLeafScratch(n);
  const fused = loss.leafRule === 'ratio' ? loss.fusedTerms?.bind(loss) ?? null : null;
  const num = fused ? r : scratch.num, den = scratch.den;
  const trainLoss = [fused ? fused(y, F, w, r, den) : loss.value(y, F, w)];
  const watchLoss = watch ? [loss.value(watch.y, Fw, watch.weights)] : [];
  const sampled = s.rowFraction < 1;
  const mask = sampled ? new Uint8Array(n) : null;
  const roundW = sampled ? new Float64Array(n) : w;
  const newton = s.newtonTrees && loss.leafRule === 'ratio';
  const z = newton ? new Float64Array(n) : r, hw = newton ? new Float64Array(n) : roundW;
  const task: Omit<GrowTask, 'rng'> = { frame, weights: hw, response: { kind: 'value', values: z, leaf: 'mean' }, settings: s.tree.grow };

  const trees: FlatTree[] = [], steps: number[] = [];
  let best = 0, bestLoss = watch ? watchLoss[0] : Infinity;
  for (let m = 0; m < s.rounds; m++) {
    const step = s.learningRate / (1 + s.stepDecay * m);
    if (mask) {
      drawSubsampleMask(n, s.rowFraction, derive(s.seed, m), mask);
      for (let i = 0; i < n; i++) roundW[i] = mask[i] ? w[i] : 0;
    }
    loss.startRound(y, F, roundW);
    for (let k = 0; k < K; k++) {
      if (!fused) {
        loss.residuals(y, F, k, r);
        if (loss.leafRule === 'ratio') loss.leafTerms(y, F, k, r, num, den);
      }
      if (newton) newtonResponse(num, den, roundW, z, hw);
      const { tree, leafOfRow } = growEnsembleTree({ ...task, rng: derive(s.seed, m, k, 1) }, s.tree.engine);
      if (loss.leafRule === 'ratio') ratioLeafValues(tree, leafOfRow, roundW, num, den, step * loss.ratioScale);
      else setLeafValues(tree, leafOfRow, loss, y, F, roundW, k, r, step, scratch);
      refreshInnerValues(tree);
      addLeafValues(tree, leafOfRow, src, F, K, k);
      if (watch) addTreeValues(tree, watch.src, watch.n, Fw, K, k);
      trees.push(tree);
    }
    steps.push(step);
    let stop = false;
    if (watch) {
      const wl = loss.value(watch.y, Fw, watch.weights);
      watchLoss.push(wl);
      if (wl < bestLoss - 1e-12 * Math.abs(bestLoss)) { bestLoss = wl; best = m + 1; }
      else if (m + 1 - best >= s.patience) stop = true;
    } else best = m + 1;
    // the fused pass also prepares the next round's residuals; after the last round only the loss is needed
    const more = !stop && m + 1 < s.rounds;
    trainLoss.push(fused && more ? fused(y, F, w, r, den) : loss.value(y, F, w));
    s.onRound?.({
      round: m + 1, total: s.rounds, trainLoss: trainLoss[m + 1], watchLoss: watch ? watchLoss[m + 1] : NaN,
      bestRound: best, last: stop || m + 1 === s.rounds,
    });
    if (stop) break;
  }
  return { trees, steps, trainLoss, watchLoss, best };
}

/** F[i·K + k] += value of the leaf row i reached: from `leafOfRow`, routing only rows it left out (−1). */
function addLeafValues(tree: FlatTree, leafOfRow: Int32Array, src: RowSource, F: Float64Array, K: number, k: number): void {
  const v = tree.value, n = leafOfRow.length;
  for (let i = 0; i < n; i++) {
    const l = leafOfRow[i];
    F[i * K + k] += v[l >= 0 ? l : leafOf(tree, src, i)];
  }
}
