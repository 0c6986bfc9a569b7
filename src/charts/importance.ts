/**
 * Feature importance as sorted horizontal bars, with optional interval whiskers (e.g. the spread of
 * permutation importance over repeats).
 */
import { errors } from '../errors.js';
import { checkFinite, checkLabel, checkOptionalFinite } from './check-input.js';
import { chartEmpty } from './empty-chart.js';
import { formatterFor, isShareOfWhole } from './format-number.js';
import { finishChart, plotSize, titles, type ChartOptions, type ChartSpec } from './spec.js';
import { ROLE } from './theme.js';

/** Importance of one feature. */
export interface ImportanceRow {
  readonly feature: string;
  readonly value: number;
  /** Lower end of an interval around `value`. __Default:__ none. */
  readonly low?: number;
  /** Upper end of an interval around `value`. __Default:__ none. */
  readonly high?: number;
}

/** Options for `chartImportance`. */
export interface ImportanceOptions extends ChartOptions {
  /** What the values measure (x-axis title). __Default:__ 'importance'. */
  readonly valueName?: string;
  /** Most features drawn (the largest values). __Default:__ 20. */
  readonly limit?: number;
  /** Words for the interval, shown in the subtitle. __Default:__ 'whiskers: interval'. */
  readonly intervalName?: string;
  /**
   * How values are written: 'share' as percentages, 'number' as numbers with the same decimals for all,
   * 'auto' as percentages when the values are shares of a whole (none negative, summing to 1).
   * __Default:__ 'auto'.
   */
  readonly valueFormat?: 'auto' | 'share' | 'number';
}

const CHART = 'chartImportance';

/**
 * Features ranked by importance.
 *
 * @param rows    One row per feature.
 * @param options `valueName` __Default:__ 'importance'; `limit` __Default:__ 20; `intervalName`
 *                __Default:__ 'whiskers: interval'; `valueFormat` __Default:__ 'auto'; plus title, subtitle, width,
 *                height (__Default:__ 22 px per feature).
 * @example
 * chartImportance([{ feature: 'storage_hours', value: 0.21, low: 0.18, high: 0.24 }, { feature: 'variety', value: 0.05 }],
 *   { valueName: 'drop in accuracy when shuffled' });
 */
export function chartImportance(rows: readonly ImportanceRow[], options: ImportanceOptions = {}): ChartSpec {
  const limit = options.limit ?? 20;
  if (!(Number.isInteger(limit) && limit >= 1)) throw errors.badOption('limit', limit, 'an integer >= 1');
  const all = rows.map((r, i) => {
    const low = checkOptionalFinite(CHART, 'low', i, r.low);
    const high = checkOptionalFinite(CHART, 'high', i, r.high);
    return { feature: checkLabel(CHART, 'feature', i, r.feature), value: checkFinite(CHART, 'value', i, r.value), low, high };
  });
  const valueFormat = options.valueFormat ?? 'auto';
  if (!['auto', 'share', 'number'].includes(valueFormat)) throw errors.badOption('valueFormat', valueFormat, "'auto', 'share' or 'number'");
  const asShare = valueFormat === 'share' || (valueFormat === 'auto' && isShareOfWhole(all.map((r) => r.value)));
  all.sort((a, b) => b.value - a.value || a.feature.localeCompare(b.feature));
  const shown = all.slice(0, limit);
  const format = formatterFor(shown.map((r) => r.value), asShare);
  const values = shown.map((r, rank) => ({ ...r, rank, label: format(r.value) }));
  const hasInterval = values.some((v) => v.low !== undefined && v.high !== undefined);
  const notes: string[] = [];
  if (hasInterval) notes.push(options.intervalName ?? 'whiskers: interval');
  if (all.length > limit) notes.push(`top ${limit} of ${all.length} features`);
  const note = notes.join(' · ');
  const [title, subtitle] = titles(options, 'Feature importance', note ? note[0].toUpperCase() + note.slice(1) : undefined);
  if (rows.length === 0) return chartEmpty(title, 'No features to rank.', options);
  const size = plotSize(options, 480, Math.max(60, values.length * 22));
  const y = { field: 'feature', type: 'nominal', title: null, sort: values.map((v) => v.feature), axis: { labelLimit: 200, labelPadding: 8 } };
  const xTitle = options.valueName ?? 'importance';
  const layers: Record<string, unknown>[] = [
    { mark: { type: 'bar', color: ROLE.primary, height: { band: 0.68 } }, encoding: { y, x: { field: 'value', type: 'quantitative', title: xTitle, ...(asShare ? { axis: { format: '~%' } } : {}) } } },
    { data: { values: [{ zero: 0 }] }, mark: { type: 'rule', color: ROLE.reference }, encoding: { x: { field: 'zero', type: 'quantitative' } } },
  ];
  if (hasInterval) {
    const withInterval = { filter: 'isValid(datum.low) && isValid(datum.high)' };
    layers.push(
      { transform: [withInterval], mark: { type: 'rule', color: ROLE.accent, strokeWidth: 2 }, encoding: { y, x: { field: 'low', type: 'quantitative' }, x2: { field: 'high' } } },
      { transform: [withInterval], mark: { type: 'tick', color: ROLE.accent, thickness: 2, size: 10 }, encoding: { y, x: { field: 'low', type: 'quantitative' } } },
      { transform: [withInterval], mark: { type: 'tick', color: ROLE.accent, thickness: 2, size: 10 }, encoding: { y, x: { field: 'high', type: 'quantitative' } } },
    );
  } else {
    layers.push({
      mark: { type: 'text', align: 'left', dx: 4, color: ROLE.muted },
      encoding: { y, x: { field: 'value', type: 'quantitative' }, text: { field: 'label' } },
    });
  }
  return finishChart({ width: size.width, height: size.height, data: { values }, layer: layers }, title, subtitle);
}
