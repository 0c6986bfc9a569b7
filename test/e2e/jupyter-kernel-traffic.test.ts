/**
 * The kernel under message traffic a notebook front end sends, driven with jupyter_client (the Python
 * that runs `jupyter`): a message type tslab does not handle must not leave a notice in any cell's
 * output, and a boosting fit sends its progress (round of total, losses) as updates of one display
 * before the model summary. Message types and fields: Jupyter messaging protocol 5.3 (jupyter-client
 * documentation, "Messaging in Jupyter": history_request, display_data, update_display_data).
 */
import { describe, expect, it } from 'vitest';
import { spawnSync } from 'node:child_process';
import { existsSync, readFileSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { cli, hasJupyter, jupyterPython, kernelFolder, penguinsPath } from './jupyter-run.js';

const python = hasJupyter ? jupyterPython() : null;
const mustRun = Boolean(process.env.CI);
if (!python && !mustRun) console.warn('test/e2e/jupyter-kernel-traffic.test.ts skipped: no jupyter_client found.');

const driver = String.raw`
import json, sys, time
from jupyter_client.manager import start_new_kernel
km, kc = start_new_kernel(kernel_name='coppice')
log = []
def run(code, timeout=300):
    mid = kc.execute(code)
    while True:
        m = kc.get_iopub_msg(timeout=timeout)
        if m['parent_header'].get('msg_id') != mid:
            log.append({'cell': None, 'type': m['msg_type'], 'content': m['content']})
            continue
        if m['msg_type'] == 'status' and m['content']['execution_state'] == 'idle': break
        log.append({'cell': code.split('\n')[0], 'type': m['msg_type'], 'content': m['content']})
    kc.get_shell_msg(timeout=timeout)
try:
    run('const rows = JSON.parse(require("fs").readFileSync(' + json.dumps(sys.argv[1]) + ', "utf8")) as Record<string, unknown>[];')
    kc.shell_channel.send(kc.session.msg('history_request', {'output': False, 'raw': True, 'hist_access_type': 'tail', 'n': 10}))
    kc.shell_channel.send(kc.session.msg('coppice_probe_request', {}))
    time.sleep(1)
    run('1 + 1')
    run('%%fit g boosting\ndata: rows\ntarget: Species\nrounds: 400\ndepth: 4\nwatch: rows')
    time.sleep(0.5)
    while True:
        try: m = kc.get_iopub_msg(timeout=0.2)
        except Exception: break
        log.append({'cell': None, 'type': m['msg_type'], 'content': m['content']})
finally:
    kc.stop_channels(); km.shutdown_kernel(now=True)
json.dump(log, open(sys.argv[2], 'w'))
`;

interface Logged { cell: string | null; type: string; content: { name?: string; text?: string; data?: Record<string, unknown>; transient?: { display_id?: string } } }

describe.runIf(Boolean(python) || mustRun)('the coppice kernel under front-end traffic (jupyter_client)', () => {
  it('keeps notices about unhandled message types out of cells, and streams fit progress', () => {
    expect(existsSync(cli), 'dist/cli.js is missing: run npm run build').toBe(true);
    const { dir, jupyterPath } = kernelFolder();
    const script = join(dir, 'drive.py'), out = join(dir, 'log.json');
    writeFileSync(script, driver);
    const run = spawnSync(python ?? 'python3', [script, penguinsPath, out], {
      cwd: dir, encoding: 'utf8', env: { ...process.env, JUPYTER_PATH: jupyterPath }, timeout: 300_000,
    });
    expect(run.status, run.stderr).toBe(0);
    expect(run.stderr).toContain('unknown msg_type: history_request'); // still in the kernel's own log
    const log = JSON.parse(readFileSync(out, 'utf8')) as Logged[];
    const streams = log.filter((m) => m.type === 'stream').map((m) => m.content.text ?? '');
    expect(streams.filter((t) => t.includes('msg_type'))).toEqual([]);
    expect(log.filter((m) => m.cell === '1 + 1' && m.type === 'stream').map((m) => m.content.text)).toEqual(['2\n']);

    const fit = log.filter((m) => m.cell === '%%fit g boosting' && (m.type === 'display_data' || m.type === 'update_display_data'));
    const ids = new Set(fit.map((m) => m.content.transient?.display_id));
    expect(ids.size).toBe(1); // one output, updated in place
    const texts = fit.map((m) => String(m.content.data?.['text/plain']));
    const rounds = texts.map((t) => /round (\d+) of 400 · training loss \S+ · watched loss \S+ · best round \d+/.exec(t)?.[1]).filter((r) => r !== undefined).map(Number);
    expect(rounds.length).toBeGreaterThanOrEqual(2);
    expect(rounds.at(-1)).toBe(400);
    expect(rounds).toEqual([...rounds].sort((a, b) => a - b));
    expect(texts.at(-1)).toMatch(/^g: boosting model\n/);
  });
});
