#!/usr/bin/env node
/**
 * Wall and CPU time of `fitBoosting` on two seeded synthetic workloads, for before/after comparisons of
 * the boosting loop (src/learn/ensemble/boosting.ts). Runs a built tree (dist/ by default):
 *
 *   node test/bench/ensemble-boosting.mjs [--dist /path/to/dist] [--only wide,cell] [--repeat 3] [--workers 1]
 *
 * wide: 200,000 rows × 28 numeric features, two classes (logistic loss), 20 rounds, 63 leaves, histogram engine.
 * cell: 50,000 rows × 10 numeric features, numeric target (squared loss), 200 rounds, default tree settings.
 * loop: the round loop almost alone — one feature and stumps, so growing a tree is a small share:
 *       200,000 rows, logistic loss, 50 rounds (loop-logistic) and squared loss, 50 rounds (loop-squared).
 * Binning is timed apart from fitting (the first fit on a frame bins it; later fits reuse the bins).
 * "grower only" is the CPU time of growing the same number of trees of the same settings directly
 * (`growTree` on a fixed response), so fit CPU − grower CPU estimates the work of the round loop itself.
 * The machine may be shared: each figure is the best of --repeat runs, with the CPU time of this process
 * beside it; compare before/after runs made one after the other under the same load.
 */
import { join, dirname, resolve } from 'node:path';
import { fileURLToPath, pathToFileURL } from 'node:url';

const here = dirname(fileURLToPath(import.meta.url));
const arg = (name, dflt) => { const i = process.argv.indexOf(name); return i > 0 ? process.argv[i + 1] : dflt; };
const distDir = resolve(arg('--dist', join(here, '..', '..', 'dist')));
const dist = (p) => pathToFileURL(join(distDir, p)).href;
const repeat = Number(arg('--repeat', '3'));
const only = arg('--only', 'wide,cell,loop').split(',');
const workers = Number(arg('--workers', '1'));

const { createRng } = await import(dist('util/rng.js'));
const { makeFrame } = await import(dist('table/make-frame.js'));
const { binnedFrameFor } = await import(dist('table/bin-cache.js'));
const { fitBoosting } = await import(dist('learn/ensemble/boosting.js'));
const { growTree } = await import(dist('learn/grow.js'));
const { defaultGrowSettings } = await import(dist('learn/grow-task.js'));
if (workers > 1) {
  const { useHistogramWorkers } = await import(dist('learn/parallel/hist-workers.js'));
  useHistogramWorkers(workers);
}

/** n × p features in [0, 1) rounded to 1/1000; `label(x, rng)` gives the target of one row. */
function columns(n, p, rng) {
  const cols = Array.from({ length: p }, (_, j) => ({ name: `f${j}`, kind: 'numeric', values: new Float64Array(n) }));
  for (let i = 0; i < n; i++) for (const c of cols) c.values[i] = Math.floor(rng.next() * 1000) / 1000;
  return cols;
}

/** Two classes: log-odds from a few features with a threshold and a product term. */
function wideData(n, p, seed) {
  const rng = createRng(seed);
  const cols = columns(n, p, rng);
  const codes = new Int32Array(n);
  for (let i = 0; i < n; i++) {
    const x = (j) => cols[j].values[i];
    const z = 3 * x(0) - 2 * x(1) + (x(2) > 0.6 ? 1.5 : -0.5) + 4 * x(3) * x(4) - 2;
    codes[i] = rng.next() < 1 / (1 + Math.exp(-z)) ? 1 : 0;
  }
  return { features: makeFrame(n, cols), target: { kind: 'class', name: 'y', codes, classes: ['no', 'yes'] }, weights: null };
}

/** A smooth numeric target with noise. */
function cellData(n, p, seed) {
  const rng = createRng(seed);
  const cols = columns(n, p, rng);
  const y = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    const x = (j) => cols[j].values[i];
    y[i] = 8 * Math.cos(3 * x(0)) + 6 * x(1) * x(2) + 4 * (x(3) > 0.3 ? 1 : 0) + rng.normal();
  }
  return { features: makeFrame(n, cols), target: { kind: 'number', name: 'y', values: y }, weights: null };
}

