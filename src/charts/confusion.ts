/**
 * Confusion matrix: actual classes down, predicted classes across; each cell shows its count and the
 * share of its actual class (row-normalised), and is shaded by that share.
 */
import type { ConfusionCell as ConfusionTableRow } from '../assess/metrics/confusion-table.js';
import { errors } from '../errors.js';
import { checkFinite, checkLabel, checkLength } from './check-input.js';
import { chartEmpty } from './empty-chart.js';
import { formatNumber, formatShare } from './format-number.js';
import { finishChart, plotSize, titles, type ChartOptions, type ChartSpec } from './spec.js';
import { ROLE, SEQUENTIAL_RAMP } from './theme.js';

/** Counts of (actual, predicted) pairs. */
export interface ConfusionInput {
  /** Class labels, in code order. */
  readonly classes: readonly string[];
  /** K × K counts: `counts[actual][predicted]`, or a flat row-major array of K·K counts. */
  readonly counts: readonly (readonly number[])[] | ArrayLike<number>;
}

/** One cell of the matrix with its row share. */
export interface ConfusionCell { actual: string; predicted: string; count: number; share: number }

const CHART = 'chartConfusion';

/**
 * Classes and counts from the tidy rows of `confusionTable` (src/assess): classes in the order they first
 * appear (actual classes, then any class only ever predicted); a pair with no row counts 0; a repeated pair
 * is an error.
 *
 * @example
 * confusionFromRows(confusionTable([0, 1, 1], [0, 0, 1], { classes: ['stay', 'leave'] }));
 * // { classes: ['stay', 'leave'], counts: Float64Array [1, 0, 1, 1] }
 */
export function confusionFromRows(rows: readonly Pick<ConfusionTableRow, 'actual' | 'predicted' | 'count'>[]): ConfusionInput {
  const index = new Map<string, number>();
  const add = (label: string) => { if (!index.has(label)) index.set(label, index.size); };
  rows.forEach((r, i) => add(checkLabel(CHART, 'actual', i, r.actual)));
  rows.forEach((r, i) => add(checkLabel(CHART, 'predicted', i, r.predicted)));
  const k = index.size;
  const counts = new Float64Array(k * k).fill(NaN);
  rows.forEach((r, i) => {
    const at = index.get(String(r.actual))! * k + index.get(String(r.predicted))!;
    if (!Number.isNaN(counts[at])) throw errors.chartInput(CHART, 'predicted', i, r.predicted, `one row per (actual, predicted) pair; ${String(r.actual)} → ${String(r.predicted)} appears twice`);
    counts[at] = checkFinite(CHART, 'count', i, r.count);
  });
  for (let j = 0; j < counts.length; j++) if (Number.isNaN(counts[j])) counts[j] = 0;
  return { classes: [...index.keys()], counts };
}

/** Cells of the matrix with each count's share of its actual class (0 for an empty row). */
export function confusionCells(input: ConfusionInput): ConfusionCell[] {
  const k = input.classes.length;
  const nested = k > 0 && Array.isArray((input.counts as ArrayLike<unknown>)[0]);
  const flat: number[] = [];
  if (nested) {
    const rows = input.counts as readonly (readonly number[])[];
    checkLength(CHART, 'counts (rows)', k, rows.length);
    rows.forEach((r, i) => { checkLength(CHART, `counts[${i}]`, k, r.length); flat.push(...r); });
  } else {
    checkLength(CHART, 'counts', k * k, input.counts.length);
    for (let i = 0; i < k * k; i++) flat.push((input.counts as ArrayLike<number>)[i]);
  }
  const cells: ConfusionCell[] = [];
  for (let a = 0; a < k; a++) {
    let total = 0;
    for (let p = 0; p < k; p++) {
      const c = checkFinite(CHART, 'count', a * k + p, flat[a * k + p]);
      total += c;
    }
    for (let p = 0; p < k; p++) {
      const count = flat[a * k + p];
      cells.push({ actual: input.classes[a], predicted: input.classes[p], count, share: total > 0 ? count / total : 0 });
    }
  }
  return cells;
}

