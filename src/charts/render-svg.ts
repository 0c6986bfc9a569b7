/**
 * Render a chart spec to SVG text in Node: vega-lite compile → vega View (no DOM, `renderer: 'none'`)
 * → `view.toSVG()`. Every warning or error vega-lite or vega logs is collected; by default any of them
 * makes the call fail, so a chart never renders quietly wrong.
 *
 * vega and vega-lite are loaded on first use, so importing coppice does not load them.
 */
import { errors } from '../errors.js';
import type { ChartSpec } from './spec.js';
import { measureItemText } from './text-width.js';

/** Options for `renderSvg`. */
export interface RenderOptions {
  /**
   * What to do when vega-lite or vega logs warnings: `'throw'` raises a CoppiceError listing them,
   * `'return'` returns them with the SVG (see `renderSvgWithWarnings`). __Default:__ `'throw'`.
   */
  readonly warnings?: 'throw' | 'return';
}

/** An SVG document and the warnings logged while rendering it. */
export interface RenderedSvg {
  readonly svg: string;
  readonly warnings: readonly string[];
}

interface CapturingLogger {
  messages: string[];
  level(level?: number): number | CapturingLogger;
  error(...args: readonly unknown[]): CapturingLogger;
  warn(...args: readonly unknown[]): CapturingLogger;
  info(...args: readonly unknown[]): CapturingLogger;
  debug(...args: readonly unknown[]): CapturingLogger;
}

function createLogger(): CapturingLogger {
  let current = 2;
  const logger: CapturingLogger = {
    messages: [],
    level(level?: number) {
      if (level === undefined) return current;
      current = level;
      return logger;
    },
    error(...args) { logger.messages.push(`error: ${args.map(String).join(' ')}`); return logger; },
    warn(...args) { logger.messages.push(`warning: ${args.map(String).join(' ')}`); return logger; },
    info() { return logger; },
    debug() { return logger; },
  };
  return logger;
}

interface TextMetrics {
  width: (item: object, text: unknown) => number;
  estimateWidth: (item: object, text: unknown) => number;
}

let textPatched = false;

/**
 * Render `spec` to SVG and return the SVG with every warning logged on the way.
 *
 * @example
 * const { svg, warnings } = await renderSvgWithWarnings(chartImportance(rows));
 */
export async function renderSvgWithWarnings(spec: ChartSpec): Promise<RenderedSvg> {
  const [vl, vega] = await Promise.all([import('vega-lite'), import('vega')]);
  // vega exports its text metrics object but not its type: use canvas-free widths when no canvas is present.
  const metrics = (vega as unknown as { textMetrics?: TextMetrics }).textMetrics;
  if (!textPatched && metrics && metrics.width === metrics.estimateWidth) {
    metrics.width = measureItemText;
    textPatched = true;
  }
  const logger = createLogger();
  let compiled;
  try {
    compiled = vl.compile(spec, { logger: logger as never });
  } catch (e) {
    throw errors.chartRender([`vega-lite: ${(e as Error).message}`]);
  }
  const view = new vega.View(vega.parse(compiled.spec), { renderer: 'none', logger: logger as never, logLevel: vega.Warn });
  try {
    const svg = await view.toSVG();
    return { svg, warnings: [...logger.messages] };
  } catch (e) {
    throw errors.chartRender([...logger.messages, `vega: ${(e as Error).message}`]);
  } finally {
    view.finalize();
  }
}

/**
 * Render `spec` to an SVG document (string), ready for an `image/svg+xml` output.
 *
 * @param spec    A vega-lite v5 spec, e.g. from any `chart…` function.
 * @param options `warnings`: `'throw'` or `'return'`. __Default:__ `'throw'`.
 * @example
 * const svg = await renderSvg(chartLearningCurve(rows, { lossName: 'log loss' }));
 */
export async function renderSvg(spec: ChartSpec, options: RenderOptions = {}): Promise<string> {
  const { svg, warnings } = await renderSvgWithWarnings(spec);
  if (warnings.length > 0 && (options.warnings ?? 'throw') === 'throw') throw errors.chartRender(warnings);
  return svg;
}
