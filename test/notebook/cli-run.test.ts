import { spawn, spawnSync } from 'node:child_process';
import { existsSync, readdirSync, readFileSync, writeFileSync } from 'node:fs';
import { join, resolve } from 'node:path';
import { describe, expect, it } from 'vitest';
import { isAtomicTemp } from '../../src/notebook/atomic-write.js';
import { parseRunArgs } from '../../src/notebook/cli-run.js';
import { notebookJson, produceFolder } from './runner-fixtures.js';

// Spawns the built command line (`npm run build` first).
const CLI = resolve('dist/cli.js');

function coppice(args: string[], env: Record<string, string> = {}) {
  return spawnSync(process.execPath, [CLI, ...args], { encoding: 'utf8', env: { ...process.env, ...env } });
}

/** Every file under a folder, with its content, for before/after comparison. */
function snapshot(dir: string): Record<string, string> {
  const out: Record<string, string> = {};
  const walk = (d: string) => {
    for (const e of readdirSync(d, { withFileTypes: true })) {
      const p = join(d, e.name);
      if (e.isDirectory()) walk(p); else out[p.slice(dir.length)] = readFileSync(p, 'utf8');
    }
  };
  if (existsSync(dir)) walk(dir);
  return out;
}

describe('parseRunArgs(args)', () => {
  it('reads the notebook, bindings and options', () => {
    expect(parseRunArgs(['nb.ipynb', '--extract', 'a=x.csv', '--extract=b=sql:SELECT 1', '--out', 'o', '--no-baseline'])).toEqual({
      notebook: 'nb.ipynb', options: { extracts: { a: 'x.csv', b: 'sql:SELECT 1' }, out: 'o', baseline: null },
    });
  });
  it('rejects malformed arguments', () => {
    expect(() => parseRunArgs([])).toThrow(/no notebook given/);
    expect(() => parseRunArgs(['nb', '--extract', 'novalue'])).toThrow(/name=path-or-query/);
    expect(() => parseRunArgs(['nb', '--extract', 'a=1', '--extract', 'a=2'])).toThrow(/bound twice/);
    expect(() => parseRunArgs(['nb', '--frobnicate'])).toThrow(/unknown option/);
    expect(() => parseRunArgs(['a.ipynb', 'b.ipynb'])).toThrow(/one notebook at a time/);
    expect(() => parseRunArgs(['nb', '--out'])).toThrow(/--out needs a value/);
  });
});

describe('coppice run (command line)', () => {
  const pause = "await new Promise((r) => setTimeout(r, Number(process.env.COPPICE_TEST_PAUSE ?? '0')));";

  it('an interrupted run leaves no partial file and the previous run intact', async () => {
    const dir = produceFolder([{ source: pause }]);
    const out = join(dir, 'out');
    const first = coppice(['run', join(dir, 'produce.ipynb'), '--out', out]);
    expect(first.status).toBe(0);
    const before = snapshot(out);
    expect(Object.keys(before).sort()).toEqual(expect.arrayContaining(['/latest.json']));

    for (const signal of ['SIGTERM', 'SIGKILL'] as const) {
      const child = spawn(process.execPath, [CLI, 'run', join(dir, 'produce.ipynb'), '--out', out, '--extract', `produce=${join(dir, 'refreshed.csv')}`], {
        env: { ...process.env, COPPICE_TEST_PAUSE: '60000' },
      });
      let stderr = '';
      await new Promise<void>((done) => {
        child.stderr.on('data', (b: Buffer) => {
          stderr += b.toString();
          if (/cell 2\/4 ok/.test(stderr)) done(); // two cells done, the third waits: kill mid-run
        });
      });
      const exited = new Promise<number | null>((done) => child.on('exit', (code) => done(code)));
      child.kill(signal);
      const code = await exited;
      if (signal === 'SIGTERM') expect(code).toBe(143);
      expect(snapshot(out)).toEqual(before);
      const names = readdirSync(join(out, 'runs'));
      expect(names.filter((n) => n.startsWith('.') || isAtomicTemp(n))).toEqual([]);
    }
    expect(readFileSync(join(dir, 'refreshed.csv'), 'utf8')).toContain('raspberry'); // inputs untouched
  });

  it('exits 2 with a clear message and writes nothing on bad input', () => {
    const dir = produceFolder();
    writeFileSync(join(dir, 'py.ipynb'), notebookJson([{ source: 'x' }], 'python3'));
    const cases: [string[], RegExp][] = [
      [['run', join(dir, 'nope.ipynb')], /nope\.ipynb" cannot be run: no such file/],
      [['run', join(dir, 'produce.ipynb'), '--extract', 'parcels=x.csv'], /declares no extract "parcels"/],
      [['run', join(dir, 'produce.ipynb'), '--extract', `produce=${join(dir, 'missing.csv')}`], /Extract "produce" .* cannot be read/],
      [['run', join(dir, 'produce.ipynb'), '--extract', `produce=${join(dir, 'broken.csv')}`], /Extract "produce" .* cannot be read/],
      [['run', join(dir, 'py.ipynb')], /its kernel is "python3"/],
      [['run'], /no notebook given/],
      [['compare', dir], /expected two runs/],
      [['compare', join(dir, 'a'), join(dir, 'b')], /Run record .* is invalid: no run\.json there/],
    ];
    const files = readdirSync(dir).sort();
    for (const [args, message] of cases) {
      const r = coppice(args);
      expect(r.status, args.join(' ')).toBe(2);
      expect(r.stderr).toMatch(message);
    }
    expect(readdirSync(dir).sort()).toEqual(files);
  });

  it('coppice compare prints the comparison of two recorded runs with the check exit code', () => {
    const dir = produceFolder();
    const out = join(dir, 'out');
    expect(coppice(['run', join(dir, 'produce.ipynb'), '--out', out]).status).toBe(0);
    const a = JSON.parse(readFileSync(join(out, 'latest.json'), 'utf8')).run as string;
    const second = coppice(['run', join(dir, 'produce.ipynb'), '--out', out, '--extract', `produce=${join(dir, 'refreshed.csv')}`]);
    expect(second.status).toBe(1); // mean waste 4.625 > 3
    expect(second.stdout).toContain('[FAILS] mean waste <= 3');
    const b = JSON.parse(readFileSync(join(out, 'latest.json'), 'utf8')).run as string;
    const cmp = coppice(['compare', join(out, 'runs', a), join(out, 'runs', b)]);
    expect(cmp.status).toBe(1);
    expect(cmp.stdout).toContain('column crop has new categories "raspberry"');
    const same = coppice(['compare', join(out, 'runs', a), join(out, 'runs', a, 'run.json')]);
    expect(same.status).toBe(0);
    expect(same.stdout).toContain('(same data)');
  });
});
