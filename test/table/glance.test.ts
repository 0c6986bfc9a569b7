import { describe, expect, it } from 'vitest';
import { glance } from '../../src/table/glance.js';
import { readExtract } from '../../src/table/read-extract.js';
import { toFrame } from '../../src/table/to-frame.js';

const DATA = 'node_modules/vega-datasets/data';

describe('glance(input)', () => {
  it('summarises each column by kind', () => {
    const rows = [
      { spend: 1, region: 'a', active: true, mixed: 1 },
      { spend: 3, region: 'b', active: false, mixed: 'x' },
      { spend: null, region: 'a', active: true, mixed: null },
    ];
    expect(glance(rows)).toEqual([
      { column: 'spend', kind: 'numeric', missing: 1, distinct: 2, min: 1, max: 3, mean: 2, top: null, note: null },
      { column: 'region', kind: 'categorical', missing: 0, distinct: 2, min: null, max: null, mean: null, top: 'a (2), b (1)', note: null },
      { column: 'active', kind: 'boolean', missing: 0, distinct: 2, min: null, max: null, mean: 2 / 3, top: 'true (2), false (1)', note: null },
      { column: 'mixed', kind: 'categorical', missing: 1, distinct: 2, min: null, max: null, mean: null, top: '1 (1), x (1)', note: 'mixed values (1 numbers, 1 texts) read as categorical' },
    ]);
  });

  it('notes all-missing and one-value columns, and Infinity without throwing', () => {
    const g = glance([{ a: null, b: 5, c: Infinity }, { a: null, b: 5, c: 1 }]);
    expect(g[0].note).toBe('all missing');
    expect(g[1].note).toBe('one value only');
    expect(g[2].note).toBe('±Infinity in 1 rows (toFrame refuses it)');
    expect(g[2].max).toBe(1);
  });

  it('gives nothing for an empty input', () => {
    expect(glance([])).toEqual([]);
  });

  // Seattle weather (vega-datasets seattle-weather.csv): 1461 days from 2012-01-01 to 2015-12-31; weather
  // classes rain 641, sun 640, fog 101, drizzle 53, snow 26 (counted with Python's csv module).
  it('glances at seattle-weather', async () => {
    const g = glance(await readExtract(`${DATA}/seattle-weather.csv`));
    const date = g.find((r) => r.column === 'date')!;
    expect(date).toMatchObject({ kind: 'date', missing: 0, distinct: 1461, min: '2012-01-01', max: '2015-12-31' });
    expect(date.note).toMatch(/^expands into date\.year, date\.month/);
    expect(g.find((r) => r.column === 'weather')!.top).toBe('rain (641), sun (640), fog (101), drizzle (53), snow (26)');
  });

  // Palmer penguins (vega-datasets penguins.json): Body Mass missing in 2 rows; Adelie 152, Gentoo 124,
  // Chinstrap 68; Beak Length 32.1–59.6 mm over 342 measured birds, mean 43.92193 (computed with Python's
  // statistics.mean), 164 distinct values.
  it('glances at penguins, also through a Frame', async () => {
    const t = await readExtract(`${DATA}/penguins.json`);
    for (const input of [t, toFrame(t)]) {
      const g = glance(input);
      expect(g.find((r) => r.column === 'Species')!.top).toBe('Adelie (152), Gentoo (124), Chinstrap (68)');
      expect(g.find((r) => r.column === 'Body Mass (g)')!.missing).toBe(2);
      const beak = g.find((r) => r.column === 'Beak Length (mm)')!;
      expect(beak).toMatchObject({ min: 32.1, max: 59.6, distinct: 164, missing: 2 });
      expect(beak.mean).toBeCloseTo(43.9219298, 6);
    }
  });
});
