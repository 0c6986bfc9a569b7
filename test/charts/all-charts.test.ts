/**
 * Every chart, on seeded demo inputs (gallery.ts): the spec validates against the vega-lite v5 JSON
 * schema (node_modules/vega-lite/build/vega-lite-schema.json) and renders to SVG with no vega-lite or
 * vega warning. With COPPICE_CHART_PNG=1 each chart is also written to /tmp/coppice-charts/ to look at.
 */
import { beforeAll, describe, expect, it } from 'vitest';
import { gallery } from './gallery.js';
import { checkSpec, schemaValidator, writePng } from './validate-spec.js';

const specs = gallery();

describe('every chart(demo input)', () => {
  beforeAll(() => { schemaValidator(); });
  for (const [name, spec] of Object.entries(specs)) {
    it(`${name}: valid vega-lite v5, renders without warnings`, async () => {
      const { schema, warnings, svg } = await checkSpec(spec);
      expect(schema).toEqual([]);
      expect(warnings).toEqual([]);
      expect(svg.startsWith('<svg')).toBe(true);
      expect((spec as { $schema?: string }).$schema).toBe('https://vega.github.io/schema/vega-lite/v5.json');
      await writePng(name, spec);
    });
  }
});
