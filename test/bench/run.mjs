#!/usr/bin/env node
/**
 * coppice benchmarks (`npm run bench`): one child process per workload, so wall time and peak RSS
 * (process.resourceUsage().maxRSS) belong to that workload alone. Each line prints the figure next to
 * its target from DESIGN.md. Runs the built package (dist/, build/kernels.wasm): `npm run build:wasm &&
 * npm run build` first.
 *
 *   node test/bench/run.mjs [--only hist,boost,flights,forest,cell] [--scale 0.1]
 *
 * --scale multiplies rows, rounds and trees (quick runs on a shared machine; targets are for scale 1).
 * Timings on a machine shared with other work are noisy: read them as upper bounds. The CPU time of the
 * whole child (all threads, data generation included) is printed too, as a load-independent figure.
 */
import { execFileSync, spawnSync } from 'node:child_process';
import { existsSync, rmSync, writeFileSync } from 'node:fs';
import { dirname, join } from 'node:path';
import { fileURLToPath, pathToFileURL } from 'node:url';

const here = dirname(fileURLToPath(import.meta.url));
const root = join(here, '..', '..');
const dist = (p) => pathToFileURL(join(root, 'dist', p)).href;
const arg = (name, dflt) => { const i = process.argv.indexOf(name); return i > 0 ? process.argv[i + 1] : dflt; };
const scale = Number(arg('--scale', '1'));
const S = (n) => Math.max(1, Math.round(n * scale));

// ---------------------------------------------------------------- data (seeded, synthetic)
async function rng(seed) {
  const { createRng } = await import(dist('util/rng.js'));
  return createRng(seed);
}

/** n × p uniform features (3 decimals) and a binary label from a logistic model with an interaction. */
async function syntheticBinary(n, p, seed) {
  const { makeFrame } = await import(dist('table/make-frame.js'));
  const r = await rng(seed);
  const cols = [];
  for (let j = 0; j < p; j++) {
    const v = new Float64Array(n);
    for (let i = 0; i < n; i++) v[i] = Math.round(r.next() * 1000) / 1000;
    cols.push({ name: `x${j}`, kind: 'numeric', values: v });
  }
  const codes = new Int32Array(n);
  for (let i = 0; i < n; i++) {
    const x = (j) => cols[j].values[i];
    const z = 2 * x(0) - 3 * x(1) + 4 * (x(2) > 0.5 ? 1 : 0) * x(3) + Math.sin(6 * x(4)) - 0.5;
    codes[i] = r.next() < 1 / (1 + Math.exp(-z)) ? 1 : 0;
  }
  return { features: makeFrame(n, cols), target: { kind: 'class', name: 'y', codes, classes: ['0', '1'] }, weights: null };
}

/** Friedman #1 (Friedman 1991): y = 10 sin(pi x1 x2) + 20 (x3 - 0.5)^2 + 10 x4 + 5 x5 + N(0,1), p inputs. */
async function friedman(n, p, seed) {
  const { makeFrame } = await import(dist('table/make-frame.js'));
  const r = await rng(seed);
  const cols = Array.from({ length: p }, (_, j) => ({ name: `x${j}`, kind: 'numeric', values: new Float64Array(n) }));
  const y = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    for (const c of cols) c.values[i] = Math.round(r.next() * 1000) / 1000;
    const x = (j) => cols[j].values[i];
    y[i] = 10 * Math.sin(Math.PI * x(0) * x(1)) + 20 * (x(2) - 0.5) ** 2 + 10 * x(3) + 5 * x(4) + r.normal();
  }
  return { features: makeFrame(n, cols), target: { kind: 'number', name: 'y', values: y }, weights: null };
}

// ---------------------------------------------------------------- workloads (run in a child)
/** Seconds of CPU (all threads of this process) since `from` (a process.cpuUsage() value). */
const cpuSince = (from) => { const u = process.cpuUsage(from); return ((u.user + u.system) / 1e6).toFixed(1); };

