/**
 * Any accepted input into a Dataset: features, target and optional sample weights.
 */
import { errors } from '../errors.js';
import type { Dataset } from './frame.js';
import { chosenColumns, type ToFrameOptions } from './frame-options.js';
import { makeFrame } from './make-frame.js';
import { rawTable, type TableInput } from './raw-table.js';
import { encodeTarget, inferTask, type TaskKind } from './encode-target.js';
import { frameColumns } from './to-frame.js';
import { readWeights } from './read-weights.js';
import { isMissingValue } from './value-counts.js';

/** Options for `toDataset`. */
export interface ToDatasetOptions extends Omit<ToFrameOptions, 'columns'> {
  /** The column to learn. Required. */
  readonly target: string;
  /** A column of non-negative sample weights. __Default:__ none (every row weighs 1). */
  readonly weight?: string;
  /** Feature columns, in order. __Default:__ every column except the target, weight and `exclude`. */
  readonly features?: readonly string[];
  /** Columns left out of the default features (ids, leaks). __Default:__ `[]` */
  readonly exclude?: readonly string[];
  /** 'classification' or 'regression'. __Default:__ regression for a numeric target, else classification. */
  readonly task?: TaskKind;
  /** What rows with a missing target get: 'error' (the message says how many) or 'drop'. __Default:__ `'error'` */
  readonly missingTarget?: 'error' | 'drop';
}

function featureNames(names: readonly string[], o: ToDatasetOptions): readonly string[] {
  const known = new Set(names);
  if (o.features !== undefined) {
    if (!Array.isArray(o.features)) throw errors.badOption('features', o.features, 'an array of column names');
    for (const f of o.features) if (!known.has(f)) throw errors.unknownColumn(f, 'option features');
    const chosen = chosenColumns(names, { columns: o.features });
    for (const special of [o.target, o.weight]) {
      if (special !== undefined && chosen.includes(special)) throw errors.badOption('features', special, 'feature columns other than the target and weight');
    }
    return chosen;
  }
  const exclude = new Set(o.exclude ?? []);
  for (const e of exclude) if (!known.has(e)) throw errors.unknownColumn(e, 'option exclude');
  return names.filter((n) => n !== o.target && n !== o.weight && !exclude.has(n));
}

/**
 * Build a Dataset from an arquero table, row objects or a Frame.
 *
 * The target becomes class labels (texts, booleans, or numbers when `task` is 'classification'; `classes`
 * are sorted, and a single class is allowed) or numbers (regression). Features are typed as by `toFrame`
 * (the kind options `categorical`, `numeric`, `dates` apply). Errors name the column, option or value for:
 * an empty table, an unknown target/weight/feature/excluded column, a missing target value (unless
 * `missingTarget: 'drop'`), a negative, missing or infinite weight, or weights that are all zero.
 *
 * Options (see `ToDatasetOptions`): `target` (required), `weight`, `features`, `exclude`, `task`,
 * `missingTarget` (__Default:__ `'error'`), `categorical`, `numeric`, `dates` (__Default:__ `[]`).
 *
 * @example
 * const data = toDataset(claims, { target: 'fraud', exclude: ['claim_id'], missingTarget: 'drop' });
 * data.target.kind === 'class' && data.target.classes // ['false', 'true']
 */
export function toDataset(input: TableInput, options: ToDatasetOptions): Dataset {
  const o = options ?? ({} as ToDatasetOptions);
  if (typeof o.target !== 'string') throw errors.badOption('target', o.target, 'the name of a column');
  if (o.task !== undefined && o.task !== 'classification' && o.task !== 'regression') {
    throw errors.badOption('task', o.task, "'classification' or 'regression'");
  }
  const policy = o.missingTarget ?? 'error';
  if (policy !== 'error' && policy !== 'drop') throw errors.badOption('missingTarget', policy, "'error' or 'drop'");
  const raw = rawTable(input);
  if (!raw.names.includes(o.target)) throw errors.missingColumn(o.target, 'the table (option target)');
  if (o.weight !== undefined && !raw.names.includes(o.weight)) throw errors.missingColumn(o.weight, 'the table (option weight)');
  if (o.weight === o.target) throw errors.badOption('weight', o.weight, 'a column other than the target');
  const features = featureNames(raw.names, o);
  if (raw.nRows === 0) throw errors.emptyData('fit');

  const targetValues = raw.values(o.target);
  const kept: number[] = [];
  for (let r = 0; r < raw.nRows; r++) if (!isMissingValue(targetValues[r])) kept.push(r);
  const dropped = raw.nRows - kept.length;
  if (dropped > 0 && policy === 'error') {
    throw errors.badTarget(o.target, `${dropped} of ${raw.nRows} rows have no value; use missingTarget: 'drop' to leave them out`);
  }
  if (kept.length === 0) throw errors.badTarget(o.target, 'every row has a missing value');
  const rows = dropped > 0 ? kept : null;

  const task = o.task ?? inferTask(o.target, targetValues);
  const target = encodeTarget(o.target, targetValues, task, rows);
  const weights = o.weight === undefined ? null : readWeights(o.weight, raw.values(o.weight), rows);
  const frame = makeFrame(kept.length, frameColumns(input, raw, features, o, rows));
  return { features: frame, target, weights };
}
