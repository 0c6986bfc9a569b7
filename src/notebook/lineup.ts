/**
 * Several fitted models scored on the same rows: a metrics table (one row per model) and a chart, shown
 * together. The lineup magic compiles to `showLineup`.
 */
import { defaultMetrics, findMetric } from '../assess/metrics/registry.js';
import type { ModelHeader, Predictions } from '../learn/model.js';
import { predictFrame } from '../learn/predict.js';
import { alignFrame } from '../table/align-frame.js';
import type { Target } from '../table/frame.js';
import type { TableInput } from '../table/raw-table.js';
import { errors } from '../errors.js';
import { chartBundle } from './chart-bundle.js';
import { emitDisplay, trackDisplay } from './display-sink.js';
import { lineupChart } from './lineup-chart.js';
import { noteMetric, noteShown, noteTable } from './record-notes.js';
import { tableBundle } from './table-bundle.js';
import { sliceTable } from './table-rows.js';

export interface LineupOptions {
  /** Metric names (see the metric registry). __Default:__ the task's default metrics. */
  readonly metrics?: readonly string[];
  /** Title, also the name a decision cites. __Default:__ `'model lineup'`. */
  readonly title?: string;
}

/** One model's scores. */
export type LineupRow = { readonly model: string } & Record<string, number | string>;

/** The target of `model` read from `table`'s rows, keeping rows whose target is known. */
function targetRows(model: ModelHeader, table: unknown): { target: Target; rows: number[] } {
  const slice = sliceTable(table, Infinity);
  const j = slice.columns.indexOf(model.target.name);
  if (j < 0) throw errors.missingColumn(model.target.name, 'the lineup data');
  const rows: number[] = [];
  const raw = slice.rows.map((r) => r[j]);
  raw.forEach((v, i) => { if (v != null && !(typeof v === 'number' && Number.isNaN(v)) && v !== '') rows.push(i); });
  if (model.task === 'classification') {
    const classes = model.target.classes ?? [];
    const codes = Int32Array.from(rows, (i) => classes.indexOf(String(raw[i])));
    return { target: { kind: 'class', name: model.target.name, codes, classes }, rows };
  }
  return { target: { kind: 'number', name: model.target.name, values: Float64Array.from(rows, (i) => Number(raw[i])) }, rows };
}

function pick(p: Predictions, rows: number[]): Predictions {
  const k = p.classes.length;
  const value = Float64Array.from(rows, (i) => p.value[i]);
  const proba = new Float64Array(k > 0 ? rows.length * k : 0);
  if (k > 0) rows.forEach((i, r) => proba.set(p.proba.subarray(i * k, i * k + k), r * k));
  return { ...p, n: rows.length, value, proba };
}

/**
 * Score each model in `models` (name → model) on `data` and show the table and chart.
 * @example
 * await showLineup({ firstTree, forest }, test, { title: 'holdout lineup' });
 */
export async function showLineup(models: Readonly<Record<string, ModelHeader>>, data: unknown, options: LineupOptions = {}): Promise<LineupRow[]> {
  const names = Object.keys(models);
  if (names.length === 0) throw errors.badOption('models', models, 'at least one model');
  const task = models[names[0]].task;
  for (const n of names) if (models[n].task !== task) throw errors.badOption(`models.${n}`, models[n].task, `a ${task} model like ${names[0]}`);
  const metrics = options.metrics ?? defaultMetrics(task);
  const title = options.title ?? 'model lineup';
  const rows: LineupRow[] = names.map((name) => {
    const model = models[name];
    const { frame } = alignFrame(data as TableInput, model.features);
    const { target, rows: kept } = targetRows(model, data);
    const p = pick(predictFrame(model, frame), kept);
    const row: Record<string, number | string> = { model: name };
    for (const m of metrics) {
      try {
        row[m] = findMetric(m).score(target, p, null);
      } catch (err) {
        row[m] = err instanceof Error ? `n/a: ${err.message}` : 'n/a';
      }
    }
    return row as LineupRow;
  });
  for (const r of rows) for (const m of metrics) if (typeof r[m] === 'number') noteMetric(`${title}: ${r.model} ${m}`, r[m] as number, { higherIsBetter: findMetric(m).higherIsBetter });
  noteTable(title, rows);
  emitDisplay({ data: tableBundle(rows, { title }), metadata: {}, transient: {} });
  const better = Object.fromEntries(metrics.map((m) => [m, findMetric(m).higherIsBetter]));
  const bundle = await trackDisplay(chartBundle(lineupChart(rows, metrics, better, title)));
  emitDisplay({ data: bundle, metadata: {}, transient: {} });
  noteShown(title, 'table');
  return rows;
}