const cpu = () => { const u = process.cpuUsage(); return (u.user + u.system) / 1e6; };

/** CPU seconds of growing `trees` trees like the fit's, on a fixed response (y − mean, or the 0/1 code − share). */
function growerOnly(data, trees, settings) {
  const n = data.features.nRows;
  const y = data.target.kind === 'class' ? Float64Array.from(data.target.codes) : data.target.values;
  let mean = 0;
  for (let i = 0; i < n; i++) mean += y[i] / n;
  const values = Float64Array.from(y, (v) => v - mean), weights = new Float64Array(n).fill(1);
  const { createRng: rng } = { createRng };
  const c0 = cpu();
  for (let t = 0; t < trees; t++) {
    growTree({ frame: data.features, weights, response: { kind: 'value', values, leaf: 'mean' }, settings, rng: rng(t) }, 'histogram');
  }
  return cpu() - c0;
}

function measure(name, data, options) {
  const c0 = cpu(), t0 = performance.now();
  binnedFrameFor(data.features);
  const bin = { wall: (performance.now() - t0) / 1000, cpu: cpu() - c0 };
  let best = null, model = null, minCpu = Infinity;
  for (let r = 0; r < repeat; r++) {
    const c1 = cpu(), t1 = performance.now();
    model = fitBoosting(data, options);
    const run = { wall: (performance.now() - t1) / 1000, cpu: cpu() - c1 };
    minCpu = Math.min(minCpu, run.cpu);
    if (!best || run.wall < best.wall) best = run;
  }
  best.minCpu = minCpu;
  const loss = `${model.trainLoss[0].toFixed(4)} → ${model.trainLoss.at(-1).toFixed(4)}`;
  const settings = { ...defaultGrowSettings, categorical: 'subset', depthLimit: options.depthLimit ?? 3, leafBudget: options.leafBudget ?? Infinity };
  let grow = Infinity;
  for (let r = 0; r < repeat; r++) grow = Math.min(grow, growerOnly(data, options.rounds, settings));
  console.log(`${name.padEnd(5)} bin ${bin.wall.toFixed(2)} s (cpu ${bin.cpu.toFixed(2)})  fit best of ${repeat}: ${best.wall.toFixed(2)} s (cpu ${best.cpu.toFixed(2)}, lowest cpu ${best.minCpu.toFixed(2)})  ` +
    `grower only: cpu ${grow.toFixed(2)}  → loop ≈ ${(((best.minCpu - grow) / options.rounds) * 1000).toFixed(1)} ms cpu per round  train loss ${loss}`);
}

console.log(`ensemble-boosting bench: ${distDir} (node ${process.version}, ${workers} histogram thread(s))`);
if (only.includes('wide')) measure('wide', wideData(200_000, 28, 1), { loss: 'logistic', rounds: 20, leafBudget: 63, depthLimit: Infinity, engine: 'histogram', seed: 1 });
if (only.includes('loop')) {
  const wide = wideData(200_000, 5, 3);
  const one = (d) => ({ ...d, features: makeFrame(d.features.nRows, [d.features.columns[0]]) });
  const two = one(wide), num = one(cellData(200_000, 4, 4));
  for (const [name, data, loss] of [['loop-logistic', two, 'logistic'], ['loop-squared', num, 'squared']]) {
    const o = { loss, rounds: 50, depthLimit: 1, engine: 'histogram', seed: 1 };
    binnedFrameFor(data.features);
    fitBoosting(data, { ...o, rounds: 2 }); // warm up
    let low = Infinity;
    for (let r = 0; r < Math.max(3, repeat); r++) { const c0 = cpu(); fitBoosting(data, o); low = Math.min(low, cpu() - c0); }
    console.log(`${name.padEnd(13)} 200,000 rows × 1 feature, stumps, 50 rounds: lowest cpu ${low.toFixed(3)} s = ${((low / 50) * 1000).toFixed(2)} ms per round (grower included)`);
  }
}
if (only.includes('cell')) measure('cell', cellData(50_000, 10, 2), { rounds: 200, engine: 'histogram', seed: 1 });
