/**
 * Helpers of the real-Jupyter tests: install the coppice kernelspec into a temporary prefix and execute
 * a notebook with Debian's `jupyter nbconvert --execute` (nbclient), reading back the executed cells.
 * Output shapes follow nbformat 4 (display_data with a mime bundle; JSON mime types hold objects).
 */
import { execFileSync, spawnSync } from 'node:child_process';
import { mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';

export const root = resolve(import.meta.dirname, '..', '..');
export const cli = join(root, 'dist', 'cli.js');
export const penguinsPath = join(root, 'node_modules', 'vega-datasets', 'data', 'penguins.json');
export const hasJupyter = spawnSync('jupyter', ['nbconvert', '--version'], { encoding: 'utf8' }).status === 0;

/** One output of an executed cell (nbformat 4). */
export interface Output {
  output_type: string;
  name?: string;
  text?: string | string[];
  data?: Record<string, unknown>;
  ename?: string;
  evalue?: string;
}

/** Text of a stream output, or of a mime entry stored as a list of lines. */
export const joined = (v: unknown): string => (Array.isArray(v) ? v.join('') : v == null ? '' : String(v));

/** A fresh folder with the kernelspec installed under `<folder>/env`; returns the folder and JUPYTER_PATH. */
export function kernelFolder(): { dir: string; jupyterPath: string } {
  const dir = mkdtempSync(join(tmpdir(), 'coppice-e2e-'));
  const prefix = join(dir, 'env');
  execFileSync(process.execPath, [cli, 'install-kernel', '--prefix', prefix]);
  return { dir, jupyterPath: join(prefix, 'share', 'jupyter') };
}

/** Execute code cells `sources` as a notebook in `dir`; resolves with each cell's outputs. */
export function executeNotebook(dir: string, jupyterPath: string, sources: readonly string[], name = 'notebook'): { status: number | null; stderr: string; outputs: Output[][] } {
  const nb = {
    cells: sources.map((source, i) => ({ cell_type: 'code', id: `cell-${i}`, metadata: {}, source, outputs: [], execution_count: null })),
    metadata: { kernelspec: { name: 'coppice', display_name: 'TypeScript (coppice)', language: 'typescript' } },
    nbformat: 4,
    nbformat_minor: 5,
  };
  const input = join(dir, `${name}.ipynb`);
  writeFileSync(input, JSON.stringify(nb));
  const run = spawnSync('jupyter', ['nbconvert', '--to', 'notebook', '--execute', '--output', `${name}.executed.ipynb`, input], {
    cwd: dir, encoding: 'utf8', env: { ...process.env, JUPYTER_PATH: jupyterPath }, timeout: 300_000,
  });
  if (run.status !== 0) return { status: run.status, stderr: run.stderr, outputs: [] };
  const done = JSON.parse(readFileSync(join(dir, `${name}.executed.ipynb`), 'utf8')) as { cells: { outputs: Output[] }[] };
  return { status: run.status, stderr: run.stderr, outputs: done.cells.map((c) => c.outputs) };
}

/** The Python that runs `jupyter` (it has jupyter_client), from the script's first line; null if unknown. */
export function jupyterPython(): string | null {
  const which = spawnSync('sh', ['-c', 'command -v jupyter'], { encoding: 'utf8' });
  if (which.status !== 0) return null;
  const first = readFileSync(which.stdout.trim(), 'utf8').split('\n')[0];
  const m = /^#!\s*(\S+)/.exec(first);
  return m ? m[1] : null;
}
