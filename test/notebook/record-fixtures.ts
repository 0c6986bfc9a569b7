/** Build small run records for comparison tests. */
import type { DecisionRecord } from '../../src/notebook/decision-types.js';
import { profileColumn, type ColumnProfile } from '../../src/notebook/record-profile.js';
import type { RunRecord } from '../../src/notebook/record-file.js';
import type { BoundExtract, NotedMetric } from '../../src/notebook/record-state.js';

export function boundExtract(name: string, cols: Record<string, unknown[]>, fingerprint = 'f0'): BoundExtract {
  const profiles: Record<string, ColumnProfile> = {};
  for (const [k, v] of Object.entries(cols)) profiles[k] = profileColumn(v);
  const rows = Object.values(cols)[0]?.length ?? 0;
  return {
    name, source: `${name}.csv`, defaultSource: `${name}.csv`, overridden: false, path: `/data/${name}.csv`, rows,
    columns: Object.keys(cols).map((c) => ({ name: c, kind: profiles[c].kind })), fingerprint, profiles,
  };
}

export function decision(title: string, checks: [string, boolean][]): DecisionRecord {
  const cs = checks.map(([label, holds]) => ({ label, kind: 'custom' as const, holds, observed: null, detail: holds ? 'holds' : 'does not hold' }));
  return { title, reasoning: '', evidence: [], checks: cs, holds: cs.every((c) => c.holds), affects: [], recorded: '2025-01-01T00:00:00.000Z' };
}

export function runRecord(id: string, parts: Partial<RunRecord> & { metrics?: NotedMetric[] } = {}): RunRecord {
  return {
    format: 'coppice-run', version: 1, id, status: 'ok',
    notebook: { path: '/nb/demo.ipynb', fingerprint: 'nb0', cells: 3 },
    started: '2025-01-01T00:00:00.000Z', finished: '2025-01-01T00:00:01.000Z', ms: 1000,
    extracts: [], metrics: [], tables: {}, predictions: {}, decisions: [], models: [], cells: [], failure: null,
    affectsPeople: [], versions: { coppice: '0.1.0' }, comparedWith: null,
    ...parts,
  };
}
