/**
 * Reading a notebook for a headless run: the file must be Jupyter nbformat 4 JSON whose kernelspec is coppice's.
 * Also finds the extract names the notebook declares, before anything runs, so a bad `--extract` is refused
 * without writing anything.
 */
import { existsSync, readFileSync, statSync } from 'node:fs';
import { errors } from '../errors.js';
import { KERNEL_NAME } from './kernelspec.js';
import { compileCell } from './magic-compile.js';
import { builtinMagics } from './magics.js';

/** A cell as nbformat 4 stores it (outputs only on code cells). */
export interface NotebookCell {
  cell_type: 'code' | 'markdown' | 'raw';
  source: string | string[];
  metadata: Record<string, unknown>;
  outputs?: Record<string, unknown>[];
  execution_count?: number | null;
  id?: string;
  attachments?: unknown;
}

export interface NotebookDocument {
  nbformat: number;
  nbformat_minor: number;
  metadata: Record<string, unknown>;
  cells: NotebookCell[];
}

/** A cell's source as one string. */
export function cellSource(cell: NotebookCell): string {
  return Array.isArray(cell.source) ? cell.source.join('') : String(cell.source ?? '');
}

/**
 * Read and check a notebook file.
 * @example
 * const nb = readNotebook('notebooks-demo/late-parcels.ipynb');
 */
export function readNotebook(path: string): { doc: NotebookDocument; text: string } {
  if (!existsSync(path)) throw errors.badNotebook(path, 'no such file');
  if (!statSync(path).isFile()) throw errors.badNotebook(path, 'it is not a file');
  const text = readFileSync(path, 'utf8');
  let parsed: unknown;
  try {
    parsed = JSON.parse(text);
  } catch {
    throw errors.badNotebook(path, 'it is not JSON (expected a Jupyter .ipynb file)');
  }
  const doc = parsed as Partial<NotebookDocument>;
  if (!doc || typeof doc !== 'object' || !Array.isArray(doc.cells)) throw errors.badNotebook(path, 'it has no cells list');
  if (doc.nbformat !== 4) throw errors.badNotebook(path, `nbformat ${JSON.stringify(doc.nbformat)}; expected 4`);
  const spec = (doc.metadata as { kernelspec?: { name?: unknown } } | undefined)?.kernelspec;
  const name = spec?.name;
  if (name !== KERNEL_NAME) {
    const seen = typeof name === 'string' ? `its kernel is ${JSON.stringify(name)}` : 'it names no kernel';
    throw errors.badNotebook(path, `${seen}; expected coppice's kernel ${JSON.stringify(KERNEL_NAME)}`);
  }
  for (const [i, c] of doc.cells.entries()) {
    if (!c || typeof c !== 'object' || !['code', 'markdown', 'raw'].includes(c.cell_type)) {
      throw errors.badNotebook(path, `cell ${i + 1} has an unknown cell_type`);
    }
  }
  return { doc: { nbformat: 4, nbformat_minor: doc.nbformat_minor ?? 5, metadata: doc.metadata ?? {}, cells: doc.cells }, text };
}

const DECLARED = /declareExtract\(\s*(["'`])([A-Za-z_$][\w$]*)\1/g;

/**
 * Extract names a notebook declares (through the extract magic or a direct `declareExtract` call), in order.
 * @example
 * declaredExtracts(nb.doc); // ['parcels']
 */
export function declaredExtracts(doc: NotebookDocument): string[] {
  const names: string[] = [];
  for (const cell of doc.cells) {
    if (cell.cell_type !== 'code') continue;
    const source = cellSource(cell);
    let code = source;
    try {
      code = compileCell(source, builtinMagics).code;
    } catch {
      // a malformed magic fails when the cell runs; scan the raw text meanwhile
    }
    for (const m of code.matchAll(DECLARED)) if (!names.includes(m[2])) names.push(m[2]);
  }
  return names;
}

/**
 * Words in a notebook's metadata marking a use that affects people (`metadata.coppice.affects`).
 * @example
 * affectsFromMetadata({ coppice: { affects: ['credit'] } }); // ['credit']
 */
export function affectsFromMetadata(metadata: Record<string, unknown>): string[] {
  const c = metadata.coppice as { affects?: unknown } | undefined;
  const a = c?.affects;
  if (typeof a === 'string') return [a];
  return Array.isArray(a) ? a.filter((x): x is string => typeof x === 'string') : [];
}
