/**
 * Drift between two extracts: the population stability index (PSI) of each feature as bars over three
 * background bands — below 0.1 little change, 0.1–0.25 worth a look, above 0.25 a real shift
 * (thresholds: common practice in credit scoring; overridable).
 */
import { errors } from '../errors.js';
import { checkFinite, checkLabel } from './check-input.js';
import { chartEmpty } from './empty-chart.js';
import { formatNumber } from './format-number.js';
import { finishChart, plotSize, titles, type ChartOptions, type ChartSpec } from './spec.js';
import { BAND_COLOURS, ROLE } from './theme.js';

/** PSI of one feature. */
export interface DriftRow {
  readonly feature: string;
  readonly psi: number;
}

/** Options for `chartDrift`. */
export interface DriftOptions extends ChartOptions {
  /** PSI at which a feature is worth a look, and at which it has shifted. __Default:__ [0.1, 0.25] (common practice). */
  readonly thresholds?: readonly [number, number];
  /** Most features drawn (largest PSI). __Default:__ 25. */
  readonly limit?: number;
}

const CHART = 'chartDrift';

/**
 * PSI per feature against the usual thresholds.
 *
 * @param rows    One row per feature.
 * @param options `thresholds` __Default:__ [0.1, 0.25]; `limit` __Default:__ 25; plus title, subtitle, width,
 *                height (__Default:__ 22 px per feature).
 * @example
 * chartDrift([{ feature: 'storage_hours', psi: 0.31 }, { feature: 'variety', psi: 0.04 }]);
 */
export function chartDrift(rows: readonly DriftRow[], options: DriftOptions = {}): ChartSpec {
  const [low, high] = options.thresholds ?? [0.1, 0.25];
  if (!(Number.isFinite(low) && Number.isFinite(high) && 0 < low && low < high)) throw errors.badOption('thresholds', options.thresholds, 'two increasing positive numbers');
  const limit = options.limit ?? 25;
  if (!(Number.isInteger(limit) && limit >= 1)) throw errors.badOption('limit', limit, 'an integer >= 1');
  const all = rows.map((r, i) => {
    const psi = checkFinite(CHART, 'psi', i, r.psi);
    if (psi < 0) throw errors.chartInput(CHART, 'psi', i, psi, 'a number >= 0');
    return { feature: checkLabel(CHART, 'feature', i, r.feature), psi };
  }).sort((a, b) => b.psi - a.psi || a.feature.localeCompare(b.feature));
  const shifted = all.filter((r) => r.psi >= high).length;
  const watch = all.filter((r) => r.psi >= low && r.psi < high).length;
  const notes = [`${shifted} shifted (PSI ≥ ${high}) · ${watch} worth a look (${low}–${high}) · ${all.length - shifted - watch} stable`];
  if (all.length > limit) notes.push(`largest ${limit} of ${all.length} features`);
  const [title, subtitle] = titles(options, 'Drift by feature (population stability index)', notes.join(' · '));
  if (rows.length === 0) return chartEmpty(title, 'No features to compare.', options);
  const values = all.slice(0, limit).map((r, rank) => ({ ...r, rank, label: formatNumber(r.psi) }));
  const size = plotSize(options, 480, Math.max(60, values.length * 22));
  const top = Math.max(high * 1.5, values[0].psi * 1.15);
  const bands = [
    { from: 0, to: low, name: 'stable', colour: BAND_COLOURS.calm },
    { from: low, to: high, name: 'worth a look', colour: BAND_COLOURS.watch },
    { from: high, to: top, name: 'shifted', colour: BAND_COLOURS.act },
  ];
  const x = { type: 'quantitative', title: 'PSI', scale: { domain: [0, top], nice: false, zero: true }, axis: { tickCount: 7 } };
  const y = { field: 'feature', type: 'nominal', title: null, sort: values.map((v) => v.feature), axis: { labelLimit: 200, grid: false } };
  return finishChart({
    width: size.width, height: size.height,
    layer: [
      { data: { values: bands }, mark: { type: 'rect', opacity: 1 },
        encoding: { x: { ...x, field: 'from' }, x2: { field: 'to' }, color: { field: 'name', type: 'nominal', title: null, scale: { domain: bands.map((b) => b.name), range: bands.map((b) => b.colour) }, legend: null } } },
      { data: { values: bands }, mark: { type: 'text', baseline: 'bottom', dy: -4, y: 0, color: ROLE.muted, fontSize: 10 },
        encoding: { x: { ...x, field: 'mid' }, text: { field: 'name' } }, transform: [{ calculate: '(datum.from + datum.to) / 2', as: 'mid' }] },
      { data: { values }, mark: { type: 'bar', color: ROLE.primary, height: { band: 0.6 } }, encoding: { x: { ...x, field: 'psi' }, y } },
      { data: { values }, mark: { type: 'text', align: 'left', dx: 4, color: ROLE.ink }, encoding: { x: { ...x, field: 'psi' }, y, text: { field: 'label' } } },
    ],
  }, title, subtitle);
}
