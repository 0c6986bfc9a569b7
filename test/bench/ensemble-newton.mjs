#!/usr/bin/env node
/**
 * Accuracy per round of boosting with and without `newtonTrees`, on seeded synthetic data of our own
 * (two classes, three classes, counts): the watched-set loss after 10, 25, 50 and 100 rounds and the
 * best round. Runs a built tree:
 *
 *   node test/bench/ensemble-newton.mjs [--dist /path/to/dist] [--rows 20000]
 */
import { join, dirname, resolve } from 'node:path';
import { fileURLToPath, pathToFileURL } from 'node:url';

const here = dirname(fileURLToPath(import.meta.url));
const arg = (name, dflt) => { const i = process.argv.indexOf(name); return i > 0 ? process.argv[i + 1] : dflt; };
const distDir = resolve(arg('--dist', join(here, '..', '..', 'dist')));
const dist = (p) => pathToFileURL(join(distDir, p)).href;
const rows = Number(arg('--rows', '20000'));

const { fitBoosting } = await import(dist('learn/ensemble/boosting.js'));
const { createRng } = await import(dist('util/rng.js'));
const { makeFrame } = await import(dist('table/make-frame.js'));

/** 10 features in [0, 1); the target (two classes, three classes or a count) from a few of them. */
function sample(n, seed, kind) {
  const rng = createRng(seed);
  const cols = Array.from({ length: 10 }, (_, j) => ({ name: `f${j}`, kind: 'numeric', values: new Float64Array(n) }));
  for (let i = 0; i < n; i++) for (const c of cols) c.values[i] = Math.floor(rng.next() * 1000) / 1000;
  const codes = new Int32Array(n), y = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    const x = (j) => cols[j].values[i];
    const z = 3 * x(0) - 2 * x(1) + (x(2) > 0.6 ? 1.5 : -0.5) + 4 * x(3) * x(4) - 2;
    if (kind === 'two') codes[i] = rng.next() < 1 / (1 + Math.exp(-z)) ? 1 : 0;
    else if (kind === 'three') {
      const a = Math.exp(z), b = Math.exp(2 * x(5) - 1), s = a + b + 1, u = rng.next();
      codes[i] = u < a / s ? 0 : u < (a + b) / s ? 1 : 2;
    } else {
      // Poisson draw with mean e^(z/2) (Knuth's multiplication method)
      const limit = Math.exp(-Math.exp(0.5 * z));
      let k = 0, q = rng.next();
      while (q > limit) { q *= rng.next(); k++; }
      y[i] = k;
    }
  }
  const features = makeFrame(n, cols);
  if (kind === 'count') return { features, target: { kind: 'number', name: 'y', values: y }, weights: null };
  return { features, target: { kind: 'class', name: 'y', codes, classes: kind === 'two' ? ['a', 'b'] : ['a', 'b', 'c'] }, weights: null };
}

console.log(`ensemble-newton bench: ${distDir}; ${rows} training and ${rows} watched rows, 15 leaves, learning rate 0.1`);
for (const [kind, loss] of [['two', 'logistic'], ['three', 'multiclass'], ['count', 'poisson']]) {
  for (const seed of [1, 2]) {
    const train = sample(rows, seed, kind), watch = sample(rows, seed + 100, kind);
    const o = { loss, rounds: 100, leafBudget: 15, depthLimit: Infinity, learningRate: 0.1, watch, engine: 'histogram' };
    const show = (m) => {
      const low = Math.min(...m.watchLoss);
      return `${[10, 25, 50, 100].map((r) => m.watchLoss[r].toFixed(4)).join(' ')}  best ${low.toFixed(4)} at ${m.watchLoss.indexOf(low)}`;
    };
    console.log(`${loss.padEnd(10)} seed ${seed}  gradient trees: ${show(fitBoosting(train, o))}`);
    console.log(`${''.padEnd(10)}         Newton trees:   ${show(fitBoosting(train, { ...o, newtonTrees: true }))}`);
  }
}
