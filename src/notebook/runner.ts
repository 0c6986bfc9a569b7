/**
 * Headless runs: execute every code cell of a notebook in this process with the notebook executor (no Jupyter,
 * no Python), binding named extracts to the sources given; then write the executed notebook, the HTML report and
 * the run record, and compare with the previous run.
 *
 * A cell that fails stops the run: the outputs before it are kept, the failing cell carries an error output, and
 * the record names the cell. Inputs are never written; output goes to `<out>/runs/<id>/` (published in one
 * rename, see runner-publish.ts) and `<out>/latest.json` points at the last run that completed.
 */
import { basename, dirname, extname, isAbsolute, join, relative, resolve } from 'node:path';
import { performance } from 'node:perf_hooks';
import { errors } from '../errors.js';
import { Fnv64 } from '../util/hash.js';
import { compareRuns, runExitCode, type RunComparison } from './compare-runs.js';
import { createCellExecutor } from './executor.js';
import { isQuerySource } from './extracts.js';
import { readLatest, readRunRecord, RUN_FORMAT, RUN_VERSION, type CellTiming, type ModelNote, type RunFailure, type RunRecord } from './record-file.js';
import { loadExtractTable } from './record-source.js';
import { currentRunState, resetRunState } from './record-state.js';
import { comparisonCharts } from './report-comparison-charts.js';
import { renderReport } from './report-html.js';
import { collectOutputs } from './runner-outputs.js';
import { affectsFromMetadata, cellSource, declaredExtracts, readNotebook, type NotebookDocument } from './runner-notebook.js';
import { newRunId, publishRun } from './runner-publish.js';
import { runVersions } from './runner-versions.js';

export interface RunOptions {
  /** Extract name → source (file path relative to the working directory, or `sql:` query). __Default:__ `{}`. */
  readonly extracts?: Readonly<Record<string, string>>;
  /** Output folder. __Default:__ `<notebook folder>/<notebook name>-runs`. */
  readonly out?: string;
  /**
   * Run record (file or folder) to compare with; `null` for none. __Default:__ the run `latest.json` in the
   * output folder points at.
   */
  readonly baseline?: string | null;
  /** Where progress lines go. __Default:__ standard error. */
  readonly log?: (line: string) => void;
}

export interface RunOutcome {
  readonly record: RunRecord;
  readonly comparison: RunComparison | null;
  /** Folder holding the executed notebook, `report.html` and `run.json`. */
  readonly runDir: string;
  readonly notebookFile: string;
  readonly exitCode: 0 | 1 | 2;
}

function resolveSources(extracts: Readonly<Record<string, string>>): Record<string, string> {
  const out: Record<string, string> = {};
  for (const [name, source] of Object.entries(extracts)) out[name] = isQuerySource(source) || isAbsolute(source) ? source : resolve(source);
  return out;
}

async function checkBindings(doc: NotebookDocument, sources: Record<string, string>): Promise<void> {
  const declared = declaredExtracts(doc);
  for (const name of Object.keys(sources)) if (!declared.includes(name)) throw errors.unknownExtract(name, declared);
  for (const [name, source] of Object.entries(sources)) {
    try {
      await loadExtractTable(source);
    } catch (err) {
      throw errors.unreadableExtract(name, source, (err as Error).message.replace(/\.$/, ''));
    }
  }
}

function isInside(path: string, dir: string): boolean {
  const r = relative(dir, path);
  return r === '' || (!r.startsWith('..') && !isAbsolute(r));
}

function modelsIn(locals: Readonly<Record<string, unknown>>): ModelNote[] {
  const kinds = new Set(['tree', 'bagging', 'forest', 'adaboost', 'boosting', 'stack']);
  const out: ModelNote[] = [];
  for (const [name, v] of Object.entries(locals)) {
    const m = v as { kind?: unknown; task?: unknown; seed?: unknown; fingerprint?: { data?: unknown } } | null;
    if (!m || typeof m !== 'object' || !kinds.has(m.kind as string) || typeof m.task !== 'string' || typeof m.seed !== 'number') continue;
    out.push({ name, kind: m.kind as string, task: m.task, seed: m.seed, dataFingerprint: typeof m.fingerprint?.data === 'string' ? m.fingerprint.data : null });
  }
  return out;
}

/**
 * Run a notebook headless and write its outputs, report and run record.
 * @example
 * const outcome = await runNotebook('notebooks-demo/late-parcels.ipynb', {
 *   extracts: { parcels: 'notebooks-demo/data/parcels-refreshed.csv' },
 * });
 * outcome.exitCode; // 0 all checks hold, 1 a check fails, 2 the run failed
 */
