import { isKernelNotice } from '../../src/notebook/kernel-notices.js';
import { describe, expect, it } from 'vitest';
import { mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { connectionFileFrom } from '../../src/notebook/cli-kernel.js';
import { installPlaceFrom } from '../../src/notebook/cli-install.js';
import { installKernelSpec, jupyterDataDir, kernelSpec } from '../../src/notebook/kernelspec.js';
import { errorContent, kernelInfo } from '../../src/notebook/kernel.js';

const dir = mkdtempSync(join(tmpdir(), 'coppice-kernel-'));
// Fields of a connection file: Jupyter client documentation, "Connection files".
const good = { shell_port: 1, iopub_port: 2, stdin_port: 3, control_port: 4, hb_port: 5, ip: '127.0.0.1', key: 'k', transport: 'tcp', signature_scheme: 'hmac-sha256' };

describe('connectionFileFrom(args)', () => {
  const file = join(dir, 'kernel-1.json');
  writeFileSync(file, JSON.stringify(good));

  it('accepts --connection <file>, --connection=<file> and a bare file', () => {
    expect(connectionFileFrom(['--connection', file])).toBe(file);
    expect(connectionFileFrom([`--connection=${file}`])).toBe(file);
    expect(connectionFileFrom([file])).toBe(file);
  });

  it('names what is wrong with a bad file', () => {
    expect(() => connectionFileFrom([])).toThrow(/missing the connection file/);
    expect(() => connectionFileFrom([join(dir, 'absent.json')])).toThrow(/Kernel connection file ".*absent.json" is invalid/);
    const noPort = join(dir, 'no-port.json');
    writeFileSync(noPort, JSON.stringify({ ...good, hb_port: 'x' }));
    expect(() => connectionFileFrom([noPort])).toThrow(/hb_port is missing or not a number/);
    const md5 = join(dir, 'md5.json');
    writeFileSync(md5, JSON.stringify({ ...good, signature_scheme: 'hmac-md5' }));
    expect(() => connectionFileFrom([md5])).toThrow(/hmac-md5 is not supported/);
    expect(() => connectionFileFrom([file, '--verbose'])).toThrow(/unexpected argument "--verbose"/);
  });
});

describe('installPlaceFrom(args)', () => {
  it('defaults to the user folder and reads --prefix', () => {
    expect(installPlaceFrom([])).toEqual({ user: true });
    expect(installPlaceFrom(['--user'])).toEqual({ user: true });
    expect(installPlaceFrom(['--prefix', '/opt/env'])).toEqual({ prefix: '/opt/env' });
    expect(installPlaceFrom(['--prefix=/opt/env'])).toEqual({ prefix: '/opt/env' });
    expect(() => installPlaceFrom(['--user', '--prefix', '/x'])).toThrow(/give one of --user or --prefix/);
    expect(() => installPlaceFrom(['--prefix'])).toThrow(/--prefix needs a folder/);
  });
});

describe('installKernelSpec(kernelSpec(cli), place)', () => {
  it('writes kernels/coppice/kernel.json under <prefix>/share/jupyter (Jupyter kernelspec layout)', () => {
    const folder = installKernelSpec(kernelSpec('/opt/coppice/dist/cli.js', '/usr/bin/node'), { prefix: join(dir, 'env') });
    expect(folder).toBe(join(dir, 'env', 'share', 'jupyter', 'kernels', 'coppice'));
    const spec = JSON.parse(readFileSync(join(folder, 'kernel.json'), 'utf8'));
    expect(spec).toEqual({
      argv: ['/usr/bin/node', '/opt/coppice/dist/cli.js', 'kernel', '--connection', '{connection_file}'],
      display_name: 'TypeScript (coppice)', language: 'typescript', interrupt_mode: 'signal', metadata: { debugger: false },
    });
  });

  it('jupyterDataDir({ user: true }) follows JUPYTER_DATA_DIR, then XDG_DATA_HOME', () => {
    if (process.platform !== 'linux') return;
    expect(jupyterDataDir({ user: true }, { JUPYTER_DATA_DIR: '/d' })).toBe('/d');
    expect(jupyterDataDir({ user: true }, { XDG_DATA_HOME: '/x' })).toBe('/x/jupyter');
  });
});

describe('kernelInfo(ts, version) and errorContent(error)', () => {
  it('reports typescript as the language', () => {
    const info = kernelInfo('5.0.4', '0.1.0') as { language_info: { name: string; file_extension: string }; protocol_version: string };
    expect(info.language_info.name).toBe('typescript');
    expect(info.language_info.file_extension).toBe('.ts');
    expect(info.protocol_version).toBe('5.3');
  });

  it('turns a cell error into ename, evalue and traceback', () => {
    expect(errorContent({ kind: 'runtime', name: 'RangeError', message: 'too far', trace: ['at f (x:1:2)'] }))
      .toEqual({ ename: 'RangeError', evalue: 'too far', traceback: ['RangeError: too far', '    at f (x:1:2)'] });
    expect(errorContent({ kind: 'magic', name: 'CoppiceError', message: 'Magic at line 1', trace: [] }).ename).toBe('Malformed magic');
  });
});

describe('isKernelNotice(text)', () => {
  it("recognises tslab's notice about a message type it does not handle (tslab 1.0.22 dist/jupyter.js), nothing else", () => {
    expect(isKernelNotice('unknown msg_type: history_request\n')).toBe(true);
    expect(isKernelNotice('unknown msg_type: usage_request\n')).toBe(true);
    expect(isKernelNotice('careful: unknown msg_type: history_request\n')).toBe(false);
    expect(isKernelNotice('unknown msg_type: a\nand more output\n')).toBe(false);
    expect(isKernelNotice('Unknown column "x" in table.\n')).toBe(false);
  });
});