const workloads = {
  async hist() {
    const { Arena } = await import(dist('kernels/arena.js'));
    const { wasmKernels } = await import(dist('kernels/wasm-kernels.js'));
    const { tsKernels } = await import(dist('kernels/ts-kernels.js'));
    const n = S(1_000_000), p = 28, r = await rng(5);
    const codes = new Uint8Array(n * p);
    for (let i = 0; i < codes.length; i++) codes[i] = r.nextU32() % 255;
    const gw = Float64Array.from({ length: n }, () => r.next());
    const gs = Float64Array.from({ length: n }, () => r.normal());
    const arena = new Arena();
    const ptr = { codes: arena.put(codes), gw: arena.put(gw), gs: arena.put(gs), rows: arena.put(Int32Array.from({ length: n }, (_, i) => i)),
      feats: arena.put(Int32Array.from({ length: p }, (_, f) => f)), hist: arena.alloc(p * 256 * 3 * 8) };
    const time = (k, reps) => {
      let best = Infinity;
      for (let i = 0; i < reps; i++) {
        const t0 = performance.now();
        k.histValue(ptr.codes, n, ptr.rows, n, ptr.gw, ptr.gs, ptr.feats, p, ptr.hist);
        best = Math.min(best, (performance.now() - t0) / 1000);
      }
      let sum = 0;
      for (const v of arena.f64(ptr.hist, p * 256 * 3)) sum += v;
      return { rate: (n * p) / best / 1e6, sum };
    };
    const wasm = wasmKernels(arena);
    const t = time(tsKernels(arena), 3);
    // wasm and C alternate, best of 7 each, so both see the same machine load
    let exe = join(here, 'c-ref'), bin = join(here, 'hist-data.bin');
    try {
      execFileSync('cc', ['-O3', '-o', exe, join(here, 'hist-ref.c')], { stdio: 'ignore' });
      writeFileSync(bin, Buffer.concat([Buffer.from(Int32Array.of(n, p).buffer), Buffer.from(codes.buffer), Buffer.from(gw.buffer), Buffer.from(gs.buffer)]));
    } catch { exe = null; }
    let w = null, c = null;
    for (let i = 0; i < 7; i++) {
      if (wasm) { const x = time(wasm, 1); if (!w || x.rate > w.rate) w = x; }
      if (exe) {
        const [secs, sum] = execFileSync(exe, [bin, '1']).toString().trim().split(' ').map(Number);
        if (!c || (n * p) / secs / 1e6 > c.rate) c = { rate: (n * p) / secs / 1e6, sum };
      }
    }
    rmSync(bin, { force: true });
    return {
      figure: w ? `wasm ${w.rate.toFixed(0)} M/s, TS ${t.rate.toFixed(0)} M/s, C -O3 ${c ? c.rate.toFixed(0) + ' M/s' : 'skipped (no compiler)'}` +
        (c ? `; wasm/C = ${(w.rate / c.rate).toFixed(2)}×${c.sum === w.sum ? ' (same sums)' : ' (SUMS DIFFER)'}` : '') : `TS ${t.rate.toFixed(0)} M/s; wasm not built`,
      target: 'wasm/C ≥ 0.8×',
    };
  },

  async boost() {
    const { fitBoosting } = await import(dist('learn/ensemble/boosting.js'));
    const { useHistogramWorkers } = await import(dist('learn/parallel/hist-workers.js'));
    const { binFrameParallel } = await import(dist('learn/parallel/bin-job.js'));
    const n = S(1_000_000), rounds = S(100);
    const data = await syntheticBinary(n, 28, 1);
    const threads = useHistogramWorkers(2);
    const c0 = process.cpuUsage(), t0 = performance.now();
    binFrameParallel(data.features, threads);
    const cb = process.cpuUsage(), tb = performance.now(), binCpu = cpuSince(c0);
    const m = fitBoosting(data, { loss: 'logistic', rounds, leafBudget: 63, engine: 'histogram', learningRate: 0.1, seed: 1 });
    const t1 = performance.now();
    return {
      wall: (t1 - t0) / 1000,
      figure: `${n} rows × 28, ${rounds} rounds, 63 leaves, ${threads} threads: bin ${((tb - t0) / 1000).toFixed(1)} s (cpu ${binCpu}) + fit ${((t1 - tb) / 1000).toFixed(1)} s (cpu ${cpuSince(cb)}); train loss ${m.trainLoss[0].toFixed(4)} → ${m.trainLoss.at(-1).toFixed(4)}`,
      target: '≤ 12 s wall',
    };
  },

  async flights() {
    const { streamFrameWithDuckDB } = await import(dist('table/duckdb-stream.js'));
    const { binFrameParallel } = await import(dist('learn/parallel/bin-job.js'));
    const { makeFrame } = await import(dist('table/make-frame.js'));
    const { fitBoosting } = await import(dist('learn/ensemble/boosting.js'));
    const { useHistogramWorkers } = await import(dist('learn/parallel/hist-workers.js'));
    const rounds = S(100);
    const threads = useHistogramWorkers(2);
    const c0 = process.cpuUsage(), t0 = performance.now();
    const frame = await streamFrameWithDuckDB(join(root, 'node_modules/vega-datasets/data/flights-3m.parquet'));
    const cl = process.cpuUsage(), tl = performance.now(), loadCpu = cpuSince(c0);
    const delay = frame.columns.find((c) => c.name === 'delay');
    const rest = frame.columns.filter((c) => c.name !== 'delay');
    // rows with a missing delay get weight 0
    const weights = new Float64Array(frame.nRows), values = new Float64Array(frame.nRows);
    for (let i = 0; i < frame.nRows; i++) { const v = delay.values[i]; if (v === v) { weights[i] = 1; values[i] = v; } }
    const features = makeFrame(frame.nRows, rest);
    binFrameParallel(features, threads);
    const cb = process.cpuUsage(), tb = performance.now(), binCpu = cpuSince(cl);
    const m = fitBoosting({ features, target: { kind: 'number', name: 'delay', values }, weights },
      { loss: 'squared', rounds, leafBudget: 63, engine: 'histogram', learningRate: 0.1, seed: 1 });
    const t1 = performance.now();
    return {
      wall: (t1 - t0) / 1000,
      figure: `${frame.nRows} rows: load ${((tl - t0) / 1000).toFixed(1)} s (cpu ${loadCpu}), bin ${((tb - tl) / 1000).toFixed(1)} s (cpu ${binCpu}), ${rounds} rounds ${((t1 - tb) / 1000).toFixed(1)} s (cpu ${cpuSince(cb)}; ${threads} threads); train MSE ${m.trainLoss[0].toFixed(0)} → ${m.trainLoss.at(-1).toFixed(0)}`,
      target: '≤ 30 s wall, peak RSS ≤ 2 GB',
    };
  },

  async forest() {
    const { fitForest } = await import(dist('learn/ensemble/forest.js'));
    const { binnedFrameFor } = await import(dist('table/bin-cache.js'));
    const { Fnv64 } = await import(dist('util/hash.js'));
    const n = S(100_000), trees = S(500);
    const data = await friedman(n, 20, 2);
    binnedFrameFor(data.features);
    const opts = { size: trees, seed: 3, featuresPerSplit: 7, leafRows: 5, engine: 'histogram' };
    // each model is reduced to a digest of its trees and out-of-bag curve at once (500 deep trees are large)
    const run = (workers) => {
      const c0 = process.cpuUsage(), t0 = performance.now();
      const m = fitForest(data, { ...opts, workers });
      const secs = (performance.now() - t0) / 1000, cpu = Number(cpuSince(c0));
      const h = new Fnv64();
      for (const t of m.trees) { h.typed(t.threshold); h.typed(t.feature); h.typed(t.value); h.typed(t.left); }
      h.string(JSON.stringify(m.oobCurve));
      return { secs, cpu, digest: h.hex(), oob: m.oobCurve.at(-1).error };
    };
    const one = run(1), two = run(2);
    return {
      wall: one.secs + two.secs,
      figure: `fitForest ${trees} trees on ${n} × 20 (leafRows 5, 7 features per split, histogram engine): 1 worker ${one.secs.toFixed(1)} s (cpu/wall ${(one.cpu / one.secs).toFixed(2)}), ` +
        `2 workers ${two.secs.toFixed(1)} s (cpu/wall ${(two.cpu / two.secs).toFixed(2)}), speed-up ${(one.secs / two.secs).toFixed(2)}×; OOB MSE ${one.oob.toFixed(3)}${one.digest === two.digest ? ' (identical models)' : ' (MODELS DIFFER)'}`,
      target: '≥ 1.8× faster',
    };
  },

  async cell() {
    const { fitBoosting } = await import(dist('learn/ensemble/boosting.js'));
    const n = S(50_000), rounds = S(200);
    const data = await friedman(n, 10, 4);
    const t0 = performance.now();
    fitBoosting(data, { rounds, engine: 'histogram', seed: 1 });
    const secs = (performance.now() - t0) / 1000;
    return { wall: secs, figure: `${rounds} rounds on ${n} rows (Friedman #1, 10 inputs), fit in-process, bins included: ${secs.toFixed(2)} s`, target: '≤ 2 s' };
  },
};

