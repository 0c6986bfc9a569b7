/**
 * Held-out rows read the way a model's training rows were: the features re-read with the training
 * schema (same columns, same category dictionaries, so a category missing from the held-out rows or
 * only seen there cannot shift the codes) and the target coded with the training classes. Rows whose
 * target is missing are left out.
 */
import { errors } from '../errors.js';
import { takeRows } from '../table/dataset.js';
import { alignFrame } from '../table/align-frame.js';
import { encodeTarget } from '../table/encode-target.js';
import type { Dataset, Target } from '../table/frame.js';
import { rawTable, type TableInput } from '../table/raw-table.js';
import { isMissingValue } from '../table/value-counts.js';

/**
 * `input` (arquero table, row objects or Frame) as a Dataset like `like` (features, their dictionaries,
 * target name and classes); every row weighs 1. A class the training rows never had is an error.
 * @example
 * const watch = readHeldOut(testRows, trainData);
 * fitBoosting(trainData, { watch, patience: 20 });
 */
export function readHeldOut(input: TableInput, like: Dataset): Dataset {
  const raw = rawTable(input);
  const name = like.target.name;
  if (!raw.names.includes(name)) throw errors.missingColumn(name, 'the held-out rows (the target)');
  const { frame } = alignFrame(input, like.features.schema.columns);
  const values = raw.values(name);
  const kept: number[] = [];
  for (let i = 0; i < raw.nRows; i++) if (!isMissingValue(values[i])) kept.push(i);
  let target: Target;
  if (like.target.kind === 'number') target = encodeTarget(name, values, 'regression', kept);
  else {
    const own = encodeTarget(name, values, 'classification', kept);
    const classes = like.target.classes;
    if (own.kind !== 'class') throw errors.badTarget(name, 'expected class labels');
    const map = own.classes.map((c) => classes.indexOf(c));
    const unseen = own.classes.filter((_, k) => map[k] < 0);
    if (unseen.length > 0) throw errors.badTarget(name, `the held-out rows have classes the training rows do not: ${unseen.join(', ')}`);
    target = { kind: 'class', name, classes, codes: Int32Array.from(own.codes, (c) => map[c]) };
  }
  return { features: kept.length === raw.nRows ? frame : takeRows(frame, kept), target, weights: null };
}
