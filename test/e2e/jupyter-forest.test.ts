/**
 * A new user's first session, through real Jupyter: install the kernel into a temporary prefix, execute
 * a notebook with `jupyter nbconvert --execute` that fits a random forest on the Palmer penguins
 * (vega-datasets penguins.json; Gorman, Williams & Fraser 2014, 344 rows) and shows charts made with
 * src/charts — importance, out-of-bag error by size, confusion matrix, a boosting learning curve and a
 * small tree — then a lineup. Each chart's vega-lite object is rendered to PNG with `renderPng`.
 * Requires the built dist (`npm run build`).
 */
import { describe, expect, it } from 'vitest';
import { existsSync, mkdirSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { renderPng } from '../../src/charts/render-png.js';
import type { ChartSpec } from '../../src/charts/spec.js';
import { cli, executeNotebook, hasJupyter, joined, kernelFolder, penguinsPath, type Output } from './jupyter-run.js';

const mustRun = Boolean(process.env.CI);
if (!hasJupyter && !mustRun) console.warn('test/e2e/jupyter-forest.test.ts skipped: `jupyter nbconvert` is not installed.');

const forestNotebook: readonly string[] = [
  `%extract penguins ${penguinsPath}\npenguins.numRows()`,
  [
    'const rows = penguins.objects() as Record<string, unknown>[];',
    'const train = rows.filter((_, i) => i % 4 !== 0);',
    'const test = rows.filter((_, i) => i % 4 === 0);',
    '[train.length, test.length]',
  ].join('\n'),
  '%%fit forest forest\ndata: train\ntarget: Species\ntrees: 200\nseed: 7',
  [
    'import { chartImportance, chartOutOfBag, chartConfusion, chartBoostingCurve, chartTree, confusionTable, predict } from "coppice";',
    'chartImportance(forest.importance, { valueName: "share of impurity decrease" })',
  ].join('\n'),
  'chartOutOfBag(forest)',
  [
    'const classes = forest.target.classes ?? [];',
    'const p = predict(forest, test);',
    'const actual = test.map((r) => classes.indexOf(String(r.Species)));',
    'const cells = confusionTable(actual, p.value, { classes });',
    'chartConfusion(cells, { title: "Forest on held-out penguins" })',
  ].join('\n'),
  '%%fit boosted boosting\ndata: train\ntarget: Species\nrounds: 150\nrate: 0.1\nwatch: test',
  'chartBoostingCurve(boosted)',
  '%%fit small tree\ndata: train\ntarget: Species\ndepth: 3\ncriterion: gini',
  'chartTree({ tree: small.tree, features: small.features, classes: small.target.classes })',
  '%%lineup holdout lineup\nmodels: small, forest, boosted\ndata: test\nmetrics: accuracy, logLoss',
];

const VL = 'application/vnd.vegalite.v5+json';
const chartCells = [3, 4, 5, 7, 9, 10];

describe.runIf(hasJupyter || mustRun)('a first session: random forest on penguins with charts, in Jupyter', () => {
  it('fits, shows each chart as one bundle, and every chart renders to PNG', async () => {
    expect(existsSync(cli), 'dist/cli.js is missing: run npm run build').toBe(true);
    const { dir, jupyterPath } = kernelFolder();
    const run = executeNotebook(dir, jupyterPath, forestNotebook, 'penguins-forest');
    expect(run.status, run.stderr).toBe(0);
    const outs = run.outputs;
    const all = outs.flat();
    expect(all.filter((o) => o.output_type === 'error').map((o) => o.evalue)).toEqual([]);
    expect(all.filter((o) => o.output_type === 'stream' && o.name === 'stderr').map((o) => joined(o.text))).toEqual([]);

    // 344 rows (vega-datasets penguins.json); 258 train, 86 test by row index.
    expect(joined(outs[0][0].text)).toBe('344\n');
    expect(joined(outs[1][0].text)).toBe('[ 258, 86 ]\n');
    const summary = (o: Output[]) => joined(o[o.length - 1].data?.['text/plain']);
    expect(summary(outs[2])).toMatch(/^forest: forest model\n(.*\n)* {2}size +200 trees, /);
    expect(summary(outs[2])).toMatch(/\n {2}out-of-bag error +0\.\d+\n/);
    expect(summary(outs[6])).toMatch(/\n {2}watched loss \(multiclass\) +[\d.e-]+ after round 150; lowest /);

    const dirPng = join(dir, 'charts');
    mkdirSync(dirPng);
    for (const c of chartCells) {
      const charts = outs[c].filter((o) => o.data?.[VL] !== undefined);
      expect(charts, `cell ${c}`).toHaveLength(1);
      const [chart] = charts;
      expect(typeof chart.data?.[VL]).toBe('object');
      expect(joined(chart.data?.['image/svg+xml'])).toMatch(/^<svg/);
      expect(joined(chart.data?.['text/plain'])).toMatch(/^\[chart: .+\]$/);
      const png = await renderPng(chart.data?.[VL] as ChartSpec);
      expect(Array.from(png.subarray(0, 8))).toEqual([137, 80, 78, 71, 13, 10, 26, 10]); // PNG signature (PNG spec, 5.2)
      writeFileSync(join(dirPng, `cell-${c}.png`), png);
    }

    // Two routes to the forest's held-out accuracy agree: the confusion chart's diagonal share
    // (confusionTable) and the lineup's accuracy (metric registry).
    const confusion = outs[5].find((o) => o.data?.[VL])?.data?.[VL] as { title: { subtitle: string } };
    const diagonal = Number(/([\d.]+)% on the diagonal/.exec(confusion.title.subtitle)?.[1]);
    const lineup = joined(outs[10][0].data?.['text/plain']).split('\n');
    const forestRow = lineup.find((l) => l.startsWith('forest'))!.split(/\s+/);
    expect(Number(forestRow[1]) * 100).toBeCloseTo(diagonal, 1); // 4-digit table vs 1-decimal percentage
  });
});