// ---------------------------------------------------------------- driver
const child = arg('--child', null);
if (child) {
  const t0 = performance.now();
  const res = await workloads[child]();
  const wall = res.wall ?? (performance.now() - t0) / 1000;
  const u = process.resourceUsage();
  const cpu = (u.userCPUTime + u.systemCPUTime) / 1e6;
  process.stdout.write(`\n@@${JSON.stringify({ ...res, wall, cpu, rssMB: u.maxRSS / 1024 })}\n`);
  process.exit(0);
}

if (!existsSync(join(root, 'dist', 'index.js'))) { console.error('dist/ is missing: run `npm run build:wasm && npm run build` first.'); process.exit(1); }
if (!existsSync(join(root, 'build', 'kernels.wasm'))) console.error('note: build/kernels.wasm is missing, kernels run as TypeScript (npm run build:wasm).');
const only = (arg('--only', '') || Object.keys(workloads).join(',')).split(',');
console.log(`coppice bench (scale ${scale}; node ${process.version}; timings on a shared machine are noisy)`);
for (const name of only) {
  if (!workloads[name]) { console.error(`unknown workload ${name}`); continue; }
  const r = spawnSync(process.execPath, [fileURLToPath(import.meta.url), '--child', name, '--scale', String(scale)], { encoding: 'utf8', maxBuffer: 1 << 24 });
  const line = (r.stdout || '').split('\n').find((l) => l.startsWith('@@'));
  if (!line) { console.log(`${name.padEnd(8)} FAILED\n${r.stderr}`); continue; }
  const o = JSON.parse(line.slice(2));
  console.log(`${name.padEnd(8)} wall ${o.wall.toFixed(2).padStart(7)} s  cpu ${o.cpu.toFixed(1).padStart(6)} s (whole child, all threads, data generation included)  peak RSS ${o.rssMB.toFixed(0).padStart(5)} MB  ${o.figure}  [target: ${o.target}]`);
}
