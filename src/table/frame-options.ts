/**
 * Options that choose columns and force their kinds, shared by toFrame, toDataset and glance.
 */
import { errors } from '../errors.js';
import type { ForcedKind } from './value-counts.js';

/** Column choice and kind overrides. */
export interface ToFrameOptions {
  /** Columns to keep, in this order. __Default:__ every column, in input order. */
  readonly columns?: readonly string[];
  /** Columns read as categorical whatever their values (numbers become their text). __Default:__ `[]` */
  readonly categorical?: readonly string[];
  /** Columns read as numbers (number texts are parsed; other texts are an error). __Default:__ `[]` */
  readonly numeric?: readonly string[];
  /** Columns read as dates (Dates or ISO date texts), expanded into date parts. __Default:__ `[]` */
  readonly dates?: readonly string[];
}

function list(option: string, value: unknown): readonly string[] {
  if (value === undefined) return [];
  if (!Array.isArray(value) || value.some((v) => typeof v !== 'string')) {
    throw errors.badOption(option, value, 'an array of column names');
  }
  return value as readonly string[];
}

/**
 * The forced kind of each listed column, checking that every name exists in `names` and that no column
 * is forced two ways.
 *
 * @example forcedKinds(['a', 'b'], { categorical: ['a'] }).get('a') // 'categorical'
 */
export function forcedKinds(names: readonly string[], options: ToFrameOptions): Map<string, ForcedKind> {
  const known = new Set(names);
  const forced = new Map<string, ForcedKind>();
  const from: Record<string, string> = {};
  const groups: [string, ForcedKind][] = [['categorical', 'categorical'], ['numeric', 'numeric'], ['dates', 'date']];
  for (const [option, kind] of groups) {
    for (const name of list(option, options[option as keyof ToFrameOptions])) {
      if (!known.has(name)) throw errors.unknownColumn(name, `option ${option}`);
      const prior = from[name];
      if (prior !== undefined && prior !== option) throw errors.optionConflict(name, prior, option);
      from[name] = option;
      forced.set(name, kind);
    }
  }
  return forced;
}

/**
 * The columns to use: `options.columns` (each must exist, no repeats) or every name.
 *
 * @example chosenColumns(['a', 'b'], { columns: ['b'] }) // ['b']
 */
export function chosenColumns(names: readonly string[], options: ToFrameOptions): readonly string[] {
  if (options.columns === undefined) return names;
  const wanted = list('columns', options.columns);
  const known = new Set(names);
  const seen = new Set<string>();
  for (const name of wanted) {
    if (!known.has(name)) throw errors.unknownColumn(name, 'option columns');
    if (seen.has(name)) throw errors.badOption('columns', name, 'each column named once');
    seen.add(name);
  }
  return wanted;
}