export async function runNotebook(notebook: string, options: RunOptions = {}): Promise<RunOutcome> {
  const log = options.log ?? ((line: string) => process.stderr.write(`${line}\n`));
  const nbPath = resolve(notebook);
  const { doc, text } = readNotebook(nbPath);
  const sources = resolveSources(options.extracts ?? {});
  await checkBindings(doc, sources);
  const nbDir = dirname(nbPath);
  const stem = basename(nbPath, extname(nbPath));
  const outDir = resolve(options.out ?? join(nbDir, `${stem}-runs`));
  for (const input of [nbPath, ...Object.values(sources).filter((s) => !isQuerySource(s))]) {
    if (isInside(input, join(outDir, 'runs')) || input === join(outDir, 'latest.json')) {
      throw errors.badArguments('run', `the output folder ${JSON.stringify(outDir)} holds an input (${input}); choose another --out`);
    }
  }
  let baseline: RunRecord | null = null;
  const baselinePath = options.baseline === undefined ? (readLatest(outDir) ? outDir : null) : options.baseline;
  if (baselinePath) {
    try {
      baseline = readRunRecord(baselinePath);
    } catch (err) {
      if (options.baseline !== undefined) throw err;
      log(`warning: previous run not compared: ${(err as Error).message}`);
    }
  }

  const state = resetRunState(sources);
  for (const a of affectsFromMetadata(doc.metadata)) state.affectsPeople.add(a);
  const started = new Date();
  const t0 = performance.now();
  const collector = collectOutputs();
  const executed: NotebookDocument = JSON.parse(JSON.stringify(doc)) as NotebookDocument;
  const cells: CellTiming[] = [];
  let failure: RunFailure | null = null;
  const codeCells = executed.cells.filter((c) => c.cell_type === 'code').length;
  const cwd = process.cwd();
  const executor = createCellExecutor({ dir: nbDir, onDisplay: collector.onDisplay, onStream: collector.onStream });
  process.chdir(nbDir);
  try {
    let count = 0;
    for (const [i, cell] of executed.cells.entries()) {
      if (cell.cell_type !== 'code') continue;
      if (failure) { cell.outputs = []; cell.execution_count = null; continue; }
      count++;
      collector.next();
      const source = cellSource(cell);
      const c0 = performance.now();
      const result = source.trim() === '' ? { ok: true as const } : await executor.execute(source);
      const ms = Math.round((performance.now() - c0) * 10) / 10;
      cells.push({ cell: i, count, ms, ok: result.ok });
      if (!result.ok) {
        const e = result.error ?? { kind: 'runtime', name: 'Error', message: 'the cell failed', trace: [] };
        collector.error(e.name, e.message, e.trace);
        failure = { cell: i, count, kind: e.kind, name: e.name, message: e.message, firstLine: source.split('\n')[0].slice(0, 120) };
      }
      cell.outputs = collector.outputs;
      cell.execution_count = count;
      log(`cell ${count}/${codeCells} ${result.ok ? 'ok' : 'FAILED'} (${ms} ms)`);
    }
  } finally {
    process.chdir(cwd);
  }
  const models = modelsIn(executor.locals);
  executor.close();
  const s = currentRunState();
  const finished = new Date();
  const record: RunRecord = {
    format: RUN_FORMAT, version: RUN_VERSION, id: '', status: failure ? 'failed' : 'ok',
    notebook: { path: nbPath, fingerprint: new Fnv64().string(text).hex(), cells: executed.cells.length },
    started: started.toISOString(), finished: finished.toISOString(), ms: Math.round(performance.now() - t0),
    extracts: s.extracts, metrics: [...s.metrics.values()],
    tables: Object.fromEntries([...s.tables.entries()].map(([k, rows]) => [k, rows.slice(0, 200)])),
    predictions: Object.fromEntries(s.predictions), decisions: s.decisions, models,
    cells, failure, affectsPeople: [...s.affectsPeople], versions: runVersions(), comparedWith: baseline ? baseline.id : null,
  };
  return publish(record, executed, baseline, outDir, nbPath);
}

function publish(draft: RunRecord, executed: NotebookDocument, baseline: RunRecord | null, outDir: string, nbPath: string): RunOutcome {
  const id = newRunId(join(outDir, 'runs'), new Date(draft.finished));
  const record: RunRecord = { ...draft, id };
  const comparison = baseline ? compareRuns(baseline, record) : null;
  const meta = (executed.metadata.coppice ?? {}) as Record<string, unknown>;
  executed.metadata.coppice = {
    ...meta,
    run: { id, status: record.status, extracts: Object.fromEntries(record.extracts.map((e) => [e.name, e.source])) },
    decisions: record.decisions,
  };
  const notebookFile = basename(nbPath);
  const report = renderReport({
    notebook: executed, record, comparison, title: basename(nbPath, extname(nbPath)),
    comparisonCharts: comparison ? comparisonCharts(comparison) : [],
  });
  const runDir = publishRun(outDir, id, {
    [notebookFile]: `${JSON.stringify(executed, null, 1)}\n`,
    'report.html': report,
    'run.json': `${JSON.stringify(record, null, 2)}\n`,
    ...(comparison ? { 'comparison.json': `${JSON.stringify(comparison, null, 2)}\n` } : {}),
  }, record.status === 'ok');
  return { record, comparison, runDir, notebookFile: join(runDir, notebookFile), exitCode: comparison ? comparison.exitCode : runExitCode(record) };
}
