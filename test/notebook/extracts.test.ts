import { mkdtempSync, writeFileSync, readdirSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { declareExtract, resolveExtractSource } from '../../src/notebook/extracts.js';
import { currentRunState, resetRunState, setExtractOverrides } from '../../src/notebook/record-state.js';

let dir: string;
beforeEach(() => {
  dir = mkdtempSync(join(tmpdir(), 'coppice-extracts-'));
  writeFileSync(join(dir, 'a.csv'), 'depot,km,late\nnorth,1.5,true\nsouth,2.5,false\nnorth,,true\n');
  writeFileSync(join(dir, 'b.csv'), 'depot,km,late\neast,9,false\n');
  resetRunState();
  delete process.env.COPPICE_EXTRACTS;
});
afterEach(() => { delete process.env.COPPICE_EXTRACTS; });

describe('declareExtract(name, defaultSource)', () => {
  it('reads the default source and records what it bound', async () => {
    const t = await declareExtract('parcels', join(dir, 'a.csv'));
    expect(t.numRows()).toBe(3);
    const [e] = currentRunState().extracts;
    expect(e).toMatchObject({ name: 'parcels', overridden: false, rows: 3, path: join(dir, 'a.csv') });
    expect(e.columns.map((c) => `${c.name}:${c.kind}`)).toEqual(['depot:categorical', 'km:numeric', 'late:boolean']);
    expect(e.fingerprint).toMatch(/^[0-9a-f]{16}$/);
    expect(e.profiles.km).toMatchObject({ missing: 1, points: [1.5, 2.5], cum: [0.5, 1], exact: true });
    expect(e.profiles.depot).toMatchObject({ counts: { north: 2, south: 1 } });
    expect(readdirSync(dir).sort()).toEqual(['a.csv', 'b.csv']); // reading writes nothing
  });

  it('uses a session override before the environment, and the environment before the default', async () => {
    process.env.COPPICE_EXTRACTS = JSON.stringify({ parcels: join(dir, 'b.csv') });
    expect((await declareExtract('parcels', join(dir, 'a.csv'))).numRows()).toBe(1);
    expect(currentRunState().extracts[0].overridden).toBe(true);
    setExtractOverrides({ parcels: join(dir, 'a.csv') });
    expect(resolveExtractSource('parcels', 'x.csv')).toEqual({ source: join(dir, 'a.csv'), overridden: true });
    expect(currentRunState().extracts).toHaveLength(1); // rebinding keeps one entry per name
  });

  it('gives different fingerprints to different data and equal ones to equal data', async () => {
    await declareExtract('a', join(dir, 'a.csv'));
    await declareExtract('b', join(dir, 'b.csv'));
    await declareExtract('c', join(dir, 'a.csv'));
    const [a, b, c] = currentRunState().extracts;
    expect(a.fingerprint).not.toBe(b.fingerprint);
    expect(a.fingerprint).toBe(c.fingerprint);
  });

  it('rejects bad names, missing files and bad environment JSON with clear errors', async () => {
    await expect(declareExtract('no spaces', 'x.csv')).rejects.toThrow(/Extract name/);
    await expect(declareExtract('p', '')).rejects.toThrow(/source of extract p/);
    await expect(declareExtract('p', join(dir, 'nope.csv'))).rejects.toThrow(/Extract "p" from .*nope\.csv.* cannot be read/);
    process.env.COPPICE_EXTRACTS = '{not json';
    await expect(declareExtract('p', join(dir, 'a.csv'))).rejects.toThrow(/COPPICE_EXTRACTS/);
    expect(currentRunState().extracts).toHaveLength(0);
  });
});
