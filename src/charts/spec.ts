/**
 * The frame every chart shares: `$schema`, the house config, title and subtitle, plot size.
 * Chart bodies are plain JSON objects; each chart's output is validated against the vega-lite v5 JSON
 * schema in `test/charts/`, which is the check that matters for a spec built from data.
 */
import type { TopLevelSpec } from 'vega-lite';
import { errors } from '../errors.js';
import { houseConfig, SIZE } from './theme.js';

/** A vega-lite v5 specification (plain JSON). */
export type ChartSpec = TopLevelSpec;

/** A chart body before the shared frame is added. */
export type SpecBody = Record<string, unknown>;

/** Options every chart takes. */
export interface ChartOptions {
  /** Title above the chart. __Default:__ a title naming what the chart shows. */
  readonly title?: string;
  /** Second line under the title. __Default:__ a short reading guide or summary, or none. */
  readonly subtitle?: string;
  /** Plot width in pixels (axes and legend come on top). __Default:__ 560. */
  readonly width?: number;
  /** Plot height in pixels. __Default:__ 300 (charts with one row per item size themselves). */
  readonly height?: number;
}

export const VEGA_LITE_SCHEMA = 'https://vega.github.io/schema/vega-lite/v5.json';

/** Checked plot size from the options, with the chart's own defaults. */
export function plotSize(options: ChartOptions, width: number = SIZE.width, height: number = SIZE.height): { width: number; height: number } {
  const w = options.width, h = options.height;
  if (w !== undefined && !(Number.isFinite(w) && w >= 40)) throw errors.badOption('width', w, 'a number of pixels >= 40');
  if (h !== undefined && !(Number.isFinite(h) && h >= 16)) throw errors.badOption('height', h, 'a number of pixels >= 16');
  return { width: w ?? width, height: h ?? height };
}

/** Wrap a chart body in the shared frame: schema URL, house config, title and subtitle. */
export function finishChart(body: SpecBody, title: string, subtitle?: string | readonly string[]): ChartSpec {
  const sub = subtitle === undefined || subtitle.length === 0 ? undefined : subtitle;
  return {
    $schema: VEGA_LITE_SCHEMA,
    config: houseConfig(),
    title: sub === undefined ? { text: title } : { text: title, subtitle: typeof sub === 'string' ? sub : [...sub] },
    ...body,
  } as ChartSpec;
}

/** Title and subtitle from the options, falling back to the chart's own. */
export function titles(options: ChartOptions, title: string, subtitle?: string | readonly string[]): [string, string | readonly string[] | undefined] {
  return [options.title ?? title, options.subtitle ?? subtitle];
}
