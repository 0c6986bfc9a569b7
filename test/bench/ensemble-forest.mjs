#!/usr/bin/env node
/**
 * Wall and CPU time of `fitForest` end to end (members, out-of-bag tally, importance) with 1 and 2
 * workers on a seeded synthetic regression, and whether both give the same model JSON. Runs a built tree:
 *
 *   node test/bench/ensemble-forest.mjs [--dist /path/to/dist] [--scale 1] [--progress]
 *
 * Scale 1: 100,000 rows × 20 numeric features, 500 trees (the DESIGN.md forest workload); --scale
 * multiplies rows and trees. --progress passes an `onTree` callback (members then grow in batches).
 * On a machine shared with other work the figures are noisy: compare runs made under the same load.
 */
import { join, dirname, resolve } from 'node:path';
import { fileURLToPath, pathToFileURL } from 'node:url';

const here = dirname(fileURLToPath(import.meta.url));
const arg = (name, dflt) => { const i = process.argv.indexOf(name); return i > 0 ? process.argv[i + 1] : dflt; };
const distDir = resolve(arg('--dist', join(here, '..', '..', 'dist')));
const dist = (p) => pathToFileURL(join(distDir, p)).href;
const scale = Number(arg('--scale', '1'));
const progress = process.argv.includes('--progress');

const { createRng } = await import(dist('util/rng.js'));
const { makeFrame } = await import(dist('table/make-frame.js'));
const { binnedFrameFor } = await import(dist('table/bin-cache.js'));
const { fitForest } = await import(dist('learn/ensemble/forest.js'));

/** n × p features in [0, 1) (1/1000 steps); y a smooth function of five of them plus noise. */
function forestData(n, p, seed) {
  const rng = createRng(seed);
  const cols = Array.from({ length: p }, (_, j) => ({ name: `f${j}`, kind: 'numeric', values: new Float64Array(n) }));
  const y = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    for (const c of cols) c.values[i] = Math.floor(rng.next() * 1000) / 1000;
    const x = (j) => cols[j].values[i];
    y[i] = 6 * Math.sin(2 * x(0) + x(1)) + 5 * (x(2) - 0.4) ** 2 + 3 * x(3) * x(4) + rng.normal();
  }
  return { features: makeFrame(n, cols), target: { kind: 'number', name: 'y', values: y }, weights: null };
}

const cpu = () => { const u = process.cpuUsage(); return (u.user + u.system) / 1e6; };
const n = Math.round(100_000 * scale), size = Math.max(2, Math.round(500 * scale));
const data = forestData(n, 20, 7);
binnedFrameFor(data.features);
const opts = { size, seed: 3, featuresPerSplit: 7, engine: 'histogram' };
const runs = {};
for (const workers of [1, 2]) {
  let reports = 0;
  const c0 = cpu(), t0 = performance.now();
  const model = fitForest(data, { ...opts, workers, ...(progress ? { onTree: () => { reports++; } } : {}) });
  runs[workers] = { wall: (performance.now() - t0) / 1000, cpu: cpu() - c0, json: JSON.stringify(model), oob: model.oobCurve.at(-1).error, reports };
}
const same = runs[1].json === runs[2].json;
console.log(`ensemble-forest bench: ${distDir} (node ${process.version}); ${size} trees on ${n} × 20, 7 features per split${progress ? ', onTree' : ''}`);
for (const w of [1, 2]) console.log(`  ${w} worker(s): ${runs[w].wall.toFixed(2)} s wall (cpu of all threads ${runs[w].cpu.toFixed(2)} s)${progress ? `, ${runs[w].reports} reports` : ''}; OOB MSE ${runs[w].oob.toFixed(4)}`);
console.log(`  speed-up ${(runs[1].wall / runs[2].wall).toFixed(2)}× (target ≥ 1.8× at scale 1); models ${same ? 'identical' : 'DIFFER'}`);