/**
 * Confusion matrix with counts and row shares. Cells with no rows show a faint 0 and no share.
 *
 * @param input   `classes` and `counts[actual][predicted]`, or the rows of `confusionTable` as they are.
 * @param options title, subtitle, width, height. __Default:__ 90 × 66 px per class, at most 560 × 440.
 * @example
 * chartConfusion({ classes: ['A', 'B'], counts: [[40, 10], [5, 45]] });
 * chartConfusion(confusionTable(actual, predicted, { classes: ['stay', 'leave'] }));
 */
export function chartConfusion(input: ConfusionInput | readonly ConfusionTableRow[], options: ChartOptions = {}): ChartSpec {
  const matrix: ConfusionInput = Array.isArray(input) ? confusionFromRows(input as readonly ConfusionTableRow[]) : input as ConfusionInput;
  const cells = confusionCells(matrix);
  const classes = matrix.classes;
  const k = classes.length;
  const total = cells.reduce((s, c) => s + c.count, 0);
  const correct = cells.filter((c) => c.actual === c.predicted).reduce((s, c) => s + c.count, 0);
  const [title, subtitle] = titles(options, 'Confusion matrix',
    total > 0 ? `Count and share of each actual class · ${formatNumber(total)} rows · ${formatShare(correct / total)} on the diagonal` : undefined);
  if (k === 0 || total === 0) return chartEmpty(title, 'No predictions to tabulate.', options);
  const side = Math.min(560, Math.max(140, 90 * k));
  const size = plotSize(options, side, Math.min(440, Math.max(100, 66 * k)));
  const values = cells.map((c) => ({ ...c, text: formatNumber(c.count), shareText: c.count === 0 ? '' : formatShare(c.share) }));
  const order = [...classes];
  const x = { field: 'predicted', type: 'nominal', title: 'Predicted class', sort: order, axis: { orient: 'top', labelAngle: 0, domain: false, ticks: false, labelLimit: Math.max(40, side / k - 6) } };
  const y = { field: 'actual', type: 'nominal', title: 'Actual class', sort: order, axis: { domain: false, ticks: false, grid: false } };
  const fontSize = k > 8 ? 9 : 12;
  // White text from a share of 0.72 up: there the ramp colour contrasts more with white than with the dark
  // ink (WCAG 2.1 contrast ratio, worked out for this ramp in CIELAB; both are about 4:1 at the switch).
  const textColour = { condition: { test: 'datum.share >= 0.72', value: '#ffffff' }, value: '#1b2430' };
  return finishChart({
    width: size.width, height: size.height,
    data: { values },
    encoding: { x, y },
    layer: [
      { mark: { type: 'rect', stroke: '#ffffff', strokeWidth: 2 },
        encoding: { color: { field: 'share', type: 'quantitative', title: 'share of actual class', scale: { domain: [0, 1], range: [...SEQUENTIAL_RAMP.slice(0, 4)], interpolate: 'lab' }, legend: { format: '.0%', gradientLength: 160 } } } },
      { transform: [{ filter: 'datum.count > 0' }], mark: { type: 'text', fontSize, fontWeight: 'bold', baseline: 'bottom', dy: -1 }, encoding: { text: { field: 'text' }, color: textColour } },
      // Empty cells: a faint, plain 0 and no share, so the eye goes to the cells that hold rows.
      { transform: [{ filter: 'datum.count === 0' }], mark: { type: 'text', fontSize, baseline: 'middle', color: ROLE.faint }, encoding: { text: { field: 'text' } } },
      { transform: [{ filter: 'datum.count > 0' }], mark: { type: 'text', fontSize: fontSize - 1, baseline: 'top', dy: 2 }, encoding: { text: { field: 'shareText' }, color: textColour } },
    ],
  }, title, subtitle);
}
