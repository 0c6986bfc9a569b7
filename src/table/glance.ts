/**
 * A first look at a table, one plain row per column: what toFrame will make of it, how much is missing,
 * ranges and the most common categories. Never throws on bad values: it notes them.
 */
import { chosenColumns, forcedKinds, type ToFrameOptions } from './frame-options.js';
import { DATE_PARTS } from './date-parts.js';
import { categoryText } from './encode-values.js';
import { parseIsoDate } from './iso-date.js';
import { isFrame, rawTable, type TableInput } from './raw-table.js';
import { isNumberText } from './text-values.js';
import { chooseKind, countValues, isMissingValue, type EncodedKind } from './value-counts.js';

/** One column at a glance. */
export interface GlanceRow {
  readonly column: string;
  /** What toFrame makes of it ('date' expands into date-part columns). */
  readonly kind: EncodedKind;
  readonly missing: number;
  /** Distinct non-missing values. */
  readonly distinct: number;
  /** Smallest and largest value: numbers, or ISO texts for dates; null otherwise. */
  readonly min: number | string | null;
  readonly max: number | string | null;
  /** Mean of a numeric column, share of true for a boolean column; null otherwise. */
  readonly mean: number | null;
  /** Up to five most common values with counts, e.g. `rain (641), sun (640)`; categorical and boolean. */
  readonly top: string | null;
  /** Anything worth a second look (mixed types, all missing, one value, ±Infinity); null when none. */
  readonly note: string | null;
}

const TOP = 5;

function isoText(t: number): string {
  const iso = new Date(t).toISOString();
  return iso.endsWith('T00:00:00.000Z') ? iso.slice(0, 10) : iso;
}

function topText(counts: Map<string, number>): string | null {
  if (counts.size === 0) return null;
  const sorted = [...counts].sort((a, b) => b[1] - a[1] || (a[0] < b[0] ? -1 : a[0] > b[0] ? 1 : 0));
  return sorted.slice(0, TOP).map(([k, n]) => `${k} (${n})`).join(', ');
}

function glanceColumn(column: string, values: ArrayLike<unknown>, kind: EncodedKind, notes: string[]): GlanceRow {
  let missing = 0, refused = 0, infinite = 0, sum = 0, count = 0;
  let min = Infinity, max = -Infinity, timeOfDay = false;
  const distinct = new Set<string | number>();
  const counts = new Map<string, number>();
  for (let i = 0; i < values.length; i++) {
    const v = values[i];
    if (isMissingValue(v)) { missing++; continue; }
    if (kind === 'categorical' || kind === 'boolean') {
      let text: string;
      try { text = categoryText(column, i, v); } catch { refused++; continue; }
      counts.set(text, (counts.get(text) ?? 0) + 1);
      distinct.add(text);
      if (kind === 'boolean') { const x = v === true || v === 1 ? 1 : 0; sum += x; count++; }
      continue;
    }
    let x: number;
    if (kind === 'date') x = v instanceof Date ? v.getTime() : typeof v === 'string' ? parseIsoDate(v) : NaN;
    else x = typeof v === 'number' || typeof v === 'bigint' || typeof v === 'boolean' ? Number(v) : typeof v === 'string' && isNumberText(v) ? Number(v.trim()) : NaN;
    if (x === Infinity || x === -Infinity) { infinite++; continue; }
    if (Number.isNaN(x)) { refused++; continue; }
    if (kind === 'date' && x % 86_400_000 !== 0) timeOfDay = true;
    distinct.add(x);
    if (x < min) min = x;
    if (x > max) max = x;
    sum += x; count++;
  }
  if (values.length > 0 && missing === values.length) notes.push('all missing');
  else if (distinct.size === 1 && values.length - missing - infinite - refused > 1) notes.push('one value only');
  if (infinite) notes.push(`±Infinity in ${infinite} rows (toFrame refuses it)`);
  if (refused) notes.push(`${refused} values do not fit kind ${kind} (toFrame refuses them)`);
  if (kind === 'date') {
    const parts = timeOfDay ? [...DATE_PARTS, 'hour'] : DATE_PARTS;
    notes.push(`expands into ${parts.map((p) => `${column}.${p}`).join(', ')}`);
  }
  const numeric = kind === 'numeric' || kind === 'date';
  const range = numeric && count > 0;
  return {
    column, kind, missing, distinct: distinct.size,
    min: range ? (kind === 'date' ? isoText(min) : min) : null,
    max: range ? (kind === 'date' ? isoText(max) : max) : null,
    mean: (kind === 'numeric' || kind === 'boolean') && count > 0 ? sum / count : null,
    top: kind === 'categorical' || kind === 'boolean' ? topText(counts) : null,
    note: notes.length ? notes.join('; ') : null,
  };
}

/**
 * One plain row per column (name, kind, missing, distinct, min, max, mean, top, note) for an arquero
 * table, row objects or a Frame — ready to show as a table or chart. Kinds are those `toFrame` would
 * choose with the same options; values it would refuse (±Infinity, objects) are counted in `note`.
 *
 * Options: `columns` (__Default:__ all), `categorical`, `numeric`, `dates` (__Default:__ `[]`), as for toFrame.
 *
 * @example glance(await readExtract('weather.csv')).find((r) => r.column === 'weather')?.top // 'rain (641), sun (640), ...'
 */
export function glance(input: TableInput, options: ToFrameOptions = {}): GlanceRow[] {
  const raw = rawTable(input);
  const forced = forcedKinds(raw.names, options);
  const frameKinds = isFrame(input) ? new Map(input.columns.map((c) => [c.name, c.kind] as const)) : null;
  return chosenColumns(raw.names, options).map((name) => {
    const values = raw.values(name);
    const own = frameKinds?.get(name);
    const choice = own && !forced.has(name) ? { kind: own } : chooseKind(countValues(values), forced.get(name));
    const notes: string[] = [];
    if ('note' in choice && choice.note && choice.note !== 'all missing' && choice.note !== 'no rows') notes.push(choice.note);
    return glanceColumn(name, values, choice.kind, notes);
  });
}
