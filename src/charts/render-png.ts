/**
 * Render a chart spec to PNG bytes: SVG from `renderSvg`, rasterised with resvg. resvg needs font files;
 * the house font (Liberation Sans) or a close relative is looked up in the usual places, and the
 * machine's own fonts are the fallback.
 */
import { existsSync } from 'node:fs';
import type { ChartSpec } from './spec.js';
import { renderSvg, type RenderOptions } from './render-svg.js';

/** Font files tried in order; the first that exists becomes the default family. */
const FONT_CANDIDATES: readonly { file: string; family: string }[] = [
  { file: '/usr/share/fonts/truetype/liberation/LiberationSans-Regular.ttf', family: 'Liberation Sans' },
  { file: '/usr/share/fonts/liberation-sans/LiberationSans-Regular.ttf', family: 'Liberation Sans' },
  { file: '/usr/share/fonts/truetype/liberation2/LiberationSans-Regular.ttf', family: 'Liberation Sans' },
  { file: '/Library/Fonts/Arial.ttf', family: 'Arial' },
  { file: '/System/Library/Fonts/Supplemental/Arial.ttf', family: 'Arial' },
  { file: 'C:\\Windows\\Fonts\\arial.ttf', family: 'Arial' },
  { file: '/usr/share/fonts/truetype/dejavu/DejaVuSans.ttf', family: 'DejaVu Sans' },
];

/** Options for `renderPng`. */
export interface PngOptions extends RenderOptions {
  /** Pixel density: 2 gives a sharp image on high-density screens. __Default:__ 2. */
  readonly scale?: number;
}

/** The font files found on this machine (with bold faces next to them) and the family to default to. */
export function findFonts(): { files: string[]; family: string | undefined } {
  const files: string[] = [];
  let family: string | undefined;
  for (const c of FONT_CANDIDATES) {
    if (!existsSync(c.file)) continue;
    files.push(c.file);
    const bold = c.file.replace(/Regular\.ttf$/, 'Bold.ttf').replace(/Sans\.ttf$/, 'Sans-Bold.ttf').replace(/arial\.ttf$/i, 'arialbd.ttf');
    if (bold !== c.file && existsSync(bold)) files.push(bold);
    family ??= c.family;
  }
  return { files, family };
}

/**
 * Render `spec` to PNG bytes.
 *
 * @param spec    A vega-lite v5 spec.
 * @param options `scale` (pixel density) __Default:__ 2; `warnings` as for `renderSvg` __Default:__ `'throw'`.
 * @example
 * writeFileSync('importance.png', await renderPng(chartImportance(rows)));
 */
export async function renderPng(spec: ChartSpec, options: PngOptions = {}): Promise<Uint8Array> {
  const svg = await renderSvg(spec, options);
  const { Resvg } = await import('@resvg/resvg-js');
  const { files, family } = findFonts();
  const scale = options.scale ?? 2;
  const resvg = new Resvg(svg, {
    fitTo: { mode: 'zoom', value: scale },
    font: {
      fontFiles: files,
      loadSystemFonts: files.length === 0,
      ...(family !== undefined ? { defaultFontFamily: family, sansSerifFamily: family } : {}),
    },
  });
  return new Uint8Array(resvg.render().asPng());
}
