/**
 * Test helper: validate a chart spec against the vega-lite v5 JSON schema (ajv, compiled once) and
 * render it to SVG, returning vega's warnings. Optionally writes a PNG under /tmp/coppice-charts/ for
 * looking at by eye.
 */
import { mkdirSync, readFileSync, writeFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import { Ajv, type ValidateFunction } from 'ajv';
import { renderPng } from '../../src/charts/render-png.js';
import { renderSvgWithWarnings } from '../../src/charts/render-svg.js';
import type { ChartSpec } from '../../src/charts/spec.js';

let validate: ValidateFunction | undefined;

/** The compiled vega-lite schema validator (vega-lite's own formats allowed). */
export function schemaValidator(): ValidateFunction {
  if (validate) return validate;
  const require = createRequire(import.meta.url);
  const path = require.resolve('vega-lite/build/vega-lite-schema.json');
  const schema = JSON.parse(readFileSync(path, 'utf8')) as object;
  const ajv = new Ajv({
    allErrors: true,
    allowUnionTypes: true,
    strictTypes: false,
    formats: { uri: true, 'uri-reference': true, 'color-hex': /^#([0-9a-f]{3}|[0-9a-f]{6}|[0-9a-f]{8})$/i },
  });
  validate = ajv.compile(schema);
  return validate;
}

/** Schema errors of `spec` as short strings (empty when valid). */
export function schemaErrors(spec: unknown): string[] {
  const v = schemaValidator();
  if (v(JSON.parse(JSON.stringify(spec)))) return [];
  return (v.errors ?? []).slice(0, 8).map((e) => `${e.instancePath} ${e.message ?? ''}`);
}

/** Schema errors and render warnings of `spec`; both should be empty. */
export async function checkSpec(spec: ChartSpec): Promise<{ schema: string[]; warnings: readonly string[]; svg: string }> {
  const schema = schemaErrors(spec);
  const { svg, warnings } = await renderSvgWithWarnings(spec);
  return { schema, warnings, svg };
}

export const PNG_DIR = '/tmp/coppice-charts';

/** Write `spec` as a PNG for inspection when COPPICE_CHART_PNG is set. */
export async function writePng(name: string, spec: ChartSpec): Promise<void> {
  if (!process.env.COPPICE_CHART_PNG) return;
  mkdirSync(PNG_DIR, { recursive: true });
  writeFileSync(`${PNG_DIR}/${name}.png`, await renderPng(spec, { scale: 1.5 }));
}
