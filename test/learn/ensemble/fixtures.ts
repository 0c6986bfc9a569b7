/**
 * Test fixtures: frames from plain arrays, the Palmer penguins (vega-datasets penguins.json; Gorman,
 * Williams & Fraser 2014, PLoS ONE 9(3):e90081) and Friedman #1 (Friedman 1991, Annals of Statistics 19(1)).
 */
import { readFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import { dirname, join } from 'node:path';
import type { Column, ColumnSchema, Dataset, Frame, Target } from '../../../src/table/frame.js';
import { schemaFingerprint } from '../../../src/table/fingerprint.js';
import { createRng } from '../../../src/util/rng.js';

type Raw = readonly (number | null)[] | readonly (string | null)[];

/** A frame from named arrays: numbers → numeric (null → NaN), strings → categorical (sorted dictionary, null → -1). */
export function frameOf(cols: Record<string, Raw>): Frame {
  const columns: Column[] = [];
  let nRows = 0;
  for (const [name, raw] of Object.entries(cols)) {
    nRows = raw.length;
    const firstDefined = raw.find((v) => v !== null);
    if (typeof firstDefined === 'string') {
      const labels = raw as readonly (string | null)[];
      const categories = [...new Set(labels.filter((v): v is string => v !== null))].sort();
      const codes = Int32Array.from(labels, (v) => (v === null ? -1 : categories.indexOf(v)));
      columns.push({ name, kind: 'categorical', codes, categories });
    } else {
      const nums = raw as readonly (number | null)[];
      columns.push({ name, kind: 'numeric', values: Float64Array.from(nums, (v) => (v === null ? NaN : v)) });
    }
  }
  const schemaCols: ColumnSchema[] = columns.map((c) => (c.kind === 'categorical' ? { name: c.name, kind: c.kind, categories: c.categories } : { name: c.name, kind: c.kind }));
  return { nRows, columns, schema: { columns: schemaCols, fingerprint: schemaFingerprint(schemaCols) } };
}

export function classTarget(name: string, labels: readonly (string | null)[], classes?: readonly string[]): Target {
  const cls = classes ?? [...new Set(labels.filter((v): v is string => v !== null))].sort();
  return { kind: 'class', name, codes: Int32Array.from(labels, (v) => (v === null ? -1 : cls.indexOf(v))), classes: cls };
}

export function numberTarget(name: string, values: readonly (number | null)[]): Target {
  return { kind: 'number', name, values: Float64Array.from(values, (v) => (v === null ? NaN : v)) };
}

export function datasetOf(features: Frame, target: Target, weights: Float64Array | null = null): Dataset {
  return { features, target, weights };
}

interface PenguinRow { Species: string; Island: string; Sex: string | null; [k: string]: string | number | null }

/** Penguins with Species as the target; rows with every measurement missing are kept (features missing). */
export function penguins(): Dataset {
  const require = createRequire(import.meta.url);
  // the package exports only its build; the data folder sits next to it
  const path = join(dirname(require.resolve('vega-datasets')), '..', 'data', 'penguins.json');
  const rows = JSON.parse(readFileSync(path, 'utf8')) as PenguinRow[];
  const num = (k: string) => rows.map((r) => (r[k] === null ? null : Number(r[k])));
  const features = frameOf({
    island: rows.map((r) => r.Island),
    beakLength: num('Beak Length (mm)'),
    beakDepth: num('Beak Depth (mm)'),
    flipperLength: num('Flipper Length (mm)'),
    bodyMass: num('Body Mass (g)'),
    sex: rows.map((r) => (r.Sex === '.' ? null : r.Sex)),
  });
  return datasetOf(features, classTarget('species', rows.map((r) => r.Species)));
}

/** Friedman #1: ten U(0,1) inputs, y = 10 sin(π x1 x2) + 20 (x3 − 0.5)² + 10 x4 + 5 x5 + N(0, 1), seeded. */
export function friedman1(n: number, seed: number, noise = 1): Dataset {
  const rng = createRng(seed);
  const cols: Record<string, number[]> = {};
  for (let j = 1; j <= 10; j++) cols[`x${j}`] = [];
  const y: number[] = [];
  for (let i = 0; i < n; i++) {
    const x = Array.from({ length: 10 }, () => rng.next());
    x.forEach((v, j) => cols[`x${j + 1}`].push(v));
    y.push(10 * Math.sin(Math.PI * x[0] * x[1]) + 20 * (x[2] - 0.5) ** 2 + 10 * x[3] + 5 * x[4] + noise * rng.normal());
  }
  return datasetOf(frameOf(cols), numberTarget('y', y));
}

/** k folds of 0..n−1 after a seeded shuffle. */
export function foldsOf(n: number, k: number, seed: number): number[][] {
  const rng = createRng(seed);
  const idx = Array.from({ length: n }, (_, i) => i);
  for (let i = n - 1; i > 0; i--) { const j = rng.int(i + 1); [idx[i], idx[j]] = [idx[j], idx[i]]; }
  return Array.from({ length: k }, (_, f) => idx.filter((_, p) => p % k === f));
}
