/**
 * A chart as ONE mime bundle: the vega-lite v5 spec as a JSON object (front ends with a vega renderer
 * draw it live), an SVG rendered in Node (for viewers without one), and a short text line.
 */
import { renderSvg } from '../charts/render-svg.js';
import type { ChartSpec } from '../charts/spec.js';
import type { MimeBundle } from './display-types.js';

export const VEGA_LITE_MIME = 'application/vnd.vegalite.v5+json';

/** True for a vega-lite spec: a plain object with a vega-lite `$schema`, or with a mark or composition and data. */
export function isChartSpec(x: unknown): x is ChartSpec {
  if (x == null || typeof x !== 'object' || Array.isArray(x)) return false;
  const proto = Object.getPrototypeOf(x) as unknown;
  if (proto !== Object.prototype && proto !== null) return false;
  const s = x as Record<string, unknown>;
  if (typeof s.$schema === 'string') return s.$schema.includes('vega-lite');
  const composed = ['mark', 'layer', 'hconcat', 'vconcat', 'concat', 'facet', 'repeat'].some((k) => k in s);
  return composed && ('data' in s || 'encoding' in s);
}

function titleOf(spec: ChartSpec): string {
  const t = (spec as { title?: unknown }).title;
  if (typeof t === 'string') return t;
  if (t && typeof t === 'object' && typeof (t as { text?: unknown }).text === 'string') return (t as { text: string }).text;
  return 'chart';
}

/**
 * The bundle for `spec`. The SVG is rendered with vega in Node; if rendering fails, the bundle keeps
 * the spec and says why in its text.
 * @example
 * const bundle = await chartBundle(spec);
 * typeof bundle['application/vnd.vegalite.v5+json']; // 'object'
 */
export async function chartBundle(spec: ChartSpec): Promise<MimeBundle> {
  const plain = JSON.parse(JSON.stringify(spec)) as Record<string, unknown>;
  const bundle: MimeBundle = { [VEGA_LITE_MIME]: plain };
  try {
    // Render a copy: vega marks the data objects it is given.
    bundle['image/svg+xml'] = await renderSvg(JSON.parse(JSON.stringify(spec)) as ChartSpec, { warnings: 'return' });
    bundle['text/plain'] = `[chart: ${titleOf(spec)}]`;
  } catch (err) {
    bundle['text/plain'] = `[chart: ${titleOf(spec)}; no SVG: ${err instanceof Error ? err.message : String(err)}]`;
  }
  return bundle;
}
