import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { table, toArrowIPC } from 'arquero';
import { afterAll, describe, expect, it } from 'vitest';
import { readExtract } from '../../src/table/read-extract.js';
import { toFrame } from '../../src/table/to-frame.js';
import { frameFingerprint } from '../../src/table/fingerprint.js';

const DATA = 'node_modules/vega-datasets/data';
const dir = mkdtempSync(join(tmpdir(), 'coppice-arrow-'));
afterAll(() => rmSync(dir, { recursive: true, force: true }));

// Round trip through arquero's own Arrow writer (toArrowIPC = toArrow + IPC encoding): what is read back
// must equal what was written.
describe('readExtract(path) on Arrow IPC', () => {
  it('reads back a table written with arquero (file and stream formats, .arrow and .feather)', async () => {
    const t = table({
      amount: [1.5, null, -3],
      region: ['north', null, 'south'],
      active: [true, false, null],
      opened: [new Date(Date.UTC(2020, 0, 31)), null, new Date(Date.UTC(2021, 5, 1))],
    });
    const fileIpc = join(dir, 'claims.arrow');
    writeFileSync(fileIpc, toArrowIPC(t, { format: 'file' }));
    const streamIpc = join(dir, 'claims.feather');
    writeFileSync(streamIpc, toArrowIPC(t, { format: 'stream' }));
    for (const p of [fileIpc, streamIpc]) {
      const back = await readExtract(p);
      expect(back.columnNames()).toEqual(['amount', 'region', 'active', 'opened']);
      expect(back.array('amount')).toEqual([1.5, null, -3]);
      expect(back.array('region')).toEqual(['north', null, 'south']);
      expect(back.array('active')).toEqual([true, false, null]);
      expect((back.array('opened') as (Date | null)[]).map((d) => d && d.getTime())).toEqual([Date.UTC(2020, 0, 31), null, Date.UTC(2021, 5, 1)]);
      expect(frameFingerprint(toFrame(back))).toBe(frameFingerprint(toFrame(t)));
    }
  });

  it('round-trips the seattle-weather extract to the same frame', async () => {
    const csv = await readExtract(`${DATA}/seattle-weather.csv`);
    const p = join(dir, 'weather.arrow');
    writeFileSync(p, toArrowIPC(csv, { format: 'file' }));
    const back = await readExtract(p);
    expect(back.numRows()).toBe(1461);
    expect(frameFingerprint(toFrame(back))).toBe(frameFingerprint(toFrame(csv)));
  });

  it('says clearly when a file is not Arrow', async () => {
    const p = join(dir, 'fake.arrow');
    writeFileSync(p, 'not arrow at all');
    await expect(readExtract(p)).rejects.toThrow(/not an Arrow IPC file/);
  });
});
