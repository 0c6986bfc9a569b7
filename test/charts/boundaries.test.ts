/**
 * Layering of src/charts (DESIGN.md): chart files import only lower layers, and vega / vega-lite only as
 * types; the two renderers load vega at call time (dynamic import) so importing coppice does not.
 */
import { readdirSync, readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';

const dir = new URL('../../src/charts/', import.meta.url);
const files = readdirSync(dir).filter((f) => f.endsWith('.ts'));

describe('src/charts imports', () => {
  for (const file of files) {
    it(`${file}: no runtime import of vega or vega-lite, nothing from notebook/cli`, () => {
      const text = readFileSync(new URL(file, dir), 'utf8');
      const statics = [...text.matchAll(/^import\s+(type\s+)?[^'"]*from\s+'([^']+)'/gm)];
      for (const m of statics) {
        if (/^(vega|vega-lite|vega-embed)$/.test(m[2])) expect(m[1], `${file} imports ${m[2]}`).toBe('type ');
        expect(m[2]).not.toMatch(/notebook|cli|arquero/);
      }
    });
  }
});
