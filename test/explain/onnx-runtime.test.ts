/**
 * ONNX export checked by an independent runtime: onnxruntime-web (the ONNX reference runtime's WebAssembly
 * build) loads the bytes from `modelToOnnx` and its outputs are compared with coppice's own predictions.
 * Inputs are float32 values (the graph input type); each frame here is built from float32 values so the
 * comparison is exact in routing. Tolerance 1e-5 (asked for by the task), relative to max(1, |value|),
 * since the runtime stores leaf weights and returns outputs in float32 (about 6e-8 relative each).
 */
import * as ort from 'onnxruntime-web';
import { beforeAll, describe, expect, it } from 'vitest';
import { modelToOnnx } from '../../src/explain/onnx-export.js';
import { predictModel } from '../../src/explain/predict-model.js';
import { fitAdaBoost } from '../../src/learn/ensemble/adaboost.js';
import { fitBoosting } from '../../src/learn/ensemble/boosting.js';
import { fitForest } from '../../src/learn/ensemble/forest.js';
import type { ModelHeader } from '../../src/learn/model.js';
import { fitTree } from '../../src/learn/tree/fit-tree.js';
import { takeDataset } from '../../src/table/dataset.js';
import type { Frame } from '../../src/table/frame.js';
import { friedman1, orchard } from './fixtures.js';

const TOL = 1e-5;

beforeAll(() => {
  ort.env.wasm.numThreads = 1;
});

function inputOf(frame: Frame): Float32Array {
  const p = frame.columns.length, x = new Float32Array(frame.nRows * p);
  frame.columns.forEach((c, j) => {
    for (let i = 0; i < frame.nRows; i++) {
      x[i * p + j] = c.kind === 'categorical' ? (c.codes[i] < 0 ? NaN : c.codes[i]) : c.values[i];
    }
  });
  return x;
}

async function runOnnx(model: ModelHeader, frame: Frame): Promise<Record<string, ort.Tensor>> {
  const { bytes } = modelToOnnx(model);
  const session = await ort.InferenceSession.create(bytes);
  const p = frame.columns.length;
  const feeds = { features: new ort.Tensor('float32', inputOf(frame), [frame.nRows, p]) };
  const out = await session.run(feeds);
  await session.release();
  return out;
}

/** Largest |onnx − coppice| / max(1, |coppice|) over rows (and classes); label mismatches counted. */
async function compare(model: ModelHeader, frame: Frame): Promise<{ gap: number; labelMismatches: number }> {
  const out = await runOnnx(model, frame);
  const pred = predictModel(model, frame);
  let gap = 0, labelMismatches = 0;
  if (pred.task === 'regression') {
    const got = out.prediction.data as Float32Array;
    for (let i = 0; i < frame.nRows; i++) gap = Math.max(gap, Math.abs(got[i] - pred.value[i]) / Math.max(1, Math.abs(pred.value[i])));
  } else {
    const got = out.probabilities.data as Float32Array;
    const labels = out.label.data as BigInt64Array;
    for (let j = 0; j < pred.proba.length; j++) gap = Math.max(gap, Math.abs(got[j] - pred.proba[j]));
    for (let i = 0; i < frame.nRows; i++) if (Number(labels[i]) !== pred.value[i]) labelMismatches++;
  }
  return { gap, labelMismatches };
}

const fr = friedman1(600, 31, true);
const frTrain = takeDataset(fr, Array.from({ length: 400 }, (_, i) => i));
const frTest = takeDataset(fr, Array.from({ length: 200 }, (_, i) => 400 + i)).features;
const cls = orchard(500, 32, 'class');
const bin = orchard(500, 33, 'binary');
const clsTrain = takeDataset(cls, Array.from({ length: 350 }, (_, i) => i));
const clsTest = takeDataset(cls, Array.from({ length: 150 }, (_, i) => 350 + i)).features;
const binTrain = takeDataset(bin, Array.from({ length: 350 }, (_, i) => i));
const binTest = takeDataset(bin, Array.from({ length: 150 }, (_, i) => 350 + i)).features;

describe('modelToOnnx(model) run by onnxruntime-web matches coppice within 1e-5', () => {
  const cases: [string, () => ModelHeader, Frame][] = [
    ['tree, regression', () => fitTree(frTrain, { depthLimit: 8 }), frTest],
    ['tree, 3 classes, multiway categorical + missing', () => fitTree(clsTrain, { depthLimit: 6 }), clsTest],
    ['tree, 3 classes, category subsets', () => fitTree(clsTrain, { depthLimit: 6, categorical: 'subset' }), clsTest],
    ['forest, regression', () => fitForest(frTrain, { size: 30, seed: 3 }), frTest],
    ['forest, 3 classes', () => fitForest(clsTrain, { size: 30, seed: 4 }), clsTest],
    ['forest, 2 classes, vote', () => fitForest(binTrain, { size: 25, seed: 5, combine: 'vote' }), binTest],
    ['boosting, regression (squared)', () => fitBoosting(frTrain, { rounds: 100, depthLimit: 3, seed: 6 }), frTest],
    ['boosting, regression (poisson)', () => fitBoosting(orchard(300, 34, 'number'), { loss: 'poisson', rounds: 40, depthLimit: 3 }), orchard(120, 35, 'number').features],
    ['boosting, 2 classes (logistic)', () => fitBoosting(binTrain, { rounds: 60, depthLimit: 3, seed: 7 }), binTest],
    ['boosting, 3 classes (multiclass)', () => fitBoosting(clsTrain, { rounds: 40, depthLimit: 3, seed: 8 }), clsTest],
    ['adaboost, 3 classes', () => fitAdaBoost(clsTrain, { rounds: 20, depthLimit: 2 }), clsTest],
  ];
  for (const [name, fit, frame] of cases) {
    it(name, async () => {
      const { gap, labelMismatches } = await compare(fit(), frame);
      console.log(`${name}: largest gap ${gap.toExponential(2)}, label mismatches ${labelMismatches}`);
      expect(gap).toBeLessThan(TOL);
      expect(labelMismatches).toBe(0);
    });
  }
});

describe('modelToOnnx(model): degenerate models still run', () => {
  it('a constant target: a one-leaf tree', async () => {
    const flat = { ...frTrain, target: { kind: 'number' as const, name: 'y', values: new Float64Array(frTrain.features.nRows).fill(3.25) } };
    const { gap } = await compare(fitTree(flat), frTest);
    expect(gap).toBe(0);
  });

  it('an ensemble with no trees kept: the output is the base value', async () => {
    const gb = fitBoosting(frTrain, { rounds: 3, depthLimit: 2 });
    const none = { ...gb, trees: [], steps: [], roundsKept: 0 };
    const out = await runOnnx(none, frTest);
    const got = out.prediction.data as Float32Array;
    expect(got[0]).toBe(Math.fround(gb.initial[0]));
  });

  it('a frame of one row and a frame with every value missing', async () => {
    const model = fitTree(clsTrain, { depthLimit: 4 });
    const one = takeDataset(cls, [400]).features;
    expect((await compare(model, one)).gap).toBeLessThan(TOL);
    const blank = { ...one, columns: one.columns.map((c) => (c.kind === 'categorical' ? { ...c, codes: Int32Array.of(-1) } : { ...c, values: Float64Array.of(NaN) })) };
    expect((await compare(model, blank)).labelMismatches).toBe(0);
    expect((await compare(model, blank)).gap).toBeLessThan(TOL);
  });
});
