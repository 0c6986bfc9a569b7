import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { fileURLToPath } from 'node:url';
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { createCellExecutor } from '../../src/notebook/executor.js';
import type { CellExecutor } from '../../src/notebook/executor.js';
import type { DisplayMessage } from '../../src/notebook/display-types.js';

const fake = fileURLToPath(new URL('./fixtures/fake-coppice', import.meta.url));

describe('createCellExecutor({ onDisplay, onStream })', () => {
  let cells: CellExecutor;
  const streams: { name: string; text: string }[] = [];
  const displays: { message: DisplayMessage; update: boolean }[] = [];
  const dir = mkdtempSync(join(tmpdir(), 'coppice-exec-'));

  beforeAll(() => {
    writeFileSync(join(dir, 'helper.ts'), 'export const twice = (x: number): number => 2 * x;\n');
    cells = createCellExecutor({
      dir,
      packages: [{ name: 'coppice', dir: fake, always: true }],
      onDisplay: (message, update) => displays.push({ message, update }),
      onStream: (name, text) => streams.push({ name, text }),
    });
  });
  afterAll(() => cells.close());

  const stdout = () => streams.filter((s) => s.name === 'stdout').map((s) => s.text).join('');

  it('execute(code) keeps declarations across cells', async () => {
    expect(await cells.execute('const a = 20; let b = 1; function add(x: number) { return x + a }')).toEqual({ ok: true });
    expect(await cells.execute('b = add(b)')).toEqual({ ok: true });
    expect(cells.locals.b).toBe(21);
  });

  it('execute(code) supports top-level await', async () => {
    const r = await cells.execute('const later = await new Promise<number>((done) => setTimeout(() => done(7), 5));');
    expect(r.ok).toBe(true);
    expect(cells.locals.later).toBe(7);
  });

  it('execute(code) prints the last expression to stdout as text', async () => {
    streams.length = 0;
    await cells.execute('later * 6');
    expect(stdout()).toBe('42\n');
  });

  it('execute(code) routes process.stdout writes to onStream while the cell runs', async () => {
    streams.length = 0;
    await cells.execute('process.stdout.write("hello\\n"); void process.stderr.write("careful\\n");');
    expect(streams).toEqual([{ name: 'stdout', text: 'hello\n' }, { name: 'stderr', text: 'careful\n' }]);
  });

  it('execute(code) makes a name defined by a magic visible in later cells', async () => {
    const r = await cells.execute('%extract claims data/claims.csv\nconst n = claims.numRows();');
    expect(r).toEqual({ ok: true });
    expect(cells.locals.n).toBe(3);
    expect(await cells.execute('const source: string = claims.source;')).toEqual({ ok: true });
    expect(cells.locals.source).toBe('data/claims.csv');
  });

  it('execute(code) reports a malformed magic before any code runs', async () => {
    const r = await cells.execute('globalThis.ranAnyway = 1;\n%extract 9lives x.csv');
    expect(r.ok).toBe(false);
    expect(r.error?.kind).toBe('magic');
    expect(r.error?.message).toContain('line 2, column 10');
    expect(r.error?.message).toContain('  %extract 9lives x.csv\n           ^^^^^^');
    expect((globalThis as Record<string, unknown>).ranAnyway).toBeUndefined();
  });

  it('execute(code) reports TypeScript errors by line and column, with nothing run', async () => {
    streams.length = 0;
    const r = await cells.execute('process.stdout.write("ran");\nconst z: number = "text";');
    expect(r.ok).toBe(false);
    expect(r.error?.kind).toBe('compile');
    expect(r.error?.message).toMatch(/^2:7 - Type 'string' is not assignable to type 'number'/);
    expect(stdout()).toBe('');
  });

  it('execute(code) reports compiler columns on the first line of a magic cell as written', async () => {
    const r = await cells.execute('%extract more m.csv\nconst q: number = "x";');
    expect(r.error?.message).toMatch(/^2:7 - /);
    const first = await cells.execute('const w: number = "x";\n%extract more2 m.csv');
    expect(first.error?.message).toMatch(/^1:7 - /);
  });

  it('execute(code) reports a thrown error with its name, message and trace', async () => {
    const r = await cells.execute('function deep() { throw new RangeError("too far") }\ndeep()');
    expect(r.ok).toBe(false);
    expect(r.error).toMatchObject({ kind: 'runtime', name: 'RangeError', message: 'too far' });
    expect(r.error?.trace.length).toBeGreaterThan(0);
    const rejected = await cells.execute('await Promise.reject(new TypeError("nope"))');
    expect(rejected.error).toMatchObject({ kind: 'runtime', name: 'TypeError', message: 'nope' });
  });

  it('execute(code) keeps working after a failed cell', async () => {
    expect(await cells.execute('const after = a + 1;')).toEqual({ ok: true });
    expect(cells.locals.after).toBe(21);
  });

  it('execute(code) imports local TypeScript files from the folder', async () => {
    expect(await cells.execute('import { twice } from "./helper";\nconst four = twice(2);')).toEqual({ ok: true });
    expect(cells.locals.four).toBe(4);
  });

  it('execute(code) resolves "coppice" to the bridged package', async () => {
    expect(await cells.execute('import { calls } from "coppice";\nconst seen = calls.map((c) => c.source);')).toEqual({ ok: true });
    // cells that failed to compile never called declareExtract
    expect(cells.locals.seen).toEqual(['data/claims.csv']);
  });

  it('complete(code, cursor) and inspect(code, cursor) see earlier declarations, ignoring magic lines', () => {
    const code = '%extract x y.csv\nlat';
    const c = cells.complete(code, code.length);
    expect(c.candidates).toContain('later');
    expect(cells.inspect('later', 2)).toContain('number');
  });

  it('isComplete(code) says an open block is incomplete', () => {
    expect(cells.isComplete('function f() {').completed).toBe(false);
    expect(cells.isComplete('%%extract q\nselect 1').completed).toBe(true);
  });

  it('never sends displays for plain values', () => {
    expect(displays).toEqual([]);
  });

  it('execute(code) shows a table-like last value as one rich display', async () => {
    streams.length = 0;
    expect(await cells.execute('[{ name: "<b>", n: 1 }]')).toEqual({ ok: true });
    expect(displays).toHaveLength(1);
    expect(displays[0].update).toBe(false);
    expect(displays[0].message.data['text/html']).toContain('&lt;b&gt;');
    expect(stdout()).toBe('');
  });
});
