/**
 * The real-Jupyter path: install the kernelspec into a temporary folder, point JUPYTER_PATH at it and
 * execute a notebook with Debian's `jupyter nbconvert --execute` (nbclient). Requires the built dist.
 * Message and output shapes follow the Jupyter messaging protocol and nbformat 4 (jupyter-client and
 * nbformat documentation: display_data with a mime bundle; JSON mime types hold objects).
 */
import { describe, expect, it } from 'vitest';
import { execFileSync, spawnSync } from 'node:child_process';
import { existsSync, mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';

const root = resolve(import.meta.dirname, '..', '..');
const cli = join(root, 'dist', 'cli.js');
const penguins = join(root, 'node_modules', 'vega-datasets', 'data', 'penguins.json');
const hasJupyter = spawnSync('jupyter', ['nbconvert', '--version'], { encoding: 'utf8' }).status === 0;
const mustRun = Boolean(process.env.CI);

if (!hasJupyter && !mustRun) {
  console.warn('test/e2e/jupyter.test.ts skipped: `jupyter nbconvert` is not installed (install jupyter-nbconvert and python3-nbclient).');
}

interface Output {
  output_type: string;
  name?: string;
  text?: string | string[];
  data?: Record<string, unknown>;
  ename?: string;
  evalue?: string;
}

const cells = [
  `%extract penguins ${penguins}\npenguins.numRows()`,
  '%glance penguins',
  [
    'const rows = penguins.objects();',
    'const train = rows.filter((_, i) => i % 4 !== 0);',
    'const test = rows.filter((_, i) => i % 4 === 0);',
    '[train.length, test.length]',
  ].join('\n'),
  '%%fit shallow tree\ndata: train\ntarget: Species\ndepth: 2\ncriterion: gini',
  '%%fit deeper tree\ndata: train\ntarget: Species\ndepth: 5',
  '%%lineup holdout lineup\nmodels: shallow, deeper\ndata: test\nmetrics: accuracy',
  '%%decide Use the deeper tree\nwhy: Higher holdout accuracy.\nevidence: holdout lineup\ncheck: holdout lineup: deeper accuracy >= 0.8',
  'penguins.slice(0, 3)',
  '%%fit pruned tree\ndata: train\ntarget: Species\nprune: reduced-error\nprune-on: test',
  '%%fit stacked stacking\ndata: train\ntarget: Species\nmembers: shallow, deeper\nfolds: 3',
  '%%lineup all kinds\nmodels: shallow, pruned, stacked\ndata: test',
];

function notebook(): object {
  return {
    cells: cells.map((source, i) => ({ cell_type: 'code', id: `cell-${i}`, metadata: {}, source, outputs: [], execution_count: null })),
    metadata: { kernelspec: { name: 'coppice', display_name: 'TypeScript (coppice)', language: 'typescript' } },
    nbformat: 4,
    nbformat_minor: 5,
  };
}

describe.runIf(hasJupyter || mustRun)('jupyter nbconvert --execute with the coppice kernel', () => {
  it('runs magics, a fit, a chart and a table, with the right output types', () => {
    expect(existsSync(cli), 'dist/cli.js is missing: run npm run build').toBe(true);
    const dir = mkdtempSync(join(tmpdir(), 'coppice-e2e-'));
    const prefix = join(dir, 'env');
    execFileSync(process.execPath, [cli, 'install-kernel', '--prefix', prefix]);
    const spec = JSON.parse(readFileSync(join(prefix, 'share', 'jupyter', 'kernels', 'coppice', 'kernel.json'), 'utf8')) as { argv: string[] };
    expect(spec.argv.slice(1)).toEqual([cli, 'kernel', '--connection', '{connection_file}']);

    const input = join(dir, 'penguins.ipynb');
    writeFileSync(input, JSON.stringify(notebook()));
    const run = spawnSync('jupyter', ['nbconvert', '--to', 'notebook', '--execute', '--output', 'executed.ipynb', input], {
      cwd: dir, encoding: 'utf8', env: { ...process.env, JUPYTER_PATH: join(prefix, 'share', 'jupyter') }, timeout: 300_000,
    });
    expect(run.status, run.stderr).toBe(0);
    const done = JSON.parse(readFileSync(join(dir, 'executed.ipynb'), 'utf8')) as { cells: { outputs: Output[] }[] };
    const outs = done.cells.map((c) => c.outputs);
    const text = (o: Output) => (Array.isArray(o.text) ? o.text.join('') : o.text ?? '');
    const joined = (v: unknown) => (Array.isArray(v) ? v.join('') : String(v));

    // 1: the extract loads all 344 rows (Gorman, Williams & Fraser 2014, via vega-datasets penguins.json).
    expect(outs[0].map(text).join('')).toBe('344\n');
    // 2: the glance is an HTML table, one row per column.
    expect(outs[1][0].output_type).toBe('display_data');
    expect(joined(outs[1][0].data?.['text/html'])).toContain('<table>');
    expect(joined(outs[1][0].data?.['text/plain'])).toContain('Flipper Length (mm)');
    expect(outs[2].map(text).join('')).toContain('258');
    // 4-5: a fit ends with the model summary in its display.
    for (const o of [outs[3], outs[4]]) {
      const last = o[o.length - 1];
      expect(['display_data', 'update_display_data']).toContain(last.output_type);
      expect(joined(last.data?.['text/plain'])).toMatch(/tree model\n {2}task +classification of Species \(3 classes\)/);
    }
    // 6: the lineup: a metrics table and ONE chart bundle with the vega-lite spec as an object and an SVG.
    const [table, chart] = outs[5];
    expect(joined(table.data?.['text/html'])).toContain('<th>model</th>');
    const vl = chart.data?.['application/vnd.vegalite.v5+json'];
    expect(typeof vl).toBe('object');
    expect((vl as { $schema: string }).$schema).toContain('vega-lite/v5');
    expect(joined(chart.data?.['image/svg+xml'])).toMatch(/^<svg/);
    expect(joined(chart.data?.['text/plain'])).toBe('[chart: holdout lineup]');
    // 7: the decision card.
    expect(outs[6].some((o) => o.output_type === 'display_data')).toBe(true);
    // 8: a table value as the last expression shows as an HTML table with a note.
    expect(joined(outs[7][0].data?.['text/html'])).toContain('3 rows × 7 columns');
    // 9-10: a tree pruned from the magic's settings, and a stack of two earlier models, through the real kernel's compiler.
    expect(joined(outs[8].at(-1)?.data?.['text/plain'])).toMatch(/\n {2}pruned +reduced error, on 86 held-out rows\n/);
    expect(joined(outs[9].at(-1)?.data?.['text/plain'])).toMatch(/^stacked: stack model\n(.*\n)* {2}members +shallow, deeper\n/);
    // 11: the lineup scores a stack like any other model.
    expect(joined(outs[10][0].data?.['text/plain'])).toMatch(/\nstacked +0\.\d+/);
  });

  it('reports a malformed magic as an error output naming line and word, and stops', () => {
    const dir = mkdtempSync(join(tmpdir(), 'coppice-e2e-'));
    const prefix = join(dir, 'env');
    execFileSync(process.execPath, [cli, 'install-kernel', '--prefix', prefix]);
    const nb = {
      cells: [{ cell_type: 'code', id: 'bad', metadata: {}, source: '%%fit m tree\ndata: t\ntarget: y\ndpeth: 3', outputs: [], execution_count: null }],
      metadata: { kernelspec: { name: 'coppice', display_name: 'TypeScript (coppice)', language: 'typescript' } },
      nbformat: 4, nbformat_minor: 5,
    };
    const input = join(dir, 'bad.ipynb');
    writeFileSync(input, JSON.stringify(nb));
    const run = spawnSync('jupyter', ['nbconvert', '--to', 'notebook', '--execute', '--allow-errors', '--output', 'executed.ipynb', input], {
      cwd: dir, encoding: 'utf8', env: { ...process.env, JUPYTER_PATH: join(prefix, 'share', 'jupyter') }, timeout: 300_000,
    });
    expect(run.status, run.stderr).toBe(0);
    const done = JSON.parse(readFileSync(join(dir, 'executed.ipynb'), 'utf8')) as { cells: { outputs: Output[] }[] };
    const err = done.cells[0].outputs.find((o) => o.output_type === 'error');
    expect(err?.ename).toBe('Malformed magic');
    expect(err?.evalue).toContain('Magic at line 4, column 1: unknown setting "dpeth"');
    expect(err?.evalue).toContain('\n  dpeth: 3\n  ^^^^^');
  });
});
