/**
 * Small inline frames and datasets for tree tests (no table layer needed).
 */
import type { Column, Dataset, Frame, Target } from '../../../src/table/frame.js';
import { schemaFingerprint } from '../../../src/table/fingerprint.js';

export type RawColumn = readonly (number | null)[] | readonly (string | null)[];

/** A column from plain values: strings (null = missing) become categorical with a sorted dictionary. */
export function columnOf(name: string, rawIn: RawColumn): Column {
  const raw = rawIn as readonly (number | string | null)[];
  const isText = raw.some((v) => typeof v === 'string');
  if (isText) {
    const categories = [...new Set(raw.filter((v): v is string => typeof v === 'string'))].sort();
    const codes = Int32Array.from(raw, (v) => (v === null ? -1 : categories.indexOf(v as string)));
    return { name, kind: 'categorical', codes, categories };
  }
  return { name, kind: 'numeric', values: Float64Array.from(raw, (v) => (v === null ? NaN : (v as number))) };
}

export function frameOf(cols: Record<string, RawColumn>): Frame {
  const columns = Object.entries(cols).map(([k, v]) => columnOf(k, v));
  const nRows = columns.length ? (columns[0].kind === 'categorical' ? columns[0].codes.length : columns[0].values.length) : 0;
  const schemaCols = columns.map((c) => (c.kind === 'categorical' ? { name: c.name, kind: c.kind, categories: c.categories } : { name: c.name, kind: c.kind }));
  return { nRows, columns, schema: { columns: schemaCols, fingerprint: schemaFingerprint(schemaCols) } };
}

export function classTarget(name: string, labels: readonly (string | null)[], classes?: readonly string[]): Target {
  const cls = classes ?? [...new Set(labels.filter((v): v is string => v !== null))].sort();
  return { kind: 'class', name, classes: cls, codes: Int32Array.from(labels, (v) => (v === null ? -1 : cls.indexOf(v))) };
}

export function numberTarget(name: string, values: readonly number[]): Target {
  return { kind: 'number', name, values: Float64Array.from(values) };
}

export function datasetOf(cols: Record<string, RawColumn>, target: Target, weights: number[] | null = null): Dataset {
  return { features: frameOf(cols), target, weights: weights ? Float64Array.from(weights) : null };
}

/**
 * PlayTennis: Mitchell, T. (1997) Machine Learning, McGraw-Hill, ch. 3, Table 3.2
 * (after Quinlan 1986, "Induction of decision trees", Machine Learning 1:81–106). Rows D1..D14.
 */
export const playTennis = {
  Outlook: ['sunny', 'sunny', 'overcast', 'rain', 'rain', 'rain', 'overcast', 'sunny', 'sunny', 'rain', 'sunny', 'overcast', 'overcast', 'rain'],
  Temperature: ['hot', 'hot', 'hot', 'mild', 'cool', 'cool', 'cool', 'mild', 'cool', 'mild', 'mild', 'mild', 'hot', 'mild'],
  Humidity: ['high', 'high', 'high', 'high', 'normal', 'normal', 'normal', 'high', 'normal', 'normal', 'normal', 'high', 'normal', 'high'],
  Wind: ['weak', 'strong', 'weak', 'weak', 'weak', 'strong', 'strong', 'weak', 'weak', 'weak', 'strong', 'strong', 'weak', 'strong'],
  PlayTennis: ['no', 'no', 'yes', 'yes', 'yes', 'no', 'yes', 'no', 'yes', 'yes', 'yes', 'yes', 'yes', 'no'],
};

export function playTennisData(): Dataset {
  const { PlayTennis, ...features } = playTennis;
  return datasetOf(features, classTarget('PlayTennis', PlayTennis));
}
