import { spawnSync } from 'node:child_process';
import { readFileSync } from 'node:fs';
import { join, resolve } from 'node:path';
import { describe, expect, it } from 'vitest';

// The demo pipeline end to end (`npm run demo`: generate the invented extracts, run the notebook on spring, rerun
// on summer). The planted changes are described in notebooks-demo/generate-extracts.mjs; the comparison must find
// them: the new crop, the warmer trucks, and a decision check that no longer holds.
describe('npm run demo (scripts/demo.mjs)', () => {
  it('flags the planted drift and a failing decision check', () => {
    const r = spawnSync(process.execPath, [resolve('scripts/demo.mjs')], { encoding: 'utf8', timeout: 280_000 });
    const out = r.stdout;
    expect(r.status, `${out}\n${r.stderr}`).toBe(0);
    expect(out).toContain('column crop has new categories "raspberry"');
    expect(out).toMatch(/! truck_temp_c +PSI +[\d.]+ +(moderate|major)/);
    expect(out).toMatch(/\[FAILS\] /);
    expect(out).toContain('Exit code 1: a decision check fails.');
    const latest = JSON.parse(readFileSync(join('notebooks-demo', 'runs', 'latest.json'), 'utf8')).run as string;
    const record = JSON.parse(readFileSync(join('notebooks-demo', 'runs', 'runs', latest, 'run.json'), 'utf8'));
    expect(record.status).toBe('ok');
    expect(record.extracts[0]).toMatchObject({ name: 'pallets', overridden: true });
    expect(record.decisions[0].checks.some((c: { holds: boolean }) => !c.holds)).toBe(true);
  }, 300_000);
});
