/**
 * `coppice score` and `coppice export-onnx` end to end through the command dispatcher (src/cli.ts), on
 * files in a temporary folder. Expected predictions come from the library path (alignFrame + predictFrame).
 */
import { mkdtemp, readFile, rm, writeFile } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import * as ort from 'onnxruntime-web';
import { afterAll, beforeAll, describe, expect, it, vi } from 'vitest';
import { main } from '../../src/cli.js';
import { withTrainingRanges } from '../../src/explain/training-ranges.js';
import { saveModel } from '../../src/learn/model-file.js';
import { predictFrame } from '../../src/learn/predict.js';
import { fitTree } from '../../src/learn/tree/fit-tree.js';
import { alignFrame } from '../../src/table/align-frame.js';
import { orchard } from './fixtures.js';

let dir = '';
const train = orchard(300, 41, 'class');
const model = withTrainingRanges(fitTree(train, { depthLimit: 5 }), train.features);

const extractRows = [
  { order_id: 'A1', storage_hours: 12, variety: 'Elstar', bruised: 0, humidity: 70 },
  { order_id: 'A2', storage_hours: 150, variety: 'Topaz', bruised: 1, humidity: 88 },   // above the training range
  { order_id: 'A3', storage_hours: 40, variety: 'Gala', bruised: 0, humidity: '' },     // unseen category, missing humidity
  { order_id: 'A4, late', storage_hours: 80, variety: 'Boskoop', bruised: 1, humidity: 91 },
];

function csv(rows: Record<string, unknown>[]): string {
  const names = Object.keys(rows[0]);
  const q = (v: unknown): string => (typeof v === 'string' && v.includes(',') ? `"${v}"` : String(v));
  return `${names.join(',')}\n${rows.map((r) => names.map((n) => q(r[n])).join(',')).join('\n')}\n`;
}

async function run(args: string[]): Promise<{ code: number; out: string; err: string }> {
  let out = '', err = '';
  const o = vi.spyOn(process.stdout, 'write').mockImplementation((s: string | Uint8Array) => { out += String(s); return true; });
  const e = vi.spyOn(process.stderr, 'write').mockImplementation((s: string | Uint8Array) => { err += String(s); return true; });
  try {
    const code = await main(args);
    return { code, out, err };
  } finally {
    o.mockRestore(); e.mockRestore();
  }
}

beforeAll(async () => {
  dir = await mkdtemp(join(tmpdir(), 'coppice-score-'));
  await saveModel(model, join(dir, 'model.json'));
  await writeFile(join(dir, 'march.csv'), csv(extractRows));
  await writeFile(join(dir, 'no-humidity.csv'), csv(extractRows.map(({ humidity: _h, ...r }) => r)));
  ort.env.wasm.numThreads = 1;
});
afterAll(async () => { await rm(dir, { recursive: true, force: true }); });

