import { mkdirSync, mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { locateRunRecord, readRunRecord, validateRunRecord } from '../../src/notebook/record-file.js';
import { runRecord } from './record-fixtures.js';

describe('readRunRecord(path)', () => {
  it('reads a record from a file, a run folder or an output folder with latest.json', () => {
    const out = mkdtempSync(join(tmpdir(), 'coppice-record-'));
    const runDir = join(out, 'runs', 'R1');
    mkdirSync(runDir, { recursive: true });
    writeFileSync(join(runDir, 'run.json'), JSON.stringify(runRecord('R1')));
    writeFileSync(join(out, 'latest.json'), JSON.stringify({ run: 'R1' }));
    expect(readRunRecord(join(runDir, 'run.json')).id).toBe('R1');
    expect(readRunRecord(runDir).id).toBe('R1');
    expect(readRunRecord(out).id).toBe('R1');
    expect(locateRunRecord(join(out, 'nope'))).toBeNull();
  });

  it('rejects missing, non-JSON, foreign, newer and malformed records with clear errors', () => {
    const dir = mkdtempSync(join(tmpdir(), 'coppice-record-'));
    expect(() => readRunRecord(join(dir, 'missing'))).toThrow(/no run\.json there/);
    writeFileSync(join(dir, 'bad.json'), '{ "format": "coppice-run", ');
    expect(() => readRunRecord(join(dir, 'bad.json'))).toThrow(/not valid JSON/);
    expect(() => validateRunRecord({ format: 'other' }, 'x')).toThrow(/format is "other"/);
    expect(() => validateRunRecord({ ...runRecord('A'), version: 99 }, 'x')).toThrow(/version 99; this build reads version 1/);
    expect(() => validateRunRecord({ ...runRecord('A'), metrics: {} }, 'x')).toThrow(/field metrics should be an array/);
    expect(() => validateRunRecord({ ...runRecord('A'), status: 'maybe' }, 'x')).toThrow(/status "maybe"/);
    expect(() => validateRunRecord({ ...runRecord('A'), extracts: [{ name: 'p' }] }, 'x')).toThrow(/extract entry/);
    expect(() => validateRunRecord([], 'x')).toThrow(/not a JSON object/);
  });
});
