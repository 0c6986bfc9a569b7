import { it } from 'vitest';
import { fitBoosting } from '/work/main/src/learn/ensemble/boosting.js';
import { createRng } from '/work/main/src/util/rng.js';
import { schemaFingerprint, dataFingerprint } from '/work/main/src/table/fingerprint.js';
it('perf', () => {
  const n = 200_000, p = 28, rng = createRng(1);
  const cols = Array.from({ length: p }, (_, j) => ({ name: `f${j}`, kind: 'numeric' as const, values: new Float64Array(n) }));
  const codes = new Int32Array(n);
  for (let i = 0; i < n; i++) { let s = 0; for (let j = 0; j < p; j++) { const v = rng.normal(); cols[j].values[i] = v; if (j < 5) s += v; } codes[i] = s + rng.normal() > 0 ? 1 : 0; }
  const sc = cols.map((c) => ({ name: c.name, kind: c.kind }));
  const data = { features: { nRows: n, columns: cols, schema: { columns: sc, fingerprint: schemaFingerprint(sc) } }, target: { kind: 'class' as const, name: 'y', codes, classes: ['a', 'b'] }, weights: null };
  { const t0 = performance.now(); dataFingerprint(data); console.log('rounds fp ms', (performance.now() - t0).toFixed(0)); }
  for (const r of [1, 11, 21]) {
    const t0 = performance.now();
    const m = fitBoosting(data, { rounds: r, leafBudget: 63, depthLimit: Infinity as number });
    console.log('rounds', r, 'ms', (performance.now() - t0).toFixed(0), 'loss', m.trainLoss.at(-1)?.toFixed(4));
  }
}, 300000);