describe('coppice score <model.json> <extract> --out <file>', () => {
  it('writes predictions and probabilities (CSV) and reports unseen categories and out-of-range values', async () => {
    const r = await run(['score', join(dir, 'model.json'), join(dir, 'march.csv'), '--out', join(dir, 'scores.csv'), '--keep', 'order_id']);
    expect(r.code).toBe(0);
    expect(r.out).toMatch(/Scored 4 rows/);
    expect(r.out).toMatch(/Unseen categories in variety: 1 row \(Gala\)/);
    expect(r.out).toMatch(/Outside the training range of storage_hours \[[\d.]+, [\d.]+\]: 0 below, 1 above/);
    const lines = (await readFile(join(dir, 'scores.csv'), 'utf8')).trim().split('\n');
    expect(lines[0]).toBe('order_id,predicted_condition,p_fresh,p_watch,p_spoiled,notes');
    expect(lines).toHaveLength(5);
    const { frame } = alignFrame(extractRows.map((row) => ({ ...row, humidity: row.humidity === '' ? null : row.humidity })), model.features);
    const p = predictFrame(model, frame);
    lines.slice(1).forEach((line, i) => {
      const fields = line.match(/("[^"]*"|[^,]*)(,|$)/g)!.map((f) => f.replace(/,$/, ''));
      expect(fields[1]).toBe(model.target.classes![p.value[i]]);
      for (let k = 0; k < 3; k++) expect(Number(fields[2 + k])).toBe(p.proba[i * 3 + k]);
    });
    expect(lines[2]).toMatch(/storage_hours above range$/);
    expect(lines[3]).toMatch(/unseen variety$/);
    expect(lines[4].startsWith('"A4, late"')).toBe(true);
  });

  it('writes JSON records and a JSON report; --strict exits 1 when a row has a note', async () => {
    const r = await run(['score', join(dir, 'model.json'), join(dir, 'no-humidity.csv'), `--out=${join(dir, 'scores.json')}`, '--report', join(dir, 'report.json'), '--strict']);
    expect(r.code).toBe(1);
    expect(r.out).toMatch(/Absent columns \(missing in every row\): humidity/);
    const rows = JSON.parse(await readFile(join(dir, 'scores.json'), 'utf8')) as Record<string, unknown>[];
    expect(rows).toHaveLength(4);
    expect(Object.keys(rows[0])).toEqual(['predicted_condition', 'p_fresh', 'p_watch', 'p_spoiled', 'notes']);
    const report = JSON.parse(await readFile(join(dir, 'report.json'), 'utf8'));
    expect(report.align.missingColumns).toEqual([{ column: 'humidity', rows: 4 }]);
  });

  it('never overwrites the extract or the model; bad arguments exit 2 with a message', async () => {
    const before = await readFile(join(dir, 'march.csv'), 'utf8');
    const same = await run(['score', join(dir, 'model.json'), join(dir, 'march.csv'), '--out', join(dir, 'march.csv')]);
    expect(same.code).toBe(2);
    expect(same.err).toMatch(/Refusing to write .* it is the extract/);
    expect(await readFile(join(dir, 'march.csv'), 'utf8')).toBe(before);
    expect((await run(['score', join(dir, 'model.json'), join(dir, 'march.csv')])).err).toMatch(/--out is required/);
    expect((await run(['score', join(dir, 'model.json'), join(dir, 'march.csv'), '--out', join(dir, 'x.txt')])).err).toMatch(/\.csv or \.json/);
    expect((await run(['score', join(dir, 'model.json'), join(dir, 'nope.csv'), '--out', join(dir, 'x.csv')])).err).toMatch(/not found/);
    expect((await run(['score', join(dir, 'model.json'), join(dir, 'march.csv'), '--out', join(dir, 'x.csv'), '--keep', 'colour'])).err).toMatch(/Unknown column "colour"/);
    expect((await run(['score', join(dir, 'model.json'), join(dir, 'march.csv'), '--outt', 'x.csv'])).err).toMatch(/unknown option --outt/);
    await writeFile(join(dir, 'broken.json'), '{"format": "coppice-model", "vers');
    const broken = await run(['score', join(dir, 'broken.json'), join(dir, 'march.csv'), '--out', join(dir, 'x.csv')]);
    expect(broken.code).toBe(2);
    expect(broken.err).toMatch(/Model file rejected/);
  });

  it('an extract with no rows gives an empty table and exit 0', async () => {
    await writeFile(join(dir, 'empty.csv'), 'order_id,storage_hours,variety,bruised,humidity\n');
    const r = await run(['score', join(dir, 'model.json'), join(dir, 'empty.csv'), '--out', join(dir, 'empty-scores.csv')]);
    expect(r.code).toBe(0);
    expect((await readFile(join(dir, 'empty-scores.csv'), 'utf8')).trim()).toBe('predicted_condition,p_fresh,p_watch,p_spoiled,notes');
  });
});

describe('coppice export-onnx <model.json> <out.onnx>', () => {
  it('writes an ONNX file onnxruntime-web loads, with the documented input and outputs', async () => {
    const r = await run(['export-onnx', join(dir, 'model.json'), join(dir, 'model.onnx')]);
    expect(r.code).toBe(0);
    expect(r.out).toMatch(/input features float32 \[N, 4\]/);
    const session = await ort.InferenceSession.create(new Uint8Array(await readFile(join(dir, 'model.onnx'))));
    expect(session.inputNames).toEqual(['features']);
    expect(session.outputNames).toEqual(['probabilities', 'label']);
    await session.release();
  });

  it('rejects an output without .onnx, a missing model file, and a missing argument', async () => {
    expect((await run(['export-onnx', join(dir, 'model.json'), join(dir, 'model.json')])).err).toMatch(/\.onnx/);
    expect((await run(['export-onnx', join(dir, 'missing.json'), join(dir, 'm.onnx')])).err).toMatch(/no such file/);
    expect((await run(['export-onnx', join(dir, 'model.json')])).code).toBe(2);
  });
});
