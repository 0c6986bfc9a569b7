import { existsSync, readdirSync, readFileSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { CoppiceError } from '../../src/errors.js';
import { runNotebook } from '../../src/notebook/runner.js';
import { notebookJson, produceFolder } from './runner-fixtures.js';

// Runs notebooks in this process through the notebook executor; cells import coppice from the built package,
// so `npm run build` must have run first.
const quiet = { log: () => {} };

describe('runNotebook(path, options)', () => {
  it('runs every cell, writes notebook, report and record, then compares a rerun on a refreshed extract', async () => {
    const dir = produceFolder();
    const first = await runNotebook(join(dir, 'produce.ipynb'), quiet);
    expect(first.record.status).toBe('ok');
    expect(first.exitCode).toBe(0);
    expect(first.comparison).toBeNull();
    expect(readdirSync(first.runDir).sort()).toEqual(['produce.ipynb', 'report.html', 'run.json']);
    const nb = JSON.parse(readFileSync(first.notebookFile, 'utf8'));
    const code = nb.cells.filter((c: { cell_type: string }) => c.cell_type === 'code');
    expect(code.map((c: { execution_count: number }) => c.execution_count)).toEqual([1, 2, 3]);
    expect(code[1].outputs[0]).toEqual({ output_type: 'stream', name: 'stdout', text: 'rows 4\n' });
    expect(Object.keys(code[2].outputs[0].data)).toContain('application/vnd.coppice.decision+json');
    expect(nb.metadata.coppice.decisions[0].title).toBe('Waste stays low');
    const record = JSON.parse(readFileSync(join(first.runDir, 'run.json'), 'utf8'));
    expect(record.metrics).toEqual([{ name: 'mean waste', value: expect.closeTo(1.925, 12), higherIsBetter: false }]); // (1.2+3.1+0.9+2.5)/4, summed in doubles
    expect(record.extracts[0]).toMatchObject({ name: 'produce', rows: 4, overridden: false });
    expect(record.cells).toHaveLength(3);
    expect(JSON.parse(readFileSync(join(dir, 'produce-runs', 'latest.json'), 'utf8'))).toEqual({ run: first.record.id });

    const second = await runNotebook(join(dir, 'produce.ipynb'), { ...quiet, extracts: { produce: join(dir, 'refreshed.csv') } });
    expect(second.record.extracts[0]).toMatchObject({ overridden: true, source: join(dir, 'refreshed.csv') });
    expect(second.comparison?.baseline.id).toBe(first.record.id);
    expect(second.comparison?.extracts[0].schema[0]).toMatchObject({ change: 'new-categories', categories: ['raspberry'] });
    expect(second.comparison?.checks[0]).toMatchObject({ label: 'mean waste <= 3', before: true, now: false }); // 4.625 > 3
    expect(second.exitCode).toBe(1);
    expect(readdirSync(join(dir, 'produce-runs', 'runs')).sort()).toEqual([first.record.id, second.record.id].sort());
    expect(readFileSync(join(dir, 'baseline.csv'), 'utf8')).toContain('tomato,4,1.2'); // inputs untouched
  });

  it('stops at a failing cell, keeps the earlier outputs, names the cell and leaves latest alone', async () => {
    const dir = produceFolder([{ source: "throw new Error('no trucks today')" }]);
    const out = await runNotebook(join(dir, 'produce.ipynb'), quiet);
    expect(out.exitCode).toBe(2);
    expect(out.record.status).toBe('failed');
    expect(out.record.failure).toMatchObject({ count: 3, name: 'Error', message: 'no trucks today' });
    const nb = JSON.parse(readFileSync(out.notebookFile, 'utf8'));
    const code = nb.cells.filter((c: { cell_type: string }) => c.cell_type === 'code');
    expect(code[1].outputs[0].text).toBe('rows 4\n'); // earlier output kept
    expect(code[2].outputs.at(-1)).toMatchObject({ output_type: 'error', ename: 'Error', evalue: 'no trucks today' });
    expect(code[3]).toMatchObject({ execution_count: null, outputs: [] }); // never ran
    expect(existsSync(join(dir, 'produce-runs', 'latest.json'))).toBe(false);
    expect(readFileSync(join(out.runDir, 'report.html'), 'utf8')).toContain('The run stopped at cell [3]');
  });

  it('refuses bad input with a clear error and writes nothing', async () => {
    const dir = produceFolder();
    const nbPath = join(dir, 'produce.ipynb');
    const cases: [() => Promise<unknown>, RegExp][] = [
      [() => runNotebook(join(dir, 'missing.ipynb'), quiet), /missing\.ipynb.*no such file/],
      [() => runNotebook(nbPath, { ...quiet, extracts: { parcels: 'x.csv' } }), /declares no extract "parcels"; it declares: produce/],
      [() => runNotebook(nbPath, { ...quiet, extracts: { produce: join(dir, 'nope.csv') } }), /Extract "produce" from .*nope\.csv.* cannot be read/],
      [() => runNotebook(join(dir, 'baseline.csv'), quiet), /not JSON/],
    ];
    writeFileSync(join(dir, 'py.ipynb'), notebookJson([{ source: 'print(1)' }], 'python3'));
    cases.push([() => runNotebook(join(dir, 'py.ipynb'), quiet), /its kernel is "python3"; expected coppice's kernel "coppice"/]);
    writeFileSync(join(dir, 'none.ipynb'), JSON.stringify({ nbformat: 4, nbformat_minor: 5, metadata: {}, cells: [] }));
    cases.push([() => runNotebook(join(dir, 'none.ipynb'), quiet), /names no kernel/]);
    cases.push([() => runNotebook(nbPath, { ...quiet, out: dir, extracts: { produce: join(dir, 'runs', 'x.csv') } }), /cannot be read|holds an input/]);
    for (const [run, message] of cases) {
      const err = await run().then(() => null, (e: unknown) => e);
      expect(err).toBeInstanceOf(CoppiceError);
      expect((err as Error).message).toMatch(message);
    }
    expect(readdirSync(dir).sort()).toEqual(['baseline.csv', 'broken.csv', 'none.ipynb', 'produce.ipynb', 'py.ipynb', 'refreshed.csv']);
  });
});
