/**
 * Scoring a new table with a saved model: align it to the model's features (`alignFrame`), predict, and
 * say which rows the model sees differently from training — unseen categories, values of the wrong type,
 * absent columns, numbers outside the training range.
 */
import type { ModelHeader, Predictions } from '../learn/model.js';
import { alignFrame, type AlignReport } from '../table/align-frame.js';
import type { Frame } from '../table/frame.js';
import { rawTable, type TableInput } from '../table/raw-table.js';
import { isMissingValue } from '../table/value-counts.js';
import { predictModel } from './predict-model.js';
import { trainingRangesOf } from './training-ranges.js';

/** Rows of one numeric feature outside its training range. */
export interface RangeIssue {
  readonly column: string;
  readonly min: number;
  readonly max: number;
  readonly below: number;
  readonly above: number;
}

export interface ScoredTable {
  readonly frame: Frame;
  readonly predictions: Predictions;
  /** What alignment did (missing columns, unseen categories, type changes, invalid values). */
  readonly align: AlignReport;
  /** Values outside the training range per feature; null when the model records no ranges. */
  readonly ranges: readonly RangeIssue[] | null;
  /** Per row, short notes on what was unusual ('' when nothing); absent or retyped columns are not repeated here. */
  readonly notes: readonly string[];
  /** Rows with at least one note. */
  readonly rowsWithNotes: number;
}

/**
 * Align `input` to `model`'s features, predict every row and collect the scoring report.
 * @example
 * const s = scoreTable(model, await readExtract('march.csv'));
 * s.align.unseen;  // [{ column: 'variety', rows: 3, ... }]
 * s.notes[17];     // 'unseen variety; storage_hours above range'
 */
export function scoreTable(model: ModelHeader, input: TableInput): ScoredTable {
  const { frame, report } = alignFrame(input, model.features);
  const predictions = predictModel(model, frame);
  const raw = rawTable(input);
  const present = new Set(raw.names);
  const perRow: string[][] = Array.from({ length: frame.nRows }, () => []);
  const ranges = trainingRangesOf(model);
  const rangeIssues: RangeIssue[] = [];
  const retyped = new Set(report.typeChanges.map((t) => t.column));
  frame.columns.forEach((col, j) => {
    const name = col.name;
    const source = present.has(name) ? name : model.features[j].origin?.source;
    // absent or retyped columns are missing in every row: reported once, not per row
    if (source === undefined || !present.has(source) || retyped.has(name)) return;
    const values = raw.values(source);
    if (col.kind === 'categorical') {
      for (let i = 0; i < frame.nRows; i++) if (col.codes[i] < 0 && !isMissingValue(values[i])) perRow[i].push(`unseen ${name}`);
      return;
    }
    for (let i = 0; i < frame.nRows; i++) if (Number.isNaN(col.values[i]) && !isMissingValue(values[i])) perRow[i].push(`unreadable ${name}`);
    const r = ranges?.[name];
    if (!r) return;
    let below = 0, above = 0;
    for (let i = 0; i < frame.nRows; i++) {
      const v = col.values[i];
      if (v < r[0]) { below++; perRow[i].push(`${name} below range`); } else if (v > r[1]) { above++; perRow[i].push(`${name} above range`); }
    }
    if (below + above > 0) rangeIssues.push({ column: name, min: r[0], max: r[1], below, above });
  });
  const notes = perRow.map((n) => n.join('; '));
  return { frame, predictions, align: report, ranges: ranges ? rangeIssues : null, notes, rowsWithNotes: notes.filter((n) => n !== '').length };
}
