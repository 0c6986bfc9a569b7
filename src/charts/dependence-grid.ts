/**
 * Two-feature partial dependence as a heat map: the average prediction over a grid of two features.
 * Numeric features get cells that span halfway to the neighbouring grid values; categorical ones a band each.
 */
import { checkFinite, checkLabel } from './check-input.js';
import { chartEmpty } from './empty-chart.js';
import { withUnit } from './residuals.js';
import { finishChart, plotSize, titles, type ChartOptions, type ChartSpec } from './spec.js';
import { SEQUENTIAL_RAMP } from './theme.js';

/** Average prediction over a grid of two features. */
export interface DependenceGridInput {
  /** Names (and optional units) of the features on x and y. */
  readonly x: { readonly name: string; readonly unit?: string };
  readonly y: { readonly name: string; readonly unit?: string };
  /** One cell per pair of grid values. */
  readonly cells: readonly { readonly x: number | string; readonly y: number | string; readonly average: number }[];
}

/** Options for `chartDependenceGrid`. */
export interface DependenceGridOptions extends ChartOptions {
  /** What is predicted (colour legend title). __Default:__ 'average prediction'. */
  readonly predictionName?: string;
}

const CHART = 'chartDependenceGrid';

/** Cell edges for sorted distinct grid values: halfway to each neighbour, and a half step beyond the ends. */
export function cellEdges(grid: readonly number[]): Map<number, [number, number]> {
  const g = [...new Set(grid)].sort((a, b) => a - b);
  const out = new Map<number, [number, number]>();
  g.forEach((v, i) => {
    const lo = i > 0 ? (g[i - 1] + v) / 2 : g.length > 1 ? v - (g[1] - v) / 2 : v - 0.5;
    const hi = i < g.length - 1 ? (v + g[i + 1]) / 2 : g.length > 1 ? v + (v - g[i - 1]) / 2 : v + 0.5;
    out.set(v, [lo, hi]);
  });
  return out;
}

/**
 * Heat map of the average prediction over two features.
 *
 * @param input   Feature names and grid cells.
 * @param options `predictionName` __Default:__ 'average prediction'; plus title, subtitle, width, height (__Default:__ 460 × 320).
 * @example
 * chartDependenceGrid({ x: { name: 'storage_hours' }, y: { name: 'variety' },
 *   cells: [{ x: 0, y: 'Elstar', average: 0.1 }, { x: 24, y: 'Elstar', average: 0.2 }] });
 */
export function chartDependenceGrid(input: DependenceGridInput, options: DependenceGridOptions = {}): ChartSpec {
  const [title, subtitle] = titles(options, `Partial dependence on ${input.x.name} and ${input.y.name}`);
  if (input.cells.length === 0) return chartEmpty(title, 'No grid cells to draw.', options);
  const size = plotSize(options, 460, 320);
  const xNum = input.cells.every((c) => typeof c.x === 'number');
  const yNum = input.cells.every((c) => typeof c.y === 'number');
  const cells = input.cells.map((c, i) => ({
    x: xNum ? checkFinite(CHART, 'x', i, c.x) : checkLabel(CHART, 'x', i, c.x),
    y: yNum ? checkFinite(CHART, 'y', i, c.y) : checkLabel(CHART, 'y', i, c.y),
    average: checkFinite(CHART, 'average', i, c.average),
  }));
  const xe = xNum ? cellEdges(cells.map((c) => c.x as number)) : undefined;
  const ye = yNum ? cellEdges(cells.map((c) => c.y as number)) : undefined;
  const values = cells.map((c) => ({
    ...c,
    ...(xe ? { x0: xe.get(c.x as number)![0], x1: xe.get(c.x as number)![1] } : {}),
    ...(ye ? { y0: ye.get(c.y as number)![0], y1: ye.get(c.y as number)![1] } : {}),
  }));
  const enc: Record<string, unknown> = {
    color: { field: 'average', type: 'quantitative', title: options.predictionName ?? 'average prediction',
      scale: { range: [...SEQUENTIAL_RAMP], interpolate: 'lab', zero: false }, legend: { gradientLength: 200, orient: 'right', direction: 'vertical', titleOrient: 'top' } },
    tooltip: [{ field: 'x', title: input.x.name }, { field: 'y', title: input.y.name }, { field: 'average', format: '.4~g' }],
  };
  const xTitle = withUnit(input.x.name, input.x.unit), yTitle = withUnit(input.y.name, input.y.unit);
  if (xe) { enc.x = { field: 'x0', type: 'quantitative', title: xTitle, scale: { zero: false, nice: false } }; enc.x2 = { field: 'x1' }; }
  else enc.x = { field: 'x', type: 'nominal', title: xTitle, sort: null, axis: { labelAngle: 0 } };
  if (ye) { enc.y = { field: 'y0', type: 'quantitative', title: yTitle, scale: { zero: false, nice: false }, axis: { grid: false } }; enc.y2 = { field: 'y1' }; }
  else enc.y = { field: 'y', type: 'nominal', title: yTitle, sort: null };
  return finishChart({ width: size.width, height: size.height, data: { values }, mark: { type: 'rect' }, encoding: enc }, title, subtitle);
}
